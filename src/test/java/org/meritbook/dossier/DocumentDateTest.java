package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.LocalDate;
import java.util.Calendar;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.meritbook.pipeline.InputFile;
import org.meritbook.study.FrontMatter;

class DocumentDateTest {
    private static FrontMatter withDate(String date) {
        return new FrontMatter("T", "M", "L", 1, null, "P", date, null, Map.of());
    }

    @Test
    void theNotebooksDateAtMidnightUtc() {
        DocumentDate d = DocumentDate.of(withDate("2026-03-14"));
        assertEquals("2026-03-14", d.display());
        Calendar c = d.calendar();
        assertEquals(LocalDate.of(2026, 3, 14).atStartOfDay(java.time.ZoneOffset.UTC).toInstant().toEpochMilli(),
                c.getTimeInMillis());
    }

    @Test
    void withoutADateNoClockIsRead() {
        DocumentDate d = DocumentDate.of(withDate(null));
        assertFalse(d.stated());
        assertEquals("not stated in the notebook", d.display());
        assertEquals(0L, d.calendar().getTimeInMillis(), "the fixed epoch");
    }

    @Test
    void withoutADateTheLatestSaveDateRecordedInTheWorkbooksIsUsedAndSaidSo() {
        List<InputFile> inputs = List.of(
                new InputFile("notebook", "s.md", "00", 1, List.of()),
                new InputFile("a", "a.xlsx", "11", 1, List.of("A!A1:B3"), "2026-02-01"),
                new InputFile("b", "b.xlsx", "22", 1, List.of("B!A1:B3"), "2026-05-09"));
        DocumentDate d = DocumentDate.of(withDate(null), inputs);
        assertEquals(LocalDate.of(2026, 5, 9), d.date());
        assertEquals("2026-05-09 (not stated in the notebook; last saved date recorded in b.xlsx)", d.display());
        assertEquals("2026-03-14", DocumentDate.of(withDate("2026-03-14"), inputs).display(), "the notebook wins");
    }

    @Test
    void aMalformedDateIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> DocumentDate.of(withDate("14/03/2026")));
    }
}
