package org.meritbook.analysis.unknowns;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.InternalStandard;
import org.meritbook.analysis.MeasuredRows;
import org.meritbook.analysis.MeasuredRows.Request;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisCell;
import org.meritbook.workbook.CellValue;

/**
 * An unknowns cell's options, checked: the sample and response columns, how readings are
 * grouped, the preparation (mass, volume, dilution: columns or constants), the QCs' known values,
 * the result's unit and the detection-limit cell whose LOQ applies.
 */
final class UnknownsOptions {
    static final int SAMPLE = 0;
    static final int Y = 1;
    static final int VOLUME = -1;
    static final int MASS = -2;
    static final int DILUTION = -3;

    private final AnalysisCell cell;
    private final boolean eachReading;
    private final PreparationValue volume;
    private final PreparationValue mass;
    private final PreparationValue dilution;
    private final String known;
    private final String resultUnit;
    private final String limits;
    private final List<Request> requests = new ArrayList<>();
    private int volumeIndex = -1;
    private int massIndex = -1;
    private int dilutionIndex = -1;
    private int knownIndex = -1;
    private int internalStandardIndex = -1;
    private final String internalStandard;
    private final int internalStandardLine;

    private UnknownsOptions(AnalysisCell cell, AnalysisContext context) {
        this.cell = cell;
        this.eachReading = cell.option("replicates").map(v -> v.text().equals("each")).orElse(false);
        this.volume = prep(cell, context, "volume");
        this.mass = prep(cell, context, "mass");
        this.dilution = prep(cell, context, "dilution");
        this.known = cell.option("known").map(v -> v.text()).orElse(null);
        this.resultUnit = cell.option("result-unit").map(v -> v.text().strip()).orElse(null);
        this.limits = cell.option("limits").map(v -> v.text()).orElse(null);
        this.internalStandard = cell.option(InternalStandard.OPTION).map(v -> v.text()).orElse(null);
        this.internalStandardLine = cell.lineOf(InternalStandard.OPTION);
        if ((volume == null) != (mass == null)) {
            String missing = volume == null ? "volume" : "mass";
            throw new InputException(ErrorKey.MISSING_OPTION, context.where(cell.lineOf(volume == null ? "mass" : "volume")),
                    "both 'mass:' and 'volume:' to give the result in the sample's units", "no '" + missing + ":'",
                    "Add '" + missing + ":' (a column or a value with its unit), or remove the other.");
        }
        if (dilution != null && volume == null) {
            // x₀ is the measured solution's concentration; only the content in the sample is scaled by D
            throw new InputException(ErrorKey.MISSING_OPTION, context.where(cell.lineOf("dilution")),
                    "'mass:' and 'volume:' beside 'dilution:' (the dilution scales the content in the sample, "
                            + "c = x₀ · V · D / m)", "'dilution:' without them, which would leave every result and QC "
                            + "deviation unscaled", "Add the test portion's mass and the extract's volume, or remove "
                            + "'dilution:' and read the samples back as measured (x₀, the solution's concentration).");
        }
        if (resultUnit != null && !SampleUnits.isResultUnit(resultUnit)) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(cell.lineOf("result-unit")),
                    "result-unit: one of " + SampleUnits.resultUnits(), "'" + resultUnit + "'",
                    "Write one of these units.");
        }
        if (resultUnit != null && volume == null) {
            throw new InputException(ErrorKey.MISSING_OPTION, context.where(cell.lineOf("result-unit")),
                    "'mass:' and 'volume:' for a result in " + resultUnit, "neither",
                    "Add the test portion's mass and the extract's volume, or remove 'result-unit:'.");
        }
        requests.add(Request.label("sample", cell.options().get("sample").text()));
        requests.add(Request.number("y", cell.options().get("y").text()));
        volumeIndex = addColumn(volume);
        massIndex = addColumn(mass);
        dilutionIndex = addColumn(dilution);
        if (known != null) {
            knownIndex = requests.size();
            requests.add(Request.label("known", known)); // blank for samples, a number for QCs
        }
        if (internalStandard != null) {
            internalStandardIndex = requests.size();
            // Read as a label and checked by InternalStandard: a censored internal standard is never dropped.
            requests.add(Request.label(InternalStandard.OPTION, internalStandard));
        }
    }

    static UnknownsOptions of(AnalysisCell cell, AnalysisContext context) {
        return new UnknownsOptions(cell, context);
    }

    private int addColumn(PreparationValue p) {
        if (p == null || !p.isColumn()) {
            return -1;
        }
        requests.add(Request.number(p.option(), p.column()));
        return requests.size() - 1;
    }

    private static PreparationValue prep(AnalysisCell cell, AnalysisContext context, String option) {
        return cell.option(option).map(v -> PreparationValue.parse(option, v, context.where(v.line()))).orElse(null);
    }

    List<Request> requests() {
        return List.copyOf(requests);
    }

    boolean eachReading() {
        return eachReading;
    }

    boolean converts() {
        return volume != null;
    }

    PreparationValue volume() {
        return volume;
    }

    PreparationValue mass() {
        return mass;
    }

    PreparationValue dilution() {
        return dilution;
    }

    String known() {
        return known;
    }

    int knownIndex() {
        return knownIndex;
    }

    String limits() {
        return limits;
    }

    /** The internal-standard column as written, or null when the response is used as read. */
    String internalStandard() {
        return internalStandard;
    }

    int internalStandardIndex() {
        return internalStandardIndex;
    }

    int internalStandardLine() {
        return internalStandardLine;
    }

    private int index(int slot) {
        return switch (slot) {
            case VOLUME -> volumeIndex;
            case MASS -> massIndex;
            case DILUTION -> dilutionIndex;
            default -> throw new IllegalArgumentException("slot " + slot);
        };
    }

    /** The row's volume, mass or dilution: its column's number, the constant, or 1 when not given. */
    double value(MeasuredRows.Row row, PreparationValue p, int slot) {
        if (p == null) {
            return 1.0;
        }
        double v = p.isColumn() ? row.number(index(slot)) : p.constant();
        if (!(v > 0)) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, row.cell(index(slot)).ref().address(),
                    "a positive " + p.option(), "'" + row.cell(index(slot)).raw() + "'",
                    "Correct the cell, or exclude the row with a reason.");
        }
        return v;
    }

    /** Where a group's volume, mass or dilution came from: its first row's cell, or the option. */
    String source(UnknownsAnalysis.Group g, PreparationValue p, int slot) {
        if (p == null) {
            return "no dilution given (1)";
        }
        return p.isColumn() ? g.rows().get(0).cell(index(slot)).ref().address()
                : "option " + p.option() + " (" + cell.id() + ", line " + p.line() + ")";
    }

    String volumeUnit(MeasuredRows rows) {
        return volume.isColumn() ? rows.columns().get(volumeIndex).unit() : volume.unit();
    }

    String massUnit(MeasuredRows rows) {
        return mass.isColumn() ? rows.columns().get(massIndex).unit() : mass.unit();
    }

    /** The result's unit: as written, else the QCs' known-value unit when it is a content, else mg/kg. */
    String resultUnit(String knownUnit) {
        if (resultUnit != null) {
            return resultUnit;
        }
        return knownUnit != null && SampleUnits.isResultUnit(knownUnit) ? knownUnit : "mg/kg";
    }

    /** A group's known value: one number over its rows, none when every cell is empty. */
    Double known(MeasuredRows rows, List<MeasuredRows.Row> group, AnalysisContext context) {
        if (knownIndex < 0) {
            return null;
        }
        Double value = null;
        for (MeasuredRows.Row r : group) {
            CellValue v = r.cell(knownIndex);
            if (v.kind() == CellValue.Kind.BLANK) {
                continue;
            }
            String where = rows.block().file().getFileName() + ", " + v.ref().address();
            if (!v.isNumber() || !(v.number() > 0)) {
                throw new InputException(ErrorKey.NOT_A_NUMBER, where, "a positive known value in column '"
                        + rows.columns().get(knownIndex).header() + "' (empty for samples that are not QCs)",
                        "'" + v.raw() + "'", "Correct the cell, or leave it empty for a sample without a known value.");
            }
            if (value != null && value != v.number()) {
                throw new InputException(ErrorKey.BAD_OPTION_VALUE, where, "one known value per QC sample",
                        "'" + v.raw() + "' beside " + value + " in the rows above",
                        "Give every reading of the QC the same known value.");
            }
            value = v.number();
        }
        return value;
    }

    String knownSource(UnknownsAnalysis.Group g) {
        return g.rows().stream().map(r -> r.cell(knownIndex)).filter(CellValue::isNumber).findFirst()
                .map(v -> v.ref().address()).orElse("column " + known);
    }
}
