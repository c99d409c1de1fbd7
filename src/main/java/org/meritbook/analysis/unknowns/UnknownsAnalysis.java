package org.meritbook.analysis.unknowns;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.meritbook.analysis.Analysis;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.InternalStandard;
import org.meritbook.analysis.LloqLevel;
import org.meritbook.analysis.LloqLevels;
import org.meritbook.analysis.MeasuredRows;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.TableCell;
import org.meritbook.analysis.calibration.CalibrationLine;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.Interval;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.regression.InversePrediction;
import org.meritbook.stats.regression.LineModel;
import org.meritbook.stats.regression.Weighting;
import org.meritbook.study.AnalysisCell;
import org.meritbook.trail.StepInput;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;

/**
 * Samples and QCs read back through an earlier straight-line calibration (DESIGN §4, issue
 * "Linear range, unknowns and QC samples"). Readings of one sample and preparation are averaged
 * (m readings) and read back as x₀ = (ȳ₀ − a)/b with s(x₀) by the inverse-prediction formula of
 * {@link InversePrediction}; with mass, volume and dilution the result is also given in the
 * sample's units. A sample outside the calibrated span is flagged and not converted (a QC is flagged and
 * still judged by its deviation); with
 * {@code limits:} a sample below the LOQ is reported as such.
 */
public final class UnknownsAnalysis implements Analysis {
    static final double LEVEL = 0.95;

    @Override
    public SectionResult run(AnalysisCell cell, AnalysisContext context) {
        CalibrationLine line = context.earlier(cell, "calibration", CalibrationLine.class, CalibrationLine.DESCRIPTION);
        SectionResult calibration = context.earlierSection(cell, "calibration");
        UnknownsOptions options = UnknownsOptions.of(cell, context);
        MeasuredRows rows = MeasuredRows.read(cell, context, "data", options.requests());
        MeasuredRows.requireAllClaimed(cell, context, List.of(rows));
        checkInternalStandard(cell, context, options, rows, line);
        Units units = units(cell, context, options, rows, line);
        Optional<Quantity> loq = options.limits() == null ? Optional.empty()
                : Optional.of(loq(cell, context, units, line));

        SectionBuilder section = new SectionBuilder(cell);
        section.setting("Calibration", "'" + line.cellId() + "', " + line.fit().weighting().notation() + " weighting, "
                + line.fit().n() + " standards, calibrated span " + plain(line.xLow()) + " to " + plain(line.xHigh())
                + unitSuffix(line.xUnit()));
        section.setting("Readings", options.eachReading()
                ? "each reading read back alone (replicates: each)"
                : "the readings of one sample and preparation averaged, then read back (replicates: together)",
                options.eachReading() ? "each" : "together");
        if (units.convert()) {
            section.setting("Result in the sample", "content = x₀ · V · D / m in " + units.result() + "; V "
                    + options.volume().describe() + ", m " + options.mass().describe() + ", D "
                    + (options.dilution() == null ? "1" : options.dilution().describe())
                    + " (taken as exact: s and the interval scale by the same factor)");
        }
        if (line.ratio()) {
            section.setting("Response", "ratio to the internal standard, y = A / A_IS: '"
                    + rows.columns().get(UnknownsOptions.Y).header() + "' / '"
                    + rows.columns().get(options.internalStandardIndex()).header() + "' in each row, as in '"
                    + line.cellId() + "' ('" + line.internalStandard() + "')", InternalStandard.OPTION);
        }
        section.setting("Confidence level", "95 %");

        Map<String, Group> groups = groups(rows, options, context, cell);
        Map<Integer, Group> groupOfRow = new LinkedHashMap<>();
        Map<String, String> notes = new LinkedHashMap<>();
        Map<String, Double> qcs = new LinkedHashMap<>(); // known value by QC sample
        for (Group g : groups.values()) {
            g.rows().forEach(r -> groupOfRow.put(r.index(), g));
            if (g.known() != null) {
                qcs.put(g.label(), g.known());
                section.nominal(g.label(), g.known()); // every QC, read back or not: a run's QCs are counted from it
            }
            notes.put(g.label(), readBack(section, g, line, calibration, units, loq, options, rows.columns()));
        }
        lloq(cell, context, qcs, line, units).ifPresent(l -> LloqLevels.record(section, l));
        return section.build(table(rows, groupOfRow, notes, section, units));
    }

