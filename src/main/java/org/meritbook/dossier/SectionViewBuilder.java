package org.meritbook.dossier;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Setting;
import org.meritbook.analysis.TableCell;
import org.meritbook.criteria.Verdict;
import org.meritbook.dossier.SectionView.CellView;
import org.meritbook.dossier.SectionView.Exclusion;
import org.meritbook.dossier.SectionView.FigureView;
import org.meritbook.dossier.SectionView.ResultRow;
import org.meritbook.dossier.SectionView.SettingRow;
import org.meritbook.dossier.SectionView.TableRow;
import org.meritbook.dossier.SectionView.TableView;
import org.meritbook.dossier.SectionView.VerdictRow;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.SvgChartRenderer;

/** Builds one {@link SectionView} from a section result: table, figures, results, verdicts, warnings. */
final class SectionViewBuilder {
    private final DisplayFormatter format;
    private final SvgChartRenderer charts;
    private final TrailViewBuilder trail;

    SectionViewBuilder(DisplayFormatter format, SvgChartRenderer charts, TrailViewBuilder trail) {
        this.format = format;
        this.charts = charts;
        this.trail = trail;
    }

    SectionView build(String number, String anchor, SectionResult r, Markup before, Markup after) {
        Set<String> inTable = new HashSet<>();
        TableView table = table(number, r, inTable);
        List<FigureView> figures = new ArrayList<>();
        int f = 0;
        for (FigureSpec spec : r.figures()) {
            f++;
            figures.add(new FigureView("Figure " + number + "." + f, anchor + "-fig-" + f,
                    spec.title() == null ? spec.id() : spec.title(), new Markup(charts.render(spec))));
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
            verdicts.add(new VerdictRow(v.characteristic(), v.rule(), Verdicts.view(v)));
        }
        List<SettingRow> settings = new ArrayList<>();
        for (Setting s : r.settings()) {
            settings.add(new SettingRow(s.label(), s.value()));
        }
        return new SectionView(number, anchor, r.id(), r.kind().keyword(), title(r), before, after, settings, table,
                figures, results, verdicts, r.warnings(), true);
    }

    static String title(SectionResult r) {
        return r.title() == null || r.title().isBlank() ? r.id() : r.title();
    }

    private TableView table(String number, SectionResult r, Set<String> inTable) {
        DataTable t = r.table();
        if (t == null) {
            return new TableView(false, "", List.of(), List.of(), List.of());
        }
        List<TableRow> rows = new ArrayList<>();
        List<Exclusion> exclusions = new ArrayList<>();
        for (DataTable.Row row : t.rows()) {
            List<CellView> cells = new ArrayList<>();
            for (TableCell c : row.cells()) {
                cells.add(cell(r, c, inTable));
            }
            String mark = "";
            if (row.excluded()) {
                mark = "E" + (exclusions.size() + 1);
                exclusions.add(new Exclusion(mark, row.label(), row.exclusionReason()));
            }
            rows.add(new TableRow(row.label() == null ? "" : row.label(), cells, row.excluded(), mark));
        }
        String caption = "Table " + number + ".1 Data as read, with each value's workbook cell"
                + (exclusions.isEmpty() ? "" : "; rows marked E are excluded from the statistics");
        return new TableView(true, caption, t.headers(), rows, exclusions);
    }

    private CellView cell(SectionResult r, TableCell c, Set<String> inTable) {
        if (c.quantity() != null) {
            Quantity q = r.quantity(c.quantity()).orElseThrow(() -> new IllegalArgumentException(
                    "section " + r.id() + ": table cell refers to quantity " + c.quantity() + ", which it lacks"));
            inTable.add(q.name());
            return new CellView(format.quantity(q).value(), "", true);
        }
        return new CellView(c.raw() == null ? "" : c.raw(), c.address() == null ? "" : c.address(), false);
    }
}
