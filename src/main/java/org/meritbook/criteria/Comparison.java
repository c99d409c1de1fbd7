package org.meritbook.criteria;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * How a profile compares a value with its limit. A profile states one; the dossier prints it beside
 * the criteria, and a verdict's reason prints the value as it was compared, so that the printed value
 * never contradicts the verdict.
 */
public enum Comparison {
    /** The value as computed, every digit: −2.00496 % is outside "within 2". */
    AS_COMPUTED("as-computed", "values are compared with their limits as computed, at full precision"),
    /**
     * The value rounded to the limit's decimal places first (half away from zero), then compared:
     * −2.00496 % rounds to −2 and is within 2. Pharmacopoeial practice, e.g. the USP General Notices
     * on significant figures and rounding (from memory).
     */
    ROUNDED_TO_LIMIT("rounded-to-limit",
            "values are rounded to as many decimal places as their limit has, then compared (pharmacopoeial practice)");

    private static final int MAX_DECIMALS = 15;
    private final String word;
    private final String statement;

    Comparison(String word, String statement) {
        this.word = word;
        this.statement = statement;
    }

    /** The profile file's spelling, e.g. {@code as-computed}. */
    public String word() {
        return word;
    }

    /** How the dossier states it, a clause. */
    public String statement() {
        return statement;
    }

    public static List<String> words() {
        return Arrays.stream(values()).map(Comparison::word).toList();
    }

    public static Optional<Comparison> fromWord(String w) {
        return Arrays.stream(values()).filter(c -> c.word.equals(w)).findFirst();
    }

    /** The value as compared: unchanged, or rounded to the limit's decimals. */
    double compared(double value, double limit) {
        if (this == AS_COMPUTED || !Double.isFinite(value)) {
            return value;
        }
        return BigDecimal.valueOf(value).setScale(decimals(limit), RoundingMode.HALF_UP).doubleValue();
    }

    /** value ≥ limit (atLeast) or value ≤ limit, after this comparison's rounding. */
    boolean passes(double value, double limit, boolean atLeast) {
        double v = compared(value, limit);
        return atLeast ? v >= limit : v <= limit;
    }

    /**
     * The value as a verdict's reason prints it. Rounded to the limit: the rounded value, with the
     * computed one beside it. As computed: six significant figures, or more decimals when six would
     * print a number on the other side of the limit (2.0000004 against 2 prints 2.0000004, not 2).
     */
    String text(double value, double limit) {
        if (this == ROUNDED_TO_LIMIT && Double.isFinite(value)) {
            double r = compared(value, limit);
            String rounded = BigDecimal.valueOf(r).setScale(decimals(limit), RoundingMode.HALF_UP).toPlainString()
                    .replace('-', '−');
            return r == value ? rounded : rounded + " (rounded from " + Limits.text(value) + ")";
        }
        String six = Limits.text(value);
        if (!Double.isFinite(value) || side(parse(six), limit) == side(value, limit)) {
            return six;
        }
        for (int d = decimals(limit); d <= MAX_DECIMALS; d++) {
            BigDecimal shown = BigDecimal.valueOf(value).setScale(d, RoundingMode.HALF_UP);
            if (side(shown.doubleValue(), limit) == side(value, limit)) {
                return shown.toPlainString().replace('-', '−');
            }
        }
        return BigDecimal.valueOf(value).toPlainString().replace('-', '−');
    }

    /** Decimal places of a limit as written: 2 has none, 0.995 three, 1e-4 four. */
    static int decimals(double limit) {
        return Math.max(0, BigDecimal.valueOf(limit).stripTrailingZeros().scale());
    }

    private static int side(double v, double limit) {
        return Double.compare(v, limit) < 0 ? -1 : v == limit ? 0 : 1;
    }

    private static double parse(String text) {
        return Double.parseDouble(text.replace('−', '-'));
    }
}
