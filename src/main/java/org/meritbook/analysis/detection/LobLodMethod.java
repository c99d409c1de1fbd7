package org.meritbook.analysis.detection;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.limits.Ep17LimitOfDetection;
import org.meritbook.stats.limits.LimitOfBlank;
import org.meritbook.stats.limits.LobMethod;
import org.meritbook.stats.tests.ShapiroWilk;
import org.meritbook.trail.StepInput;

/**
 * {@code lob-lod}: the CLSI EP17 approach: LoB from blank results (parametric or by rank, by
 * {@code lob:} or, when not given, by a Shapiro–Wilk test of the blanks), then LoD = LoB + c_p·SD_L
 * from low-level samples.
 */
final class LobLodMethod {
    static final String NAME = "lob-lod";
    static final String PROCEDURE = "CLSI EP17-A2 approach: LoB and LoD";
    /** The normality test's level for choosing the parametric LoB (common practice, no source). */
    static final double NORMALITY_LEVEL = 0.05;

    private LobLodMethod() {
    }

    static LimitRow record(DetectionInputs in) {
        SectionBuilder s = in.section();
        MeasuredSet blanks = in.requireBlankResults(NAME);
        MeasuredSet low = in.lowSamples().orElseThrow(() -> new InputException(ErrorKey.MISSING_OPTION,
                in.context().where(in.cell().lineOf("methods")),
                "'low-samples: {data: …, column: …, sample: …}' for method lob-lod", "no low-samples: option",
                "Add the results of the low-level samples under 'low-samples:'."));
        String unit = blanks.unit();
        if (blanks.censored() > 0) {
            s.warning("Method lob-lod: " + blanks.censored() + " censored blank result(s) were left out (censored: "
                    + "drop), not set to zero; EP17 asks for the instrument's raw blank readings, negative ones included.");
        }
        LobMethod method = chooseLob(in, blanks);
        LimitOfBlank lob = method == LobMethod.PARAMETRIC ? LimitOfBlank.parametric(blanks.values())
                : LimitOfBlank.nonParametric(blanks.values());
        String lobId;
        if (method == LobMethod.PARAMETRIC) {
            lobId = s.quantity(QuantityDraft.of("critical_value:lob-lod", "Limit of blank (parametric)",
                    "LoB = mean_B + 1.645·SD_B", DetectionInputs.concat(List.of(
                            StepInput.number("mean_B", lob.blanks().mean(), unit, blanks.where()),
                            StepInput.number("SD_B", lob.blanks().sd(), unit, blanks.where())), blanks.inputs("x_B")),
                    lob.lob(), unit).withMethod(PROCEDURE));
        } else {
            lobId = s.quantity(QuantityDraft.of("critical_value:lob-lod", "Limit of blank (non-parametric, by rank)",
                    "rank r = 0.5 + 0.95·B; LoB = x₍⌊r⌋₎ + (r − ⌊r⌋)·(x₍⌊r⌋+1₎ − x₍⌊r⌋₎) of the sorted blanks",
                    DetectionInputs.concat(List.of(StepInput.number("r", lob.rankPosition().orElseThrow(), null,
                            "B = " + lob.blanks().n())), blanks.inputs("x_B")), lob.lob(), unit).withMethod(PROCEDURE));
        }
        if (blanks.values().length < LimitOfBlank.RECOMMENDED_BLANKS) {
            s.warning("Method lob-lod: " + blanks.values().length + " blank results; EP17 recommends at least "
                    + LimitOfBlank.RECOMMENDED_BLANKS + " per reagent lot when a LoB is established (from memory), "
                    + "so this LoB is an estimate for verification rather than establishment.");
        }
        if (low.unit() != null && unit != null && !low.unit().equals(unit)) {
            s.warning("Method lob-lod: the blanks are in " + unit + " and the low-level samples in " + low.unit()
                    + "; LoB and SD_L are added as if in one unit.");
        }
        Map<String, List<Integer>> bySample = bySample(in, low);
        List<double[]> groups = new ArrayList<>();
        bySample.values().forEach(idx -> groups.add(idx.stream().mapToDouble(i -> low.values()[i]).toArray()));
        Ep17LimitOfDetection lod = Ep17LimitOfDetection.of(lob, groups);
        String sdL = s.step("lob_lod_sd_l", "Pooled SD of " + lod.sampleCount() + " low-level samples ("
                        + lod.resultCount() + " results)", "SD_L = √( Σ (n_j − 1)·s_j² / (L − J) )",
                DetectionInputs.concat(List.of(StepInput.text("samples", String.join(", ", bySample.keySet()),
                        low.where())), low.inputs("x_L")), lod.pooledSd(), low.unit(), PROCEDURE);
        String cp = s.step("lob_lod_cp", "Multiplier c_p for L − J = " + (lod.resultCount() - lod.sampleCount())
                        + " degrees of freedom", "c_p = 1.645 / (1 − 1/(4·(L − J)))",
                List.of(StepInput.number("L", lod.resultCount(), null, low.where()),
                        StepInput.number("J", lod.sampleCount(), null, low.where())), lod.cp(), null, PROCEDURE);
        s.quantity(QuantityDraft.of("lod:lob-lod", "Limit of detection (EP17)", "LoD = LoB + c_p·SD_L",
                List.of(s.ref("LoB", lobId), s.ref("c_p", cp), s.ref("SD_L", sdL)), lod.lod(), unit)
                .withMethod(PROCEDURE));
        in.mark("LoB", lob.lob(), unit, true);
        in.mark("LoD (EP17)", lod.lod(), unit, true);
        return new LimitRow(NAME, unit, lob.blanks().n() + " blanks (" + (method == LobMethod.PARAMETRIC
                ? "parametric" : "non-parametric") + " LoB), " + lod.sampleCount() + " low-level samples", PROCEDURE,
                false, true);
    }