    /**
     * The QC samples at the LLOQ: named in the cell, else those whose known value is the calibration's
     * lowest standard above zero, when the QCs are compared in the calibration's own unit (a known value
     * in the sample's unit is not a standard's concentration) and that standard is the lowest planned
     * (with the run's lowest standard excluded, a low QC at the next one is not an LLOQ QC).
     */
    private static Optional<LloqLevel> lloq(AnalysisCell cell, AnalysisContext context, Map<String, Double> qcs,
                                            CalibrationLine line, Units units) {
        Optional<LloqLevel> named = LloqLevels.named(cell, context, qcs.keySet(),
                "QC samples (samples with a known value)");
        OptionalDouble lowest = line.lowestStandardAboveZero();
        if (qcs.isEmpty() || units.convert() || lowest.isEmpty()) {
            return named;
        }
        String unit = unitSuffix(line.xUnit());
        double planned = line.lowestPlannedAboveZero();
        if (planned < lowest.getAsDouble()) {
            return Optional.of(named.orElse(new LloqLevel(List.of(), "the lowest standard above zero of calibration '"
                    + line.cellId() + "' (" + plain(planned) + unit + ") is excluded from its fit, so no QC is taken "
                    + "for an LLOQ QC; name them with '" + LloqLevels.OPTION + ":' if the run's LLOQ stands")));
        }
        LloqLevel found = LloqLevels.atLowestStandard(qcs, lowest.getAsDouble(), "the lowest standard above zero of "
                + "calibration '" + line.cellId() + "' (" + plain(lowest.getAsDouble()) + unit + ")");
        // A QC at the LLOQ's concentration is an LLOQ QC whether or not the cell's list names it.
        return Optional.of(named.map(n -> LloqLevels.union(n, found)).orElse(found));
    }

    /** One sample as read back: its readings (used rows), preparation and known value. */
    record Group(String label, List<MeasuredRows.Row> rows, double volume, double mass, double dilution, Double known,
                 List<String> sources) {
    }

    /** Units in force: concentration (x), result (null when not converted), conversion factor. */
    record Units(String x, String result, double factor, String known, String volume, String mass) {
        boolean convert() {
            return result != null;
        }
    }

    private static Map<String, Group> groups(MeasuredRows rows, UnknownsOptions options, AnalysisContext context,
                                             AnalysisCell cell) {
        Map<String, List<MeasuredRows.Row>> byKey = new LinkedHashMap<>();
        Map<String, Integer> preparations = new LinkedHashMap<>();
        Map<String, String> labelOf = new LinkedHashMap<>();
        for (MeasuredRows.Row r : rows.used()) {
            String sample = r.label(UnknownsOptions.SAMPLE);
            if (sample.isEmpty()) {
                throw new InputException(ErrorKey.NOT_A_NUMBER, rows.block().file().getFileName() + ", "
                        + r.cell(UnknownsOptions.SAMPLE).ref().address(), "a sample name in column '"
                        + rows.columns().get(UnknownsOptions.SAMPLE).header() + "'", "an empty cell",
                        "Enter the sample's name, or exclude the row with a reason.");
            }
            double v = options.value(r, options.volume(), UnknownsOptions.VOLUME);
            double m = options.value(r, options.mass(), UnknownsOptions.MASS);
            double d = options.value(r, options.dilution(), UnknownsOptions.DILUTION);
            String prep = sample + "\u0000" + v + "\u0000" + m + "\u0000" + d
                    + (options.eachReading() ? "\u0000" + r.index() : "");
            if (!byKey.containsKey(prep)) {
                int k = preparations.merge(sample, 1, Integer::sum);
                String label = options.eachReading() ? sample + " (" + r.cell(UnknownsOptions.Y).ref().a1() + ")"
                        : k == 1 ? sample
                        : sample + " (" + (d == 1 ? "preparation " + k : "dilution " + PreparationValue.stripped(d)) + ")";
                labelOf.put(prep, label);
                byKey.put(prep, new ArrayList<>());
            }
            byKey.get(prep).add(r);
        }
        Map<String, Group> groups = new LinkedHashMap<>();
        for (var e : byKey.entrySet()) {
            List<MeasuredRows.Row> rs = e.getValue();
            MeasuredRows.Row first = rs.get(0);
            Double known = options.known(rows, rs, context);
            List<String> sources = rs.stream().map(r -> r.cell(UnknownsOptions.Y).ref().address()).toList();
            groups.put(labelOf.get(e.getKey()), new Group(labelOf.get(e.getKey()), rs,
                    options.value(first, options.volume(), UnknownsOptions.VOLUME),
                    options.value(first, options.mass(), UnknownsOptions.MASS),
                    options.value(first, options.dilution(), UnknownsOptions.DILUTION), known, sources));
        }
        return groups;
    }

