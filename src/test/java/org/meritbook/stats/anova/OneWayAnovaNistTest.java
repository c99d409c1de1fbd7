package org.meritbook.stats.anova;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.meritbook.qualification.NistAnovaDataset;
import org.meritbook.stats.ExactMoments;
import org.meritbook.stats.Lre;

/**
 * One-way ANOVA against NIST StRD certified values (https://www.itl.nist.gov/div898/strd/anova/):
 * between and within SS, MS, F, R² and the residual SD. Measured per set, as for the univariate
 * data: on the data centred exactly in decimal before conversion (how {@code meritbook qualify}
 * reads them), on the nearest doubles against the exact sums of squares of those doubles, and on
 * the nearest doubles against the certificate (where binary representation limits the digits).
 */
class OneWayAnovaNistTest {

    // Source: NIST StRD SiRstv, SmLs01-09, AtmWtAg certified ANOVA tables, R² and residual SD.
    @ParameterizedTest
    @MethodSource("names")
    void centredDataReachEveryCertifiedFigure(String name) {
        NistAnovaDataset d = load(name);
        OneWayAnova a = OneWayAnova.of(d.centredGroups());
        assertEquals(d.dfBetween(), a.dfBetween());
        assertEquals(d.dfWithin(), a.dfWithin());
        double bar = 14; // measured: at least 14.5 (AtmWtAg SS within, whose certificate prints 15 digits)
        assertDigits(name + " SS between", a.ssBetween(), d.ssBetween(), bar);
        assertDigits(name + " SS within", a.ssWithin(), d.ssWithin(), bar);
        assertDigits(name + " MS between", a.msBetween(), d.msBetween(), bar);
        assertDigits(name + " MS within", a.msWithin(), d.msWithin(), bar);
        assertDigits(name + " F", a.f(), d.f(), bar);
        assertDigits(name + " R²", a.rSquared(), d.rSquared(), bar);
        assertDigits(name + " residual SD", a.residualSd(), d.residualSd(), bar);
    }

    // Source: NIST StRD files (data) and exact decimal arithmetic on the same doubles (ExactMoments).
    @ParameterizedTest
    @MethodSource("names")
    void onTheNearestDoublesTheAlgorithmLosesNothing(String name) {
        List<double[]> groups = load(name).groups();
        OneWayAnova a = OneWayAnova.of(groups);
        double[] exact = ExactMoments.anovaSums(groups);
        assertDigits(name + " SS between (exact of doubles)", a.ssBetween(), exact[0], 15); // measured ≥ 15.7
        assertDigits(name + " SS within (exact of doubles)", a.ssWithin(), exact[1], 15);
    }

    // Source: NIST StRD certified values; the bars are the representation limits of the doubles, measured.
    @ParameterizedTest
    @MethodSource("names")
    void onTheNearestDoublesOnlyRepresentationLimitsTheDigits(String name) {
        NistAnovaDataset d = load(name);
        OneWayAnova a = OneWayAnova.of(d.groups());
        // Measured: SmLs07-09 3.9 to 4.4 digits (13 constant leading digits), AtmWtAg and SmLs04-06
        // 9.9 to 10.9 (7 constant digits), the lower-difficulty sets 13.1 or more.
        double bar = switch (name) {
            case "SmLs07", "SmLs08", "SmLs09" -> 3.5;
            case "AtmWtAg", "SmLs04", "SmLs05", "SmLs06" -> 9.5;
            default -> 13;
        };
        assertDigits(name + " SS between (raw)", a.ssBetween(), d.ssBetween(), bar);
        assertDigits(name + " SS within (raw)", a.ssWithin(), d.ssWithin(), bar);
        assertDigits(name + " F (raw)", a.f(), d.f(), bar);
    }

    private static final Map<String, NistAnovaDataset> LOADED = new ConcurrentHashMap<>();

    private static NistAnovaDataset load(String name) {
        return LOADED.computeIfAbsent(name, NistAnovaDataset::load);
    }

    static List<String> names() {
        return NistAnovaDataset.NAMES;
    }

    static void assertDigits(String what, double computed, double certified, double bar) {
        double lre = Lre.of(computed, certified);
        assertTrue(lre >= bar, () -> String.format(Locale.ROOT, "%s: computed %.17g, reference %.17g, %.1f digits (< %.1f)",
                what, computed, certified, lre, bar));
    }
}
