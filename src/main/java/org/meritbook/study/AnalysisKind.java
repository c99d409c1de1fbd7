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
            List.of("weighting", "model", "internal-standard", "exclude", "id", "role", "censored", "formulas", "hidden",
                    "merged"),
            List.of("n", "slope", "intercept", "slope_se", "intercept_se", "intercept_t", "intercept_p", "r",
                    "r_squared", "residual_sd", "quadratic_coef", "quadratic_coef_se", "lack_of_fit_f", "lack_of_fit_p",
                    "mandel_f", "mandel_p", "shapiro_w", "shapiro_p", "back_calculated", "deviation_percent",
                    "anova_regression_df", "anova_regression_ss", "anova_regression_ms", "anova_regression_f",
                    "anova_regression_p", "anova_residual_df", "anova_residual_ss", "anova_residual_ms",
                    "anova_lack_of_fit_df", "anova_lack_of_fit_ss", "anova_lack_of_fit_ms", "anova_pure_error_df",
                    "anova_pure_error_ss", "anova_pure_error_ms", "anova_total_df", "anova_total_ss",
                    "standardized_residual", "studentized_residual")),
    DETECTION_LIMIT("detection-limit",
            List.of("methods"),
            List.of("calibration", "blanks", "spikes", "low-samples", "sigma", "k", "lob", "alpha", "beta",
                    "signal", "noise", "reporting-limit", "exclude", "id", "role", "censored", "formulas", "hidden",
                    "merged"),
            List.of("lod", "loq", "critical_value", "lowest_standard", "reporting_limit")),
    ACCURACY("accuracy",
            List.of("data", "measured", "known"),
            List.of("level", "unspiked", "calibration", "lloq-level", "exclude", "id", "role", "censored", "formulas", "hidden", "merged"),
            List.of("recovery_percent", "error_percent", "recovery_ci_low", "recovery_ci_high", "bias_p", "n",
                    "recovery_sd", "row_recovery_percent", "read_back")),
    PRECISION("precision",
            List.of("data", "value"),
            List.of("group", "level", "horwitz", "lloq-level", "exclude", "id", "role", "censored", "formulas", "hidden", "merged"),
            List.of("n", "mean", "sd", "cv_percent", "anova_f", "anova_p", "repeatability_sd", "between_sd", "intermediate_sd",
                    "repeatability_cv_percent", "intermediate_cv_percent", "repeatability_limit", "intermediate_limit",
                    "grubbs_g", "grubbs_means_g", "cochran_c", "horwitz_ratio")),
    RANGE("range",
            List.of("calibration"),
            List.of("tolerance", "deviation", "limits", "id", "role"),
            List.of("range_low", "range_high")),
    UNKNOWNS("unknowns",
            List.of("calibration", "data", "y", "sample"),
            List.of("replicates", "mass", "volume", "dilution", "known", "result-unit", "limits", "internal-standard",
                    "lloq-level", "exclude", "id", "role", "censored", "formulas", "hidden", "merged"),
            List.of("x0", "x0_se", "x0_ci_low", "x0_ci_high", "content", "content_se", "qc_deviation_percent"));

    private final String keyword;
    private final List<String> required;
    private final List<String> optional;
    private final List<String> reports;

    AnalysisKind(String keyword, List<String> required, List<String> optional, List<String> reports) {
        this.keyword = keyword;
        this.required = required;
        this.optional = optional;
        this.reports = reports;
    }

    /**
     * The results.json names a section of this kind may report (DESIGN §4), without their
     * {@code :<label>} part: acceptance rules are checked against them when a profile is loaded.
     */
    public List<String> reportedNames() {
        return reports;
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

    /** The words an option whose value is a fixed choice accepts ({@code model}: linear, …), empty otherwise. */
    public static List<String> choicesOf(String option) {
        return OptionRules.CHOICES.containsKey(option) ? OptionRules.shown(option) : List.of();
    }

    public static List<String> keywords() {
        return Arrays.stream(values()).map(AnalysisKind::keyword).toList();
    }
}
