package org.meritbook.dossier;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.ResultTable;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Setting;
import org.meritbook.analysis.TableCell;
import org.meritbook.analysis.Verdict;
import org.meritbook.dossier.SectionView.CellView;
import org.meritbook.dossier.SectionView.ColumnView;
import org.meritbook.dossier.SectionView.Exclusion;
import org.meritbook.dossier.SectionView.FigureView;
import org.meritbook.dossier.SectionView.ResultCell;
import org.meritbook.dossier.SectionView.ResultColumn;
import org.meritbook.dossier.SectionView.ResultRow;
import org.meritbook.dossier.SectionView.ResultTableView;
import org.meritbook.dossier.SectionView.SettingRow;
import org.meritbook.dossier.SectionView.TableRow;
import org.meritbook.dossier.SectionView.TableView;
import org.meritbook.dossier.SectionView.VerdictRow;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.Thinning;
import org.meritbook.trail.Step;

/** Builds one {@link SectionView} from a section result: table, figures, results, verdicts, warnings. */
final class SectionViewBuilder {
    /** A column name up to this long stays on one line in the header; a longer one wraps at its spaces. */
    private static final int SHORT_HEADER = 16;
    /** A result table with more columns than this is set in a smaller font to keep within A4. */
    private static final int WIDE_TABLE = 6;
    private final DisplayFormatter format;
    private final FigureArt figureArt;
    private final TrailViewBuilder trail;
    /** Attachment names by alias, to name the file a summarised data table is attached as. */
    private final Map<String, String> attachments;

    SectionViewBuilder(DisplayFormatter format, FigureArt figureArt, TrailViewBuilder trail,
                       Map<String, String> attachments) {
        this.format = format;
        this.figureArt = figureArt;
        this.trail = trail;
        this.attachments = Map.copyOf(attachments);
    }

    SectionView build(String number, String anchor, SectionResult r, Markup before, Markup after) {
        return build(number, anchor, r, before, after, false);
    }

    /** The section; a supporting cell's verdicts say beside them that they are not counted. */
    SectionView build(String number, String anchor, SectionResult r, Markup before, Markup after, boolean supporting) {
        Set<String> inTable = new HashSet<>();
        TableView table = table(number, r, inTable);
        List<ResultTableView> tables = new ArrayList<>();
        for (ResultTable t : r.tables()) {
            int n = tables.size() + (table.present() ? 2 : 1);
            tables.add(resultTable(number, anchor + "-table-" + n, n, r, t));
        }
        List<FigureView> figures = new ArrayList<>();
        int f = 0;
        for (FigureSpec spec : r.figures()) {
            f++;
            FigureSpec drawn = Thinning.of(spec);
            String caption = spec.title() == null ? spec.id() : spec.title();
            String thinned = Thinning.describe(spec, drawn);
            if (!thinned.isEmpty()) {
                caption += ". Thinned for drawing (" + thinned + "): in each of " + Thinning.COLUMNS
                        + " columns of the x range the lowest and the highest point are drawn; the statistics use every point";
            }
            figures.add(new FigureView("Figure " + number + "." + f, anchor + "-fig-" + f, caption,
                    figureArt.placeholder(drawn)));
        }
        List<ResultRow> results = new ArrayList<>();
        for (Quantity q : r.quantities()) {
            if (inTable.contains(q.name())) {
                continue; // per-point values are read in the data table, not repeated here
            }
            DisplayFormatter.Formatted v = format.quantity(q);
            TrailViewBuilder.StepRef ref = trail.ref(q.stepId());
            results.add(new ResultRow(q.label(), q.name(), v.withUnit(), v.uncertainty(), ref.number(),
                    ref.anchor()));
        }
        List<VerdictRow> verdicts = new ArrayList<>();
        for (Verdict v : r.verdicts()) {
            verdicts.add(new VerdictRow(v.characteristic(), v.rule(), Verdicts.view(v, supporting)));
        }
        List<SettingRow> settings = new ArrayList<>();
        for (Setting s : r.settings()) {
            settings.add(new SettingRow(s.label(), s.value()));
        }
        return new SectionView(number, anchor, r.id(), r.kind().keyword(), title(r), before, after, settings, table,
                tables, figures, results, verdicts, r.warnings(), true);
    }

