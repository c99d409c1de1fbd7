package org.meritbook.stats;

/**
 * A two-sided confidence interval.
 *
 * @param low   lower limit
 * @param high  upper limit
 * @param level confidence level, e.g. 0.95
 */
public record Interval(double low, double high, double level) {
    public Interval {
        if (!(low <= high)) {
            throw new IllegalArgumentException("interval limits out of order: " + low + " > " + high);
        }
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("confidence level must lie in (0, 1): " + level);
        }
    }
}
