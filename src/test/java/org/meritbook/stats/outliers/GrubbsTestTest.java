package org.meritbook.stats.outliers;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.distributions.StudentT;

class GrubbsTestTest {

    /** n, 1 % and 5 % critical values: ISO 5725-2, table of critical values for Grubbs' test (from memory). */
    private static final double[][] ISO_TABLE = {
        {3, 1.155, 1.155}, {4, 1.496, 1.481}, {5, 1.764, 1.715}, {6, 1.973, 1.887}, {7, 2.139, 2.020},
        {8, 2.274, 2.126}, {9, 2.387, 2.215}, {10, 2.482, 2.290}, {11, 2.564, 2.355}, {12, 2.636, 2.412},
        {13, 2.699, 2.462}, {14, 2.755, 2.507}, {15, 2.806, 2.549}, {16, 2.852, 2.585}, {17, 2.894, 2.620},
        {18, 2.932, 2.651}, {19, 2.968, 2.681}, {20, 3.001, 2.709}, {25, 3.135, 2.822}, {30, 3.236, 2.908},
        {40, 3.381, 3.036}};

    // Source: ISO 5725-2 Grubbs table (from memory); tolerance one unit of its third decimal.
    @Test
    void criticalValuesReproduceTheIsoTable() {
        for (double[] row : ISO_TABLE) {
            int n = (int) row[0];
            assertEquals(row[1], GrubbsTest.criticalValue(n, 0.01), 0.001, "1 %, n = " + n);
            assertEquals(row[2], GrubbsTest.criticalValue(n, 0.05), 0.001, "5 %, n = " + n);
        }
    }

    // Source: R 4.2.2, the same formula evaluated with qt: g(4, 0.05) = 1.4812500000,
    // g(7, 0.05) = 2.0199685077, g(10, 0.01) = 2.4820832497, g(30, 0.05) = 2.9084730597.
    @Test
    void criticalValuesAgreeWithTheFormulaInR() {
        assertEquals(1.4812500000, GrubbsTest.criticalValue(4, 0.05), 1e-9);
        assertEquals(2.0199685077, GrubbsTest.criticalValue(7, 0.05), 1e-9);
        assertEquals(2.4820832497, GrubbsTest.criticalValue(10, 0.01), 1e-9);
        assertEquals(2.9084730597, GrubbsTest.criticalValue(30, 0.05), 1e-9);
        // and the formula itself, written out here once more with this package's t
        double t = new StudentT(8).quantile(1 - 0.05 / 20);
        assertEquals(9 / Math.sqrt(10) * Math.sqrt(t * t / (8 + t * t)), GrubbsTest.criticalValue(10, 0.05), 1e-15);
    }

    // Source: Miller & Miller, ch. 3, nitrite in river water (from memory): 0.403, 0.410, 0.401, 0.380 mg/L;
    // G = |0.380 − 0.3985| / 0.01292 = 1.43 < 1.481 (n = 4, P = 0.05), so 0.380 is retained.
    @Test
    void nitriteExampleRetainsTheLowValue() {
        GrubbsTest g = GrubbsTest.of(new double[] {0.403, 0.410, 0.401, 0.380});
        assertEquals(3, g.suspectIndex());
        assertEquals(0.380, g.suspect());
        assertEquals(0.3985, g.mean(), 1e-12);
        assertEquals(1.43, g.statistic(), 0.005);
        assertEquals(1.481, g.critical5(), 0.0005);
        assertEquals(OutlierClass.CONSISTENT, g.judgement());
    }

    // Source: hand arithmetic on the same example with three more results, 0.400, 0.413, 0.408:
    // x̄ = 2.815/7 = 0.402143, Σ(x − x̄)² = 7.10857e-4, s = 0.0108847, G = 0.022143/0.0108847 = 2.0343,
    // above G_crit(5 %, n = 7) = 2.020 and below G_crit(1 %) = 2.139: a straggler in ISO 5725-2's terms.
    @Test
    void moreResultsMakeTheLowValueAStraggler() {
        GrubbsTest g = GrubbsTest.of(new double[] {0.403, 0.410, 0.401, 0.380, 0.400, 0.413, 0.408});
        assertEquals(2.0343, g.statistic(), 5e-5);
        assertEquals(OutlierClass.STRAGGLER, g.judgement());
        assertEquals(7, g.n());
    }

    // Source: the bound G ≤ (n − 1)/√n, reached by one value far from n − 1 equal ones.
    @Test
    void oneValueFarFromEqualOthersIsAnOutlier() {
        GrubbsTest g = GrubbsTest.of(new double[] {5, 5, 5, 5, 5, 5, 5, 5, 5, 50});
        assertEquals(9 / Math.sqrt(10), g.statistic(), 1e-12);
        assertEquals(OutlierClass.OUTLIER, g.judgement());
        assertEquals(9, g.suspectIndex());
    }

    @Test
    void unusableDataSayWhy() {
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES,
                assertThrows(UnusableDataException.class, () -> GrubbsTest.of(new double[] {1, 2})).reason());
        UnusableDataException flat = assertThrows(UnusableDataException.class, () -> GrubbsTest.of(new double[] {2, 2, 2}));
        assertEquals(UnusableDataException.Reason.NO_VARIATION, flat.reason());
        assertEquals("Grubbs' test needs values that differ, but all 3 are equal", flat.getMessage());
        assertThrows(IllegalArgumentException.class, () -> GrubbsTest.criticalValue(2, 0.05));
        assertThrows(IllegalArgumentException.class, () -> GrubbsTest.criticalValue(5, 0));
    }
}
