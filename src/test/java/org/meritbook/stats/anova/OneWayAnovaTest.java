package org.meritbook.stats.anova;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.stats.UnusableDataException;

class OneWayAnovaTest {

    // Invented unbalanced layout (three days, 2, 3 and 5 replicates), used only for cross-checks.
    private static final List<double[]> UNBALANCED = List.of(
            new double[] {10.2, 10.5},
            new double[] {9.8, 10.1, 9.9},
            new double[] {10.6, 10.9, 10.4, 10.8, 10.7});

    // Source: Apache Commons Math 3.6.1 org.apache.commons.math3.stat.inference.OneWayAnova (one-pass sums).
    @Test
    void unbalancedGroupsAgreeWithCommonsMath() {
        OneWayAnova a = OneWayAnova.of(UNBALANCED);
        org.apache.commons.math3.stat.inference.OneWayAnova cm = new org.apache.commons.math3.stat.inference.OneWayAnova();
        assertEquals(cm.anovaFValue(UNBALANCED), a.f(), 1e-10 * a.f());
        assertEquals(cm.anovaPValue(UNBALANCED), a.p(), 1e-10);
        assertEquals(2, a.dfBetween());
        assertEquals(7, a.dfWithin());
        assertEquals(10, a.totalCount());
        assertEquals(List.of(2, 3, 5), a.groupSizes());
    }

    // Source: hand arithmetic on the layout above: group means 10.35, 9.9333…, 10.68, grand mean 10.39;
    // SS_within = 0.045 + 0.14/3 + 0.148 = 0.239667; SS_between = 2(−0.04)² + 3(−0.456667)² + 5(0.29)²
    // = 0.0032 + 0.625633 + 0.4205 = 1.049333; total Σ(x − 10.39)² = 0.0482 + 0.6723 + 0.5685 = 1.289.
    @Test
    void unbalancedGroupsByHand() {
        OneWayAnova a = OneWayAnova.of(UNBALANCED);
        assertEquals(10.39, a.grandMean(), 1e-13);
        assertEquals(10.35, a.groupMeans().get(0), 1e-13);
        assertEquals(29.8 / 3, a.groupMeans().get(1), 1e-13);
        assertEquals(10.68, a.groupMeans().get(2), 1e-13);
        assertEquals(0.045 + 0.14 / 3 + 0.148, a.ssWithin(), 1e-13);
        assertEquals(0.0032 + 3 * Math.pow(29.8 / 3 - 10.39, 2) + 0.4205, a.ssBetween(), 1e-13);
        assertEquals(1.289, a.ssTotal(), 1e-13);
        assertEquals(a.ssBetween() / 1.289, a.rSquared(), 1e-13);
        assertEquals(Math.sqrt(a.ssWithin() / 7), a.residualSd(), 1e-15);
    }

    // Source: the definition; the ANOVA does not depend on the order of the groups or of values within one.
    @Test
    void orderDoesNotMatter() {
        OneWayAnova a = OneWayAnova.of(UNBALANCED);
        OneWayAnova b = OneWayAnova.of(List.of(new double[] {10.8, 10.4, 10.9, 10.6, 10.7}, new double[] {10.5, 10.2},
                new double[] {9.9, 9.8, 10.1}));
        assertEquals(a.f(), b.f(), 1e-12 * a.f());
        assertEquals(a.ssWithin(), b.ssWithin(), 1e-14);
    }

    @Test
    void unusableLayoutsSayWhy() {
        UnusableDataException one = assertThrows(UnusableDataException.class,
                () -> OneWayAnova.of(List.<double[]>of(new double[] {1, 2})));
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, one.reason());
        UnusableDataException singles = assertThrows(UnusableDataException.class,
                () -> OneWayAnova.of(List.of(new double[] {1}, new double[] {2})));
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, singles.reason());
        UnusableDataException empty = assertThrows(UnusableDataException.class,
                () -> OneWayAnova.of(List.of(new double[] {1, 2}, new double[0])));
        assertEquals("group 2: at least 1 value is needed, but there are 0", empty.getMessage());
        UnusableDataException flat = assertThrows(UnusableDataException.class,
                () -> OneWayAnova.of(List.of(new double[] {1, 1}, new double[] {2, 2})));
        assertEquals(UnusableDataException.Reason.NO_VARIATION, flat.reason());
        UnusableDataException inf = assertThrows(UnusableDataException.class,
                () -> OneWayAnova.of(List.of(new double[] {1, 2}, new double[] {2, Double.POSITIVE_INFINITY})));
        assertEquals(UnusableDataException.Reason.NOT_FINITE, inf.reason());
    }
}
