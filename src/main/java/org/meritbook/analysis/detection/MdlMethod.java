package org.meritbook.analysis.detection;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.limits.BlankMdl;
import org.meritbook.stats.limits.EpaMdl;
import org.meritbook.stats.limits.SpikedMdl;
import org.meritbook.trail.StepInput;

/**
 * {@code mdl}: the US EPA method detection limit, 40 CFR Part 136 Appendix B, Revision 2: the larger
 * of MDL_s (spiked samples) and MDL_b (method blanks), with the procedure's checks on the spike
 * level and on the batches.
 */
final class MdlMethod {
    static final String NAME = "mdl";
    static final String PROCEDURE = "US EPA 40 CFR Part 136 Appendix B, Revision 2 (MDL)";
    /** The procedure's spikes and blanks come from at least three batches on three dates (from memory). */
    static final int BATCHES = 3;

    private MdlMethod() {
    }

    static LimitRow record(DetectionInputs in) {
        SectionBuilder s = in.section();
        MeasuredSet spikes = in.spikes().orElseThrow(() -> new org.meritbook.error.InputException(
                org.meritbook.error.ErrorKey.MISSING_OPTION, in.context().where(in.cell().lineOf("methods")),
                "'spikes: {data: …, column: …}' with the spiked-sample results for method mdl", "no spikes: option",
                "Add at least 7 spiked-sample results under 'spikes:'."));
        SpikedMdl spiked = SpikedMdl.of(spikes.values());
        String unit = spikes.unit();
        String mean = s.step("mdl_spike_mean", "Mean of the spiked-sample results (n = " + spiked.spikes().n() + ")",
                "X̄_s = Σ x_s[i] / n", spikes.inputs("x_s"), spiked.spikes().mean(), unit, null);
        String sd = s.step("mdl_spike_sd", "SD of the spiked-sample results", "S_s = √( Σ (x_s[i] − X̄_s)² / (n − 1) )",
                DetectionInputs.concat(List.of(s.ref("X̄_s", mean)), spikes.inputs("x_s")), spiked.spikes().sd(), unit,
                null);
        String t = s.step("mdl_t", "One-sided Student t at 99 % for n − 1 = " + spiked.spikes().degreesOfFreedom()
                        + " degrees of freedom", "t = t(n − 1, 0.99)",
                List.of(StepInput.number("n", spiked.spikes().n(), null, spikes.where())), spiked.t(), null, PROCEDURE);
        String mdlS = s.step("mdl_spiked", "MDL from the spiked samples", "MDL_s = t · S_s",
                List.of(s.ref("t", t), s.ref("S_s", sd)), spiked.mdl(), unit, PROCEDURE);
        Optional<BlankMdl> blank = blankPart(in, s, unit);
        EpaMdl mdl = EpaMdl.of(spiked, blank);
        List<StepInput> parts = new ArrayList<>(List.of(s.ref("MDL_s", mdlS)));
        if (blank.isPresent()) {
            parts.add(s.ref("MDL_b", s.stepId("mdl_blank")));
        }
        s.quantity(QuantityDraft.of("lod:mdl", "Method detection limit (decided by the "
                        + (mdl.decidedBy() == EpaMdl.Basis.BLANK ? "method blanks" : "spiked samples") + ")",
                blank.isPresent() ? "MDL = max(MDL_s, MDL_b)" : "MDL = MDL_s (no MDL_b)", parts, mdl.mdl(), unit)
                .withMethod(PROCEDURE));
        in.mark("MDL", mdl.mdl(), unit, in.blanks().isPresent());
        checkSpikeLevel(in, mdl, unit);
        checkBatches(in, "spiked samples", in.spikes());
        in.blanks().ifPresent(b -> checkBatches(in, "method blanks", in.blanks()));
        String basis = spiked.spikes().n() + " spikes" + (blank.isPresent()
                ? " and " + blank.get().blankCount() + " method blanks" : "");
        return new LimitRow(NAME, unit, basis, PROCEDURE, false, false);
    }

