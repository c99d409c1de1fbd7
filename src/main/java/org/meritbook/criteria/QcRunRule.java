package org.meritbook.criteria;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.meritbook.analysis.LloqLevel;
import org.meritbook.analysis.NominalValues;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Verdict;
import org.meritbook.study.AnalysisKind;

/**
 * A run accepted by its QC samples, as ICH M10 accepts an analytical run (from memory): at least a
 * fraction of all the QCs (two thirds), and at least a fraction of those at each concentration level
 * (half), within ±tolerance % of their known value, ±lloqTolerance % for the QCs the section
 * identifies at the LLOQ ({@link LloqLevel}). One QC outside its limit does not fail the run by
 * itself; the rule gives one verdict for the section's QCs, counting them and naming those outside.
 * A level is the QCs' known value ({@link NominalValues}).
 *
 * @param characteristic       what is judged, e.g. "QC samples of the run"
 * @param tolerance            allowed |% deviation| from the known value
 * @param lloqTolerance        allowed |% deviation| at the LLOQ
 * @param minimumFraction      fraction of all QCs that must be within their limit, in (0, 1]
 * @param minimumLevelFraction fraction of the QCs of each level that must be within their limit, in [0, 1]
 *                             (0: no rule per level)
 * @param source               where the limits come from
 */
public record QcRunRule(String characteristic, double tolerance, double lloqTolerance, double minimumFraction,
                        double minimumLevelFraction, String source) implements Rule {
    /** The family judged, named in the verdict: the dossier's summary points its members to it. */
    static final String FAMILY = "qc_deviation_percent";
    static final String PREFIX = FAMILY + ":";
    /** Slack for a share compared with its minimum: 4 of 6 is two thirds although 6 · 2/3 is not exactly 4. */
    private static final double SHARE_SLACK = 1e-9;

    public QcRunRule {
        if (!(tolerance > 0 && lloqTolerance > 0 && minimumFraction > 0 && minimumFraction <= 1
                && minimumLevelFraction >= 0 && minimumLevelFraction <= 1)) {
            throw new IllegalArgumentException("QC limits must be positive, the fraction in (0, 1] and the fraction "
                    + "per level in [0, 1]");
        }
    }

    @Override
    public String text() {
        return "QCs within ±" + Limits.text(tolerance) + " % of their known value"
                + (lloqTolerance == tolerance ? "" : " (±" + Limits.text(lloqTolerance) + " % at the LLOQ)")
                + ", at least " + share(minimumFraction) + " of them"
                + (minimumLevelFraction > 0 ? " and " + share(minimumLevelFraction) + " at each level" : "");
    }

    private static String share(double f) {
        return Math.abs(f - 2.0 / 3) < SHARE_SLACK ? "two thirds" : Limits.text(f * 100) + " %";
    }

    @Override
    public List<Verdict> judge(SectionResult section, Comparison comparison) {
        if (section.kind() != AnalysisKind.UNKNOWNS) {
            return List.of();
        }
        List<Quantity> qcs = section.quantities().stream().filter(q -> q.name().startsWith(PREFIX)).toList();
        if (qcs.isEmpty()) {
            return List.of(new Verdict(characteristic, FAMILY, text(), Verdict.Outcome.NOT_EVALUABLE,
                    "no QC sample (a sample with a known value) read back"));
        }
        LloqLevel lloq = section.export(LloqLevel.class).orElse(null);
        boolean identified = lloq != null && !lloq.labels().isEmpty();
        Map<Double, int[]> byLevel = new TreeMap<>(); // known value → {within, all, at the LLOQ}
        List<String> outside = new ArrayList<>();
        boolean lloqWouldTurn = false;
        for (Quantity q : qcs) {
            String label = q.name().substring(PREFIX.length());
            double known = NominalValues.of(section, q.name()).orElseThrow(() -> new IllegalStateException(
                    "unknowns section " + section.id() + " exports no known value for " + q.name()));
            boolean atLloq = identified && lloq.contains(label);
            double limit = atLloq ? lloqTolerance : tolerance;
            int[] counts = byLevel.computeIfAbsent(known, k -> new int[3]);
            counts[1]++;
            counts[2] += atLloq ? 1 : 0;
            double size = Math.abs(q.value());
            if (comparison.passes(size, limit, false)) {
                counts[0]++;
            } else {
                // the size is compared with the limit; the sign is printed as computed
                outside.add(label + " (" + (q.value() < 0 ? "−" : "") + comparison.text(size, limit) + " %)");
            }
            lloqWouldTurn |= !identified && comparison.passes(size, lloqTolerance, false) != comparison.passes(size,
                    tolerance, false);
        }
        int within = qcs.size() - outside.size();
        boolean pass = within >= minimumFraction * qcs.size() - SHARE_SLACK;
        List<String> levels = new ArrayList<>();
        for (Map.Entry<Double, int[]> e : byLevel.entrySet()) {
            int[] c = e.getValue();
            pass &= c[0] >= minimumLevelFraction * c[1] - SHARE_SLACK;
            levels.add(Limits.text(e.getKey()) + (c[2] > 0 ? " (LLOQ)" : "") + ": " + c[0] + " of " + c[1]);
        }
        String reason = within + " of " + qcs.size() + " QCs within their limit; by known value " + String.join(", ", levels)
                + (outside.isEmpty() ? "" : "; outside: " + String.join(", ", outside))
                + (!pass && lloqWouldTurn ? LevelRule.NOT_IDENTIFIED : ""); // said only where it may turn the run
        return List.of(new Verdict(characteristic, FAMILY, text(), pass ? Verdict.Outcome.PASS : Verdict.Outcome.FAIL,
                reason));
    }
}