    static String title(SectionResult r) {
        return r.title() == null || r.title().isBlank() ? r.id() : r.title();
    }

    private TableView table(String number, SectionResult r, Set<String> inTable) {
        DataTable t = r.table();
        if (t == null) {
            return TableView.none();
        }
        CellGrid grid = CellGrid.of(t);
        List<TableRow> rows = new ArrayList<>();
        List<Exclusion> exclusions = new ArrayList<>();
        boolean summarised = DataTableCsv.summarised(t);
        int n = t.rows().size();
        for (int i = 0; i < n; i++) {
            DataTable.Row row = t.rows().get(i);
            boolean printed = !summarised || i < DataTableCsv.SHOWN_AT_EACH_END || i >= n - DataTableCsv.SHOWN_AT_EACH_END;
            List<CellView> cells = new ArrayList<>();
            for (int j = 0; j < row.cells().size(); j++) {
                // Every cell is visited, printed or not: a computed value marks its quantity as shown in the table.
                CellView c = cell(r, row.cells().get(j), grid.addressShown(j), inTable);
                if (printed) {
                    cells.add(c);
                }
            }
            String label = row.label() == null ? "" : row.label();
            String mark = "";
            if (row.excluded()) {
                mark = "E" + (exclusions.size() + 1);
                String where = grid.compact() ? "Point " + label + " (sheet row " + grid.row(i) + ")" : "Row " + label;
                exclusions.add(new Exclusion(mark, where, row.exclusionReason()));
            }
            if (printed) {
                rows.add(new TableRow(label, grid.compact() ? grid.row(i) : "", cells, row.excluded(), mark));
            }
        }
        List<ColumnView> columns = new ArrayList<>();
        for (int j = 0; j < t.headers().size(); j++) {
            String note = grid.computed(j) ? "computed" : grid.compact() ? grid.letter(j) : "";
            String header = t.headers().get(j) == null ? "" : t.headers().get(j);
            int unit = header.lastIndexOf(" (");
            boolean hasUnit = unit > 0 && header.endsWith(")");
            String name = hasUnit ? header.substring(0, unit) : header;
            columns.add(new ColumnView(header, name, hasUnit ? header.substring(unit + 1) : "", note, grid.computed(j),
                    grid.text(j), name.length() <= SHORT_HEADER));
        }
        String namedBy = grid.labelColumn();
        boolean labels = !grid.compact() || namedBy.isEmpty();
        StringBuilder caption = new StringBuilder("Table " + number + ".1 ");
        if (summarised) {
            String file = attachments.getOrDefault(DataTableCsv.alias(r), "");
            caption.append(String.format(Locale.ROOT, "Summary of the data as read%s: %,d rows, of which the first %d and the "
                    + "last %d are printed. The full table, every value with its workbook cell, is attached to the PDF as %s",
                    grid.compact() ? " from " + grid.range() : "", n, DataTableCsv.SHOWN_AT_EACH_END,
                    DataTableCsv.SHOWN_AT_EACH_END, file));
            caption.append(grid.compact() ? ". A value's cell is its column letter (under the header) and its sheet row (first column)" : "");
        } else if (grid.compact()) {
            caption.append("Data as read from ").append(grid.range())
                    .append(". A value's cell is its column letter (under the header) and its sheet row (first column)");
            if (!namedBy.isEmpty()) {
                caption.append("; points are named by their column ").append(namedBy).append(" cell");
            }
        } else {
            caption.append("Data as read, with each value's workbook cell below it");
        }
        caption.append(exclusions.isEmpty() ? "." : ". Rows marked E are excluded from the statistics.");
        SectionView.Omission omitted = SectionView.Omission.NONE;
        if (summarised) {
            int left = n - 2 * DataTableCsv.SHOWN_AT_EACH_END;
            String span = grid.compact() ? " (sheet rows " + grid.row(DataTableCsv.SHOWN_AT_EACH_END) + " to "
                    + grid.row(n - DataTableCsv.SHOWN_AT_EACH_END - 1) + ")" : "";
            int width = columns.size() + (grid.compact() ? 1 : 0) + (labels ? 1 : 0)
                    + (!exclusions.isEmpty() && !grid.compact() ? 1 : 0);
            omitted = new SectionView.Omission(DataTableCsv.SHOWN_AT_EACH_END, String.format(Locale.ROOT,
                    "… %,d rows not printed%s: see the attached %s …", left, span,
                    attachments.getOrDefault(DataTableCsv.alias(r), "")), width);
        }
        return new TableView(true, caption.toString(), t.headers(), columns, grid.compact(), labels, rows, exclusions, omitted);
    }

