package org.meritbook.stats.anova;

import org.meritbook.stats.UnusableDataException;

/**
 * The Horwitz ratio (HorRat): the reproducibility RSD found, divided by the RSD Horwitz's function
 * predicts for the concentration.
 *
 * <p>Formula (Horwitz, Kamps &amp; Boyer, J. Assoc. Off. Anal. Chem. 63, 1344–1354, 1980; Horwitz
 * &amp; Albert, J. AOAC Int. 89, 1095–1109, 2006, for HorRat; from memory):
 * <pre>
 *   predicted RSD_R (%) = 2 · C^(−0.1505)       C the concentration as a mass fraction (1 mg/kg = 10⁻⁶)
 *   HorRat = RSD found (%) / predicted RSD_R (%)
 * </pre>
 * 2·C^(−0.1505) is the usual rounding of Horwitz's 2^(1 − 0.5·log₁₀C) (exponent −0.5·log₁₀2 =
 * −0.150515); the two differ by at most 0.05 % of the RSD for C ≥ 10⁻¹². The function gives 2 % at
 * C = 1, 16 % at 1 mg/kg and 45 % at 1 µg/kg. Thompson's (2000) modification below 120 µg/kg
 * (a constant 22 %) is not applied. AOAC reads HorRat(R) between 0.5 and 2 as usual for a
 * collaborative study (from memory); acceptance is the caller's rule, not decided here.
 *
 * @param massFraction        C, in (0, 1]
 * @param predictedRsdPercent 2·C^(−0.1505)
 * @param foundRsdPercent     the RSD found, in percent
 * @param ratio               found / predicted
 */
public record HorwitzRatio(double massFraction, double predictedRsdPercent, double foundRsdPercent, double ratio) {
    /** The exponent of the Horwitz function as usually printed. */
    public static final double EXPONENT = -0.1505;

    public HorwitzRatio {
        requireMassFraction(massFraction);
        if (predictedRsdPercent != predictedRsdPercent(massFraction)) {
            throw new IllegalArgumentException("the predicted RSD must be 2·C^(−0.1505)");
        }
        if (!(foundRsdPercent >= 0) || Double.isInfinite(foundRsdPercent)) {
            throw new IllegalArgumentException("the RSD found must be finite and not negative, but is " + foundRsdPercent);
        }
        if (ratio != foundRsdPercent / predictedRsdPercent) {
            throw new IllegalArgumentException("HorRat must be the RSD found over the RSD predicted");
        }
    }

    /**
     * HorRat for an RSD found at a concentration.
     *
     * @param massFraction    the concentration as a mass fraction, 0 &lt; C ≤ 1
     * @param foundRsdPercent the RSD found (reproducibility or intermediate precision), percent
     * @throws UnusableDataException {@code OUT_OF_DOMAIN} when C is not in (0, 1]
     */
    public static HorwitzRatio of(double massFraction, double foundRsdPercent) {
        double predicted = predictedRsdPercent(massFraction);
        return new HorwitzRatio(massFraction, predicted, foundRsdPercent, foundRsdPercent / predicted);
    }

    /** The predicted reproducibility RSD in percent, 2·C^(−0.1505). */
    public static double predictedRsdPercent(double massFraction) {
        return 2 * Math.pow(requireMassFraction(massFraction), EXPONENT);
    }

    private static double requireMassFraction(double c) {
        if (!(c > 0 && c <= 1)) {
            throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN,
                    "the Horwitz function needs the concentration as a mass fraction in (0, 1], but it is " + c);
        }
        return c;
    }
}
