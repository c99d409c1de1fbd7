package org.meritbook.stats.regression;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.TreeMap;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.Moments;

/**
 * The replicate standard deviations of a calibration's levels, for inverse-variance weighting
 * ({@link Weighting#INVERSE_VARIANCE}, DESIGN §4). A level is the set of points with the same
 * concentration x (compared exactly, as read); its SD is the sample SD of their responses,
 * s = √(Σ(yᵢ − ȳ)² / (k − 1)) over its k replicates. Each point's raw weight is 1/s² of its level.
 *
 * <p>Preconditions: every level has at least two replicates and a positive SD; a weight is never
 * made from fewer (Draper &amp; Smith, <i>Applied Regression Analysis</i>, ch. 9: the weights of
 * weighted least squares are the inverse variances, here estimated per level).
 *
 * <p>Between levels ({@link #sdAt}, the SD a new point at x₀ is given, e.g. to weigh an unknown) the SD
 * is interpolated linearly between the two levels that bracket x₀, and held at the end level's SD
 * beyond the span: a rule that reproduces exactly an SD that grows linearly with x (the model behind
 * 1/x² weighting) and never extrapolates a trend from two noisy estimates.
 */
public final class LevelVariances {
    /**
     * One level.
     *
     * @param x     its concentration
     * @param count its replicates k
     * @param mean  ȳ of its responses
     * @param sd    the sample SD of its responses (NaN when k &lt; 2)
     */
    public record Level(double x, int count, double mean, double sd) {
        /** Whether the level gives a weight: k ≥ 2 and 0 &lt; s &lt; ∞ with a finite 1/s². */
        public boolean usable() {
            return count >= 2 && sd > 0 && Double.isFinite(1 / (sd * sd)) && 1 / (sd * sd) > 0;
        }
    }

    private final double[] x;
    private final List<Level> levels;

    private LevelVariances(double[] x, List<Level> levels) {
        this.x = x;
        this.levels = List.copyOf(levels);
    }

    /**
     * Groups the points by concentration.
     *
     * @throws IllegalArgumentException when x and y differ in length
     */
    public static LevelVariances of(double[] x, double[] y) {
        Objects.requireNonNull(x, "x");
        Objects.requireNonNull(y, "y");
        if (x.length != y.length) {
            throw new IllegalArgumentException("x and y must have the same length, but have "
                    + x.length + " and " + y.length);
        }
        TreeMap<Double, List<Double>> byX = new TreeMap<>();
        for (int i = 0; i < x.length; i++) {
            byX.computeIfAbsent(x[i] == 0 ? 0.0 : x[i], k -> new ArrayList<>()).add(y[i]); // −0 is the level 0
        }
        List<Level> levels = new ArrayList<>();
        byX.forEach((level, ys) -> {
            double[] v = ys.stream().mapToDouble(Double::doubleValue).toArray();
            double mean = Moments.mean(v);
            double sd = v.length < 2 ? Double.NaN : Math.sqrt(Moments.sumOfSquares(v, mean) / (v.length - 1));
            levels.add(new Level(level, v.length, mean, sd));
        });
        return new LevelVariances(x.clone(), levels);
    }

    /** The levels in increasing x. */
    public List<Level> levels() {
        return levels;
    }

    /** The level of point i. */
    public Level levelOf(int i) {
        double key = x[i] == 0 ? 0.0 : x[i];
        return levels.stream().filter(l -> Double.compare(l.x(), key) == 0).findFirst().orElseThrow();
    }

    /** Index of the first point whose level gives no weight (fewer than 2 replicates, or s = 0), or −1. */
    public int firstUnusablePoint() {
        for (int i = 0; i < x.length; i++) {
            if (!levelOf(i).usable()) {
                return i;
            }
        }
        return -1;
    }

    /**
     * Raw weights 1/s² of each point's level.
     *
     * @throws UnusableDataException {@code TOO_FEW_VALUES} for a level with one replicate,
     *                               {@code NO_VARIATION} for a level whose replicates are equal
     */
    public double[] rawWeights() {
        double[] w = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            Level l = levelOf(i);
            requireUsable(l);
            w[i] = 1 / (l.sd() * l.sd());
        }
        return w;
    }

    /**
     * The SD given to a new point at x0: linear between the bracketing levels, the end level's beyond.
     *
     * @throws UnusableDataException as {@link #rawWeights()} when a level used is not usable
     */
    public double sdAt(double x0) {
        if (!Double.isFinite(x0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NOT_FINITE,
                    "no replicate SD at x = " + x0);
        }
        levels.forEach(LevelVariances::requireUsable);
        Level first = levels.get(0);
        Level last = levels.get(levels.size() - 1);
        if (x0 <= first.x()) {
            return first.sd();
        }
        if (x0 >= last.x()) {
            return last.sd();
        }
        for (int k = 1; k < levels.size(); k++) {
            Level high = levels.get(k);
            if (x0 <= high.x()) {
                Level low = levels.get(k - 1);
                double f = (x0 - low.x()) / (high.x() - low.x());
                return low.sd() + f * (high.sd() - low.sd());
            }
        }
        throw new IllegalStateException("x0 " + x0 + " lies inside the levels but between none");
    }

    private static void requireUsable(Level l) {
        if (l.count() < 2) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES, "weighting 1/s^2 needs at "
                    + "least 2 replicates at each level, but the level x = " + l.x() + " has " + l.count());
        }
        if (!l.usable()) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION, "weighting 1/s^2 needs "
                    + "replicates that scatter at each level, but the " + l.count() + " replicates at x = " + l.x()
                    + " have s = " + l.sd());
        }
    }
}