    /** A table of results: every number formatted by its kind (a quantity as itself) and linked to its step. */
    private ResultTableView resultTable(String number, String anchor, int n, SectionResult r, ResultTable t) {
        List<ResultColumn> columns = new ArrayList<>();
        boolean[] numeric = new boolean[t.columns().size()];
        for (List<ResultTable.Cell> row : t.rows()) {
            for (int j = 0; j < row.size(); j++) {
                numeric[j] |= row.get(j).show() != ResultTable.Show.TEXT;
            }
        }
        for (int j = 0; j < t.columns().size(); j++) {
            ResultTable.Column c = t.columns().get(j);
                        String unit = c.unit() == null ? "" : c.unit().startsWith("(") ? c.unit() : "(" + c.unit() + ")";
            columns.add(new ResultColumn(c.name(), unit, numeric[j]));
        }
        List<List<ResultCell>> rows = new ArrayList<>();
        for (List<ResultTable.Cell> row : t.rows()) {
            List<ResultCell> cells = new ArrayList<>();
            for (ResultTable.Cell c : row) {
                cells.add(resultCell(r, c));
            }
            rows.add(cells);
        }
        return new ResultTableView(anchor, "Table " + number + "." + n + " " + t.title(), columns, rows, t.note(),
                columns.size() > WIDE_TABLE);
    }

    private ResultCell resultCell(SectionResult r, ResultTable.Cell c) {
        return switch (c.show()) {
            case TEXT -> new ResultCell(c.text(), false, "", "");
            case QUANTITY -> {
                Quantity q = r.quantity(c.ref()).orElseThrow();
                yield linked(format.quantity(q).value(), q.stepId());
            }
            case INTERVAL -> {
                Quantity q = r.quantity(c.ref()).orElseThrow();
                yield linked(format.limits(q), q.stepId());
            }
            case STEP -> {
                Step step = r.steps().stream().filter(s -> s.id().equals(c.ref())).findFirst().orElseThrow();
                double v = c.ownValue() ? c.value() : step.value();
                yield linked(format.number(v, null, null, c.kind()).value(), step.id());
            }
        };
    }

    private ResultCell linked(String text, String stepId) {
        TrailViewBuilder.StepRef ref = trail.ref(stepId);
        return new ResultCell(text, true, ref.number().isEmpty() ? "" : "trail step " + ref.number(), ref.anchor());
    }

    private CellView cell(SectionResult r, TableCell c, boolean showAddress, Set<String> inTable) {
        if (c.quantity() != null) {
            Quantity q = r.quantity(c.quantity()).orElseThrow(() -> new IllegalArgumentException(
                    "section " + r.id() + ": table cell refers to quantity " + c.quantity() + ", which it lacks"));
            inTable.add(q.name());
            TrailViewBuilder.StepRef ref = trail.ref(q.stepId());
            String tip = ref.number().isEmpty() ? "computed" : "computed, trail step " + ref.number();
            return new CellView(format.quantity(q).value(), "", true, false, tip, ref.anchor());
        }
        String address = c.address() == null ? "" : c.address();
        return new CellView(c.raw() == null ? "" : c.raw(), address, false, showAddress && !address.isEmpty(), address,
                "");
    }
}
