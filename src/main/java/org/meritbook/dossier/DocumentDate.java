package org.meritbook.dossier;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.Locale;
import java.util.TimeZone;
import org.meritbook.study.FrontMatter;

/**
 * The one date a dossier carries, never the wall clock: the notebook's front-matter {@code date},
 * else a fixed epoch (1970-01-01) that is obviously not a revision date, and the cover says the date
 * was not stated. The PDF's Info and XMP dates use the same instant, midnight UTC.
 *
 * @param date    the date used for metadata
 * @param stated  whether the notebook stated it
 */
record DocumentDate(LocalDate date, boolean stated) {
    static final LocalDate UNSTATED = LocalDate.of(1970, 1, 1);

    static DocumentDate of(FrontMatter fm) {
        if (fm.date() != null && !fm.date().isBlank()) {
            try {
                return new DocumentDate(LocalDate.parse(fm.date().strip()), true);
            } catch (DateTimeParseException e) {
                throw new IllegalArgumentException("front-matter date must be yyyy-mm-dd but was '" + fm.date() + "'",
                        e);
            }
        }
        return new DocumentDate(UNSTATED, false);
    }

    String display() {
        return stated ? date.toString() : "not stated in the notebook";
    }

    Calendar calendar() {
        GregorianCalendar c = new GregorianCalendar(TimeZone.getTimeZone(ZoneOffset.UTC), Locale.ROOT);
        c.clear();
        c.set(date.getYear(), date.getMonthValue() - 1, date.getDayOfMonth(), 0, 0, 0);
        return c;
    }
}
