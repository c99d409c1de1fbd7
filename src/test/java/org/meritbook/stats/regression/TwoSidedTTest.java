package org.meritbook.stats.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.distribution.TDistribution;
import org.junit.jupiter.api.Test;

class TwoSidedTTest {
    @Test
    void rememberedQuantilesAreTheTableValuesForEachLevelAndDf() {
        // NIST/SEMATECH e-Handbook of Statistical Methods, 1.3.6.7.2 (critical values of Student's t):
        // 9 df: 2.262 (two-sided 95 %), 3.250 (two-sided 99 %); 4 df: 2.776 (95 %).
        for (int pass = 0; pass < 2; pass++) { // the second pass is answered from memory
            assertEquals(2.262, TwoSidedT.quantile(9, 0.95, 1e-13), 5e-4);
            assertEquals(3.250, TwoSidedT.quantile(9, 0.99, 1e-13), 5e-4);
            assertEquals(2.776, TwoSidedT.quantile(4, 0.95, 1e-13), 5e-4);
        }
    }

    @Test
    void aRememberedQuantileIsTheSameDoubleCommonsMathGives() {
        double direct = new TDistribution(null, 7, 1e-13).inverseCumulativeProbability(0.975);
        TwoSidedT.quantile(7, 0.95, 1e-13);
        assertEquals(direct, TwoSidedT.quantile(7, 0.95, 1e-13), 0.0);
        // Another accuracy is another question.
        double coarse = new TDistribution(null, 7, 1e-3).inverseCumulativeProbability(0.975);
        assertEquals(coarse, TwoSidedT.quantile(7, 0.95, 1e-3), 0.0);
    }
}
