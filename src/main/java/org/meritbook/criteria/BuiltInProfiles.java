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
                                "Mandel p", "linear", "Mandel's fitting test at the 5 % level (ISO 8466-1)")),
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
        all.put("drug-substance-assay", drugSubstanceAssay());
        all.put("bioanalysis-m10", bioanalysisM10());
        all.put("trace-environmental", traceEnvironmental());
        return all;
    }

    /** An assay of a drug substance, in the manner of ICH Q2(R2), whose text sets no numeric limit itself. */
    private static AcceptanceProfile drugSubstanceAssay() {
        String q2 = "ICH Q2(R2) asks for accuracy and repeatability data for an assay but sets no numeric limit; ";
        String recovery = q2 + "a mean recovery of 98.0-102.0 % is common practice for drug-substance assays, no source; "
                + "a default to confirm locally";
        return new AcceptanceProfile("drug-substance-assay",
                "Assay of a drug substance (ICH Q2(R2) characteristics; limits of common practice).", "built in", List.of(
                        new QuantityRule(AnalysisKind.ACCURACY, "Accuracy", "recovery_percent", true, 98.0,
                                "mean recovery (%)", null, recovery),
                        new QuantityRule(AnalysisKind.ACCURACY, "Accuracy", "recovery_percent", false, 102.0,
                                "mean recovery (%)", null, recovery),
                        new QuantityRule(AnalysisKind.PRECISION, "Repeatability", "cv_percent", false, 2.0, "RSD (%)",
                                null, q2 + "an RSD of at most 2 % over the repeated determinations is common practice "
                                        + "for drug-substance assays, no source; a default to confirm locally"),
                        new QuantityRule(AnalysisKind.CALIBRATION, "Linearity", "r_squared", true, 0.998, "r²", null,
                                q2 + "r² ≥ 0.998 (often written r ≥ 0.999) is common practice for assays, no source; "
                                        + "a default to confirm locally")),
                BUILT_IN_COMPARISON);
    }

    /**
     * Bioanalysis after ICH M10: calibration standards; the run's QC samples, two thirds of them and half
     * of each level within ±15 % ({@link QcRunRule}); the accuracy and precision of each QC level, ±15 %
     * (20 % at the LLOQ, as the section identifies it: {@link LevelRule}).
     */
    private static AcceptanceProfile bioanalysisM10() {
        String m10 = "ICH M10 (2022), sections on calibration curve and accuracy and precision (from memory); "
                + "a default to confirm locally";
        return new AcceptanceProfile("bioanalysis-m10",
                "Bioanalytical method validation after ICH M10: standards, QCs, accuracy and precision per level.",
                "built in", List.of(
                        new DeviationRule("Calibration standards", 15, 20, 0.75, 6, m10),
                        new QcRunRule("QC samples of the run", 15, 20, 2.0 / 3, 0.5, new QcRunRule.Design(3, 2),
                                "ICH M10 (2022), analytical run acceptance: QCs at three levels (low, medium, high) at "
                                        + "least in duplicate, two thirds of them and half at each level within ±15 % "
                                        + "(from memory); a default to confirm locally"),
                        new LevelRule(AnalysisKind.ACCURACY, "Accuracy", "error_percent", true, 15, 20, "mean error",
                                m10),
                        new LevelRule(AnalysisKind.PRECISION, "Precision, within run", "repeatability_cv_percent", false,
                                15, 20, "within-run CV", m10),
                        new LevelRule(AnalysisKind.PRECISION, "Precision, between runs", "intermediate_cv_percent", false,
                                15, 20, "between-run CV", m10),
                        new LevelRule(AnalysisKind.PRECISION, "Precision, all results", "cv_percent", false, 15, 20,
                                "CV", m10)),
                BUILT_IN_COMPARISON);
    }

    /** Trace analysis in environmental samples: the recovery and RSD windows such methods publish. */
    private static AcceptanceProfile traceEnvironmental() {
        String epa = "US EPA drinking-water methods, initial demonstration of capability (e.g. Method 537.1: mean "
                + "recovery within ±30 % of the true value, RSD ≤ 20 %; from memory), common practice for trace "
                + "environmental methods; a default to confirm locally";
        return new AcceptanceProfile("trace-environmental",
                "Trace analysis of environmental samples: recovery 70-130 %, RSD ≤ 20 %, LOQ at or below the reporting "
                        + "limit.", "built in", List.of(
                        new QuantityRule(AnalysisKind.ACCURACY, "Recovery", "recovery_percent", true, 70,
                                "mean recovery (%)", null, epa),
                        new QuantityRule(AnalysisKind.ACCURACY, "Recovery", "recovery_percent", false, 130,
                                "mean recovery (%)", null, epa),
                        new QuantityRule(AnalysisKind.PRECISION, "Precision", "cv_percent", false, 20, "RSD (%)", null,
                                epa),
                        new BoundRule(AnalysisKind.DETECTION_LIMIT, "Quantitation limit", "loq", false,
                                "reporting_limit", "LOQ", "reporting limit", "common practice: a result is reported "
                                        + "only down to a level the method quantifies, no source; a default to confirm "
                                        + "locally")),
                BUILT_IN_COMPARISON);
    }
}
