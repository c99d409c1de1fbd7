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
        // Source: NIST StRD Norris, NoInt1, NoInt2 and Pontius certified values (shipped as resources, unchanged).
        List<QualificationCheck> checks = Qualification.run();
        assertEquals(22, checks.size());
        for (QualificationCheck c : checks) {
            assertTrue(c.passed(), c.dataset() + " " + c.figure() + ": " + c.digits() + " digits");
        }
        String md = QualificationReport.markdown(checks, List.of("meritbook test"));
        assertTrue(md.contains("**Outcome: all 22 figures passed.**"), md);
        assertTrue(md.contains("| Pontius | y = B0 + B1·x + B2·x² | B2 | -3.160818713450290e-15 |"), md);
    }
}
