package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.Quantity;
import org.meritbook.stats.Interval;

/** The display rules of docs/dossier.md, one by one (values invented for the rules, not references). */
class DisplayFormatterTest {
    private final DisplayFormatter f = new DisplayFormatter();

    private DisplayFormatter.Formatted q(String name, double v, String unit, Interval ci) {
        return q(NumberKind.ofUnit(unit), name, v, unit, ci);
    }

    private DisplayFormatter.Formatted q(NumberKind kind, String name, double v, String unit, Interval ci) {
        return f.quantity(new Quantity(name, name, v, unit, "s." + name, ci, true, kind));
    }

    @Test
    void aSymmetricIntervalSetsTheDecimalsAndReadsAsPlusMinus() {
        DisplayFormatter.Formatted s = q("slope", 1519.4338, "AU per mg/L", new Interval(1519.4338 - 2.2562, 1519.4338 + 2.2562, 0.95));
        assertEquals("1519.4 ± 2.3 AU per mg/L", s.withUnit());
        assertEquals("95 % CI 1517.2 to 1521.7 AU per mg/L", s.uncertainty());
    }

    @Test
    void anAsymmetricIntervalIsGivenByItsLimits() {
        DisplayFormatter.Formatted s = q("sd", 0.01094, "mg/L", new Interval(0.00683, 0.02684, 0.95));
        assertEquals("0.011 mg/L", s.withUnit());
        assertEquals("95 % CI 0.007 to 0.027 mg/L", s.uncertainty());
    }

    @Test
    void aLargeUncertaintyRoundsToTensWithoutNegativeZero() {
        assertEquals("0 ± 120 AU", q("intercept", -0.3, "AU", new Interval(-120.3, 119.7, 0.95)).withUnit());
        assertEquals("1230 ± 450", q("x", 1234.5, null, new Interval(784.5, 1684.5, 0.9)).withUnit());
        assertEquals("90 % CI 780 to 1680", q("x", 1234.5, null, new Interval(784.5, 1684.5, 0.9)).uncertainty());
    }

    @Test
    void correlationShowsFourDecimalsButNeverRoundsUpToOne() {
        assertEquals("0.9987", q(NumberKind.CORRELATION, "r_squared", 0.99874, null, null).value());
        assertEquals("0.99999", q(NumberKind.CORRELATION, "r_squared", 0.999993, null, null).value());
        assertEquals("0.999996", q(NumberKind.CORRELATION, "r", 0.9999962, null, null).value());
        assertEquals("1.0000", q(NumberKind.CORRELATION, "r", 1.0, null, null).value());
    }

    @Test
    void pValuesCountsPercentagesAndTheDefault() {
        assertEquals("0.012", q(NumberKind.P_VALUE, "lack_of_fit_p", 0.01234, null, null).value());
        assertEquals("< 0.001", q(NumberKind.P_VALUE, "shapiro_p", 0.00012, null, null).value());
        assertEquals("20", q(NumberKind.COUNT, "n", 20, null, null).value());
        assertEquals("99.2 %", q("recovery_percent:low", 99.21, "%", null).withUnit());
        assertEquals("0.043 %", q("cv_percent", 0.0432, "%", null).withUnit());
        assertEquals("3.303 AU", q("residual_sd", 3.30281, "AU", null).withUnit());
        assertEquals("15235", q("x", 15234.51, null, null).value(), "integer digits are never dropped");
        assertEquals("\u22120.06170", q("deviation", -0.0617, null, null).value(), "true minus sign");
    }

    @Test
    void extremesAreScientific() {
        assertEquals("1.235 × 10⁻⁵ mg/L", q("lod", 1.23456e-5, "mg/L", null).withUnit());
        assertEquals("\u22124.500 × 10⁷", q("x", -4.5e7, null, null).value());
    }

    @Test
    void trailValuesCarrySixSignificantFiguresWithoutTrailingZeros() {
        assertEquals("0.05 mg/L", f.trailValue(0.05, "mg/L"));
        assertEquals("1519.43", f.trailValue(1519.4338, null));
        assertEquals("20", f.trailValue(20, null));
        assertEquals("", f.trailValue(Double.NaN, null));
    }

    @Test
    void theDefaultLocaleChangesNothing() {
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertEquals("1519.4 ± 2.3 AU", q("slope", 1519.4338, "AU", new Interval(1519.4338 - 2.2562, 1519.4338 + 2.2562, 0.95))
                    .withUnit());
        } finally {
            Locale.setDefault(saved);
        }
    }

    @Test
    void theKindNotTheNameChoosesTheRule() {
        // The same names as above with other kinds: the rule follows the kind the analysis gave.
        assertEquals("20.00", q(NumberKind.MEASURE, "n", 20, null, null).value());
        assertEquals("3", q(NumberKind.COUNT, "x", 3.0, null, null).value());
        assertEquals("0.012", q(NumberKind.P_VALUE, "x", 0.01234, null, null).value());
        assertEquals("0.9987", q(NumberKind.CORRELATION, "x", 0.99874, null, null).value());
        assertEquals("0.01234", q(NumberKind.MEASURE, "lack_of_fit_p", 0.01234, null, null).value());
        assertEquals("0.1579", q(NumberKind.STATISTIC, "anova_f", 0.15789473684210606, null, null).value());
        assertEquals("0.6500", q(NumberKind.RATIO, "horwitz_ratio", 0.65, null, null).value());
        assertEquals("99.2 %", q(NumberKind.PERCENT, "x", 99.21, "%", null).withUnit());
        // an interval sets the decimals of a measure, not of a count
        Interval ci = new Interval(17.5, 22.5, 0.95);
        assertEquals("20.0 ± 2.5", q(NumberKind.MEASURE, "x", 20, null, ci).withUnit());
        assertEquals("20", q(NumberKind.COUNT, "x", 20, null, ci).withUnit());
    }

    @Test
    void aTableShowsAnIntervalByItsLimitsRoundedAsItsValue() {
        Quantity sd = new Quantity("sd", "SD", 0.01094, "mg/L", "s.sd", new Interval(0.00683, 0.02684, 0.95), true,
                NumberKind.MEASURE);
        assertEquals("0.007 to 0.027", f.limits(sd));
        assertEquals("", f.limits(new Quantity("sd", "SD", 0.01094, "mg/L", "s.sd", null, true, NumberKind.MEASURE)));
        assertEquals("0.1579", f.number(0.15789473684210606, null, null, NumberKind.STATISTIC).value());
    }
}
