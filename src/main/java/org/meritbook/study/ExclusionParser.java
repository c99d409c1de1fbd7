package org.meritbook.study;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.meritbook.error.ErrorKey;

/**
 * Reads {@code exclude:}: a list of {@code - cell: Sheet!C17} entries, each with a {@code reason:}.
 * A point leaves the statistics only this way, so every entry must name one cell and say why.
 */
final class ExclusionParser {
    private static final List<String> KEYS = List.of("cell", "reason", "by", "on");
    private static final String SHAPE = "a list of entries '- cell: Sheet!C17' with 'reason: ...'";
    // Unquoted sheet: no '!' and no leading quote; quoted sheet: '' escapes a quote.
    private static final Pattern ADDRESS = Pattern.compile("(?:'((?:[^']|'')+)'|([^'!][^!]*))!\\$?([A-Za-z]{1,3})\\$?([0-9]{1,7})");

    private final Problems problems;

    ExclusionParser(Problems problems) {
        this.problems = problems;
    }

    List<Exclusion> parse(OptionValue exclude) {
        List<Exclusion> out = new ArrayList<>();
        if (exclude.isScalar() && exclude.text().isBlank()) {
            return out; // "exclude:" with nothing under it excludes nothing
        }
        if (!(exclude.value() instanceof List)) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, exclude.line(), SHAPE, Problems.describe(exclude),
                    "Write one '- cell: ...' entry per excluded cell, each with 'reason: ...'.");
            return out;
        }
        Map<String, Integer> seen = new HashMap<>();
        for (OptionValue entry : exclude.list()) {
            Exclusion e = entry(entry);
            if (e == null) {
                continue;
            }
            Integer first = seen.putIfAbsent(e.address(), e.line());
            if (first != null) {
                problems.add(ErrorKey.BAD_OPTION_VALUE, e.line(), "each excluded cell once",
                        Problems.quote(e.address()) + " again (first at line " + first + ")", "Remove one of the two entries.");
                continue;
            }
            out.add(e);
        }
        return out;
    }

    private Exclusion entry(OptionValue entry) {
        if (!(entry.value() instanceof Map)) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, entry.line(), SHAPE,
                    Problems.describe(entry),
                    "Write the entry as 'cell: Sheet!C17' and, indented below it, 'reason: ...'.");
            return null;
        }
        Map<String, OptionValue> map = entry.map();
        boolean ok = true;
        for (Map.Entry<String, OptionValue> kv : map.entrySet()) {
            if (!KEYS.contains(kv.getKey())) {
                problems.add(ErrorKey.UNKNOWN_OPTION, kv.getValue().line(), "an entry of an exclusion: " + Problems.list(KEYS),
                        Problems.quote(kv.getKey()), "Correct the name" + Suggestion.hint(kv.getKey(), KEYS) + " or remove the line.");
                ok = false;
            }
        }
        String[] address = address(map.get("cell"), entry.line());
        String reason = reason(map.get("reason"), entry.line());
        if (!ok || address == null || reason == null) {
            return null;
        }
        String by = optional(map.get("by"), "who excluded the point, e.g. 'by: I. Hollinsworth'");
        String on = optional(map.get("on"), "the date of the exclusion, e.g. 'on: 2026-11-20'");
        if (on != null && !on.matches("\\d{4}-\\d{2}-\\d{2}")) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, map.get("on").line(), "a date as YYYY-MM-DD for 'on:'",
                    Problems.quote(on), "Write the date of the exclusion as e.g. 2026-11-20.");
            return null;
        }
        if (map.containsKey("by") && by == null || map.containsKey("on") && on == null) {
            return null;
        }
        return new Exclusion(address[0], address[1], reason, by, on, entry.line());
    }

    /** {sheet, A1} or null when reported. */
    private String[] address(OptionValue cell, int entryLine) {
        if (cell == null) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, entryLine, "'cell:' in the exclusion", "no cell",
                    "Name the excluded cell, e.g. 'cell: Calibration!C17'.");
            return null;
        }
        String written = cell.isScalar() ? cell.text().strip() : null;
        Matcher m = written == null ? null : ADDRESS.matcher(written);
        if (m == null || !m.matches() || DataReferenceParser.column(m.group(3).toUpperCase(Locale.ROOT)) > 16_384
                || !DataReferenceParser.row(m.group(4))) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, cell.line(),
                    "one cell as Sheet!A1 (a sheet name with spaces in quotes: \"'Day 1'!C5\")",
                    Problems.describe(cell),
                    "Write the sheet, '!', then the cell, e.g. Calibration!C17; quote the whole value when the sheet name is quoted.");
            return null;
        }
        String sheet = m.group(1) != null ? m.group(1).replace("''", "'") : m.group(2);
        return new String[] {sheet, m.group(3).toUpperCase(Locale.ROOT) + m.group(4)};
    }

    /** An optional one-line entry key: null when absent; reported (and null) when empty or not text. */
    private String optional(OptionValue value, String expected) {
        if (value == null) {
            return null;
        }
        if (!value.isScalar() || value.text().isBlank()) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, value.line(), expected, Problems.describe(value),
                    "Fill it in or remove the line.");
            return null;
        }
        return value.text().strip();
    }

    private String reason(OptionValue reason, int entryLine) {
        if (reason == null || !reason.isScalar() || reason.text().isBlank()) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, reason == null ? entryLine : reason.line(),
                    "a reason for the exclusion", reason == null ? "no reason" : reason.isScalar() ? "an empty reason" : Problems.describe(reason),
                    "Say why the point is left out, e.g. 'reason: Injection failure recorded in run log'.");
            return null;
        }
        return reason.text();
    }
}
