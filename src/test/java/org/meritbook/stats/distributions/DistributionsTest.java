package org.meritbook.stats.distributions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.junit.jupiter.api.Test;

class DistributionsTest {

    /**
     * t(n − 1, 0.99) for n = 7 … 30, as tabled in the US EPA MDL procedure, 40 CFR Part 136
     * Appendix B, Revision 2 (2017), "Student's t-values at the 99 % confidence level" (from memory;
     * the same three-decimal values as every one-sided 99 % t table).
     */
    private static final double[] EPA_T_99 = {3.143, 2.998, 2.896, 2.821, 2.764, 2.718, 2.681, 2.650, 2.624, 2.602,
        2.583, 2.567, 2.552, 2.539, 2.528, 2.518, 2.508, 2.500, 2.492, 2.485, 2.479, 2.473, 2.467, 2.462};

    /** The same quantiles from R 4.2.2, qt(0.99, 6:29), printed to 12 decimals. */
    private static final double[] R_T_99 = {3.142668403291, 2.997951566869, 2.896459447710, 2.821437925026,
        2.763769458113, 2.718079183814, 2.680997993121, 2.650308837912, 2.624494067590, 2.602480295011,
        2.583487185276, 2.566933983725, 2.552379630182, 2.539483190624, 2.527977002742, 2.517648016045,
        2.508324552899, 2.499866739495, 2.492159473158, 2.485107175411, 2.478629823591, 2.472659911956,
        2.467140097967, 2.462021360150};

    // Source: US EPA 40 CFR 136 App. B Rev. 2 t table (from memory), R qt(), Apache Commons Math TDistribution.
    @Test
    void mdlTQuantilesForSevenToThirtyReplicates() {
        for (int n = 7; n <= 30; n++) {
            double t = new StudentT(n - 1).quantile(0.99);
            assertEquals(EPA_T_99[n - 7], t, 0.0005, "EPA table, n = " + n);
            assertEquals(R_T_99[n - 7], t, 1e-11, "R, n = " + n);
            assertEquals(new TDistribution(n - 1).inverseCumulativeProbability(0.99), t, 1e-8, "Commons Math, n = " + n);
        }
    }

    // Source: R 4.2.2 qt, pt (values in the comments of each line).
    @Test
    void studentTAgreesWithR() {
        assertEquals(2.2621571628, new StudentT(9).twoSidedQuantile(0.95), 1e-10); // qt(0.975, 9)
        assertEquals(-2.2621571628, new StudentT(9).quantile(0.025), 1e-10);
        assertEquals(62.4045060482, new StudentT(5).quantile(1 - 1e-8), 1e-7); // qt(1 - 1e-8, 5)
        assertEquals(4.08622052801, new StudentT(28).quantile(1 - 0.01 / 60), 1e-10); // a Grubbs t, n = 30
        assertEquals(0.00999304088189, new StudentT(7).twoSidedP(3.5), 1e-14); // 2*pt(-3.5, 7)
        assertEquals(1.71903403946e-05, new StudentT(3).cdf(-40), 1e-15); // pt(-40, 3)
        assertEquals(1, new StudentT(4).twoSidedP(0));
        assertEquals(0.5, new StudentT(4).cdf(0));
    }

    // Source: R 4.2.2 qchisq, pchisq; a printed chi-square table gives 2.700 and 19.023 for 9 df.
    @Test
    void chiSquaredAgreesWithR() {
        assertEquals(2.7003895000, new ChiSquared(9).quantile(0.025), 1e-10);
        assertEquals(19.0227677986, new ChiSquared(9).quantile(0.975), 1e-9);
        assertEquals(0.6493845992, new ChiSquared(4.5).quantile(0.025), 1e-10); // fractional df (Satterthwaite)
        assertEquals(11.9985394027, new ChiSquared(4.5).quantile(0.975), 1e-9);
        assertEquals(0.000438721770979, new ChiSquared(9).upperTail(30), 1e-15);
        assertEquals(new ChiSquaredDistribution(9).inverseCumulativeProbability(0.9), new ChiSquared(9).quantile(0.9), 1e-8);
    }

    // Source: R 4.2.2 qf, pf; NIST StRD SiRstv and AtmWtAg (F and its p computed by R from the certified F).
    @Test
    void fisherFAgreesWithR() {
        assertEquals(2.8660814020, new FisherF(4, 20).upperQuantile(0.05), 1e-9);
        assertEquals(2.4442570393, new FisherF(20, 160).upperQuantile(0.01 / 9), 1e-9);
        assertEquals(0.3494474934, new FisherF(4, 20).upperTail(1.18046237440255), 1e-10);
        assertEquals(0.000232684448339, new FisherF(1, 46).upperTail(15.9467335677930), 1e-15);
        // A p of 2.6e-22 survives: 1 - cdf would give 0.
        assertEquals(2.58326433727e-22, new FisherF(8, 180).upperTail(21), 1e-32);
        assertEquals(new FDistribution(3, 12).inverseCumulativeProbability(0.95), new FisherF(3, 12).quantile(0.95), 1e-8);
    }

    // Source: R 4.2.2 qnorm(0.95) = 1.644853626951472.
    @Test
    void standardNormalAgreesWithR() {
        assertEquals(1.644853626951472, StandardNormal.quantile(0.95), 1e-14);
        assertEquals(-1.644853626951472, StandardNormal.quantile(0.05), 1e-14);
        assertEquals(0.95, StandardNormal.cdf(1.644853626951472), 1e-15);
    }

    @Test
    void badArgumentsAreRefusedWithTheirValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new StudentT(0));
        assertEquals("the degrees of freedom of t must be positive and finite, but is 0.0", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new StudentT(3).quantile(1));
        assertThrows(IllegalArgumentException.class, () -> new FisherF(2, Double.POSITIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> new ChiSquared(4).quantile(0));
        assertThrows(IllegalArgumentException.class, () -> StandardNormal.quantile(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> new StudentT(3).cdf(Double.NaN));
    }
}
