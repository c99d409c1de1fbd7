package org.meritbook.analysis;

import java.util.Optional;
import java.util.function.Supplier;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.UnusableDataException;

/**
 * The one place where a statistic's refusal ({@link UnusableDataException}: too few values, no
 * variation, too many values for the method, magnitudes beyond double precision) becomes what
 * DESIGN §7 asks for. A statistic the section can stand without is tried with {@link #optional}
 * and, when the data cannot support it, becomes the section warning "Not evaluable: …, because …";
 * the section's own result is {@link #required} and a refusal becomes a located input error. The
 * analyses call these instead of repeating the statistics' preconditions by hand.
 */
public final class Attempt {
    private Attempt() {
    }

    /**
     * Runs a statistic the section can do without.
     *
     * @param section   where the warning goes
     * @param statistic how the statistic reads in the warning, e.g. "the Shapiro–Wilk test of the residuals"
     * @return the result, or empty after the warning when the data cannot support it
     */
    public static <T> Optional<T> optional(SectionBuilder section, String statistic, Supplier<T> computation) {
        try {
            return Optional.of(computation.get());
        } catch (UnusableDataException e) {
            section.warning(notEvaluable(statistic, e));
            return Optional.empty();
        }
    }

    /** The warning's wording, one for every analysis. */
    public static String notEvaluable(String statistic, UnusableDataException e) {
        return "Not evaluable: " + statistic + ", because " + e.getMessage() + ".";
    }

    /**
     * Runs the computation the section's result depends on.
     *
     * @param where    the notebook line or cell the data came from ({@code context.where(line)})
     * @param expected what the data must be, e.g. "calibration responses that vary"
     * @param fix      one sentence the user can act on
     * @throws InputException located, keyed by the statistic's reason, when the data cannot support it
     */
    public static <T> T required(String where, String expected, String fix, Supplier<T> computation) {
        try {
            return computation.get();
        } catch (UnusableDataException e) {
            throw new InputException(key(e.reason()), where, expected, e.getMessage(), fix);
        }
    }

    static ErrorKey key(UnusableDataException.Reason reason) {
        return switch (reason) {
            case NO_VARIATION -> ErrorKey.ZERO_VARIANCE;
            case TOO_FEW_VALUES -> ErrorKey.TOO_FEW_POINTS;
            default -> ErrorKey.UNUSABLE_VALUES;
        };
    }
}
