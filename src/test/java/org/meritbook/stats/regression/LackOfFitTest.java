package org.meritbook.stats.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.apache.commons.math3.distribution.FDistribution;
import org.junit.jupiter.api.Test;

/** The lack-of-fit F test with pure error from replicated levels. */
class LackOfFitTest {

    private static final double[] X = {1, 1, 2, 2, 3, 3};
    private static final double[] Y = {1, 3, 4, 6, 5, 7};
    private static final double[] ONES = {1, 1, 1, 1, 1, 1};

    // Source: hand arithmetic (Draper & Smith, §2.1 decomposition). Level means 2, 5, 6; the line through
    // the six points is y = 1/3 + 2x (balanced design: the line through the means), fitted 7/3, 13/3, 19/3.
    // SSpe = 3 levels × (1² + 1²) = 6, df 6 − 3 = 3; SSlof = 2·[(1/3)² + (2/3)² + (1/3)²] = 4/3, df 3 − 2 = 1;
    // F = (4/3)/(6/3) = 2/3. p from Apache Commons Math FDistribution(1, 3).
    @Test
    void unweightedLineByHand() {
        LineFit line = LeastSquares.fitLine(X, Y, Weighting.NONE, LineModel.WITH_INTERCEPT);
        LackOfFit test = LackOfFit.of(X, Y, line.weights(), line.fitted(), 2).orElseThrow();
        assertEquals(3, test.levels());
        assertEquals(1, test.lackOfFitDf());
        assertEquals(3, test.pureErrorDf());
        assertEquals(6, test.ssPureError(), 1e-13);
        assertEquals(4.0 / 3, test.ssLackOfFit(), 1e-13);
        assertEquals(2.0 / 3, test.f(), 1e-13);
        assertEquals(1 - new FDistribution(1, 3).cumulativeProbability(2.0 / 3), test.p(), 1e-12);
    }

    // Source: hand arithmetic with weights (1, 3 | 2, 2 | 1, 1) and given fitted values (2 | 5 | 7), one
    // parameter. Weighted level means: (1 + 9)/4 = 2.5, 5, 6. SSpe = 1·1.5² + 3·0.5² + 2·1² + 2·1² + 1 + 1
    // = 9 (df 3); SSlof = 4·0.5² + 4·0² + 2·1² = 3 (df 3 − 1 = 2); F = (3/2)/(9/3) = 0.5. Check: SSpe + SSlof
    // = Σw(y − ŷ)² = 1 + 3 + 2 + 2 + 4 + 0 = 12. p from Apache Commons Math FDistribution(2, 3).
    @Test
    void weightedByHand() {
        double[] w = {1, 3, 2, 2, 1, 1};
        double[] fitted = {2, 2, 5, 5, 7, 7};
        LackOfFit test = LackOfFit.of(X, Y, w, fitted, 1).orElseThrow();
        assertEquals(9, test.ssPureError(), 1e-13);
        assertEquals(3, test.ssLackOfFit(), 1e-13);
        assertEquals(2, test.lackOfFitDf());
        assertEquals(0.5, test.f(), 1e-14);
        assertEquals(1 - new FDistribution(2, 3).cumulativeProbability(0.5), test.p(), 1e-12);
        // Weights on any scale give the same test (F is a ratio of weighted sums).
        double[] w10 = {10, 30, 20, 20, 10, 10};
        LackOfFit scaled = LackOfFit.of(X, Y, w10, fitted, 1).orElseThrow();
        assertEquals(test.f(), scaled.f(), 1e-14);
        assertEquals(test.p(), scaled.p(), 1e-14);
    }

