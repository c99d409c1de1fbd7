package org.meritbook.analysis.calibration;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.meritbook.stats.regression.LineModel;

/** The notebook's {@code model:} option: the calibration function fitted. */
enum CalibrationModel {
    LINEAR("linear", "straight line, y = a + b·x", 3),
    THROUGH_ORIGIN("linear-through-origin", "straight line through the origin, y = b·x", 3),
    QUADRATIC("quadratic", "quadratic, y = a + b·x + c·x²", 4);

    private final String keyword;
    private final String description;
    private final int minimumPoints;

    CalibrationModel(String keyword, String description, int minimumPoints) {
        this.keyword = keyword;
        this.description = description;
        this.minimumPoints = minimumPoints;
    }

    String keyword() {
        return keyword;
    }

    /** As stated in the dossier's settings. */
    String description() {
        return description;
    }

    /** Points needed for a fit with at least one residual degree of freedom to spare. */
    int minimumPoints() {
        return minimumPoints;
    }

    /** Distinct concentration levels the model needs. */
    int minimumLevels() {
        return this == QUADRATIC ? 3 : 2;
    }

    /** The straight-line model, for the two straight-line kinds. */
    LineModel lineModel() {
        return switch (this) {
            case LINEAR -> LineModel.WITH_INTERCEPT;
            case THROUGH_ORIGIN -> LineModel.THROUGH_ORIGIN;
            default -> throw new IllegalStateException(this + " is not a straight line");
        };
    }

    static Optional<CalibrationModel> fromKeyword(String text) {
        return Arrays.stream(values()).filter(m -> m.keyword.equals(text)).findFirst();
    }

    static List<String> keywords() {
        return Arrays.stream(values()).map(CalibrationModel::keyword).toList();
    }
}
