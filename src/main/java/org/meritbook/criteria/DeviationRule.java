package org.meritbook.criteria;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.NominalValues;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.study.AnalysisKind;
import org.meritbook.analysis.Verdict;

/**
 * Back-calculated calibration standards within ±tolerance % of nominal (±lowestLevelTolerance % at
 * the lowest concentration level), for at least a fraction of the standards in the fit and, when
 * minimumLevels is above 0, at that many distinct nominal levels with a standard within its limit
 * (ICH M10 asks for six). Excluded standards are not judged; they carry their own reason.
 *
 * @param characteristic  what is judged, e.g. "Back-calculated standards"
 * @param tolerance       allowed |% deviation|
 * @param lowestTolerance allowed |% deviation| at the lowest level
 * @param minimumFraction fraction of standards that must be within their limit, in (0, 1]
 * @param minimumLevels   distinct nominal levels that must have a standard within its limit (0: no such rule)
 * @param source          where the limits come from
 */
public record DeviationRule(String characteristic, double tolerance, double lowestTolerance, double minimumFraction,
                            int minimumLevels, String source) implements Rule {
    static final String PREFIX = "deviation_percent:";

    public DeviationRule {
        if (!(tolerance > 0 && lowestTolerance > 0 && minimumFraction > 0 && minimumFraction <= 1
                && minimumLevels >= 0)) {
            throw new IllegalArgumentException("deviation limits must be positive, the fraction in (0, 1] and the "
                    + "number of levels not negative");
        }
    }

    /** A rule without a minimum number of levels. */
    public DeviationRule(String characteristic, double tolerance, double lowestTolerance, double minimumFraction,
                         String source) {
        this(characteristic, tolerance, lowestTolerance, minimumFraction, 0, source);
    }

    @Override
    public String text() {
        return "back-calculated standards within ±" + Limits.text(tolerance) + " % of nominal (±"
                + Limits.text(lowestTolerance) + " % at the lowest level), at least "
                + Limits.text(minimumFraction * 100) + " % of them"
                + (minimumLevels > 0 ? ", at " + minimumLevels + " or more levels" : "");
    }

    @Override
    public List<Verdict> judge(SectionResult section, Comparison comparison) {
        if (!judges(section.kind())) {
            return List.of();
        }
        List<double[]> judged = new ArrayList<>(); // nominal, deviation
        List<String> labels = new ArrayList<>();
        for (DataTable.Row row : section.table().rows()) {
            Optional<Quantity> dev = section.quantity(PREFIX + row.label());
            if (row.excluded() || dev.isEmpty()) {
                continue;
            }
            judged.add(new double[] {nominal(section, dev.get()), dev.get().value()});
            labels.add(row.label());
        }
        if (judged.isEmpty()) {
            return List.of(new Verdict(characteristic, null, text(), Verdict.Outcome.NOT_EVALUABLE,
                    "no back-calculated standard with a non-zero nominal concentration"));
        }
        double lowest = judged.stream().mapToDouble(p -> p[0]).min().orElseThrow();
        List<String> outside = new ArrayList<>();
        Set<Double> levelsWithin = new HashSet<>();
        Set<Double> levels = new HashSet<>();
        for (int i = 0; i < judged.size(); i++) {
            double[] p = judged.get(i);
            double limit = p[0] == lowest ? lowestTolerance : tolerance;
            levels.add(p[0]);
            if (!comparison.passes(Math.abs(p[1]), limit, false)) {
                // the size is compared with the limit; the sign is printed as computed
                outside.add(labels.get(i) + " (" + (p[1] < 0 ? "−" : "") + comparison.text(Math.abs(p[1]), limit) + " %)");
            } else {
                levelsWithin.add(p[0]);
            }
        }
        int within = judged.size() - outside.size();
        boolean pass = within >= minimumFraction * judged.size() - 1e-9 && levelsWithin.size() >= minimumLevels;
        String reason = within + " of " + judged.size() + " standards within their limit"
                + (minimumLevels > 0 ? ", at " + levelsWithin.size() + " of " + levels.size() + " levels" : "")
                + (outside.isEmpty() ? "" : "; outside: " + String.join(", ", outside));
        return List.of(new Verdict(characteristic, null, text(),
                pass ? Verdict.Outcome.PASS : Verdict.Outcome.FAIL, reason));
    }

    /** Whether this rule judges sections of this kind: calibrations, whose standards are back-calculated. */
    public boolean judges(AnalysisKind kind) {
        return kind == AnalysisKind.CALIBRATION;
    }

    /** The standard's nominal concentration, as the calibration section exports it ({@link NominalValues}). */
    private static double nominal(SectionResult section, Quantity deviation) {
        return NominalValues.of(section, deviation.name()).orElseThrow(() -> new IllegalStateException(
                "calibration section " + section.id() + " exports no nominal concentration for " + deviation.name()));
    }
}
