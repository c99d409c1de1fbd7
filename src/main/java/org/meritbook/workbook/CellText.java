package org.meritbook.workbook;

import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Classifies the text of a cell: a censored result, a number written as text, or plain text.
 * Only unambiguous forms are read as numbers: '.' decimal point, no thousands separators. A
 * decimal comma ("0,512") stays text, because "1,234" could mean either 1.234 or 1234.
 */
final class CellText {
    static final String NUMBER_AS_TEXT = "number stored as text";

    /** "&lt;0.05", "&lt; 0.05", "&gt;200", "≤0.1": a censored result with its stated limit. */
    private static final Pattern LIMIT = Pattern.compile("(?:<=?|>=?|≤|≥)\\s*([+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)");

    /**
     * Censored results without a stated limit, compared lower-case with inner spaces collapsed.
     * The list holds the spellings common in lab workbooks (common practice, no source).
     */
    private static final Set<String> NO_LIMIT = Set.of(
            "n.d.", "n.d", "nd", "not detected", "bdl", "blq", "bloq", "bql",
            "<loq", "< loq", "<lod", "< lod", "<lloq", "< lloq", "<mdl", "< mdl");

    private CellText() {
    }

    /**
     * @param note how the text was obtained (e.g. a formula's cached result), or null; combined
     *             with "number stored as text" when the text is read as a number
     */
    static CellValue classify(CellRef ref, String text, String note) {
        String t = text.strip();
        if (t.isEmpty()) {
            return new CellValue(ref, CellValue.Kind.BLANK, Double.NaN, "", note);
        }
        StoredNumber.Parsed number = StoredNumber.parse(t);
        if (number.ok()) {
            String n = note == null ? NUMBER_AS_TEXT : note + "; " + NUMBER_AS_TEXT;
            return new CellValue(ref, CellValue.Kind.NUMBER, number.value(), t, n);
        }
        if (number.problem() != null) {
            // "1e309", "NaN": text that names a number no double holds is kept as unreadable, not as 0 or ∞.
            return unreadable(ref, t, number.problem(), note);
        }
        Matcher m = LIMIT.matcher(t);
        if (m.matches()) {
            StoredNumber.Parsed limit = StoredNumber.parse(m.group(1));
            return limit.ok() ? new CellValue(ref, CellValue.Kind.CENSORED, limit.value(), t, note)
                    : unreadable(ref, t, "the censored result '" + t + "', whose limit is no finite number", note);
        }
        if (NO_LIMIT.contains(t.toLowerCase(Locale.ROOT).replaceAll("\\s+", " "))) {
            return new CellValue(ref, CellValue.Kind.CENSORED, Double.NaN, t, note);
        }
        return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, t, note);
    }

    /**
     * A value the sheet stores but that is no number meritbook can read faithfully (a stored NaN, a
     * number beyond a double's range, an unknown error code, a damaged cell): kept as text with the
     * reason, so it is reported with its cell if a method needs it as a number.
     */
    static CellValue unreadable(CellRef ref, String raw, String reason, String note) {
        return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, raw, Notes.join(note, Notes.UNREADABLE + reason));
    }

    /** Like {@link #classify} for CSV fields: every field is text, so a number carries no note. */
    static CellValue classifyCsv(CellRef ref, String text) {
        CellValue v = classify(ref, text, null);
        return v.isNumber() ? new CellValue(ref, v.kind(), v.number(), v.raw(), null) : v;
    }
}
