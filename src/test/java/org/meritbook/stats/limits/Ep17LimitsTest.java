package org.meritbook.stats.limits;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.stats.UnusableDataException;

class Ep17LimitsTest {

    /** Twenty blank results 0.00, 0.01, …, 0.19, given out of order. */
    private static double[] blanks() {
        double[] b = new double[20];
        for (int i = 0; i < 20; i++) {
            b[i] = ((i * 7) % 20) * 0.01;
        }
        return b;
    }

    // Source: hand arithmetic with the EP17 rank rule: B = 20, rank 0.5 + 0.95·20 = 19.5, halfway between the
    // 19th (0.18) and 20th (0.19) smallest: LoB = 0.185.
    @Test
    void nonParametricLobInterpolatesBetweenRanks() {
        LimitOfBlank lob = LimitOfBlank.nonParametric(blanks());
        assertEquals(LobMethod.NON_PARAMETRIC, lob.method());
        assertEquals(19.5, lob.rankPosition().getAsDouble(), 1e-15);
        assertEquals(0.185, lob.lob(), 1e-15);
    }

    // Source: hand arithmetic: with B = 10 the rank 10 is the largest result itself; with B = 30 the rank
    // 29.0 is the 29th result exactly.
    @Test
    void nonParametricLobAtWholeRanks() {
        double[] ten = {0.4, 0.1, 0.3, 0.2, 0.9, 0.5, 0.6, 0.8, 0.7, 1.0};
        assertEquals(1.0, LimitOfBlank.nonParametric(ten).lob());
        double[] thirty = new double[30];
        for (int i = 0; i < 30; i++) {
            thirty[i] = i + 1;
        }
        assertEquals(29, LimitOfBlank.nonParametric(thirty).lob(), 1e-15);
    }

    // Source: hand arithmetic: the 20 blanks have mean 0.095 and SD 0.01·√35 = 0.0591608,
    // so LoB = 0.095 + 1.645·0.0591608 = 0.1923195.
    @Test
    void parametricLob() {
        LimitOfBlank lob = LimitOfBlank.parametric(blanks());
        assertEquals(0.095, lob.blanks().mean(), 1e-15);
        assertEquals(0.01 * Math.sqrt(35), lob.blanks().sd(), 1e-15);
        assertEquals(0.1923195, lob.lob(), 5e-8);
        assertEquals(LobMethod.PARAMETRIC, lob.method());
    }

    // Source: hand arithmetic with EP17's LoD formula: two low-level samples of five results, each with
    // Σd² = 0.02, so SD_L = √(0.04/8) = 0.0707107; L − J = 8, c_p = 1.645/(1 − 1/32) = 1.698065;
    // LoD = 0.185 + 1.698065·0.0707107 = 0.3050713.
    @Test
    void lodFromPooledLowLevelSamples() {
        Ep17LimitOfDetection lod = Ep17LimitOfDetection.of(LimitOfBlank.nonParametric(blanks()),
                List.of(new double[] {0.3, 0.4, 0.5, 0.4, 0.4}, new double[] {0.5, 0.7, 0.6, 0.6, 0.6}));
        assertEquals(2, lod.sampleCount());
        assertEquals(10, lod.resultCount());
        assertEquals(Math.sqrt(0.005), lod.pooledSd(), 1e-15);
        assertEquals(1.645 / (1 - 1.0 / 32), lod.cp(), 1e-15);
        assertEquals(0.3050713, lod.lod(), 5e-8);
    }

    @Test
    void tooFewResultsSayWhy() {
        UnusableDataException nine = assertThrows(UnusableDataException.class,
                () -> LimitOfBlank.nonParametric(new double[] {1, 2, 3, 4, 5, 6, 7, 8, 9}));
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, nine.reason());
        LimitOfBlank lob = LimitOfBlank.parametric(blanks());
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, assertThrows(UnusableDataException.class,
                () -> Ep17LimitOfDetection.of(lob, List.of())).reason());
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, assertThrows(UnusableDataException.class,
                () -> Ep17LimitOfDetection.of(lob, List.of(new double[] {0.3}))).reason());
        assertEquals(UnusableDataException.Reason.NO_VARIATION, assertThrows(UnusableDataException.class,
                () -> Ep17LimitOfDetection.of(lob, List.of(new double[] {0.3, 0.3}, new double[] {0.5, 0.5}))).reason());
    }
}