    /** By {@code lob:}, else parametric unless Shapiro–Wilk rejects normality of the blanks. */
    private static LobMethod chooseLob(DetectionInputs in, MeasuredSet blanks) {
        SectionBuilder s = in.section();
        if (in.options().lob().isPresent()) {
            LobMethod m = in.options().lob().get().equals("parametric") ? LobMethod.PARAMETRIC : LobMethod.NON_PARAMETRIC;
            s.setting("LoB", (m == LobMethod.PARAMETRIC ? "parametric" : "non-parametric") + " (lob: option)",
                    in.options().lob().get());
            return m;
        }
        double[] v = blanks.values();
        if (v.length < ShapiroWilk.MIN_N) {
            s.setting("LoB", "parametric (too few blanks for a normality test)", "parametric");
            return LobMethod.PARAMETRIC;
        }
        boolean allEqual = java.util.Arrays.stream(v).distinct().count() == 1;
        if (allEqual || v.length > ShapiroWilk.MAX_N) {
            boolean ranked = v.length >= LimitOfBlank.NON_PARAMETRIC_MINIMUM;
            s.setting("LoB", (ranked ? "non-parametric" : "parametric") + (allEqual ? " (all blank results are equal: "
                    + "no normality test)" : " (more blanks than the normality test takes)"),
                    ranked ? "non-parametric" : "parametric");
            return ranked ? LobMethod.NON_PARAMETRIC : LobMethod.PARAMETRIC;
        }
        ShapiroWilk sw = ShapiroWilk.test(v);
        s.step("lob_lod_normality", "Shapiro–Wilk test of the blank results", "W, p (Royston 1995)",
                blanks.inputs("x_B"), sw.p(), null, "Shapiro & Wilk 1965; Royston 1995");
        boolean normal = sw.p() >= NORMALITY_LEVEL;
        if (!normal && v.length < LimitOfBlank.NON_PARAMETRIC_MINIMUM) {
            s.setting("LoB", String.format(Locale.ROOT, "parametric, although Shapiro–Wilk p = %.3g < 0.05: a rank-based "
                    + "LoB needs at least 10 blanks", sw.p()), "parametric");
            s.warning("Method lob-lod: the blank results do not look normal (Shapiro–Wilk p < 0.05), but there are too "
                    + "few for the non-parametric LoB; the parametric LoB is used.");
            return LobMethod.PARAMETRIC;
        }
        s.setting("LoB", String.format(Locale.ROOT, "%s, chosen by Shapiro–Wilk on the blanks (W = %.4f, p = %.3g)",
                normal ? "parametric" : "non-parametric", sw.w(), sw.p()), normal ? "parametric" : "non-parametric");
        return normal ? LobMethod.PARAMETRIC : LobMethod.NON_PARAMETRIC;
    }

    /** The used low-level results' indices grouped by sample label, in first-seen order. */
    private static Map<String, List<Integer>> bySample(DetectionInputs in, MeasuredSet low) {
        Map<String, List<Integer>> groups = new LinkedHashMap<>();
        for (int i = 0; i < low.extra().size(); i++) {
            String label = low.extra().get(i);
            if (label.isEmpty()) {
                throw new InputException(ErrorKey.BAD_OPTION_VALUE, low.rows().block().file().getFileName() + ", "
                        + low.addresses().get(i), "a sample label beside every low-level result",
                        "an empty sample cell", "Fill in the sample of this result, or exclude it with a reason.");
            }
            groups.computeIfAbsent(label, x -> new ArrayList<>()).add(i);
        }
        return groups;
    }
}
