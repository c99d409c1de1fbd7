package org.meritbook.analysis;

import java.util.Objects;
import java.util.Optional;
import org.meritbook.study.AnalysisKind;

/**
 * The limits the acceptance profile that judges a section sets, as far as a figure draws them. Analyses
 * ask; the criteria package answers from the study's profile and the pipeline hands the answer in
 * through {@link AnalysisContext}, so a figure's band is the profile's limit and analysis never reads
 * a profile itself.
 */
public interface AcceptanceBands {
    /** No profile judges the study: no limit anywhere. */
    AcceptanceBands NONE = new AcceptanceBands() {
        @Override
        public Band on(AnalysisKind kind, String model, String quantity) {
            return Band.NONE;
        }

        @Override
        public Optional<DeviationBand> deviation(AnalysisKind kind) {
            return Optional.empty();
        }
    };

    /**
     * The limits on one quantity of sections of one kind: a rule on the base name ({@code recovery_percent})
     * counts, a rule on one member ({@code recovery_percent:L1}) does not, since one band is drawn for all.
     *
     * @param model the section's model as the notebook words it ({@code linear}), or null when it has none
     */
    Band on(AnalysisKind kind, String model, String quantity);

    /** The allowed deviation of back-calculated standards in sections of this kind, when a rule sets one. */
    Optional<DeviationBand> deviation(AnalysisKind kind);

    /**
     * Lower and upper limits; either may be absent (NaN). With several rules the tightest limit counts.
     *
     * @param profile the name of the profile that sets them, for the legend
     */
    record Band(double low, double high, String profile) {
        public static final Band NONE = new Band(Double.NaN, Double.NaN, null);

        public boolean isEmpty() {
            return Double.isNaN(low) && Double.isNaN(high);
        }
    }

    /**
     * Allowed |% deviation| from nominal, and at the lowest level (the LLOQ).
     *
     * @param profile the name of the profile that sets them, for the legend
     */
    record DeviationBand(double tolerance, double lowestTolerance, String profile) {
        public DeviationBand {
            Objects.requireNonNull(profile, "profile");
            if (!(tolerance > 0 && lowestTolerance > 0)) {
                throw new IllegalArgumentException("deviation limits must be positive");
            }
        }
    }
}
