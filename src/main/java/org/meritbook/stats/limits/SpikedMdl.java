package org.meritbook.stats.limits;

import java.util.Objects;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.distributions.StudentT;

/**
 * The US EPA method detection limit from spiked samples, MDL_s.
 *
 * <p>Formula (40 CFR Part 136 Appendix B, Revision 2, 2017; from memory):
 * <pre>
 *   MDL_s = t(n − 1, 0.99) · S_s
 * </pre>
 * S_s the SD of n ≥ 7 results of samples spiked at a low level and taken through the whole
 * method, t the one-sided 99 % Student value for n − 1 degrees of freedom (3.143 for n = 7).
 * Checks the procedure asks for that need more than numbers (spikes over at least three batches,
 * the spike level no more than 10 times the MDL: {@link EpaMdl#spikeLevelTooHigh}) are the
 * caller's to report.
 *
 * @param spikes the spiked results' n, mean and SD
 * @param t      t(n − 1, 0.99)
 * @param mdl    t·S_s
 */
public record SpikedMdl(SampleSummary spikes, double t, double mdl) {
    /** The fewest spiked samples the procedure accepts. */
    public static final int MINIMUM = 7;
    /** The one-sided confidence level of the procedure's t. */
    public static final double LEVEL = 0.99;

    public SpikedMdl {
        Objects.requireNonNull(spikes, "spikes");
        if (spikes.n() < MINIMUM || !(spikes.sd() > 0)) {
            throw new IllegalArgumentException("MDL_s needs at least 7 spiked results with a positive SD");
        }
        if (t != new StudentT(spikes.degreesOfFreedom()).quantile(LEVEL) || mdl != t * spikes.sd()) {
            throw new IllegalArgumentException("MDL_s must be t(n − 1, 0.99)·S_s");
        }
    }

    /**
     * MDL_s of the spiked-sample results.
     *
     * @throws UnusableDataException {@code TOO_FEW_VALUES} below 7, {@code NOT_FINITE}, {@code NO_VARIATION}
     */
    public static SpikedMdl of(double[] spikedResults) {
        SampleSummary s = SampleSummary.of(SampleChecks.finiteCopy("the spiked-sample results", spikedResults, MINIMUM));
        if (!(s.sd() > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "all " + s.n() + " spiked-sample results are equal, so S_s = 0 gives no MDL");
        }
        double t = new StudentT(s.degreesOfFreedom()).quantile(LEVEL);
        return new SpikedMdl(s, t, t * s.sd());
    }
}
