package org.meritbook.criteria;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.study.AnalysisKind;
import org.meritbook.analysis.Verdict;

/**
 * A limit on one named quantity (results.json name) of every section of one kind, e.g.
 * {@code r_squared ≥ 0.995}. A name without a {@code :} also judges every member of its family
 * ({@code repeatability_cv_percent} judges {@code repeatability_cv_percent:QC-N} and each other
 * level) besides the quantity of that very name, one verdict each; a full member name judges that member only. A section that reports
 * neither gets "not evaluable".
 *
 * @param kind           the analysis kind judged
 * @param characteristic what is judged, e.g. "Linearity"
 * @param quantity       the quantity name, e.g. {@code r_squared}
 * @param atLeast        true for value ≥ limit, false for value ≤ limit
 * @param limit          the limit
 * @param symbol         how the quantity reads in the rule text, e.g. "r²"
 * @param model          when not null, only sections whose model is this notebook word ({@code linear}) are judged
 * @param source         where the limit comes from
 */
public record QuantityRule(AnalysisKind kind, String characteristic, String quantity, boolean atLeast, double limit,
                           String symbol, String model, String source) implements Rule {
    public QuantityRule {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(quantity, "quantity");
        if (!Double.isFinite(limit)) {
            throw new IllegalArgumentException("limit of " + quantity + " must be finite");
        }
        if (model != null && !AnalysisKind.choicesOf("model").contains(model)) {
            // A model the notebook cannot write would match no section: the rule would judge nothing, silently.
            throw new IllegalArgumentException("model of the rule on " + quantity + " must be a notebook word ("
                    + String.join(", ", AnalysisKind.choicesOf("model")) + "), not '" + model + "'");
        }
    }

    @Override
    public String text() {
        return symbol + (atLeast ? " ≥ " : " ≤ ") + Limits.text(limit);
    }

    @Override
    public List<Verdict> judge(SectionResult section, Comparison comparison) {
        if (section.kind() != kind || !modelMatches(section)) {
            return List.of();
        }
        List<Quantity> judged = members(section);
        if (judged.isEmpty()) {
            return List.of(new Verdict(characteristic, quantity, text(), Verdict.Outcome.NOT_EVALUABLE,
                    "not computed for this section" + (section.warnings().isEmpty() ? ""
                            : " (see its warnings)")));
        }
        List<Verdict> verdicts = new ArrayList<>();
        for (Quantity q : judged) {
            double v = q.value();
            boolean pass = comparison.passes(v, limit, atLeast);
            String member = q.name().equals(quantity) ? "" : " (" + q.name().substring(q.name().indexOf(':') + 1) + ")";
            verdicts.add(new Verdict(characteristic + member, q.name(), text(),
                    pass ? Verdict.Outcome.PASS : Verdict.Outcome.FAIL, symbol + " = " + comparison.text(v, limit)));
        }
        return verdicts;
    }

    /**
     * The quantity itself, or, for a family name, the quantity of that name (an overall value) and
     * every member the section reports, in the section's order: a mean recovery is judged overall
     * and at each level.
     */
    private List<Quantity> members(SectionResult section) {
        if (quantity.contains(":")) {
            return section.quantity(quantity).map(List::of).orElse(List.of());
        }
        return section.quantities().stream()
                .filter(q -> q.name().equals(quantity) || q.name().startsWith(quantity + ":")).toList();
    }

    /**
     * Whether this rule judges sections of this kind and model, the model as the notebook words it
     * (null for a section without one), as {@link #judge} decides from the section's settings.
     */
    public boolean judges(AnalysisKind sectionKind, String sectionModel) {
        return sectionKind == kind && (model == null || model.equals(sectionModel));
    }

    private boolean modelMatches(SectionResult section) {
        return model == null || section.settings().stream()
                .anyMatch(s -> s.label().equals("Model") && model.equals(s.key()));
    }
}
