package org.meritbook.stats.outliers;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.distributions.FisherF;

class CochranTestTest {

    /**
     * k (groups), then 1 % and 5 % critical values for n = 2 … 6: ISO 5725-2, table of critical values
     * for Cochran's test (from memory; p there is our k). k = 2, n = 2 is blank in the table.
     */
    private static final double[][] ISO_TABLE = {
        {2, Double.NaN, Double.NaN, 0.995, 0.975, 0.979, 0.939, 0.959, 0.906, 0.937, 0.877},
        {3, 0.993, 0.967, 0.942, 0.871, 0.883, 0.798, 0.834, 0.746, 0.793, 0.707},
        {4, 0.968, 0.906, 0.864, 0.768, 0.781, 0.684, 0.721, 0.629, 0.676, 0.590},
        {5, 0.928, 0.841, 0.788, 0.684, 0.696, 0.598, 0.633, 0.544, 0.588, 0.506},
        {6, 0.883, 0.781, 0.722, 0.616, 0.626, 0.532, 0.564, 0.480, 0.520, 0.445},
        {10, 0.718, 0.602, 0.536, 0.445, 0.447, 0.373, 0.393, 0.331, 0.357, 0.303}};

    // Source: ISO 5725-2 Cochran table (from memory); tolerance one unit of its third decimal.
    @Test
    void criticalValuesReproduceTheIsoTable() {
        for (double[] row : ISO_TABLE) {
            int k = (int) row[0];
            for (int n = 2; n <= 6; n++) {
                double one = row[1 + 2 * (n - 2)];
                double five = row[2 + 2 * (n - 2)];
                if (Double.isNaN(one)) {
                    continue;
                }
                assertEquals(one, CochranTest.criticalValue(k, n, 0.01), 0.001, "1 %, k = " + k + ", n = " + n);
                assertEquals(five, CochranTest.criticalValue(k, n, 0.05), 0.001, "5 %, k = " + k + ", n = " + n);
            }
        }
    }

    // Source: R 4.2.2, the formula with qf: k = 4, n = 3: 0.7679205583 (5 %), 0.8642791192 (1 %);
    // k = 3, n = 4, 5 %: 0.7977386661; k = 5, n = 2, 1 %: 0.9278688495.
    @Test
    void criticalValuesAgreeWithTheFormulaInR() {
        assertEquals(0.7679205583, CochranTest.criticalValue(4, 3, 0.05), 1e-9);
        assertEquals(0.8642791192, CochranTest.criticalValue(4, 3, 0.01), 1e-9);
        assertEquals(0.7977386661, CochranTest.criticalValue(3, 4, 0.05), 1e-9);
        assertEquals(0.9278688495, CochranTest.criticalValue(5, 2, 0.01), 1e-9);
        double f = new FisherF(2, 6).upperQuantile(0.05 / 4);
        assertEquals(1 / (1 + 3 / f), CochranTest.criticalValue(4, 3, 0.05), 1e-15);
    }

    // Source: hand arithmetic: three groups {0, 1, 2} (s² = 1) and one {0, √10, 2√10} (s² = 10), n = 3:
    // C = 10/13 = 0.76923, just above C_crit(5 %; k = 4, n = 3) = 0.76792 and below the 1 % value 0.86428.
    @Test
    void oneWideGroupJustAboveTheFivePercentValueIsAStraggler() {
        double r = Math.sqrt(10);
        CochranTest c = CochranTest.of(List.of(new double[] {0, 1, 2}, new double[] {0, 1, 2}, new double[] {0, r, 2 * r},
                new double[] {0, 1, 2}));
        assertEquals(10.0 / 13, c.statistic(), 1e-14);
        assertEquals(2, c.suspectIndex());
        assertEquals(3, c.groupSize());
        assertEquals(CochranTest.GroupSizeRule.EQUAL, c.sizeRule());
        assertEquals(OutlierClass.STRAGGLER, c.judgement());
        assertEquals(4, c.variances().size());
        assertEquals(10, c.variances().get(2), 1e-13);
        assertEquals(1, c.variances().get(0), 1e-15);
    }

    // Source: ISO 5725-2 §7.3.3 (from memory): with unequal sizes n is the size occurring in most groups;
    // ties go to the smaller size (our rule, stated in the class).
    @Test
    void unequalSizesUseTheMostFrequentSize() {
        CochranTest majority = CochranTest.of(List.of(new double[] {1, 2, 3}, new double[] {1, 2, 4}, new double[] {2, 3},
                new double[] {1, 3, 2}));
        assertEquals(3, majority.groupSize());
        assertEquals(CochranTest.GroupSizeRule.MOST_FREQUENT, majority.sizeRule());
        assertEquals(CochranTest.criticalValue(4, 3, 0.05), majority.critical5());
        CochranTest tie = CochranTest.of(List.of(new double[] {1, 2, 3, 4}, new double[] {1, 2}, new double[] {2, 3, 5, 1},
                new double[] {1, 3}));
        assertEquals(2, tie.groupSize());
    }

    @Test
    void unusableDataSayWhy() {
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, assertThrows(UnusableDataException.class,
                () -> CochranTest.of(List.<double[]>of(new double[] {1, 2}))).reason());
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, assertThrows(UnusableDataException.class,
                () -> CochranTest.of(List.of(new double[] {1, 2}, new double[] {3}))).reason());
        assertEquals(UnusableDataException.Reason.NO_VARIATION, assertThrows(UnusableDataException.class,
                () -> CochranTest.of(List.of(new double[] {1, 1}, new double[] {3, 3}))).reason());
        assertThrows(IllegalArgumentException.class, () -> CochranTest.criticalValue(1, 3, 0.05));
    }
}
