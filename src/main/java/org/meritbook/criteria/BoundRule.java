package org.meritbook.criteria;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Verdict;
import org.meritbook.study.AnalysisKind;

/**
 * A limit that is another quantity of the same section, e.g. {@code loq} not above
 * {@code reporting_limit}: the LOQ of a detection-limit cell against the reporting limit it states
 * or the lowest standard of its calibration. A family name judges the quantity of that name and
 * every member, as {@link QuantityRule} does. When the section does not report the bound (no
 * reporting limit given), or reports it in another unit, the verdict is "not evaluable".
 *
 * @param kind           the analysis kind judged
 * @param characteristic what is judged, e.g. "Quantitation limit"
 * @param quantity       the judged quantity (or family) name, e.g. {@code loq}
 * @param atLeast        true for value ≥ bound, false for value ≤ bound
 * @param bound          the name of the quantity that is the limit, e.g. {@code reporting_limit}
 * @param symbol         how the judged quantity reads in the rule text, e.g. "LOQ"
 * @param boundSymbol    how the bound reads, e.g. "reporting limit"
 * @param source         where the rule comes from
 */
public record BoundRule(AnalysisKind kind, String characteristic, String quantity, boolean atLeast, String bound,
                        String symbol, String boundSymbol, String source) implements Rule {
    /** Why a section lacks a bound, for the bounds a kind reports only on request. */
    private static final Map<String, String> ABSENT = Map.of(
            "reporting_limit", "no reporting limit given (option 'reporting-limit:' of the cell)",
            "lowest_standard", "no lowest calibration standard (the cell names no calibration, or its standards are "
                    + "not above zero)");

    public BoundRule {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(quantity, "quantity");
        Objects.requireNonNull(bound, "bound");
    }

    @Override
    public String text() {
        return symbol + (atLeast ? " ≥ " : " ≤ ") + boundSymbol;
    }

    @Override
    public List<Verdict> judge(SectionResult section, Comparison comparison) {
        if (section.kind() != kind) {
            return List.of();
        }
        List<Quantity> judged = section.quantities().stream()
                .filter(q -> q.name().equals(quantity) || (!quantity.contains(":") && q.name().startsWith(quantity + ":")))
                .toList();
        if (judged.isEmpty()) {
            return List.of(notEvaluable(characteristic, quantity, "not computed for this section"
                    + (section.warnings().isEmpty() ? "" : " (see its warnings)")));
        }
        Optional<Quantity> limit = section.quantity(bound);
        List<Verdict> verdicts = new ArrayList<>();
        for (Quantity q : judged) {
            String what = characteristic + (q.name().equals(quantity) ? ""
                    : " (" + q.name().substring(q.name().indexOf(':') + 1) + ")");
            if (limit.isEmpty()) {
                verdicts.add(notEvaluable(what, q.name(), ABSENT.getOrDefault(bound, "the section reports no " + bound)));
            } else if (q.unit() != null && limit.get().unit() != null && !q.unit().equals(limit.get().unit())) {
                verdicts.add(notEvaluable(what, q.name(), symbol + " is in " + q.unit() + ", the " + boundSymbol + " in "
                        + limit.get().unit()));
            } else {
                double b = limit.get().value();
                boolean pass = comparison.passes(q.value(), b, atLeast);
                String unit = q.unit() == null ? "" : " " + q.unit();
                verdicts.add(new Verdict(what, q.name(), text(), pass ? Verdict.Outcome.PASS : Verdict.Outcome.FAIL,
                        symbol + " = " + comparison.text(q.value(), b) + unit + ", " + boundSymbol + " = "
                                + Limits.text(b) + unit));
            }
        }
        return verdicts;
    }

    private Verdict notEvaluable(String what, String name, String why) {
        return new Verdict(what, name, text(), Verdict.Outcome.NOT_EVALUABLE, why);
    }
}
