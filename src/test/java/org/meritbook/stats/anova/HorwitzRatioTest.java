package org.meritbook.stats.anova;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.meritbook.stats.UnusableDataException;

class HorwitzRatioTest {

    // Source: Horwitz, Kamps & Boyer (1980) and the AOAC literature (from memory): the Horwitz curve gives
    // about 2 % at C = 1 (100 %), 16 % at 1 mg/kg (C = 10⁻⁶) and 45 % at 1 µg/kg (C = 10⁻⁹).
    @Test
    void theHorwitzCurveAtItsLandmarks() {
        assertEquals(2.0, HorwitzRatio.predictedRsdPercent(1), 1e-15);
        assertEquals(16.0, HorwitzRatio.predictedRsdPercent(1e-6), 0.05);
        assertEquals(45, HorwitzRatio.predictedRsdPercent(1e-9), 0.5); // 45.24
        // The original form 2^(1 − 0.5·log10 C) differs by at most 0.05 % of the RSD down to 10⁻¹².
        for (double c = 1; c >= 1e-12; c /= 10) {
            double original = Math.pow(2, 1 - 0.5 * Math.log10(c));
            assertEquals(original, HorwitzRatio.predictedRsdPercent(c), 5e-4 * original);
        }
    }

    // Source: hand arithmetic: 8 % found at 1 mg/kg, predicted 2·(10⁻⁶)^(−0.1505) = 15.996 %, HorRat 0.5001.
    @Test
    void ratioOfFoundToPredicted() {
        HorwitzRatio h = HorwitzRatio.of(1e-6, 8);
        assertEquals(2 * Math.pow(1e-6, -0.1505), h.predictedRsdPercent(), 1e-13);
        assertEquals(8 / h.predictedRsdPercent(), h.ratio(), 1e-15);
        assertEquals(0.5001, h.ratio(), 5e-5);
    }

    @Test
    void aConcentrationThatIsNoMassFractionIsRefused() {
        UnusableDataException e = assertThrows(UnusableDataException.class, () -> HorwitzRatio.of(2.5, 3));
        assertEquals(UnusableDataException.Reason.OUT_OF_DOMAIN, e.reason());
        assertThrows(UnusableDataException.class, () -> HorwitzRatio.of(0, 3));
        assertThrows(IllegalArgumentException.class, () -> HorwitzRatio.of(1e-3, -1));
    }
}
