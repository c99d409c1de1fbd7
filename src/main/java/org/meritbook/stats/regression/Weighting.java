package org.meritbook.stats.regression;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.meritbook.stats.UnusableDataException;

/**
 * Weighting of a least-squares calibration: each point gets a weight that is a power of
 * its concentration x or its response y, so that points with smaller (assumed) variance
 * count more.
 *
 * <p>Under {@code 1/x^k} the weight of point i is {@code 1 / x_i^k}; under {@code 1/y^k} it is
 * {@code 1 / y_i^k} (the observed response). The choice models a standard deviation that
 * grows in proportion to x (or y) to the power {@code k/2}. Reference: Miller &amp; Miller,
 * <i>Statistics and Chemometrics for Analytical Chemistry</i>, section on weighted regression
 * lines; Draper &amp; Smith, <i>Applied Regression Analysis</i>, chapter on weighted least
 * squares.
 *
 * <p>Precondition of every power weighting: its basis (x or y) is strictly positive
 * at every point, since a power of zero or of a negative value gives no meaningful weight.
 *
 * <p>{@link #INVERSE_VARIANCE} ({@code 1/s^2}) is the estimated inverse variance: each point's weight is
 * 1/s² of the replicate responses of its level (the points with the same x), see {@link LevelVariances};
 * its precondition is at least two replicates with a positive SD at every level.
 */
public enum Weighting {
    /** Ordinary (unweighted) least squares: every weight is 1. */
    NONE("none", null, 0),
    /** Weight 1/x. */
    INVERSE_X("1/x", "x", 1),
    /** Weight 1/x². */
    INVERSE_X2("1/x^2", "x", 2),
    /** Weight 1/y (observed response). */
    INVERSE_Y("1/y", "y", 1),
    /** Weight 1/y² (observed response). */
    INVERSE_Y2("1/y^2", "y", 2),
    /** Weight 1/s², s the replicate SD of the point's level (basis {@code "s"}). */
    INVERSE_VARIANCE("1/s^2", "s", 2);

    private final String notation;
    private final String basis;
    private final int power;

    Weighting(String notation, String basis, int power) {
        this.notation = notation;
        this.basis = basis;
        this.power = power;
    }

    /** The notation a notebook uses, e.g. {@code "1/x^2"}. */
    public String notation() {
        return notation;
    }

    /**
     * The weighting a notation names. Accepts the forms of {@link #notation()} and the
     * superscript two ({@code "1/x²"}), ignoring surrounding and inner blanks and letter case.
     *
     * @return the weighting, or empty when the text names none (or is null)
     */
    public static Optional<Weighting> fromNotation(String text) {
        if (text == null) {
            return Optional.empty();
        }
        String key = text.replaceAll("\\s+", "").replace("²", "^2").toLowerCase(Locale.ROOT);
        for (Weighting w : values()) {
            if (w.notation.equals(key)) {
                return Optional.of(w);
            }
        }
        return Optional.empty();
    }

    /**
     * The variable the weight is a power of: {@code "x"}, {@code "y"}, {@code "s"} (the replicate SD of
     * the level, {@link #INVERSE_VARIANCE}), or null for {@link #NONE}.
     */
    public String basis() {
        return basis;
    }

    /** The power k in {@code 1/basis^k}; 0 for {@link #NONE}. */
    public int power() {
        return power;
    }

    /**
     * Index of the first point whose basis value is not strictly positive (≤ 0 or NaN), so a
     * caller can name the offending point before fitting.
     *
     * @return that index, or -1 when every basis value is positive or the weighting is {@link #NONE}
     * @throws IllegalArgumentException when x and y differ in length
     */
    public int firstNonPositiveBasis(double[] x, double[] y) {
        if (this == INVERSE_VARIANCE) {
            basisValues(x, y);
            return LevelVariances.of(x, y).firstUnusablePoint();
        }
        double[] values = basisValues(x, y);
        if (values == null) {
            return -1;
        }
        for (int i = 0; i < values.length; i++) {
            if (!(values[i] > 0)) {
                return i;
            }
        }
        return -1;
    }

    /**
     * The unnormalised weights {@code 1/basis^k}, one per point (all 1 for {@link #NONE}).
     *
     * @throws IllegalArgumentException when x and y differ in length, or a basis value is not
     *                                  strictly positive, or a weight is not finite
     */
    public double[] rawWeights(double[] x, double[] y) {
        if (this == INVERSE_VARIANCE) {
            basisValues(x, y);
            return LevelVariances.of(x, y).rawWeights();
        }
        double[] values = basisValues(x, y);
        double[] weights = new double[x.length];
        for (int i = 0; i < weights.length; i++) {
            if (values == null) {
                weights[i] = 1.0;
                continue;
            }
            double v = values[i];
            if (!(v > 0)) {
                throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN, "weighting " + notation
                        + " needs " + basis
                        + " > 0 at every point, but point " + i + " has " + basis + " = " + v);
            }
            weights[i] = power == 1 ? 1.0 / v : 1.0 / (v * v);
            if (!Double.isFinite(weights[i]) || weights[i] == 0) {
                throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_RANGE, "weighting " + notation
                        + " gives no usable weight at point "
                        + i + " (" + basis + " = " + v + ")");
            }
        }
        return weights;
    }

    /**
     * The raw weight a new point at x0 gets under this weighting, on the scale of
     * {@link #rawWeights} for the calibration points (x, y): 1/x0ᵏ, 1/ŷ0ᵏ with ŷ0 the predicted
     * response at x0, or 1/s(x0)² with s(x0) from {@link LevelVariances#sdAt}; 1 when unweighted.
     *
     * @throws IllegalArgumentException when the weighting gives no weight there (a basis not positive)
     */
    public double rawWeightAt(double x0, double predicted, double[] x, double[] y) {
        if (this == NONE) {
            return 1;
        }
        if (this == INVERSE_VARIANCE) {
            double s = LevelVariances.of(x, y).sdAt(x0);
            return 1 / (s * s);
        }
        double basis = "x".equals(this.basis) ? x0 : predicted;
        return rawWeights(new double[] {basis}, new double[] {basis})[0];
    }

    private double[] basisValues(double[] x, double[] y) {
        Objects.requireNonNull(x, "x");
        Objects.requireNonNull(y, "y");
        if (x.length != y.length) {
            throw new IllegalArgumentException("x and y must have the same length, but have "
                    + x.length + " and " + y.length);
        }
        if (basis == null) {
            return null;
        }
        return basis.equals("x") ? x : y;
    }
}
