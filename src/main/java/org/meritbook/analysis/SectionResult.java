package org.meritbook.analysis;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import org.meritbook.figures.FigureSpec;
import org.meritbook.study.AnalysisKind;
import org.meritbook.trail.Step;

/**
 * Everything one analysis cell produced, as the dossier and results.json need it.
 *
 * @param id         the cell id
 * @param kind       the analysis kind
 * @param title      section title (the heading above the cell)
 * @param settings   the statistical choices in force (model, weighting, …)
 * @param quantities named results in a stable order
 * @param steps      the trail steps of this section, in computation order
 * @param table      the data table (with exclusions marked)
 * @param tables     further tables shown after it (ANOVA, per-level summaries, outlier tests), each
 *                   holding only references to this section's quantities and steps
 * @param figures    figure specifications
 * @param verdicts   acceptance verdicts
 * @param warnings   plain-language warnings (outliers flagged, statistics not evaluable and why)
 * @param exports    typed results later cells may use (a calibration's line), never rendered
 */
public record SectionResult(String id, AnalysisKind kind, String title, List<Setting> settings,
                            List<Quantity> quantities, List<Step> steps, DataTable table, List<ResultTable> tables,
                            List<FigureSpec> figures, List<Verdict> verdicts, List<String> warnings,
                            List<Exported> exports) {
    public SectionResult {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(kind, "kind");
        settings = List.copyOf(settings);
        quantities = List.copyOf(quantities);
        steps = List.copyOf(steps);
        figures = List.copyOf(figures);
        verdicts = List.copyOf(verdicts);
        warnings = List.copyOf(warnings);
        exports = List.copyOf(exports);
        tables = List.copyOf(tables);
        long distinct = quantities.stream().map(Quantity::name).distinct().count();
        if (distinct != quantities.size()) {
            throw new IllegalArgumentException("duplicate quantity names in section " + id);
        }
        checkReferences(id, quantities, steps, tables);
    }

    /** A section with one data table and no further tables. */
    public SectionResult(String id, AnalysisKind kind, String title, List<Setting> settings,
                         List<Quantity> quantities, List<Step> steps, DataTable table, List<FigureSpec> figures,
                         List<Verdict> verdicts, List<String> warnings, List<Exported> exports) {
        this(id, kind, title, settings, quantities, steps, table, List.of(), figures, verdicts, warnings, exports);
    }

    /** A section that hands nothing typed to later cells. */
    public SectionResult(String id, AnalysisKind kind, String title, List<Setting> settings,
                         List<Quantity> quantities, List<Step> steps, DataTable table, List<FigureSpec> figures,
                         List<Verdict> verdicts, List<String> warnings) {
        this(id, kind, title, settings, quantities, steps, table, List.of(), figures, verdicts, warnings, List.of());
    }

    /** The typed result of this type the section exports, if any. */
    public <T extends Exported> Optional<T> export(Class<T> type) {
        return exports.stream().filter(type::isInstance).map(type::cast).findFirst();
    }

    /** The same section with these verdicts (acceptance is judged after the analysis). */
    public SectionResult withVerdicts(List<Verdict> judged) {
        return new SectionResult(id, kind, title, settings, quantities, steps, table, tables, figures, judged, warnings,
                exports);
    }

    public Optional<Quantity> quantity(String name) {
        return quantities.stream().filter(q -> q.name().equals(name)).findFirst();
    }

    /** Every table cell names a quantity or step of this section: a table never shows a number from nowhere. */
    private static void checkReferences(String id, List<Quantity> quantities, List<Step> steps, List<ResultTable> tables) {
        Set<String> names = quantities.stream().map(Quantity::name).collect(Collectors.toSet());
        Set<String> stepIds = steps.stream().map(Step::id).collect(Collectors.toSet());
        for (ResultTable t : tables) {
            for (List<ResultTable.Cell> row : t.rows()) {
                for (ResultTable.Cell c : row) {
                    boolean known = switch (c.show()) {
                        case TEXT -> true;
                        case QUANTITY -> names.contains(c.ref());
                        case INTERVAL -> quantities.stream().anyMatch(q -> q.name().equals(c.ref()) && q.interval() != null);
                        case STEP -> stepIds.contains(c.ref());
                    };
                    if (!known) {
                        throw new IllegalArgumentException("section " + id + ", table '" + t.title() + "': no "
                                + (c.show() == ResultTable.Show.STEP ? "step " : c.show() == ResultTable.Show.INTERVAL
                                        ? "interval of " : "quantity ") + c.ref());
                    }
                }
            }
        }
    }
}