    // Source: definition — pure error is the scatter within a level, so shifting every replicate of a level
    // by the same amount leaves SSpe unchanged (and moves only the level mean, i.e. SSlof); listing the
    // points in another order changes nothing.
    @Test
    void aShiftCommonToTheReplicatesOfALevelChangesOnlyLackOfFit() {
        double[] fitted = {2, 2, 4, 4, 6, 6};
        LackOfFit reference = LackOfFit.of(X, Y, ONES, fitted, 2).orElseThrow();
        double[] shifted = {1, 3, 4.7, 6.7, 5, 7};
        LackOfFit moved = LackOfFit.of(X, shifted, ONES, fitted, 2).orElseThrow();
        assertEquals(reference.ssPureError(), moved.ssPureError(), 1e-13);
        assertTrue(moved.ssLackOfFit() != reference.ssLackOfFit());
        double[] xs = {3, 1, 2, 3, 2, 1};
        double[] ys = {7, 3, 4, 5, 6, 1};
        double[] fs = {6, 2, 4, 6, 4, 2};
        LackOfFit shuffled = LackOfFit.of(xs, ys, ONES, fs, 2).orElseThrow();
        assertEquals(reference.ssPureError(), shuffled.ssPureError(), 1e-13);
        assertEquals(reference.ssLackOfFit(), shuffled.ssLackOfFit(), 1e-13);
        assertEquals(reference.f(), shuffled.f(), 1e-13);
    }

    // Source: Apache Commons Math FDistribution — the upper tail of F(d1, d2), here across a range of F.
    @Test
    void pIsTheUpperTailOfTheFDistribution() {
        double[] x = {1, 1, 1, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 5, 5};
        double[] y = {2.0, 2.1, 1.9, 4.2, 4.0, 4.1, 5.8, 6.1, 6.0, 8.4, 8.0, 8.1, 9.6, 9.9, 10.4};
        for (double curvature : new double[] {0, 0.02, 0.1, 0.5}) {
            double[] bent = new double[y.length];
            for (int i = 0; i < y.length; i++) {
                bent[i] = y[i] + curvature * x[i] * x[i];
            }
            LineFit line = LeastSquares.fitLine(x, bent, Weighting.NONE, LineModel.WITH_INTERCEPT);
            LackOfFit test = LackOfFit.of(x, bent, line.weights(), line.fitted(), 2).orElseThrow();
            assertEquals(3, test.lackOfFitDf());
            assertEquals(10, test.pureErrorDf());
            double expected = 1 - new FDistribution(3, 10).cumulativeProbability(test.f());
            assertEquals(expected, test.p(), 1e-10);
            // The residual SS splits exactly into lack of fit and pure error.
            assertEquals(line.ssResidual(), test.ssLackOfFit() + test.ssPureError(), 1e-12 * line.ssResidual());
        }
    }

    // Source: definition — without replicates there is no pure error; with no more levels than parameters no
    // lack-of-fit degree of freedom; with identical replicates SSpe = 0 and F has no finite value.
    @Test
    void notEvaluable() {
        double[] x = {1, 2, 3, 4, 5};
        double[] y = {1.1, 1.9, 3.2, 3.9, 5.1};
        double[] ones = {1, 1, 1, 1, 1};
        assertEquals(Optional.empty(), LackOfFit.of(x, y, ones, y, 2));
        assertEquals(Optional.empty(), LackOfFit.of(X, Y, ONES, Y, 3));
        double[] same = {2, 2, 5, 5, 6, 6};
        assertEquals(Optional.empty(), LackOfFit.of(X, same, ONES, new double[] {2, 2, 4, 4, 6, 6}, 2));
    }

    @Test
    void preconditions() {
        assertThrows(IllegalArgumentException.class, () -> LackOfFit.of(X, new double[] {1, 2}, ONES, Y, 2));
        assertThrows(IllegalArgumentException.class, () -> LackOfFit.of(new double[0], new double[0], new double[0],
                new double[0], 2));
        assertThrows(IllegalArgumentException.class, () -> LackOfFit.of(X, Y, new double[] {1, 1, 0, 1, 1, 1}, Y, 2));
        assertThrows(IllegalArgumentException.class, () -> LackOfFit.of(X, Y, ONES, new double[] {1, 1, 1, 1, 1, Double.NaN}, 2));
        assertThrows(IllegalArgumentException.class, () -> LackOfFit.of(X, Y, ONES, Y, 0));
        assertThrows(IllegalArgumentException.class, () -> new LackOfFit(3, 1, 3, 4.0 / 3, 6, 0.9, 0.5));
        assertThrows(IllegalArgumentException.class, () -> new LackOfFit(3, 1, 3, 4.0 / 3, 0, Double.POSITIVE_INFINITY, 0));
        assertThrows(IllegalArgumentException.class, () -> new LackOfFit(3, 1, 3, 4.0 / 3, 6, 2.0 / 3, 1.5));
    }
}
