package org.meritbook.study;

import java.util.List;
import java.util.Map;

/**
 * The notebook's option language beyond the option names of {@link AnalysisKind}: enumerated values
 * and the nested data sets (DESIGN §3). Values are checked here so that a typo is reported with its
 * line before any workbook is opened.
 */
final class OptionRules {
    private OptionRules() {
    }

    /** Options whose value is one word from a fixed list. */
    static final Map<String, List<String>> CHOICES = choices();

    private static Map<String, List<String>> choices() {
        Map<String, List<String>> all = new java.util.HashMap<>(Map.of(
                // 1/x², 1/y² and 1/s² are accepted as typed with a superscript; 1/s^2: the replicate SD of each level.
                "weighting", List.of("none", "1/x", "1/x^2", "1/y", "1/y^2", "1/s^2", "auto", "1/x²", "1/y²", "1/s²"),
                "model", List.of("linear", "quadratic", "linear-through-origin"),
                "censored", List.of("reject", "drop"),
                "sigma", List.of("blank", "residual", "intercept"),
                "replicates", List.of("together", "each"),
                "lob", List.of("parametric", "non-parametric"),
                // every kind: a supporting cell is shown and judged but kept out of the overall outcome.
                "role", List.of(AnalysisCell.REPORTING, AnalysisCell.SUPPORTING),
                // precision: the unit of the results as a mass fraction, for the Horwitz ratio.
                "horwitz", MassFractions.UNITS));
        all.putAll(ReadingOptions.choices()); // formulas, hidden, merged
        return Map.copyOf(all);
    }

    /** How each choice list is shown in messages (the superscript spellings are not advertised). */
    static List<String> shown(String option) {
        return CHOICES.get(option).stream().filter(v -> !v.contains("²")).toList();
    }

    static final String METHODS = "methods";
    static final List<String> METHOD_CHOICES =
            List.of("blank", "response-sd", "mdl", "lob-lod", "prediction-band", "signal-noise");

    static final String EXCLUDE = "exclude";
    /** accuracy, precision, unknowns: the level (or QC samples) at the LLOQ, one or a list. */
    static final String LLOQ_LEVEL = "lloq-level";
    static final String ID = "id";
    static final String DATA = "data";
    static final String CALIBRATION = "calibration";

    /** A second data set inside a cell: its own {@code data:} and columns. */
    record DataSet(List<String> required, List<String> optional, Map<String, List<String>> choices) {
        List<String> all() {
            return java.util.stream.Stream.concat(required.stream(), optional.stream()).toList();
        }
    }

    static final Map<String, DataSet> DATA_SETS = Map.of(
            // units: blanks hold signals unless stated as results in concentration units.
            "blanks", new DataSet(List.of("data", "column"), List.of("units", "batch"),
                    Map.of("units", List.of("signal", "concentration"))),
            // spiked: the column of the amount added (the MDL's spike-level check); batch: preparation batch.
            "spikes", new DataSet(List.of("data", "column"), List.of("spiked", "batch"), Map.of()),
            "low-samples", new DataSet(List.of("data", "column", "sample"), List.of(), Map.of()),
            // signal-noise: the peak signal with the concentration of the standard, and the noise beside it.
            "signal", new DataSet(List.of("data", "column", "concentration"), List.of(), Map.of()),
            "noise", new DataSet(List.of("data", "column"), List.of(), Map.of()));

    /** Cell ids appear in results.json, file names and anchors, hence the plain alphabet. */
    static final java.util.regex.Pattern ID_PATTERN = java.util.regex.Pattern.compile("[a-z0-9][a-z0-9-]*");
}
