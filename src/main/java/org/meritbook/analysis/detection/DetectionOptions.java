package org.meritbook.analysis.detection;

import java.util.List;
import java.util.Optional;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.limits.BlankLimit;
import org.meritbook.stats.limits.PredictionBandLimits;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.OptionValue;

/**
 * The options of a detection-limit cell, with their defaults; a malformed number is a located error.
 *
 * @param methods the methods in the order listed (the first gives {@code lod} and {@code loq})
 * @param k       the blank method's multiplier for the LOD
 * @param kLine   the notebook line of {@code k}, or 0 when defaulted
 * @param alpha   α of the prediction band
 * @param beta    β of the prediction band
 * @param sigma   {@code sigma:} as written, if given
 * @param lob     {@code lob:} as written, if given
 */
record DetectionOptions(List<String> methods, double k, int kLine, double alpha, double beta, Optional<String> sigma,
                        Optional<String> lob) {

    static DetectionOptions of(AnalysisCell cell, AnalysisContext context) {
        List<String> methods = cell.option("methods").orElseThrow().list().stream().map(OptionValue::text).toList();
        double k = number(cell, context, "k", BlankLimit.DETECTION_K, 0, Double.POSITIVE_INFINITY,
                "a positive multiplier, e.g. 'k: 3'");
        double alpha = number(cell, context, "alpha", PredictionBandLimits.DEFAULT_PROBABILITY, 0, 0.5,
                "a probability strictly between 0 and 0.5, e.g. 'alpha: 0.05'");
        double beta = number(cell, context, "beta", PredictionBandLimits.DEFAULT_PROBABILITY, 0, 0.5,
                "a probability strictly between 0 and 0.5, e.g. 'beta: 0.05'");
        return new DetectionOptions(methods, k, cell.option("k").map(OptionValue::line).orElse(0), alpha, beta,
                cell.option("sigma").map(OptionValue::text), cell.option("lob").map(OptionValue::text));
    }

    /** The option's number, strictly between low and high, or the default when absent. */
    private static double number(AnalysisCell cell, AnalysisContext context, String name, double fallback, double low,
                                 double high, String expected) {
        Optional<OptionValue> v = cell.option(name);
        if (v.isEmpty()) {
            return fallback;
        }
        double x;
        try {
            x = Double.parseDouble(v.get().text().strip());
        } catch (NumberFormatException e) {
            x = Double.NaN;
        }
        if (!(x > low && x < high)) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(v.get().line()), name + ": " + expected,
                    "'" + v.get().text() + "'", "Write a number in that range after '" + name + ":'.");
        }
        return x;
    }
}
