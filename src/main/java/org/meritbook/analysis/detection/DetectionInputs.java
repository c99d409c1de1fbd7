package org.meritbook.analysis.detection;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.MeasuredRows;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.calibration.CalibrationLine;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.study.AnalysisCell;
import org.meritbook.trail.StepInput;

/**
 * Everything the methods of one cell share: its options, its data sets (read once, up front, so a
 * bad cell is reported whichever method fails first), the referenced calibration, and the blank
 * mean and SD steps that several methods use.
 */
final class DetectionInputs {
    private final AnalysisCell cell;
    private final AnalysisContext context;
    private final DetectionOptions options;
    private final SectionBuilder section;
    private final Optional<MeasuredSet> blanks;
    private final Optional<MeasuredSet> spikes;
    private final Optional<MeasuredSet> spikeLevels;
    private final Optional<MeasuredSet> lowSamples;
    private final Optional<MeasuredSet> signal;
    private final Optional<MeasuredSet> noise;
    private final CalibrationLine line;
    private final SectionResult calibrationSection;
    private SampleSummary blankSummary;
    private final List<Mark> marks = new ArrayList<>();

    /**
     * A level to draw: a limit or decision level.
     *
     * @param label      legend text
     * @param value      the level
     * @param unit       its unit
     * @param blankScale whether it is on the scale of the blank values (drawn on the blank figure)
     */
    record Mark(String label, double value, String unit, boolean blankScale) {
    }