    /** MDL_b when the cell has method blanks and they support one; otherwise a warning says why not. */
    private static Optional<BlankMdl> blankPart(DetectionInputs in, SectionBuilder s, String unit) {
        if (in.blanks().isEmpty()) {
            s.warning("Method mdl: no method blanks are given (blanks:), so the MDL is MDL_s alone; the procedure "
                    + "asks for MDL_b from method blanks as well.");
            return Optional.empty();
        }
        MeasuredSet blanks = in.requireBlankResults(NAME);
        if (blanks.unit() != null && unit != null && !blanks.unit().equals(unit)) {
            s.warning("Method mdl: the spiked results are in " + unit + " and the method blanks in " + blanks.unit()
                    + "; MDL_s and MDL_b are compared as if in one unit.");
        }
        Optional<BlankMdl> part;
        try {
            part = BlankMdl.of(blanks.values(), blanks.censored());
        } catch (UnusableDataException e) {
            s.warning("MDL_b not evaluable, because " + e.getMessage() + "; the MDL is MDL_s alone.");
            return Optional.empty();
        }
        if (part.isEmpty()) {
            s.warning("MDL_b does not apply: " + (blanks.values().length == 0 ? "no method blank gave a numerical result"
                    : "the blank of the procedure's rank gave no numerical result") + " (" + blanks.censored()
                    + " censored, not set to zero); the MDL is MDL_s.");
            return part;
        }
        List<StepInput> inputs = new ArrayList<>(blanks.inputs("x_b"));
        if (part.get() instanceof BlankMdl.FromMeanAndSd m) {
            inputs.add(0, StepInput.number("t(n − 1, 0.99)", m.t(), null, PROCEDURE));
            s.step("mdl_blank", String.format(Locale.ROOT, "MDL from %d method blanks, all numeric (X̄ = %.4g%s, S_b = "
                            + "%.4g)", m.blankCount(), m.blanks().mean(), m.blanks().mean() < 0 ? ", taken as 0" : "",
                    m.blanks().sd()), "MDL_b = max(X̄_b, 0) + t(n − 1, 0.99)·S_b", inputs, m.mdl(), unit, PROCEDURE);
        } else if (part.get() instanceof BlankMdl.FromRankedResult r) {
            inputs.add(0, StepInput.number("censored blanks", blanks.censored(), null, blanks.where()));
            s.step("mdl_blank", "MDL from " + r.blankCount() + " method blanks, " + (r.blankCount() - r.numericCount())
                            + " without a numerical result (ranked lowest, never set to zero)",
                    r.blankCount() < BlankMdl.RANKED_FROM ? "MDL_b = the highest method-blank result (n < 100)"
                            : "MDL_b = the result of rank round(0.99·n) = " + r.rank(), inputs, r.mdl(), unit, PROCEDURE);
        }
        return part;
    }

    private static void checkSpikeLevel(DetectionInputs in, EpaMdl mdl, String unit) {
        Optional<MeasuredSet> levels = in.spikeLevels();
        if (levels.isEmpty()) {
            in.section().warning("Method mdl: the spike level is not given (spikes: spiked: <column>), so the "
                    + "procedure's check that it is no more than 10 times the MDL was not made.");
            return;
        }
        double highest = Double.NEGATIVE_INFINITY;
        for (double v : levels.get().extraNumbers()) {
            highest = Math.max(highest, v);
        }
        if (mdl.spikeLevelTooHigh(highest)) {
            in.section().warning(String.format(Locale.ROOT, "Method mdl: the spike level %.4g %s is more than 10 times "
                    + "the MDL (%.4g %s); the procedure asks for spikes nearer the MDL.", highest, unit, mdl.mdl(), unit));
        }
    }

    private static void checkBatches(DetectionInputs in, String what, Optional<MeasuredSet> set) {
        MeasuredSet m = set.orElseThrow();
        if (!m.hasExtra()) {
            in.section().warning("Method mdl: the " + what + " have no batch column (batch: <column>), so the "
                    + "procedure's spread over at least " + BATCHES + " batches on separate days was not checked.");
            return;
        }
        Set<String> batches = new LinkedHashSet<>(m.extra());
        if (batches.size() < BATCHES) {
            in.section().warning("Method mdl: the " + what + " come from " + batches.size() + " batch(es) ("
                    + String.join(", ", batches) + "); the procedure asks for at least " + BATCHES
                    + " batches prepared and analysed on separate days.");
        }
    }
}
