package org.meritbook.stats.descriptive;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.meritbook.qualification.NistUnivariateDataset;
import org.meritbook.stats.ExactMoments;
import org.meritbook.stats.Lre;

/**
 * Mean and SD against NIST StRD univariate summary statistics (certified values in the files'
 * headers, https://www.itl.nist.gov/div898/strd/univ/). Three measurements per set:
 * <ul>
 *   <li>on the values centred exactly on their first value before conversion to doubles (how
 *       {@code meritbook qualify} reads them): every certified figure to ≥ 14.5 digits;</li>
 *   <li>on the doubles nearest the printed values, against the exact mean and SD of those same
 *       doubles (60-digit decimal arithmetic, {@link ExactMoments}): the algorithm's own error,
 *       ≥ 14 digits everywhere;</li>
 *   <li>on those doubles against the certificate: limited by their binary representation
 *       (measured for the SD: Mavro 13.1, Michelso 13.8, NumAcc3 9.5, NumAcc4 8.3 digits; the
 *       bars are set just below).</li>
 * </ul>
 */
class SampleSummaryNistTest {

    // Source: NIST StRD Michelso, Mavro, NumAcc1-4, Lew, Lottery, PiDigits certified mean and SD.
    @ParameterizedTest
    @MethodSource("names")
    void centredDataReachTheCertifiedDigits(String name) {
        NistUnivariateDataset d = NistUnivariateDataset.load(name);
        SampleSummary s = SampleSummary.of(d.centredValues());
        double mean = d.centre().doubleValue() + s.mean();
        assertDigits(name + " mean", mean, d.certifiedMean(), 14.5);
        assertDigits(name + " SD", s.sd(), d.certifiedSd(), 14.5);
    }

    // Source: NIST StRD files (data) and exact decimal arithmetic on the same doubles (ExactMoments).
    @ParameterizedTest
    @MethodSource("names")
    void onTheNearestDoublesTheAlgorithmLosesNothing(String name) {
        double[] v = NistUnivariateDataset.load(name).values();
        SampleSummary s = SampleSummary.of(v);
        assertDigits(name + " mean (exact of doubles)", s.mean(), ExactMoments.mean(v).doubleValue(), 15);
        assertDigits(name + " SD (exact of doubles)", s.sd(), ExactMoments.sd(v), 14);
    }

    // Source: NIST StRD certified values; the bars are the representation limits measured on these doubles.
    @ParameterizedTest
    @MethodSource("names")
    void onTheNearestDoublesOnlyNumAcc3And4FallShortOfTheCertificate(String name) {
        NistUnivariateDataset d = NistUnivariateDataset.load(name);
        SampleSummary s = SampleSummary.of(d.values());
        double sdBar = switch (name) {
            case "NumAcc3" -> 9;
            case "NumAcc4" -> 8;
            default -> 13;
        };
        assertDigits(name + " mean", s.mean(), d.certifiedMean(), 15);
        assertDigits(name + " SD", s.sd(), d.certifiedSd(), sdBar);
    }

    static List<String> names() {
        return NistUnivariateDataset.NAMES;
    }

    static void assertDigits(String what, double computed, double certified, double bar) {
        double lre = Lre.of(computed, certified);
        assertTrue(lre >= bar, () -> String.format(Locale.ROOT, "%s: computed %.17g, reference %.17g, %.1f digits (< %.1f)",
                what, computed, certified, lre, bar));
    }
}
