package org.meritbook.stats.limits;

import java.util.Objects;
import java.util.Optional;
import org.meritbook.stats.SampleChecks;

/**
 * The US EPA method detection limit: the greater of MDL_s (spiked samples) and MDL_b (method
 * blanks), 40 CFR Part 136 Appendix B, Revision 2 (from memory). When MDL_b does not apply
 * (no blank gave a number), the MDL is MDL_s.
 *
 * @param spiked    MDL_s
 * @param blank     MDL_b, when the blanks give one
 * @param mdl       max(MDL_s, MDL_b)
 * @param decidedBy which of the two is the MDL (spiked on a tie)
 */
public record EpaMdl(SpikedMdl spiked, Optional<BlankMdl> blank, double mdl, Basis decidedBy) {
    /** The spike level should not exceed this many MDLs (the procedure's check on the spiking level). */
    public static final double SPIKE_LEVEL_CEILING = 10;

    /** Which part decided the MDL. */
    public enum Basis {
        /** MDL_s ≥ MDL_b, or no MDL_b. */
        SPIKED,
        /** MDL_b &gt; MDL_s. */
        BLANK
    }

    public EpaMdl {
        Objects.requireNonNull(spiked, "spiked");
        Objects.requireNonNull(blank, "blank");
        Objects.requireNonNull(decidedBy, "decidedBy");
        Basis expected = blank.isPresent() && blank.get().mdl() > spiked.mdl() ? Basis.BLANK : Basis.SPIKED;
        if (decidedBy != expected || mdl != (expected == Basis.BLANK ? blank.get().mdl() : spiked.mdl())) {
            throw new IllegalArgumentException("the MDL must be the greater of MDL_s and MDL_b");
        }
    }

    /** The MDL from its two parts. */
    public static EpaMdl of(SpikedMdl spiked, Optional<BlankMdl> blank) {
        Objects.requireNonNull(spiked, "spiked");
        Objects.requireNonNull(blank, "blank");
        boolean byBlank = blank.isPresent() && blank.get().mdl() > spiked.mdl();
        return new EpaMdl(spiked, blank, byBlank ? blank.get().mdl() : spiked.mdl(), byBlank ? Basis.BLANK : Basis.SPIKED);
    }

    /** Whether the spike level is more than 10 times the MDL, which the procedure says is too high. */
    public boolean spikeLevelTooHigh(double spikeLevel) {
        return SampleChecks.finite("the spike level", spikeLevel) > SPIKE_LEVEL_CEILING * mdl;
    }
}
