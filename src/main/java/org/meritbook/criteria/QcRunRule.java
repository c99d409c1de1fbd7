package org.meritbook.criteria;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;
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
 * A level is the QCs' known value ({@link NominalValues}); a QC that could not be read back counts as
 * outside. Each QC sample counts once (the unknowns cell averages the readings of one sample name).
 *
 * @param characteristic       what is judged, e.g. "QC samples of the run"
 * @param tolerance            allowed |% deviation| from the known value
 * @param lloqTolerance        allowed |% deviation| at the LLOQ
 * @param minimumFraction      fraction of all QCs that must be within their limit, in (0, 1]
 * @param minimumLevelFraction fraction of the QCs of each level that must be within their limit, in [0, 1]
 *                             (0: no rule per level)
 * @param design               the fewest levels, and QCs at each, a run must have to be judged at all; short of
 *                             it, a second verdict fails the run's QC design
 * @param source               where the limits come from
 */
public record QcRunRule(String characteristic, double tolerance, double lloqTolerance, double minimumFraction,
                        double minimumLevelFraction, Design design, String source) implements Rule {
    /**
     * The QCs a run must carry (ICH M10, from memory: low, medium and high QCs, at least in duplicate).
     *
     * @param levels   the fewest distinct known values (0: no minimum)
     * @param perLevel the fewest QCs at each of them (0: no minimum)
     */
    public record Design(int levels, int perLevel) {
        public static final Design NONE = new Design(0, 0);

        public Design {
            if (levels < 0 || perLevel < 0) {
                throw new IllegalArgumentException("a QC design counts levels and QCs: not negative");
            }
        }

        boolean any() {
            return levels > 0 || perLevel > 0;
        }
    }

    /** The family judged, named in the verdict: the dossier's summary points its members to it. */
    static final String FAMILY = "qc_deviation_percent";
    static final String PREFIX = FAMILY + ":";
    /** Slack for a share compared with its minimum: 4 of 6 is two thirds although 6 · 2/3 is not exactly 4. */
    private static final double SHARE_SLACK = 1e-9;

    public QcRunRule {
        java.util.Objects.requireNonNull(design, "design");
        if (!(tolerance > 0 && lloqTolerance > 0 && minimumFraction > 0 && minimumFraction <= 1
                && minimumLevelFraction >= 0 && minimumLevelFraction <= 1)) {
            throw new IllegalArgumentException("QC limits must be positive, the fraction in (0, 1] and the fraction "
                    + "per level in [0, 1]");
        }
    }

    /** A rule without a minimum QC design. */
    public QcRunRule(String characteristic, double tolerance, double lloqTolerance, double minimumFraction,
                     double minimumLevelFraction, String source) {
        this(characteristic, tolerance, lloqTolerance, minimumFraction, minimumLevelFraction, Design.NONE, source);
    }

    @Override
    public String text() {
        return "QCs within ±" + Limits.text(tolerance) + " % of their known value"
                + (lloqTolerance == tolerance ? "" : " (±" + Limits.text(lloqTolerance) + " % at the LLOQ)")
                + ", at least " + share(minimumFraction) + " of them"
                + (minimumLevelFraction > 0 ? " and " + share(minimumLevelFraction) + " at each level" : "")
                + (design.any() ? "; QCs at " + design.levels() + " or more levels, " + design.perLevel()
                        + " or more at each" : "");
    }

    private static String share(double f) {
        return Math.abs(f - 2.0 / 3) < SHARE_SLACK ? "two thirds" : Limits.text(f * 100) + " %";
    }

    @Override
    public List<Verdict> judge(SectionResult section, Comparison comparison) {
        if (section.kind() != AnalysisKind.UNKNOWNS) {
            return List.of();
        }
        // Every QC the section has, read back or not: one that could not be read back counts as outside.
        Map<String, Double> knownByQc = section.export(NominalValues.class).map(NominalValues::byLabel).orElse(Map.of());
        if (knownByQc.isEmpty()) {
            return List.of(new Verdict(characteristic, FAMILY, text(), Verdict.Outcome.NOT_EVALUABLE,
                    "no QC sample (a sample with a known value) in the section"));
        }
        LloqLevel lloq = section.export(LloqLevel.class).orElse(null);
        boolean identified = lloq != null && !lloq.labels().isEmpty();
        List<Qc> qcs = new ArrayList<>();
        for (Map.Entry<String, Double> e : knownByQc.entrySet()) {
            Double deviation = section.quantity(PREFIX + e.getKey()).map(Quantity::value).orElse(null);
            qcs.add(new Qc(e.getKey(), e.getValue(), deviation, identified && lloq.contains(e.getKey())));
        }
        List<Double> levels = levels(qcs);
        Tally tally = tally(qcs, levels, comparison, qc -> qc.atLloq());
        String reason = tally.within() + " of " + qcs.size() + " QCs within their limit; by known value "
                + String.join(", ", tally.byLevel()) + (tally.outside().isEmpty() ? "" : "; outside: "
                + String.join(", ", tally.outside()));
        if (!tally.pass() && !identified && lloqTolerance != tolerance) {
            // said only where it would turn the run: the lowest level's QCs, were they at the LLOQ
            double lowest = levels.get(0);
            if (tally(qcs, levels, comparison, qc -> NominalValues.sameLevel(qc.known(), lowest)).pass()) {
                reason += LevelRule.NOT_IDENTIFIED;
            }
        }
        Verdict run = new Verdict(characteristic, FAMILY, text(), tally.pass() ? Verdict.Outcome.PASS : Verdict.Outcome.FAIL,
                reason);
        int fewest = tally.fewest();
        if (levels.size() >= design.levels() && fewest >= design.perLevel()) {
            return List.of(run);
        }
        // short of the design the count above cannot accept the run: said as a verdict of its own
        return List.of(run, new Verdict(characteristic + ": QC design", FAMILY, text(), Verdict.Outcome.FAIL,
                "QCs at " + levels.size() + (levels.size() == 1 ? " level" : " levels") + ", " + fewest
                        + " at the level with fewest; the rule asks for " + design.levels() + " or more levels with "
                        + design.perLevel() + " or more QCs each"));
    }

    /** One QC sample: its known value, its % deviation (null when it was not read back), whether at the LLOQ. */
    private record Qc(String label, double known, Double deviation, boolean atLloq) {
    }

    /** The count: whether the run passes, QCs within, each level's line, those outside, the fewest QCs at a level. */
    private record Tally(boolean pass, int within, List<String> byLevel, List<String> outside, int fewest) {
    }

    /** The distinct known values, ascending; values within a relative 1e-9 are one level (as typed numbers are). */
    private static List<Double> levels(List<Qc> qcs) {
        List<Double> levels = new ArrayList<>();
        qcs.stream().map(Qc::known).sorted().forEach(k -> {
            if (levels.isEmpty() || !NominalValues.sameLevel(levels.get(levels.size() - 1), k)) {
                levels.add(k);
            }
        });
        return levels;
    }

    private Tally tally(List<Qc> qcs, List<Double> levels, Comparison comparison, Predicate<Qc> atLloq) {
        int within = 0;
        int fewest = Integer.MAX_VALUE;
        boolean pass = true;
        List<String> byLevel = new ArrayList<>();
        List<String> outside = new ArrayList<>();
        for (double level : levels) {
            int in = 0;
            int all = 0;
            boolean lloqHere = false;
            for (Qc qc : qcs) {
                if (!NominalValues.sameLevel(qc.known(), level)) {
                    continue;
                }
                all++;
                boolean lloq = atLloq.test(qc);
                lloqHere |= lloq;
                double limit = lloq ? lloqTolerance : tolerance;
                if (qc.deviation() == null) {
                    outside.add(qc.label() + " (not read back)");
                } else if (comparison.passes(Math.abs(qc.deviation()), limit, false)) {
                    in++;
                } else {
                    // the size is compared with the limit; the sign is printed as computed
                    outside.add(qc.label() + " (" + (qc.deviation() < 0 ? "−" : "")
                            + comparison.text(Math.abs(qc.deviation()), limit) + " %)");
                }
            }
            pass &= in >= minimumLevelFraction * all - SHARE_SLACK;
            within += in;
            fewest = Math.min(fewest, all);
            byLevel.add(Limits.text(level) + (lloqHere ? " (LLOQ)" : "") + ": " + in + " of " + all);
        }
        pass &= within >= minimumFraction * qcs.size() - SHARE_SLACK;
        return new Tally(pass, within, byLevel, outside, fewest);
    }
}
