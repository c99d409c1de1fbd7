package org.meritbook.analysis.unknowns;

import java.util.Map;
import java.util.Optional;

/**
 * The conversion from a measured-solution concentration to a sample content:
 * content = x₀ · V · D / m, with the units of x₀ (mass per volume), V (volume), m (mass) and the
 * result (mass fraction) each a prefix of gram or litre, so the factor is exact powers of ten.
 */
final class SampleUnits {
    private static final Map<String, Double> MASS = Map.of("kg", 1e3, "g", 1.0, "mg", 1e-3, "µg", 1e-6, "ug", 1e-6,
            "ng", 1e-9);
    private static final Map<String, Double> VOLUME = Map.of("L", 1.0, "mL", 1e-3, "µL", 1e-6, "uL", 1e-6);
    /** Mass fractions, in g/g. */
    private static final Map<String, Double> FRACTION = Map.of("mg/kg", 1e-6, "µg/kg", 1e-9, "ug/kg", 1e-9,
            "µg/g", 1e-6, "ug/g", 1e-6, "ng/g", 1e-9, "mg/g", 1e-3, "g/kg", 1e-3, "%", 1e-2, "g/100 g", 1e-2);

    private SampleUnits() {
    }

    /** The result units meritbook converts to, for messages. */
    static String resultUnits() {
        return "mg/kg, µg/kg, µg/g, ng/g, mg/g, g/kg, %";
    }

    static boolean isResultUnit(String unit) {
        return FRACTION.containsKey(unit);
    }

    static boolean isMassUnit(String unit) {
        return unit != null && MASS.containsKey(unit);
    }

    static boolean isVolumeUnit(String unit) {
        return unit != null && VOLUME.containsKey(unit);
    }

    /**
     * The factor f with content [result] = f · x₀ [x] · V [volume] / m [mass], or empty when the
     * concentration unit is not a mass per volume meritbook knows.
     */
    static Optional<Double> factor(String xUnit, String volumeUnit, String massUnit, String resultUnit) {
        if (xUnit == null || !xUnit.contains("/")) {
            return Optional.empty();
        }
        String[] parts = xUnit.split("/", 2);
        Double xMass = MASS.get(parts[0].strip());
        Double xVolume = VOLUME.get(parts[1].strip());
        Double v = VOLUME.get(volumeUnit);
        Double m = MASS.get(massUnit);
        Double r = FRACTION.get(resultUnit);
        if (xMass == null || xVolume == null || v == null || m == null || r == null) {
            return Optional.empty();
        }
        // (g per L of x) · (L of V) / (g of m) = g/g, then into the result's fraction.
        return Optional.of(xMass / xVolume * v / m / r);
    }
}
