package org.meritbook.dossier;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.Calendar;
import java.util.Comparator;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Locale;
import java.util.TimeZone;
import org.meritbook.pipeline.InputFile;
import org.meritbook.study.FrontMatter;

/**
 * The one date a dossier carries, never the wall clock: the notebook's front-matter {@code date};
 * else the latest last-saved date that the workbooks read record about themselves (content of the
 * files, so the same in every copy), and the cover says where it came from; else a fixed epoch
 * (1970-01-01) that is obviously not a revision date, and the cover says the date was not stated.
 * The PDF's Info and XMP dates use the same instant, midnight UTC.
 *
 * @param date   the date used for metadata
 * @param stated whether the notebook stated it
 * @param origin where a date not stated came from (e.g. "last saved date recorded in lab.xlsx"), or null
 */
record DocumentDate(LocalDate date, boolean stated, String origin) {
    static final LocalDate UNSTATED = LocalDate.of(1970, 1, 1);

    static DocumentDate of(FrontMatter fm) {
        return of(fm, List.of());
    }

    static DocumentDate of(FrontMatter fm, List<InputFile> inputs) {
        if (fm.date() != null && !fm.date().isBlank()) {
            try {
                return new DocumentDate(LocalDate.parse(fm.date().strip()), true, null);
            } catch (DateTimeParseException e) {
                throw new IllegalArgumentException("front-matter date must be yyyy-mm-dd but was '" + fm.date() + "'",
                        e);
            }
        }
        return inputs.stream().filter(f -> f.savedOn() != null)
                .max(Comparator.comparing(InputFile::savedOn).thenComparing(InputFile::path))
                .map(f -> new DocumentDate(LocalDate.parse(f.savedOn()), false,
                        "last saved date recorded in " + f.path()))
                .orElse(new DocumentDate(UNSTATED, false, null));
    }

    String display() {
        if (stated) {
            return date.toString();
        }
        return origin == null ? "not stated in the notebook"
                : date + " (not stated in the notebook; " + origin + ")";
    }

    Calendar calendar() {
        GregorianCalendar c = new GregorianCalendar(TimeZone.getTimeZone(ZoneOffset.UTC), Locale.ROOT);
        c.clear();
        c.set(date.getYear(), date.getMonthValue() - 1, date.getDayOfMonth(), 0, 0, 0);
        return c;
    }
}
