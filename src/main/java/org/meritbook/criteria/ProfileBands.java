package org.meritbook.criteria;

import java.util.Optional;
import org.meritbook.analysis.AcceptanceBands;
import org.meritbook.study.AnalysisKind;

/**
 * A profile's limits as the figures draw them: the same rules that judge a section bound its bands.
 * With several rules on one quantity the tightest limit counts, as the section must meet them all.
 */
public final class ProfileBands implements AcceptanceBands {
    private final AcceptanceProfile profile;

    private ProfileBands(AcceptanceProfile profile) {
        this.profile = profile;
    }

    /** The bands of a profile, or none when the study names no profile (null). */
    public static AcceptanceBands of(AcceptanceProfile profile) {
        return profile == null ? AcceptanceBands.NONE : new ProfileBands(profile);
    }

    @Override
    public Band on(AnalysisKind kind, String model, String quantity) {
        double low = Double.NaN;
        double high = Double.NaN;
        for (Rule rule : profile.rules()) {
            if (rule instanceof QuantityRule q && q.judges(kind, model) && q.quantity().equals(quantity)) {
                if (q.atLeast()) {
                    low = Double.isNaN(low) ? q.limit() : Math.max(low, q.limit());
                } else {
                    high = Double.isNaN(high) ? q.limit() : Math.min(high, q.limit());
                }
            }
        }
        return Double.isNaN(low) && Double.isNaN(high) ? Band.NONE : new Band(low, high, profile.name());
    }

    @Override
    public Optional<DeviationBand> deviation(AnalysisKind kind) {
        double tolerance = Double.NaN;
        double lowest = Double.NaN;
        for (Rule rule : profile.rules()) {
            if (rule instanceof DeviationRule d && d.judges(kind)) {
                tolerance = Double.isNaN(tolerance) ? d.tolerance() : Math.min(tolerance, d.tolerance());
                lowest = Double.isNaN(lowest) ? d.lowestTolerance() : Math.min(lowest, d.lowestTolerance());
            }
        }
        return Double.isNaN(tolerance) ? Optional.empty()
                : Optional.of(new DeviationBand(tolerance, lowest, profile.name()));
    }
}
