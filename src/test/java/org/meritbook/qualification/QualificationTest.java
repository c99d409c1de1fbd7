package org.meritbook.qualification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class QualificationTest {
    @Test
    void logRelativeErrorCountsAgreeingDigits() {
        // LRE as defined for StRD comparisons (McCullough 1998, from memory): 1.0000001 vs 1 agrees to 7 digits.
        assertEquals(7.0, QualificationCheck.lre(1.0000001, 1.0), 1e-6);
        assertEquals(15.0, QualificationCheck.lre(2.5, 2.5));
        assertEquals(3.0, QualificationCheck.lre(-2.002, -2.0), 1e-9);
    }

    @Test
    void everyCertifiedFigureOfTheShippedNistSetsIsReproduced() {
        // Source: NIST StRD certified values of the shipped files (unchanged): linear least squares Norris,
        // NoInt1, NoInt2, Pontius (22 figures); univariate PiDigits, Lottery, Lew, Mavro, Michelso, NumAcc1-4
        // (mean and SD, 18); one-way ANOVA SiRstv, SmLs01-09, AtmWtAg (SS, MS, F, R², residual SD, 77).
        List<QualificationCheck> checks = Qualification.run();
        assertEquals(22 + 18 + 77, checks.size());
        for (QualificationCheck c : checks) {
            assertTrue(c.passed(), c.dataset() + " " + c.figure() + ": " + c.digits() + " digits");
        }
        String md = QualificationReport.markdown(checks, List.of("meritbook test"));
        assertTrue(md.contains("**Outcome: all 117 figures passed.**"), md);
        assertTrue(md.contains("| Pontius | y = B0 + B1·x + B2·x² | B2 | -3.160818713450290e-15 |"), md);
        assertTrue(md.contains("| SmLs07 | one-way ANOVA, 9 groups | F | 2.100000000000000e+01 |"), md);
        assertTrue(md.contains("| NumAcc4 | mean and SD (n − 1) | SD | 1.000000000000000e-01 |"), md);
        assertTrue(md.contains("centred exactly on each file's first value"), md);
    }

    @Test
    void theHardestSetsAreReadWithTheirDecimalDigits() {
        // Source: NIST StRD SmLs07.dat: responses 1000000000000.4, .3, .5 …; the first is the centre.
        NistAnovaDataset d = NistAnovaDataset.load("SmLs07");
        assertEquals("1000000000000.4", d.centre().toPlainString());
        assertEquals(9, d.centredGroups().size());
        assertEquals(21, d.centredGroups().get(0).length);
        assertEquals(0, d.centredGroups().get(0)[0]);
        assertEquals(-0.1, d.centredGroups().get(0)[1]);
        assertEquals(0.1, d.centredGroups().get(0)[2]);
        // the nearest double of 1000000000000.3 is not 1000000000000.4 − 0.1 in binary: 2.4e-5 apart
        assertTrue(Math.abs(d.groups().get(0)[1] - d.groups().get(0)[0] + 0.1) > 1e-5);
        NistUnivariateDataset u = NistUnivariateDataset.load("NumAcc4");
        assertEquals(1001, u.values().length);
        assertEquals("10000000.2", u.centre().toPlainString());
        assertEquals(-0.1, u.centredValues()[1]);
        // NumAcc1.dat certifies mean 10000002 and SD 1 (exact).
        NistUnivariateDataset one = NistUnivariateDataset.load("NumAcc1");
        assertEquals(10000002, one.certifiedMean());
        assertEquals(1, one.certifiedSd());
    }
}
