package org.meritbook.study;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The analysis kinds a notebook cell can name in its info string (DESIGN §3). Every kind that reads
 * data also takes the reading options of {@link ReadingOptions} ({@code formulas}, {@code hidden},
 * {@code merged}).
 */
public enum AnalysisKind {
    CALIBRATION("calibration",
            List.of("data", "x", "y"),
            List.of("weighting", "model", "exclude", "id", "censored", "formulas", "hidden", "merged")),
    DETECTION_LIMIT("detection-limit",
            List.of("methods"),
            List.of("calibration", "blanks", "spikes", "low-samples", "sigma", "k", "alpha", "beta",
                    "signal", "noise", "exclude", "id", "censored", "formulas", "hidden", "merged")),
    ACCURACY("accuracy",
            List.of("data", "measured", "known"),
            List.of("level", "unspiked", "calibration", "exclude", "id", "censored", "formulas", "hidden", "merged")),
    PRECISION("precision",
            List.of("data", "value"),
            List.of("group", "level", "exclude", "id", "censored", "formulas", "hidden", "merged")),
    RANGE("range",
            List.of("calibration"),
            List.of("tolerance", "id")),
    UNKNOWNS("unknowns",
            List.of("calibration", "data", "y", "sample"),
            List.of("replicates", "exclude", "id", "censored", "formulas", "hidden", "merged"));

    private final String keyword;
    private final List<String> required;
    private final List<String> optional;

    AnalysisKind(String keyword, List<String> required, List<String> optional) {
        this.keyword = keyword;
        this.required = required;
        this.optional = optional;
    }

    /** The word used in the notebook's fence info string and in results.json. */
    public String keyword() {
        return keyword;
    }

    public List<String> requiredOptions() {
        return required;
    }

    public List<String> optionalOptions() {
        return optional;
    }

    public boolean allows(String option) {
        return required.contains(option) || optional.contains(option);
    }

    public static Optional<AnalysisKind> fromKeyword(String word) {
        return Arrays.stream(values()).filter(k -> k.keyword.equals(word)).findFirst();
    }

    public static List<String> keywords() {
        return Arrays.stream(values()).map(AnalysisKind::keyword).toList();
    }
}
