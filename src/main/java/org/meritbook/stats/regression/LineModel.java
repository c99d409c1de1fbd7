package org.meritbook.stats.regression;

/** The straight-line model of a calibration: with an intercept, or forced through the origin. */
public enum LineModel {
    /** y = a + b·x: two parameters. */
    WITH_INTERCEPT(2),
    /** y = b·x: one parameter; the blank is assumed to give zero response. */
    THROUGH_ORIGIN(1);

    private final int parameters;

    LineModel(int parameters) {
        this.parameters = parameters;
    }

    /** Number of estimated parameters. */
    public int parameterCount() {
        return parameters;
    }

    /** Fewest points that leave at least one residual degree of freedom (parameters + 1). */
    public int minimumPoints() {
        return parameters + 1;
    }
}
