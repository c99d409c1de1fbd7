package org.meritbook.workbook;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A header split into name and unit: "Area (mAU·s)" gives "Area" and "mAU·s", "Conc [ng/mL]"
 * gives "Conc" and "ng/mL". Only a bracketed part at the end of the header is a unit; the text is
 * taken literally, so "Area (mean)" has the unit "mean" (the decision is recorded for the trail).
 *
 * @param header the header as written, whitespace runs collapsed to one space
 * @param name   the header without its unit
 * @param unit   the unit, or null
 */
record HeaderText(String header, String name, String unit) {
    private static final Pattern ROUND = Pattern.compile("(.*\\S)\\s*\\(([^()]*)\\)");
    private static final Pattern SQUARE = Pattern.compile("(.*\\S)\\s*\\[([^\\[\\]]*)]");

    static HeaderText parse(String written) {
        String h = collapse(written);
        for (Pattern p : new Pattern[] {ROUND, SQUARE}) {
            Matcher m = p.matcher(h);
            if (m.matches()) {
                String unit = m.group(2).strip();
                return new HeaderText(h, m.group(1).strip(), unit.isEmpty() ? null : unit);
            }
        }
        return new HeaderText(h, h, null);
    }

    /**
     * Two header rows, the upper one merged across sub-columns: "Area (mAU·s)" over "Inj 1" gives
     * the header "Area (mAU·s) Inj 1", the name "Area Inj 1" and the unit "mAU·s". When both rows
     * state a unit the lower one, nearer the values, is taken.
     */
    static HeaderText combine(String upper, String lower) {
        HeaderText u = parse(upper);
        HeaderText l = parse(lower);
        if (u.header().isEmpty()) {
            return l;
        }
        if (l.header().isEmpty()) {
            return u;
        }
        if (l.header().matches("\\(.*\\)|\\[.*]")) {
            return parse(u.header() + " " + l.header()); // a row of units under the names
        }
        String unit = l.unit() != null ? l.unit() : u.unit();
        return new HeaderText(u.header() + " " + l.header(), u.name() + " " + l.name(), unit);
    }

    static String collapse(String s) {
        return s.strip().replaceAll("\\s+", " ");
    }
}
