package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.meritbook.criteria.AcceptanceProfile;
import org.meritbook.study.FrontMatter;

/** Only meritbook's built-in profiles are called defaults; a lab's own criteria file is the lab's (issue 6). */
class CriteriaNoteTest {
    @Test
    void aLabsOwnFileIsNotCalledDefaults() {
        FrontMatter fm = new FrontMatter("T", null, null, 1, null, null, null, "lab-criteria.yaml", Map.of());
        String note = DossierModelBuilder.criteriaNote(
                new AcceptanceProfile("lab-criteria", "ours", "lab-criteria.yaml", List.of()), fm);
        assertFalse(note.contains("default"), note);
        assertTrue(note.contains("the laboratory's own (profile file lab-criteria.yaml"), note);
    }

    @Test
    void aBuiltInProfileIsADefaultToConfirm() {
        FrontMatter fm = new FrontMatter("T", null, null, 1, null, null, null, "linearity-basic", Map.of());
        String note = DossierModelBuilder.criteriaNote(
                new AcceptanceProfile("linearity-basic", "built", "built in", List.of()), fm);
        assertTrue(note.startsWith("Acceptance criteria are defaults (profile linearity-basic)"), note);
    }
}
