package org.meritbook.stats;

import java.util.Objects;

/**
 * The checks every statistic makes on its sample before computing, with one wording for the
 * whole statistics tree. Each throws {@link UnusableDataException} with its reason.
 */
public final class SampleChecks {
    private SampleChecks() {
    }

    /**
     * A copy of {@code values} after checking that there are at least {@code minimum} of them and
     * that each is finite.
     *
     * @param name    what the values are, for the message (e.g. "blank results")
     * @param values  the sample
     * @param minimum fewest values the method needs
     */
    public static double[] finiteCopy(String name, double[] values, int minimum) {
        Objects.requireNonNull(values, name);
        if (values.length < minimum) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                    name + ": at least " + minimum + (minimum == 1 ? " value is" : " values are") + " needed, but there are "
                            + values.length);
        }
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new UnusableDataException(UnusableDataException.Reason.NOT_FINITE,
                        name + ": every value must be a finite number, but value " + (i + 1) + " is " + values[i]);
            }
        }
        return values.clone();
    }

    /** Checks that a single input is finite. */
    public static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new UnusableDataException(UnusableDataException.Reason.NOT_FINITE,
                    name + " must be a finite number, but is " + value);
        }
        return value;
    }

    /** Checks that a calibration slope rises, as every detection limit through a line needs. */
    public static double positiveSlope(double slope) {
        finite("the slope", slope);
        if (!(slope > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NON_POSITIVE_SLOPE,
                    "the calibration slope must be positive to convert a response to a concentration, but is " + slope);
        }
        return slope;
    }

    /** Checks a confidence level or probability lies strictly between 0 and 1. */
    public static double openUnit(String name, double p) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException(name + " must lie strictly between 0 and 1, but is " + p);
        }
        return p;
    }
}