    /** Records one sample's steps and quantities; returns the table's note for it ("" when none). */
    private static String readBack(SectionBuilder section, Group g, CalibrationLine line, SectionResult calibration,
                                   Units units, Optional<Quantity> loq, UnknownsOptions options, List<Column> columns) {
        String id = g.label();
        double[] y = new double[g.rows().size()];
        List<String> sources = new ArrayList<>(g.sources());
        for (int i = 0; i < y.length; i++) {
            MeasuredRows.Row r = g.rows().get(i);
            y[i] = r.number(UnknownsOptions.Y);
            if (options.internalStandard() != null) {
                int is = options.internalStandardIndex();
                CellValue analyte = r.cell(UnknownsOptions.Y);
                sources.set(i, InternalStandard.record(section, analyte.ref().a1(), analyte,
                        columns.get(UnknownsOptions.Y).unit(), r.cell(is), columns.get(is).unit()));
                y[i] = analyte.number() / r.cell(is).number();
            }
        }
        List<StepInput> readings = new ArrayList<>();
        for (int i = 0; i < y.length; i++) {
            readings.add(StepInput.number("y" + (i + 1), y[i], line.yUnit(), sources.get(i)));
        }
        InversePrediction ip;
        try {
            ip = InversePrediction.of(line.fit(), y);
        } catch (UnusableDataException e) {
            section.warning("Sample " + id + ": not read back, because " + e.getMessage() + ".");
            return "not read back: " + e.getMessage();
        }
        String mean = section.step("mean_response:" + id, "Mean response of " + id, "ȳ₀ = Σyᵢ / m, m = " + y.length,
                readings, ip.meanResponse(), line.yUnit(), null);
        Quantity slope = CalibrationLine.quantity(calibration, "slope");
        List<StepInput> x0In = new ArrayList<>(List.of(section.ref("ȳ₀", mean)));
        if (line.fit().model() == LineModel.WITH_INTERCEPT) {
            x0In.add(SectionBuilder.fromEarlier("a", CalibrationLine.quantity(calibration, "intercept")));
        }
        x0In.add(SectionBuilder.fromEarlier("b", slope));
        String x0Id = section.quantity(QuantityDraft.of("x0:" + id, "Concentration read back, " + id,
                line.fit().model() == LineModel.WITH_INTERCEPT ? "x₀ = (ȳ₀ − a) / b" : "x₀ = ȳ₀ / b",
                x0In, ip.x0(), line.xUnit()).withInterval(ip.interval(LEVEL)).withMethod(
                        "inverse prediction (Miller & Miller, Statistics and Chemometrics, ch. 5)"));
        List<StepInput> seIn = List.of(section.ref("x₀", x0Id),
                SectionBuilder.fromEarlier("s(y/x)", CalibrationLine.quantity(calibration, "residual_sd")),
                SectionBuilder.fromEarlier("b", slope),
                StepInput.number("m", y.length, null, "readings of " + id),
                StepInput.number("n", line.fit().n(), null, "standards in '" + line.cellId() + "'"),
                StepInput.number("w₀", ip.weightAtX0(), null, line.fit().weighting() == Weighting.INVERSE_VARIANCE
                        ? "weight at x₀: 1/s(x₀)², s(x₀) interpolated linearly between the replicate SDs of the two "
                        + "levels of '" + line.cellId() + "' around x₀ (the end level's SD beyond them), scaled as the "
                        + "calibration's weights (average 1)"
                        : "weight at x₀ (" + line.fit().weighting().notation() + ", weights scaled to average 1)"));
        String seFormula = line.fit().model() == LineModel.WITH_INTERCEPT
                ? "s(x₀) = (s(y/x)/|b|)·√(1/(w₀·m) + 1/Σw + (ȳ₀ − ȳw)²/(b²·Σwᵢ(xᵢ − x̄w)²))"
                : "s(x₀) = (s(y/x)/|b|)·√(1/(w₀·m) + ȳ₀²/(b²·Σwᵢxᵢ²))";
        String seId = section.quantity(QuantityDraft.of("x0_se:" + id, "Standard error of x₀, " + id, seFormula,
                seIn, ip.standardError(), line.xUnit()));
        Interval ci = ip.interval(LEVEL);
        double t = ip.degreesOfFreedom() > 0 ? (ci.high() - ip.x0()) / ip.standardError() : Double.NaN;
        List<StepInput> ciIn = List.of(section.ref("x₀", x0Id), section.ref("s(x₀)", seId),
                StepInput.number("t", Double.isFinite(t) ? t : 0, null, "t(0.975; " + ip.degreesOfFreedom() + ")"));
        section.quantity(QuantityDraft.of("x0_ci_low:" + id, "Lower 95 % limit of x₀, " + id,
                "x₀ − t·s(x₀)", ciIn, ci.low(), line.xUnit()));
        section.quantity(QuantityDraft.of("x0_ci_high:" + id, "Upper 95 % limit of x₀, " + id,
                "x₀ + t·s(x₀)", ciIn, ci.high(), line.xUnit()));

        List<String> notes = new ArrayList<>();
        boolean outside = ip.x0() < line.xLow() || ip.x0() > line.xHigh();
        // A QC is judged by its deviation wherever it reads: an LLOQ QC a few % low reads below the lowest
        // standard, and a QC far outside the span is a failed QC, never one left unjudged.
        boolean qc = g.known() != null;
        if (outside) {
            boolean above = ip.x0() > line.xHigh();
            String where = String.format(Locale.ROOT, "%s %s reads %s%s, %s standard of '%s' (%s%s): it is outside the "
                            + "calibrated span", qc ? "QC" : "Sample", id, plain(ip.x0()), unitSuffix(line.xUnit()),
                    above ? "above the highest" : "below the lowest", line.cellId(),
                    plain(above ? line.xHigh() : line.xLow()), unitSuffix(line.xUnit()));
            section.warning(qc ? where + "; as a QC it is still judged by its deviation from the known value, read "
                    + "beyond the span. Check the run against its QC acceptance."
                    : where + ", so no result is reported from it (never extrapolated). "
                    + (above ? "Dilute it and run it again." : "Report it as below the lowest standard, or concentrate it."));
            notes.add(qc ? "outside the calibrated span: judged as a QC" : "outside the calibrated span: not reported");
        }
        String resultId = x0Id;
        double result = ip.x0();
        String resultUnit = line.xUnit();
        if (units.convert() && (!outside || qc)) {
            List<StepInput> in = new ArrayList<>(List.of(section.ref("x₀", x0Id),
                    StepInput.number("V", g.volume(), units.volume(), options.source(g, options.volume(), UnknownsOptions.VOLUME)),
                    StepInput.number("m", g.mass(), units.mass(), options.source(g, options.mass(), UnknownsOptions.MASS)),
                    StepInput.number("D", g.dilution(), null, options.source(g, options.dilution(), UnknownsOptions.DILUTION)),
                    StepInput.number("f", units.factor(), null, "unit conversion to " + units.result())));
            double scale = g.volume() * g.dilution() / g.mass() * units.factor();
            result = ip.x0() * scale;
            Interval contentCi = new Interval(ci.low() * scale, ci.high() * scale, LEVEL);
            resultId = section.quantity(QuantityDraft.of("content:" + id, "Content in the sample, " + id,
                    "c = x₀ · V · D / m · f", in, result, units.result()).withInterval(contentCi));
            section.quantity(QuantityDraft.of("content_se:" + id, "Standard error of the content, " + id,
                    "s(c) = s(x₀) · V · D / m · f", List.of(section.ref("s(x₀)", seId), section.ref("c", resultId),
                            section.ref("x₀", x0Id)), ip.standardError() * scale, units.result()));
            resultUnit = units.result();
        }
        if (loq.isPresent() && !outside) {
            Quantity limit = loq.get();
            boolean inSolution = java.util.Objects.equals(limit.unit(), line.xUnit());
            double compared = inSolution ? ip.x0() : result;
            if (compared < limit.value()) {
                section.warning(String.format(Locale.ROOT, "Sample %s is below the LOQ (%s%s < %s%s): report it as "
                        + "below the limit of quantitation, not as a number.", id, plain(compared),
                        unitSuffix(limit.unit()), plain(limit.value()), unitSuffix(limit.unit())));
                notes.add("below the LOQ (" + plain(limit.value()) + unitSuffix(limit.unit()) + ")");
            }
        }
        if (qc) {
            double known = g.known();
            section.quantity(QuantityDraft.of("qc_deviation_percent:" + id, "QC deviation from its known value, " + id,
                    "(result − known) / known × 100", List.of(section.ref("result", resultId),
                            StepInput.number("known", known, units.known(), options.knownSource(g))),
                    (result - known) / known * 100.0, "%").inSummary());
            if (units.known() != null && resultUnit != null && !units.known().equals(resultUnit)) {
                throw new IllegalStateException("known and result units were checked to agree");
            }
        }
        return String.join("; ", notes);
    }

