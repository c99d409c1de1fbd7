package org.meritbook.study;

import java.util.List;
import java.util.Map;

/**
 * The mass-fraction units a notebook may name for the Horwitz ratio ({@code horwitz: mg/kg}), and the
 * factor that turns a result in that unit into a dimensionless mass fraction (1 mg/kg = 10⁻⁶).
 */
public final class MassFractions {
    private MassFractions() {
    }

    private static final Map<String, Double> FACTORS = Map.ofEntries(
            Map.entry("g/g", 1.0), Map.entry("%", 1e-2), Map.entry("g/100g", 1e-2), Map.entry("g/kg", 1e-3),
            Map.entry("mg/g", 1e-3), Map.entry("mg/kg", 1e-6), Map.entry("µg/g", 1e-6), Map.entry("ug/g", 1e-6),
            Map.entry("ppm", 1e-6), Map.entry("µg/kg", 1e-9), Map.entry("ug/kg", 1e-9), Map.entry("ng/g", 1e-9),
            Map.entry("ppb", 1e-9), Map.entry("ng/kg", 1e-12), Map.entry("ppt", 1e-12));

    /** The accepted words, in a fixed order for messages. */
    static final List<String> UNITS = List.of("%", "g/100g", "g/g", "g/kg", "mg/g", "mg/kg", "µg/g", "ug/g", "ppm",
            "µg/kg", "ug/kg", "ng/g", "ppb", "ng/kg", "ppt");

    /** The factor as a power of ten, e.g. {@code 10^-6}. */
    public static String factorText(String unit) {
        long exponent = Math.round(Math.log10(factor(unit)));
        return exponent == 0 ? "1" : "10^" + exponent;
    }

    /** The mass fraction of one unit, e.g. 1e-6 for {@code mg/kg}. */
    public static double factor(String unit) {
        Double f = FACTORS.get(unit);
        if (f == null) {
            throw new IllegalArgumentException("not a mass-fraction unit: " + unit);
        }
        return f;
    }
}
