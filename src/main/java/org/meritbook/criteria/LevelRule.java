package org.meritbook.criteria;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.meritbook.analysis.LloqLevel;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Verdict;
import org.meritbook.study.AnalysisKind;

/**
 * A limit on every level (or QC sample) of a family, with its own limit at the LLOQ. ICH M10 writes
 * its accuracy and precision criteria this way (±15 %, ±20 % at the LLOQ). The LLOQ members are the
 * ones the section identified ({@link LloqLevel}: named in the cell, or QCs at the calibration's
 * lowest standard); a section that identified none is judged by the general limit throughout, and a
 * verdict the LLOQ's limit would have turned says so: the lowest level of a study is often a low QC,
 * not the LLOQ.
 * {@code magnitude} judges |value| (a % error or deviation "within ±15 %"), otherwise the value (a CV
 * "≤ 15 %"); the limit itself is within. Each member gets one verdict; the family's overall value (the
 * name without a level) is judged only when the section reports no level, since the limits are per
 * level.
 *
 * @param kind           the analysis kind judged
 * @param characteristic what is judged, e.g. "Accuracy"
 * @param quantity       the family name, e.g. {@code error_percent}
 * @param magnitude      true to judge |value|, false to judge the value
 * @param limit          the limit at every level but the LLOQ
 * @param lowestLimit    the limit at the LLOQ level
 * @param symbol         how the quantity reads in the rule text, e.g. "mean error (%)"
 * @param source         where the limits come from
 */
public record LevelRule(AnalysisKind kind, String characteristic, String quantity, boolean magnitude, double limit,
                        double lowestLimit, String symbol, String source) implements Rule {
    /** Told where the LLOQ's limit would have given the other outcome: only there can it matter. */
    static final String NOT_IDENTIFIED =
            "; LLOQ not identified (name it with 'lloq-level:' in the cell), general limit applied";

    public LevelRule {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(quantity, "quantity");
        if (!(limit >= 0 && lowestLimit >= 0 && Double.isFinite(limit) && Double.isFinite(lowestLimit))) {
            throw new IllegalArgumentException("limits of " + quantity + " must be finite and not negative");
        }
    }

    @Override
    public String text() {
        String unit = quantity.endsWith("_percent") ? " %" : "";
        String text = symbol + (magnitude ? " within " : " ") + bound(limit) + unit;
        return lowestLimit == limit ? text + " at each level"
                : text + " (" + bound(lowestLimit) + unit + " at the LLOQ)";
    }

    private String bound(double l) {
        return (magnitude ? "±" : "≤ ") + Limits.text(l);
    }

    @Override
    public List<Verdict> judge(SectionResult section, Comparison comparison) {
        if (section.kind() != kind) {
            return List.of();
        }
        List<Quantity> members = section.quantities().stream().filter(q -> q.name().startsWith(quantity + ":")).toList();
        if (members.isEmpty()) {
            Quantity overall = section.quantity(quantity).orElse(null);
            if (overall == null) {
                return List.of(new Verdict(characteristic, quantity, text(), Verdict.Outcome.NOT_EVALUABLE,
                        "not computed for this section" + (section.warnings().isEmpty() ? "" : " (see its warnings)")));
            }
            return List.of(verdict(overall, characteristic, limit, comparison, ""));
        }
        LloqLevel lloq = section.export(LloqLevel.class).orElse(null);
        List<Verdict> verdicts = new ArrayList<>();
        for (Quantity q : members) {
            String member = q.name().substring(q.name().indexOf(':') + 1);
            boolean atLloq = lloq != null && lloq.contains(member);
            String what = characteristic + " (" + member + (atLloq && !member.equalsIgnoreCase("LLOQ") ? ", LLOQ" : "") + ")";
            verdicts.add(verdict(q, what, atLloq ? lowestLimit : limit, comparison,
                    (lloq == null || lloq.labels().isEmpty()) && decidedByTheLloq(q, comparison) ? NOT_IDENTIFIED : ""));
        }
        return verdicts;
    }

    private boolean decidedByTheLloq(Quantity q, Comparison comparison) {
        double judged = magnitude ? Math.abs(q.value()) : q.value();
        return comparison.passes(judged, lowestLimit, false) != comparison.passes(judged, limit, false);
    }

    private Verdict verdict(Quantity q, String what, double applied, Comparison comparison, String note) {
        double v = q.value();
        double judged = magnitude ? Math.abs(v) : v;
        boolean pass = comparison.passes(judged, applied, false);
        String unit = q.unit() == null || q.unit().isEmpty() ? "" : " " + q.unit();
        return new Verdict(what, q.name(), text(), pass ? Verdict.Outcome.PASS : Verdict.Outcome.FAIL,
                symbol + " = " + printed(v, judged, applied, comparison, unit) + ", limit " + bound(applied) + unit
                        + note);
    }

    /**
     * The value as compared, with its unit. The size is compared with the limit and the sign printed
     * as computed; rounded to the limit, rounding half away from zero treats both signs alike, so the
     * signed value is rounded and printed with the computed one beside it.
     */
    private String printed(double v, double judged, double applied, Comparison comparison, String unit) {
        if (comparison == Comparison.ROUNDED_TO_LIMIT) {
            String text = comparison.text(v, applied);
            int beside = text.indexOf(" (rounded from ");
            return beside < 0 ? text + unit : text.substring(0, beside) + unit + text.substring(beside, text.length() - 1)
                    + unit + ")";
        }
        return (magnitude && v < 0 ? "−" : "") + comparison.text(judged, applied) + unit;
    }
}
