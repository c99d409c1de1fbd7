package org.meritbook.criteria;

import java.util.Objects;
import java.util.Optional;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.study.AnalysisKind;

/**
 * A limit on one named quantity (results.json name) of every section of one kind, e.g.
 * {@code r_squared ≥ 0.995}. A section that does not report the quantity gets "not evaluable".
 *
 * @param kind           the analysis kind judged
 * @param characteristic what is judged, e.g. "Linearity"
 * @param quantity       the quantity name, e.g. {@code r_squared}
 * @param atLeast        true for value ≥ limit, false for value ≤ limit
 * @param limit          the limit
 * @param symbol         how the quantity reads in the rule text, e.g. "r²"
 * @param modelPrefix    when not null, only sections whose "Model" setting starts with this are judged
 * @param source         where the limit comes from
 */
public record QuantityRule(AnalysisKind kind, String characteristic, String quantity, boolean atLeast, double limit,
                           String symbol, String modelPrefix, String source) implements Rule {
    public QuantityRule {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(quantity, "quantity");
        if (!Double.isFinite(limit)) {
            throw new IllegalArgumentException("limit of " + quantity + " must be finite");
        }
    }

    @Override
    public String text() {
        return symbol + (atLeast ? " ≥ " : " ≤ ") + Limits.text(limit);
    }

    @Override
    public Optional<Verdict> judge(SectionResult section) {
        if (section.kind() != kind || !modelMatches(section)) {
            return Optional.empty();
        }
        Optional<Quantity> q = section.quantity(quantity);
        if (q.isEmpty()) {
            return Optional.of(new Verdict(characteristic, quantity, text(), Verdict.Outcome.NOT_EVALUABLE,
                    "not computed for this section (see its warnings)"));
        }
        double v = q.get().value();
        boolean pass = atLeast ? v >= limit : v <= limit;
        return Optional.of(new Verdict(characteristic, quantity, text(),
                pass ? Verdict.Outcome.PASS : Verdict.Outcome.FAIL,
                symbol + " = " + Limits.text(v)));
    }

    private boolean modelMatches(SectionResult section) {
        return modelPrefix == null || section.settings().stream()
                .anyMatch(s -> s.label().equals("Model") && s.value().startsWith(modelPrefix));
    }
}