    DetectionInputs(AnalysisCell cell, AnalysisContext context, SectionBuilder section) {
        this.cell = cell;
        this.context = context;
        this.section = section;
        this.options = DetectionOptions.of(cell, context);
        this.blanks = MeasuredSet.read(cell, context, "blanks", "batch", false);
        this.spikes = MeasuredSet.read(cell, context, "spikes", "batch", false);
        this.spikeLevels = MeasuredSet.read(cell, context, "spikes", "spiked", true);
        this.lowSamples = MeasuredSet.read(cell, context, "low-samples", "sample", false);
        this.signal = MeasuredSet.read(cell, context, "signal", "concentration", true);
        this.noise = MeasuredSet.read(cell, context, "noise", null, false);
        List<MeasuredRows> sets = new ArrayList<>();
        for (Optional<MeasuredSet> s : List.of(blanks, spikes, spikeLevels, lowSamples, signal, noise)) {
            s.ifPresent(m -> sets.add(m.rows()));
        }
        MeasuredRows.requireAllClaimed(cell, context, sets);
        if (cell.option("calibration").isPresent()) {
            line = context.earlier(cell, "calibration", CalibrationLine.class, CalibrationLine.DESCRIPTION);
            calibrationSection = context.earlierSection(cell, "calibration");
            if (line.ratio() && blanks.isPresent() && !blanksAreConcentrations()) {
                // Plain blank signals divided by a slope in ratio units would give a number of no meaning.
                throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(cell.lineOf("blanks")),
                        "blanks on the response scale of calibration '" + line.cellId() + "'",
                        "blank signals, while '" + line.cellId() + "' calibrates the ratio to its internal standard ('"
                                + line.internalStandard() + "')",
                        "Give the blanks as results in concentration units (units: concentration), or calibrate "
                                + "without the internal standard.");
            }
        } else {
            line = null;
            calibrationSection = null;
        }
    }

    AnalysisCell cell() {
        return cell;
    }

    AnalysisContext context() {
        return context;
    }

    DetectionOptions options() {
        return options;
    }

    SectionBuilder section() {
        return section;
    }

    void mark(String label, double value, String unit, boolean blankScale) {
        marks.add(new Mark(label, value, unit, blankScale));
    }

    List<Mark> marks() {
        return List.copyOf(marks);
    }

    /** The referenced calibration, if the cell names one. */
    Optional<CalibrationLine> calibrationIfAny() {
        return Optional.ofNullable(line);
    }

    /** The referenced calibration's section, if the cell names one. */
    Optional<SectionResult> calibrationSectionIfAny() {
        return Optional.ofNullable(calibrationSection);
    }

    Optional<MeasuredSet> blanks() {
        return blanks;
    }

    /** Whether the blanks are results in concentration units ({@code units: concentration}). */
    boolean blanksAreConcentrations() {
        return cell.option("blanks").map(v -> v.map().get("units")).map(u -> u.text().equals("concentration"))
                .orElse(false);
    }

    Optional<MeasuredSet> spikes() {
        return spikes;
    }

    /** The spikes read with their spiked-amount column, when {@code spiked:} names one. */
    Optional<MeasuredSet> spikeLevels() {
        return spikeLevels.filter(MeasuredSet::hasExtra);
    }

    Optional<MeasuredSet> lowSamples() {
        return lowSamples;
    }

    Optional<MeasuredSet> signal() {
        return signal;
    }

    Optional<MeasuredSet> noise() {
        return noise;
    }

    /** The referenced calibration, or a located error naming the method that needs it. */
    CalibrationLine calibration(String method) {
        if (line == null) {
            throw new InputException(ErrorKey.MISSING_OPTION, context.where(cell.lineOf("methods")),
                    "'calibration: <id>' naming the calibration cell for method " + method, "no calibration: option",
                    "Add 'calibration: <id>' with the id of a calibration cell above this one.");
        }
        return line;
    }

    /** A trail input linked to the calibration's own step for one of its quantities. */
    StepInput fromCalibration(String symbol, String quantity) {
        Quantity q = CalibrationLine.quantity(calibrationSection, quantity);
        return SectionBuilder.fromEarlier(symbol, q);
    }

    /** The blank set, or a located error naming the method that needs it. */
    MeasuredSet requireBlanks(String method) {
        return blanks.orElseThrow(() -> new InputException(ErrorKey.MISSING_OPTION, context.where(cell.lineOf("methods")),
                "'blanks: {data: …, column: …}' for method " + method, "no blanks: option",
                "Add the blank results under 'blanks:'."));
    }

    /** Blank results in concentration units, as the mdl and lob-lod procedures need them. */
    MeasuredSet requireBlankResults(String method) {
        MeasuredSet b = requireBlanks(method);
        if (!blanksAreConcentrations()) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(b.line()),
                    "blank results in concentration units for method " + method + " ('units: concentration')",
                    "blanks of signals (units: signal, the default)",
                    "Give blank results and write 'units: concentration' under 'blanks:', or drop " + method + ".");
        }
        return b;
    }

    /**
     * The blanks' n, mean and SD, recorded once as the steps {@code blank_mean} and {@code blank_sd}
     * with every blank cell as an input.
     */
    SampleSummary blankSummary(String method) {
        if (blankSummary != null) {
            return blankSummary;
        }
        MeasuredSet b = requireBlanks(method);
        if (b.values().length < SampleSummary.MINIMUM) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                    "there " + (b.values().length == 1 ? "is 1 usable blank" : "are " + b.values().length
                            + " usable blanks") + " in " + b.where() + ", and a blank SD needs at least 2");
        }
        SampleSummary s = SampleSummary.of(b.values());
        String censoredNote = b.censored() == 0 ? "" : "; " + b.censored()
                + " censored blank(s) left out (censored: drop): they have no number and are not set to zero";
        section.step("blank_mean", "Mean of the blanks (n = " + s.n() + censoredNote + ")", "ȳ_b = Σ y_b[i] / n",
                b.inputs("y_b"), s.mean(), b.unit(), null);
        section.step("blank_sd", "SD of the blanks", "s_b = √( Σ (y_b[i] − ȳ_b)² / (n − 1) )",
                concat(List.of(section.ref("ȳ_b", section.stepId("blank_mean"))), b.inputs("y_b")), s.sd(), b.unit(),
                null);
        if (b.censored() > 0) {
            section.warning(b.censored() + " censored blank result(s) were left out of the blank mean and SD "
                    + "(censored: drop): the methods using them see only the numeric blanks, which understates "
                    + "the blank spread if the censored ones were low.");
        }
        blankSummary = s;
        return s;
    }

    static List<StepInput> concat(List<StepInput> a, List<StepInput> b) {
        List<StepInput> all = new ArrayList<>(a);
        all.addAll(b);
        return all;
    }
}
