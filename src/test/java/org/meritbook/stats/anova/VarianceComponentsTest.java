package org.meritbook.stats.anova;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.meritbook.qualification.NistAnovaDataset;
import org.meritbook.stats.Interval;

class VarianceComponentsTest {

    // Source: NIST StRD SiRstv certified mean squares (5 instruments × 5 replicates, balanced, n₀ = 5):
    // MS_between = 1.27865654E-02, MS_within = 1.08318280E-02, so by hand s_L² = (MSB − MSW)/5
    // = 3.9094748E-04, s_I² = 1.122277548E-02; Satterthwaite ν = s_I⁴ / ((MSB/5)²/4 + (0.8·MSW)²/20)
    // = 1.2595069E-04 / (1.6349625E-06 + 3.7545119E-06) = 23.3698.
    @Test
    void balancedComponentsFromNistSiRstv() {
        VarianceComponents v = VarianceComponents.of(OneWayAnova.of(NistAnovaDataset.load("SiRstv").groups()));
        assertEquals(5, v.n0(), 1e-14);
        assertEquals(1.08318280e-02, v.repeatabilityVariance(), 1e-15);
        assertEquals(3.9094748e-04, v.betweenVariance(), 1e-15);
        assertFalse(v.betweenSetToZero());
        assertEquals(1.122277548e-02, v.intermediateVariance(), 1e-15);
        assertEquals(23.3698, v.intermediateDf(), 5e-4);
        assertEquals(20, v.repeatabilityDf());
        assertEquals(2.8 * Math.sqrt(1.08318280e-02), v.repeatabilityLimit(), 1e-12);
        assertEquals(2.8 * Math.sqrt(1.122277548e-02), v.reproducibilityLimit(), 1e-12);
    }

    // Source: hand arithmetic, the ISO 5725-2 formula for n₀ with group sizes 2, 3, 5:
    // N = 10, Σn² = 38, n₀ = (10 − 3.8)/2 = 3.1; data as in OneWayAnovaTest: MSB = 1.049333/2, MSW = 0.239667/7.
    @Test
    void unbalancedGroupsUseTheEffectiveGroupSize() {
        OneWayAnova a = OneWayAnova.of(List.of(new double[] {10.2, 10.5}, new double[] {9.8, 10.1, 9.9},
                new double[] {10.6, 10.9, 10.4, 10.8, 10.7}));
        VarianceComponents v = VarianceComponents.of(a);
        assertEquals(3.1, v.n0(), 1e-14);
        assertEquals((a.msBetween() - a.msWithin()) / 3.1, v.betweenVariance(), 1e-15);
        assertEquals(100 * v.intermediateSd() / 10.39, v.intermediateCvPercent(), 1e-12);
        assertEquals(100 * v.repeatabilitySd() / 10.39, v.repeatabilityCvPercent(), 1e-12);
    }

    // Source: hand arithmetic: groups {1, 2, 3} and {1, 2, 3} have MSB = 0 and MSW = 1, so the between
    // estimate (0 − 1)/3 is negative; it is set to 0, s_I = s_r = 1 with N − k = 4 degrees of freedom.
    @Test
    void aNegativeBetweenEstimateIsSetToZeroAndSaysSo() {
        VarianceComponents v = VarianceComponents.of(OneWayAnova.of(List.of(new double[] {1, 2, 3}, new double[] {1, 2, 3})));
        assertTrue(v.betweenSetToZero());
        assertEquals(-1.0 / 3, v.betweenEstimate(), 1e-15);
        assertEquals(0, v.betweenVariance());
        assertEquals(0, v.betweenSd());
        assertEquals(1, v.intermediateSd(), 1e-15);
        assertEquals(4, v.intermediateDf());
        assertEquals(v.repeatabilitySdInterval(0.95), v.intermediateSdInterval(0.95));
    }

    // Source: hand arithmetic on groups {0, 1} and {a, 1 + a}, a = √1.5: MSW = 0.5, MSB = 2·2·(a/2)² = 1.5,
    // n₀ = 2, s_L² = (1.5 − 0.5)/2 = 0.5, s_I² = 1; Satterthwaite ν = 1 / ((1.5/2)²/1 + (0.5·0.5)²/2)
    // = 1 / 0.59375 = 1.684211.
    @Test
    void satterthwaiteDegreesOfFreedomByHand() {
        double a = Math.sqrt(1.5);
        VarianceComponents v = VarianceComponents.of(OneWayAnova.of(List.of(new double[] {0, 1}, new double[] {a, 1 + a})));
        assertEquals(0.5, v.betweenVariance(), 1e-15);
        assertEquals(1, v.intermediateVariance(), 1e-15);
        assertEquals(1 / 0.59375, v.intermediateDf(), 1e-12);
    }

    // Source: Monte Carlo check of the Satterthwaite interval's coverage (seeded, so deterministic):
    // 6 days × 3 replicates, σ_r = σ_L = 1, true σ_I = √2; 4000 simulated studies. The approximate 95 %
    // interval must cover σ_I in 93 % to 97 % of them (simulation error ±0.7 % at 2 SE).
    @Test
    void intermediateIntervalCoversTheTrueValue() {
        Random random = new Random(20240611L);
        int covered = 0;
        int studies = 4000;
        for (int s = 0; s < studies; s++) {
            List<double[]> groups = new ArrayList<>();
            for (int day = 0; day < 6; day++) {
                double effect = random.nextGaussian();
                double[] g = new double[3];
                for (int j = 0; j < 3; j++) {
                    g[j] = 50 + effect + random.nextGaussian();
                }
                groups.add(g);
            }
            Interval ci = VarianceComponents.of(OneWayAnova.of(groups)).intermediateSdInterval(0.95);
            if (ci.low() <= Math.sqrt(2) && Math.sqrt(2) <= ci.high()) {
                covered++;
            }
        }
        double coverage = (double) covered / studies;
        assertTrue(coverage >= 0.93 && coverage <= 0.97, "coverage " + coverage);
    }
}
