package org.meritbook.stats.regression;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.meritbook.stats.UnusableDataException;

/**
 * The weighted design of a quadratic y = a + b·x + c·x², prepared so that it is well conditioned,
 * and the linear algebra on it. Package-private: {@link LeastSquares#fitQuadratic} fits with it and
 * {@link QuadraticFit} rebuilds it (deterministically, from its x and weights) for intervals.
 *
 * <p>Method: x is centred and scaled, z = (x − x̄w)/h with h = max|x − x̄w|, so every column of the
 * design [1, z, z²] lies in [−1, 1]; the rows are multiplied by √w and the least-squares problem is
 * solved by Householder QR (Apache Commons Math {@link QRDecomposition}), never through the normal
 * equations X'WX, whose condition number is the square of the design's. With the raw powers of x the
 * NIST Pontius data (x up to 3·10⁶) give X'WX a condition number near 10²⁵, beyond double precision;
 * after centring and scaling it is a few hundred. The coefficients α in z map to β = (a, b, c) in x by
 * β = T·α with, u = x̄w/h,
 * <pre>
 *       | 1   −u    u²   |
 *   T = | 0   1/h  −2u/h |
 *       | 0   0    1/h²  |
 * </pre>
 * and (X'WX)⁻¹ in x is T·R⁻¹·R⁻ᵀ·Tᵀ, formed as M·Mᵀ with M = T·R⁻¹ (a sum of squares on the
 * diagonal, no cancellation there). For a new point g = (1, x0, x0²) the variance factor
 * g'(X'WX)⁻¹g equals |R⁻ᵀ·g<sub>z</sub>|² with g<sub>z</sub> = (1, z0, z0²).
 * Reference: Golub &amp; Van Loan, <i>Matrix Computations</i>, ch. 5 (least squares by QR); Draper
 * &amp; Smith, <i>Applied Regression Analysis</i>, ch. 12 (centring polynomial predictors).
 */
final class QuadraticDesign {

    /** Relative size below which a diagonal element of R counts as zero (the columns are dependent). */
    private static final double RANK_TOLERANCE = 1e-10;

    private final double centre;
    private final double scale;
    private final double[] sqrtW;
    private final DecompositionSolver solver;
    /** R⁻¹, upper triangular, 3 × 3. */
    private final double[][] rInverse;

    /**
     * @param x concentrations, with at least three distinct values
     * @param w weights normalised to average 1, all positive
     * @throws IllegalArgumentException when the design is numerically rank-deficient
     */
    QuadraticDesign(double[] x, double[] w) {
        int n = x.length;
        double sumW = 0;
        for (double v : w) {
            sumW += v;
        }
        centre = WeightedMean.of(x, w, sumW);
        double h = 0;
        for (double v : x) {
            h = Math.max(h, Math.abs(v - centre));
        }
        scale = h;
        sqrtW = new double[n];
        double[][] design = new double[n][3];
        for (int i = 0; i < n; i++) {
            sqrtW[i] = Math.sqrt(w[i]);
            double z = z(x[i]);
            design[i][0] = sqrtW[i];
            design[i][1] = sqrtW[i] * z;
            design[i][2] = sqrtW[i] * z * z;
        }
        QRDecomposition qr = new QRDecomposition(new Array2DRowRealMatrix(design, false));
        RealMatrix r = qr.getR();
        double limit = RANK_TOLERANCE * Math.sqrt(sumW);
        for (int k = 0; k < 3; k++) {
            if (!(Math.abs(r.getEntry(k, k)) > limit)) {
                throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                        "the x levels are too close together to separate a quadratic term "
                        + "from a line (the centred design has rank below 3)");
            }
        }
        solver = qr.getSolver();
        rInverse = new double[3][3];
        for (int j = 0; j < 3; j++) {
            // Column j of R⁻¹ by back-substitution of R·v = e_j.
            for (int i = j; i >= 0; i--) {
                double sum = i == j ? 1 : 0;
                for (int k = i + 1; k <= j; k++) {
                    sum -= r.getEntry(i, k) * rInverse[k][j];
                }
                rInverse[i][j] = sum / r.getEntry(i, i);
            }
        }
    }

    /** The centred, scaled abscissa z = (x − x̄w)/h. */
    double z(double x) {
        return (x - centre) / scale;
    }

    /** Least-squares coefficients α in z for responses y: minimises Σw(y − α0 − α1·z − α2·z²)². */
    double[] solveInZ(double[] y) {
        double[] b = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            b[i] = sqrtW[i] * y[i];
        }
        return solver.solve(new ArrayRealVector(b, false)).toArray();
    }

    /** α0 + α1·z + α2·z² at z(x). */
    double valueInZ(double[] alpha, double x) {
        double z = z(x);
        return alpha[0] + z * (alpha[1] + z * alpha[2]);
    }

    /** The coefficients (a, b, c) in x: β = T·α. */
    double[] toX(double[] alpha) {
        double u = centre / scale;
        return new double[] {
            alpha[0] - alpha[1] * u + alpha[2] * u * u,
            alpha[1] / scale - 2 * alpha[2] * u / scale,
            alpha[2] / (scale * scale)};
    }

    /** (X'WX)⁻¹ for the coefficients in x, as M·Mᵀ with M = T·R⁻¹. */
    double[][] inverseCrossProduct() {
        double u = centre / scale;
        double[][] t = {
            {1, -u, u * u},
            {0, 1 / scale, -2 * u / scale},
            {0, 0, 1 / (scale * scale)}};
        double[][] m = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double sum = 0;
                for (int k = 0; k <= j; k++) {
                    sum += t[i][k] * rInverse[k][j];
                }
                m[i][j] = sum;
            }
        }
        double[][] result = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double sum = 0;
                for (int k = 0; k < 3; k++) {
                    sum += m[i][k] * m[j][k];
                }
                result[i][j] = sum;
            }
        }
        return result;
    }

    /** g'(X'WX)⁻¹g for g = (1, x0, x0²), as |R⁻ᵀ·g<sub>z</sub>|². */
    double meanResponseFactor(double x0) {
        double z = z(x0);
        double[] g = {1, z, z * z};
        double total = 0;
        for (int j = 0; j < 3; j++) {
            double v = 0;
            for (int k = 0; k <= j; k++) {
                v += rInverse[k][j] * g[k];
            }
            total += v * v;
        }
        return total;
    }
}
