package org.meritbook.stats.descriptive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.meritbook.stats.Interval;
import org.meritbook.stats.UnusableDataException;

class SampleSummaryTest {

    // Source: Miller & Miller, Statistics and Chemometrics for Analytical Chemistry, ch. 2, the sodium
    // ion content of a urine specimen (from memory): 102, 97, 99, 98, 101, 106 mM give x̄ = 100.5,
    // s = 3.27 and the 95 % confidence limits 100.5 ± 3.4 mM (t = 2.57).
    @Test
    void sodiumExampleOfTheHandbook() {
        SampleSummary s = SampleSummary.of(new double[] {102, 97, 99, 98, 101, 106});
        assertEquals(6, s.n());
        assertEquals(100.5, s.mean(), 1e-12);
        assertEquals(3.27, s.sd(), 0.005);
        Interval ci = s.meanInterval(0.95);
        assertEquals(3.4, (ci.high() - ci.low()) / 2, 0.05);
        // Exact arithmetic: Σ(x − x̄)² = 53.5, s² = 10.7.
        assertEquals(10.7, s.variance(), 1e-13);
        assertEquals(100 * Math.sqrt(10.7) / 100.5, s.cvPercent(), 1e-13);
        assertEquals(97, s.min());
        assertEquals(106, s.max());
    }

    // Source: hand arithmetic with tabled chi-square values χ²(0.025; 5) = 0.8312, χ²(0.975; 5) = 12.833
    // (any chi-square table): s = √10.7 = 3.2711, limits s·√(5/12.833) = 2.042 and s·√(5/0.8312) = 8.023.
    @Test
    void chiSquareIntervalOfTheSd() {
        SampleSummary s = SampleSummary.of(new double[] {102, 97, 99, 98, 101, 106});
        Interval ci = s.sdInterval(0.95);
        assertEquals(2.042, ci.low(), 0.0005);
        assertEquals(8.023, ci.high(), 0.0005);
        assertEquals(0.95, ci.level());
    }

    // Source: the defining property; a shift leaves s unchanged and moves x̄ and its interval with it.
    @Test
    void shiftMovesTheMeanOnly() {
        double[] v = {0.12, 0.15, 0.11, 0.16, 0.13};
        double[] shifted = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            shifted[i] = v[i] + 1e6;
        }
        SampleSummary a = SampleSummary.of(v);
        SampleSummary b = SampleSummary.of(shifted);
        assertEquals(a.sd(), b.sd(), 1e-9 * a.sd());
        assertEquals(a.mean() + 1e6, b.mean(), 1e-9);
    }

    @Test
    void constantDataHaveZeroSpreadAndADegenerateInterval() {
        SampleSummary s = SampleSummary.of(new double[] {0.3, 0.3, 0.3});
        assertEquals(0, s.sd());
        assertEquals(0.3, s.mean());
        assertEquals(0, s.cvPercent());
        Interval ci = s.meanInterval(0.95);
        assertEquals(ci.low(), ci.high());
    }

    @Test
    void unusableDataSayWhy() {
        UnusableDataException one = assertThrows(UnusableDataException.class, () -> SampleSummary.of(new double[] {1}));
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, one.reason());
        assertEquals("the sample: at least 2 values are needed, but there are 1", one.getMessage());
        UnusableDataException nan = assertThrows(UnusableDataException.class,
                () -> SampleSummary.of(new double[] {1, Double.NaN}));
        assertEquals(UnusableDataException.Reason.NOT_FINITE, nan.reason());
        UnusableDataException zero = assertThrows(UnusableDataException.class,
                () -> SampleSummary.of(new double[] {-1, 1}).cvPercent());
        assertEquals(UnusableDataException.Reason.ZERO_MEAN, zero.reason());
        assertThrows(IllegalArgumentException.class, () -> SampleSummary.of(new double[] {1, 2}).meanInterval(1.0));
        assertThrows(IllegalArgumentException.class, () -> new SampleSummary(3, 1, 4, 3, 0, 2));
    }
}
