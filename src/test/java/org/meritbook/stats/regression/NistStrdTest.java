package org.meritbook.stats.regression;

import org.meritbook.stats.Lre;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.meritbook.qualification.NistDataset;

/**
 * Ordinary least squares against NIST StRD certified values (linear regression category,
 * https://www.itl.nist.gov/div898/strd/). Every figure must agree on at least 9 significant
 * digits (log relative error ≥ 9).
 */
class NistStrdTest {

    private static final double MIN_LRE = 9;

    // Source: NIST StRD Norris.dat (lower difficulty, y = B0 + B1·x, 36 observations), certified values.
    @Test
    void norrisWithIntercept() {
        NistDataset nist = NistDataset.load("Norris");
        LineFit fit = LeastSquares.fitLine(nist.x(), nist.y(), Weighting.NONE, LineModel.WITH_INTERCEPT);

        assertDigits("B0", fit.intercept(), nist.estimate("B0"));
        assertDigits("B1", fit.slope(), nist.estimate("B1"));
        assertDigits("sd(B0)", fit.interceptSe(), nist.standardDeviation("B0"));
        assertDigits("sd(B1)", fit.slopeSe(), nist.standardDeviation("B1"));
        assertCommon(nist, fit);
    }

    // Source: NIST StRD NoInt1.dat (average difficulty, y = B1·x, 11 observations), certified values;
    // NIST certifies the uncentred R² for the no-intercept model.
    @Test
    void noInt1ThroughOrigin() {
        assertThroughOrigin(NistDataset.load("NoInt1"));
    }

    // Source: NIST StRD NoInt2.dat (average difficulty, y = B1·x, 3 observations), certified values.
    @Test
    void noInt2ThroughOrigin() {
        assertThroughOrigin(NistDataset.load("NoInt2"));
    }

    // Source: NIST StRD Pontius.dat (lower difficulty, quadratic y = B0 + B1·x + B2·x², 40 observations),
    // certified values. x runs to 3·10⁶, so the raw-power normal equations lose about 25 digits.
    @Test
    void pontiusQuadratic() {
        NistDataset nist = NistDataset.load("Pontius");
        QuadraticFit fit = LeastSquares.fitQuadratic(nist.x(), nist.y(), Weighting.NONE);

        assertDigits("B0", fit.intercept(), nist.estimate("B0"));
        assertDigits("B1", fit.linear(), nist.estimate("B1"));
        assertDigits("B2", fit.quadratic(), nist.estimate("B2"));
        assertDigits("sd(B0)", fit.interceptSe(), nist.standardDeviation("B0"));
        assertDigits("sd(B1)", fit.linearSe(), nist.standardDeviation("B1"));
        assertDigits("sd(B2)", fit.quadraticSe(), nist.standardDeviation("B2"));
        assertEquals(nist.residualDf(), fit.degreesOfFreedom(), "residual degrees of freedom");
        assertDigits("residual SD", fit.residualSd(), nist.residualSd());
        assertDigits("R-squared", fit.rSquared(), nist.rSquared());
        assertDigits("residual SS", fit.ssResidual(), nist.ssResidual());
        // The certified regression SS is the centred total less the residual SS: R² = SSreg / (SSreg + SSres).
        assertDigits("R-squared from the ANOVA table", fit.rSquared(),
                nist.ssRegression() / (nist.ssRegression() + nist.ssResidual()));
    }

    // Source: NIST StRD Norris.dat and NoInt2.dat, the data lines as printed in the files.
    @Test
    void parserReadsTheStatedDataLinesInTheNamedColumnOrder() {
        NistDataset norris = NistDataset.load("Norris");
        assertEquals(36, norris.x().length);
        assertEquals(0.2, norris.x()[0]);
        assertEquals(0.1, norris.y()[0]);
        assertEquals(337.4, norris.x()[1]);
        assertEquals(338.8, norris.y()[1]);
        NistDataset noInt2 = NistDataset.load("NoInt2");
        assertEquals(3, noInt2.x().length);
        assertEquals(6, noInt2.x()[2]);
        assertEquals(4, noInt2.y()[2]);
        assertEquals(2, noInt2.residualDf());
    }

    private static void assertThroughOrigin(NistDataset nist) {
        LineFit fit = LeastSquares.fitLine(nist.x(), nist.y(), Weighting.NONE, LineModel.THROUGH_ORIGIN);
        assertDigits("B1", fit.slope(), nist.estimate("B1"));
        assertDigits("sd(B1)", fit.slopeSe(), nist.standardDeviation("B1"));
        assertEquals(0, fit.intercept());
        assertCommon(nist, fit);
    }

    private static void assertCommon(NistDataset nist, LineFit fit) {
        assertEquals(nist.residualDf(), fit.degreesOfFreedom(), "residual degrees of freedom");
        assertDigits("residual SD", fit.residualSd(), nist.residualSd());
        assertDigits("R-squared", fit.rSquared(), nist.rSquared());
        assertDigits("regression SS", fit.ssRegression(), nist.ssRegression());
        assertDigits("residual SS", fit.ssResidual(), nist.ssResidual());
    }

    private static void assertDigits(String what, double computed, double certified) {
        double lre = Lre.of(computed, certified);
        assertTrue(lre >= MIN_LRE, () -> what + ": computed " + computed + ", certified " + certified
                + ", only " + String.format(java.util.Locale.ROOT, "%.1f", lre) + " digits agree");
    }
}
