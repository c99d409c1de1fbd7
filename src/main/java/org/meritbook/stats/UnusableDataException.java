package org.meritbook.stats;

import java.util.Objects;

/**
 * The data cannot support the statistic asked for: too few values, no variation, a zero mean
 * under a ratio, a non-positive slope under a limit. Thrown before any result exists, so no NaN
 * and no number from nothing leaves the statistics. It is an {@link IllegalArgumentException},
 * so a caller that treats every unusable input alike needs nothing more; {@link #reason()} lets
 * a caller say "not evaluable, because …" in its own words.
 */
public class UnusableDataException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    /** Why the data cannot support the statistic. */
    public enum Reason {
        /** Fewer values (or groups, or degrees of freedom) than the method needs. */
        TOO_FEW_VALUES,
        /** More values than the method's published coefficients cover (Shapiro–Wilk beyond 5,000). */
        TOO_MANY_VALUES,
        /** Magnitudes whose squares or products leave double precision (beyond about 1e±150). */
        OUT_OF_RANGE,
        /** A value is NaN or infinite. */
        NOT_FINITE,
        /** The values (or the replicates within every group) are all equal, so a spread is zero. */
        NO_VARIATION,
        /** A ratio to the mean was asked for and the mean is zero. */
        ZERO_MEAN,
        /** The calibration slope is zero or negative where a detection limit needs a rising line. */
        NON_POSITIVE_SLOPE,
        /** The calibration slope is zero, so no concentration corresponds to a response. */
        ZERO_SLOPE,
        /** A value lies outside the domain of the formula (e.g. a mass fraction above 1). */
        OUT_OF_DOMAIN
    }

    private final Reason reason;

    public UnusableDataException(Reason reason, String message) {
        super(message);
        this.reason = Objects.requireNonNull(reason, "reason");
    }

    /** As {@link #UnusableDataException(Reason, String)}, keeping the lower-level exception that found it. */
    public UnusableDataException(Reason reason, String message, Throwable cause) {
        super(message, cause);
        this.reason = Objects.requireNonNull(reason, "reason");
    }

    /** The reason, for a caller's keyed message. */
    public Reason reason() {
        return reason;
    }
}
