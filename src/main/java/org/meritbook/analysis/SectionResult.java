package org.meritbook.analysis;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
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
 * @param figures    figure specifications
 * @param verdicts   acceptance verdicts
 * @param warnings   plain-language warnings (outliers flagged, statistics not evaluable and why)
 * @param exports    typed results later cells may use (a calibration's line), never rendered
 */
public record SectionResult(String id, AnalysisKind kind, String title, List<Setting> settings,
                            List<Quantity> quantities, List<Step> steps, DataTable table, List<FigureSpec> figures,
                            List<Verdict> verdicts, List<String> warnings, List<Exported> exports) {
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
        long distinct = quantities.stream().map(Quantity::name).distinct().count();
        if (distinct != quantities.size()) {
            throw new IllegalArgumentException("duplicate quantity names in section " + id);
        }
    }

    /** A section that hands nothing typed to later cells. */
    public SectionResult(String id, AnalysisKind kind, String title, List<Setting> settings,
                         List<Quantity> quantities, List<Step> steps, DataTable table, List<FigureSpec> figures,
                         List<Verdict> verdicts, List<String> warnings) {
        this(id, kind, title, settings, quantities, steps, table, figures, verdicts, warnings, List.of());
    }

    /** The typed result of this type the section exports, if any. */
    public <T extends Exported> Optional<T> export(Class<T> type) {
        return exports.stream().filter(type::isInstance).map(type::cast).findFirst();
    }

    /** The same section with these verdicts (acceptance is judged after the analysis). */
    public SectionResult withVerdicts(List<Verdict> judged) {
        return new SectionResult(id, kind, title, settings, quantities, steps, table, figures, judged, warnings,
                exports);
    }

    public Optional<Quantity> quantity(String name) {
        return quantities.stream().filter(q -> q.name().equals(name)).findFirst();
    }
}
