package org.meritbook.criteria;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.study.AnalysisKind;

/**
 * The acceptance profiles meritbook ships. They are defaults, stated with their sources, for the
 * laboratory to confirm against its own procedures and the rules that apply to it.
 */
public final class BuiltInProfiles {
    /** Every built-in profile compares values as computed: no rounding towards a limit. */
    static final Comparison BUILT_IN_COMPARISON = Comparison.AS_COMPUTED;

    private BuiltInProfiles() {
    }

    public static Map<String, AcceptanceProfile> all() {
        Map<String, AcceptanceProfile> all = new LinkedHashMap<>();
        all.put("linearity-basic", new AcceptanceProfile("linearity-basic",
                "A straight-line calibration that is linear by the usual statistical checks.", "built in", List.of(
                        new QuantityRule(AnalysisKind.CALIBRATION, "Linearity", "r_squared", true, 0.995, "r²", null,
                                "common practice for chromatographic assays; confirm locally"),
                        new QuantityRule(AnalysisKind.CALIBRATION, "Linearity: lack of fit", "lack_of_fit_p", true, 0.05,
                                "lack-of-fit p", null, "lack-of-fit F test at the 5 % level"),
                        new QuantityRule(AnalysisKind.CALIBRATION, "Linearity: no curvature", "mandel_p", true, 0.05,
                                "Mandel p", "straight line", "Mandel's fitting test at the 5 % level (ISO 8466-1)")),
                BUILT_IN_COMPARISON));
        all.put("bioanalytical-calibration", new AcceptanceProfile("bioanalytical-calibration",
                "Calibration standards of a bioanalytical method: back-calculated concentrations near nominal.",
                "built in", List.of(new DeviationRule("Back-calculated standards", 15, 20, 0.75,
                        "ICH M10 bioanalytical method validation, calibration curve (±15 %, ±20 % at the LLOQ, "
                                + "75 % of standards)")), BUILT_IN_COMPARISON));
        String aoac = "AOAC Official Methods of Analysis, Appendix F (Guidelines for Standard Method Performance "
                + "Requirements), expected recovery 80-110 % for analytes at 1 to 10 mg/kg (from memory); "
                + "a default to confirm locally";
        all.put("recovery-ppm", new AcceptanceProfile("recovery-ppm",
                "Mean recovery of an analyte at about 1 to 10 mg/kg, per level and overall.", "built in", List.of(
                        new QuantityRule(AnalysisKind.ACCURACY, "Recovery", "recovery_percent", true, 80,
                                "mean recovery (%)", null, aoac),
                        new QuantityRule(AnalysisKind.ACCURACY, "Recovery", "recovery_percent", false, 110,
                                "mean recovery (%)", null, aoac)), BUILT_IN_COMPARISON));
        // AOAC's table of expected precision by concentration; the row for 10 mg/kg (10 ppm). Intermediate
        // precision lies between repeatability and reproducibility, so judging it against RSD_R is lenient.
        all.put("food-precision-10-mg-kg", new AcceptanceProfile("food-precision-10-mg-kg",
                "Precision of a method for an analyte near 10 mg/kg, against the RSDs AOAC expects at that level.",
                "built in", List.of(
                        new QuantityRule(AnalysisKind.PRECISION, "Repeatability", "repeatability_cv_percent", false, 7.3,
                                "RSD_r (%)", null, "AOAC Official Methods of Analysis, Appendix F (2016), expected "
                                        + "RSD_r at 10 ppm (from memory); a default to confirm locally"),
                        new QuantityRule(AnalysisKind.PRECISION, "Intermediate precision", "intermediate_cv_percent", false,
                                11, "RSD_I (%)", null, "AOAC Official Methods of Analysis, Appendix F (2016), expected "
                                        + "RSD_R at 10 ppm (from memory), an upper bound for RSD_I; a default to confirm "
                                        + "locally")), BUILT_IN_COMPARISON));
        return all;
    }
}
