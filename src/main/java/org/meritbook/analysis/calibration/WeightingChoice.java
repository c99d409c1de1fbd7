package org.meritbook.analysis.calibration;

import java.util.Optional;
import org.meritbook.stats.regression.Weighting;

/**
 * The notebook's {@code weighting:} option: a fixed weighting, or {@code auto}, which fits every
 * weighting and keeps the one with the smallest sum of |% deviation| of the back-calculated
 * standards (DESIGN §4).
 *
 * @param fixed the weighting, or null for auto
 */
record WeightingChoice(Weighting fixed) {
    static final WeightingChoice AUTO = new WeightingChoice(null);

    boolean isAuto() {
        return fixed == null;
    }

    static Optional<WeightingChoice> parse(String text) {
        if (text.equals("auto")) {
            return Optional.of(AUTO);
        }
        return Weighting.fromNotation(text).map(WeightingChoice::new);
    }
}
