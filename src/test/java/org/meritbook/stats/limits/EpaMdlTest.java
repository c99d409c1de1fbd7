package org.meritbook.stats.limits;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.meritbook.stats.UnusableDataException;

class EpaMdlTest {

    private static final double[] SPIKES = {0.9, 1.1, 1.0, 1.3, 0.8, 1.2, 1.0};

    // Source: hand arithmetic with the EPA formula (40 CFR 136 App. B Rev. 2): mean 7.3/7, Σd² = 0.177143,
    // S_s = √(0.177143/6) = 0.171825; t(6, 0.99) = 3.143 (EPA table) = 3.142668 (R); MDL_s = 0.539989.
    @Test
    void spikedSamples() {
        SpikedMdl s = SpikedMdl.of(SPIKES);
        assertEquals(3.142668403291, s.t(), 1e-11);
        assertEquals(0.171825, s.spikes().sd(), 5e-7);
        assertEquals(0.539989, s.mdl(), 5e-7);
    }

    // Source: hand arithmetic, the all-numeric blank rule with a negative mean taken as zero: blanks
    // −0.02, 0.01, −0.03, 0.00, −0.01, 0.02, −0.04 have mean −0.01 (used as 0), Σd² = 0.0028,
    // S_b = √(0.0028/6) = 0.0216025, MDL_b = 0 + 3.142668·0.0216025 = 0.0678894.
    @Test
    void allBlanksNumericWithANegativeMean() {
        BlankMdl b = BlankMdl.of(new double[] {-0.02, 0.01, -0.03, 0.00, -0.01, 0.02, -0.04}, 0).orElseThrow();
        BlankMdl.FromMeanAndSd m = assertInstanceOf(BlankMdl.FromMeanAndSd.class, b);
        assertEquals(-0.01, m.blanks().mean(), 1e-15);
        assertEquals(0, m.meanUsed());
        assertEquals(0.0678894, m.mdl(), 5e-8);
        assertEquals(7, m.blankCount());
    }

    // Source: the procedure's rule for blanks of which some give no number, fewer than 100: MDL_b is the
    // highest blank result (here 0.12 of 3 numeric among 7 blanks).
    @Test
    void someBlanksNumericFewerThanAHundred() {
        BlankMdl b = BlankMdl.of(new double[] {0.05, 0.12, 0.08}, 4).orElseThrow();
        BlankMdl.FromRankedResult r = assertInstanceOf(BlankMdl.FromRankedResult.class, b);
        assertEquals(0.12, r.mdl());
        assertEquals(7, r.rank());
        assertEquals(3, r.numericCount());
    }

    // Source: 40 CFR 136 App. B Rev. 2, its example of 164 method blanks (from memory): the highest results
    // are …, 1.5, 1.7, 1.9, 5.0, 10; 164 × 0.99 = 162.36 rounds to rank 162, so MDL_b = 1.9.
    @Test
    void theProceduresExampleOfA164BlankRanking() {
        double[] numeric = new double[64];
        for (int i = 0; i < 59; i++) {
            numeric[i] = 0.2 + 0.02 * i;
        }
        numeric[59] = 1.5;
        numeric[60] = 1.7;
        numeric[61] = 1.9;
        numeric[62] = 5.0;
        numeric[63] = 10;
        BlankMdl.FromRankedResult r = assertInstanceOf(BlankMdl.FromRankedResult.class,
                BlankMdl.of(numeric, 100).orElseThrow());
        assertEquals(162, r.rank());
        assertEquals(1.9, r.mdl());
        assertEquals(164, r.blankCount());
    }

    // Source: our reading of the procedure, stated in BlankMdl: no numeric blank, or a 99th-percentile rank
    // that falls on a blank without a number, gives no MDL_b; the MDL is then MDL_s.
    @Test
    void blanksWithoutNumbersGiveNoBlankMdl() {
        assertTrue(BlankMdl.of(new double[0], 7).isEmpty());
        assertTrue(BlankMdl.of(new double[] {0.3}, 149).isEmpty()); // rank round(148.5) = 149 of 150, non-numeric
        EpaMdl mdl = EpaMdl.of(SpikedMdl.of(SPIKES), BlankMdl.of(new double[0], 7));
        assertEquals(EpaMdl.Basis.SPIKED, mdl.decidedBy());
        assertEquals(SpikedMdl.of(SPIKES).mdl(), mdl.mdl());
    }

    // Source: the procedure: the MDL is the greater of MDL_s and MDL_b; and its check of the spike level.
    @Test
    void theGreaterOfTheTwoIsTheMdl() {
        Optional<BlankMdl> high = BlankMdl.of(new double[] {0.05, 0.9, 0.08}, 4);
        EpaMdl mdl = EpaMdl.of(SpikedMdl.of(SPIKES), high);
        assertEquals(EpaMdl.Basis.BLANK, mdl.decidedBy());
        assertEquals(0.9, mdl.mdl());
        assertTrue(mdl.spikeLevelTooHigh(9.5));
        assertFalse(mdl.spikeLevelTooHigh(9.0));
    }

    @Test
    void tooFewResultsSayWhy() {
        UnusableDataException six = assertThrows(UnusableDataException.class,
                () -> SpikedMdl.of(new double[] {1, 2, 3, 4, 5, 6}));
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, six.reason());
        assertEquals("the spiked-sample results: at least 7 values are needed, but there are 6", six.getMessage());
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, assertThrows(UnusableDataException.class,
                () -> BlankMdl.of(new double[] {0.1, 0.2}, 4)).reason());
        assertEquals(UnusableDataException.Reason.NO_VARIATION, assertThrows(UnusableDataException.class,
                () -> SpikedMdl.of(new double[] {1, 1, 1, 1, 1, 1, 1})).reason());
    }
}