    /**
     * A calibration on ratios reads back only ratios, and a ratio only through such a calibration: either
     * mismatch is refused, never repaired silently. Every used internal-standard cell must hold a positive number.
     */
    private static void checkInternalStandard(AnalysisCell cell, AnalysisContext context, UnknownsOptions options,
                                              MeasuredRows rows, CalibrationLine line) {
        if (line.ratio() && options.internalStandard() == null) {
            throw new InputException(ErrorKey.MISSING_OPTION, context.where(cell.lineOf("calibration")),
                    "'" + InternalStandard.OPTION + ":' naming the samples' internal-standard column, since calibration '"
                            + line.cellId() + "' uses the ratio to its internal standard ('" + line.internalStandard() + "')",
                    "no '" + InternalStandard.OPTION + ":'",
                    "Add '" + InternalStandard.OPTION + ": <column>' so the samples are read back as the same ratio.");
        }
        if (!line.ratio() && options.internalStandard() != null) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(options.internalStandardLine()),
                    "a calibration whose response is the ratio to an internal standard",
                    "calibration '" + line.cellId() + "' fits the responses as read",
                    "Remove '" + InternalStandard.OPTION + ":' here, or add it to the calibration cell as well.");
        }
        if (options.internalStandard() == null) {
            return;
        }
        int is = options.internalStandardIndex();
        List<CellValue> cells = rows.used().stream().map(r -> r.cell(is)).toList();
        List<org.meritbook.error.Problem> problems = InternalStandard.problems(rows.block().file(),
                rows.columns().get(is), cells, context.where(options.internalStandardLine()));
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
    }

    private static DataTable table(MeasuredRows rows, Map<Integer, Group> groupOfRow, Map<String, String> notes,
                                   SectionBuilder section, Units units) {
        // The columns the cell reads, not the whole block: a sheet's notes and types would push the results off the page.
        List<String> headers = new ArrayList<>();
        for (Column c : rows.columns()) {
            headers.add(c.header());
        }
        headers.add("x₀" + unitSuffixParen(units.x()));
        if (units.convert()) {
            headers.add("Content (" + units.result() + ")");
        }
        headers.add("Flag"); // QC deviations are in the results and the summary: the table must fit the page
        List<DataTable.Row> out = new ArrayList<>();
        for (MeasuredRows.Row r : rows.rows()) {
            List<TableCell> cells = new ArrayList<>();
            for (CellValue v : r.cells()) {
                cells.add(TableCell.raw(v.raw(), v.ref().address()));
            }
            Group g = groupOfRow.get(r.index());
            String id = g == null ? null : g.label();
            cells.add(computed(section, id == null ? null : "x0:" + id));
            if (units.convert()) {
                cells.add(computed(section, id == null ? null : "content:" + id));
            }
            cells.add(TableCell.raw(id == null ? "" : notes.getOrDefault(id, ""), null));
            out.add(new DataTable.Row(id == null ? r.label(UnknownsOptions.SAMPLE) : id, cells, r.exclusionReason()));
        }
        return new DataTable(headers, out);
    }

    private static TableCell computed(SectionBuilder section, String name) {
        return name != null && section.hasQuantity(name) ? TableCell.computed(name) : TableCell.raw("", null);
    }

    private static Units units(AnalysisCell cell, AnalysisContext context, UnknownsOptions options, MeasuredRows rows,
                               CalibrationLine line) {
        String known = options.known() == null ? null : rows.columns().get(options.knownIndex()).unit();
        if (!options.converts()) {
            checkKnownUnit(cell, context, known, line.xUnit());
            return new Units(line.xUnit(), null, 1, known, null, null);
        }
        String result = options.resultUnit(known);
        String volumeUnit = options.volumeUnit(rows);
        String massUnit = options.massUnit(rows);
        Optional<Double> factor = SampleUnits.factor(line.xUnit(), volumeUnit, massUnit, result);
        if (factor.isEmpty()) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(cell.lineOf("mass")),
                    "units meritbook can convert: a concentration in mass per volume (calibration '" + line.cellId()
                            + "'), a volume in L, mL or µL, a mass in g, mg or kg, and a result in " + SampleUnits.resultUnits(),
                    "concentration '" + line.xUnit() + "', volume '" + volumeUnit + "', mass '" + massUnit
                            + "', result '" + result + "'",
                    "State the units in the column headers ('Mass (g)') or with the constants ('mass: 5.00 g'), "
                            + "and the result's unit with 'result-unit:'.");
        }
        checkKnownUnit(cell, context, known, result);
        return new Units(line.xUnit(), result, factor.get(), known, volumeUnit, massUnit);
    }

    private static void checkKnownUnit(AnalysisCell cell, AnalysisContext context, String known, String result) {
        if (known != null && result != null && !known.equals(result)) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(cell.lineOf("known")),
                    "known values in the unit of the result (" + result + ")", "'" + known + "'",
                    "Give the QCs' known values in " + result + ", or state the result's unit (mass:, volume: and "
                            + "result-unit:) so that both agree.");
        }
    }

    private static Quantity loq(AnalysisCell cell, AnalysisContext context, Units units, CalibrationLine line) {
        SectionResult limits = context.earlierSection(cell, "limits");
        Quantity loq = limits.quantity("loq").orElseThrow(() -> new InputException(ErrorKey.UNKNOWN_REFERENCE,
                context.where(cell.lineOf("limits")), "a cell that reports an LOQ (a detection-limit cell)",
                "cell '" + limits.id() + "' (" + limits.kind().keyword() + ") reports none",
                "Name the detection-limit cell whose LOQ applies to these samples."));
        boolean comparable = java.util.Objects.equals(loq.unit(), line.xUnit())
                || (units.convert() && java.util.Objects.equals(loq.unit(), units.result()));
        if (!comparable) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(cell.lineOf("limits")),
                    "an LOQ in the unit of x₀ (" + line.xUnit() + ")" + (units.convert() ? " or of the result ("
                            + units.result() + ")" : ""),
                    "'" + limits.id() + "' gives its LOQ in " + loq.unit(),
                    "Name a detection-limit cell whose LOQ is in one of these units.");
        }
        return loq;
    }

    static String plain(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }

    private static String unitSuffix(String unit) {
        return unit == null ? "" : " " + unit;
    }

    private static String unitSuffixParen(String unit) {
        return unit == null ? "" : " (" + unit + ")";
    }
}
