package org.meritbook.analysis;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The nominal (known) value behind each member of a section's per-member quantities, by the
 * member's label (the part after {@code :} in {@code deviation_percent:C5}): a calibration standard's
 * concentration, a QC sample's known value. The calibration's deviation rule reads it to set the
 * lowest standard (the LLOQ) apart, and an unknowns section to find its QCs at that standard
 * ({@link LloqLevels}), never from the trail's input names.
 *
 * @param byLabel nominal value by member label, in the order recorded
 */
public record NominalValues(Map<String, Double> byLabel) implements Exported {
    public NominalValues {
        Objects.requireNonNull(byLabel, "byLabel");
        byLabel = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(byLabel));
        for (Map.Entry<String, Double> e : byLabel.entrySet()) {
            if (e.getValue() == null || !Double.isFinite(e.getValue())) {
                throw new IllegalArgumentException("nominal value of " + e.getKey() + " is not finite");
            }
        }
    }

    /** Relative difference under which two typed nominal values are one level (3 and 3.0000000000001). */
    private static final double SAME_LEVEL = 1e-9;

    /** Whether two nominal values are the same level: typed numbers that differ only in their last digits. */
    public static boolean sameLevel(double a, double b) {
        return Math.abs(a - b) <= SAME_LEVEL * Math.max(Math.abs(a), Math.abs(b));
    }

    /** The nominal value of one member, when the section records one. */
    public OptionalDouble of(String label) {
        Double v = byLabel.get(label);
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
    }

    /** The nominal value behind a quantity {@code name:<label>}, when recorded. */
    public static OptionalDouble of(SectionResult section, String quantityName) {
        int colon = quantityName.indexOf(':');
        if (colon < 0) {
            return OptionalDouble.empty();
        }
        String label = quantityName.substring(colon + 1);
        return section.export(NominalValues.class).map(n -> n.of(label)).orElse(OptionalDouble.empty());
    }
}
