package org.meritbook.criteria;

import java.util.OptionalDouble;
import org.meritbook.analysis.NominalValues;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.study.AnalysisKind;

/**
 * The nominal (known) level behind a per-level or per-sample quantity, so that a rule can set the
 * lowest level (the LLOQ) apart without parsing display text or trail input names: the section's
 * {@link NominalValues} export (calibration: the standard's x; unknowns: the QC's known value;
 * accuracy: the mean known value of the level's rows). Precision records no nominal value: a level
 * whose label is a number is that number, otherwise the level's mean ({@code mean:<level>}) stands
 * for it.
 */
final class NominalLevels {
    private NominalLevels() {
    }

    /** The member's nominal level, or empty when the section does not give one. */
    static OptionalDouble of(SectionResult section, Quantity member) {
        OptionalDouble recorded = NominalValues.of(section, member.name());
        if (recorded.isPresent()) {
            return recorded;
        }
        String label = member.name().contains(":") ? member.name().substring(member.name().indexOf(':') + 1) : null;
        if (label == null || section.kind() != AnalysisKind.PRECISION) {
            return OptionalDouble.empty();
        }
        try {
            double v = Double.parseDouble(label.strip());
            if (Double.isFinite(v)) {
                return OptionalDouble.of(v);
            }
        } catch (NumberFormatException e) {
            // a text label ("QC-L"): the level's mean below
        }
        return section.quantity("mean:" + label).map(q -> OptionalDouble.of(q.value())).orElse(OptionalDouble.empty());
    }
}
