package org.meritbook.analysis.unknowns;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.OptionValue;

/**
 * A test-portion mass, volume or dilution factor: a column of the block (by header or letter) or
 * one value for every sample written with its unit ({@code volume: 50 mL}).
 *
 * @param column   the column's header or letter, or null for a constant
 * @param constant the constant, NaN for a column
 * @param unit     the constant's unit (null for a dilution factor or a column, whose unit is its header's)
 * @param option   the option name
 * @param line     the notebook line
 */
record PreparationValue(String column, double constant, String unit, String option, int line) {
    private static final Pattern CONSTANT = Pattern.compile("([0-9]+(?:\\.[0-9]+)?(?:[eE][-+]?[0-9]+)?)\\s*(\\S.*)?");

    boolean isColumn() {
        return column != null;
    }

    static PreparationValue parse(String option, OptionValue value, String where) {
        String text = value.text().strip();
        Matcher m = CONSTANT.matcher(text);
        if (!m.matches()) {
            return new PreparationValue(text, Double.NaN, null, option, value.line());
        }
        double v = Double.parseDouble(m.group(1));
        String unit = m.group(2) == null ? null : m.group(2).strip();
        boolean dilution = option.equals("dilution");
        boolean unitOk = dilution ? unit == null
                : option.equals("mass") ? SampleUnits.isMassUnit(unit) : SampleUnits.isVolumeUnit(unit);
        if (!(v > 0) || !Double.isFinite(v) || !unitOk) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, where,
                    option + ": a column of the block, or a positive number" + (dilution ? " (a factor, no unit)"
                            : " with its unit (" + (option.equals("mass") ? "g, mg, kg" : "mL, L, µL") + ")"),
                    "'" + text + "'", "Write e.g. '" + option + ": " + example(option) + "' or name the column.");
        }
        return new PreparationValue(null, v, unit, option, value.line());
    }

    private static String example(String option) {
        return switch (option) {
            case "mass" -> "5.00 g";
            case "volume" -> "50 mL";
            default -> "5";
        };
    }

    /** As the settings state it. */
    String describe() {
        return isColumn() ? "column '" + column + "'"
                : String.format(Locale.ROOT, "%s%s for every sample", stripped(constant), unit == null ? "" : " " + unit);
    }

    static String stripped(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
