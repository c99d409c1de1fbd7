package org.meritbook.robustness;

import static org.meritbook.robustness.SheetEdits.cell;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import org.meritbook.error.ErrorKey;
import org.meritbook.robustness.CorpusCase.Anything;
import org.meritbook.robustness.CorpusCase.Faithful;
import org.meritbook.robustness.CorpusCase.NotFrom;
import org.meritbook.robustness.CorpusCase.Refused;
import org.meritbook.robustness.CorpusCase.Same;

/**
 * Mutations of the demo's calibration sheet beyond single values: hidden rows and columns, merged
 * cells, shifted headers and ranges, rows and cells written twice or without addresses, very long and
 * non-Latin strings.
 */
final class LayoutMutations {
    private static final Set<ErrorKey> HIDDEN = Set.of(ErrorKey.HIDDEN_CELLS);
    private static final Set<ErrorKey> MALFORMED = Set.of(ErrorKey.MALFORMED_SHEET);
    private static final String[] NON_LATIN = {"Проба после промывки", "第一次进样", "حقن أول", "δείγμα αναφοράς", "सबसे पहले",
        "🧪 first injection ✓", "e\u0301te\u0301 (combining)", "\u202Eright-to-left override", "日本語のメモ", "ℌ𝔐𝔉 𝔱𝔢𝔰𝔱"};

    private final Demo demo;
    private final SplittableRandom random;

    LayoutMutations(Demo demo, SplittableRandom random) {
        this.demo = demo;
        this.random = random;
    }

    private int usedRow() {
        List<Integer> rows = Demo.ROWS.stream().filter(r -> r != Demo.EXCLUDED_ROW).toList();
        return rows.get(random.nextInt(rows.size()));
    }

    List<CorpusCase> hidden(int n) {
        List<CorpusCase> out = new ArrayList<>();
        String include = Demo.withOption(demo.notebook, "hidden: include");
        String leaveOut = Demo.withOption(demo.notebook, "hidden: leave-out");
        for (int i = 0; i < n; i++) {
            int row = usedRow();
            boolean zero = random.nextBoolean();
            java.util.function.UnaryOperator<String> hide = x -> zero ? SheetEdits.zeroHeightRow(x, row) : SheetEdits.hideRow(x, row);
            String how = (zero ? "zero-height" : "hidden") + " row " + row;
            switch (i % 8) {
                case 0, 1 -> out.add(demo.sheet("hidden", how, hide, new Refused(HIDDEN)));
                case 2 -> out.add(demo.sheet("hidden", how + ", hidden: include", hide, include, new Same()));
                case 3 -> out.add(demo.sheet("hidden", how + ", hidden: leave-out", hide, leaveOut,
                        new NotFrom(Demo.addresses("C" + row, "D" + row), 1)));
                case 4 -> out.add(demo.sheet("hidden", "hidden column E (retention time)", x -> SheetEdits.hideColumn(x, 5),
                        new Refused(HIDDEN)));
                case 5 -> out.add(demo.sheet("hidden", "hidden column E, hidden: " + (i % 16 == 5 ? "leave-out" : "include"),
                        x -> SheetEdits.hideColumn(x, 5), i % 16 == 5 ? leaveOut : include, new Same()));
                case 6 -> {
                    int meta = 2 + (i / 8) % 5;
                    out.add(demo.sheet("hidden", "hidden metadata row " + meta + " above the block",
                            x -> SheetEdits.hideRow(x, meta), new Same()));
                }
                default -> out.add(demo.sheet("hidden", "hidden excluded row 23, hidden: leave-out",
                        x -> SheetEdits.hideRow(x, Demo.EXCLUDED_ROW), leaveOut, new Same()));
            }
        }
        return out;
    }

    /** Blanks the cells a merged region covers besides its first, as a spreadsheet program stores them. */
    private static String mergeColumn(String xml, char col, int from, int to) {
        String out = xml;
        for (int r = from + 1; r <= to; r++) {
            out = cell(out, col + String.valueOf(r), "");
        }
        return SheetEdits.merge(out, col + String.valueOf(from) + ":" + col + to);
    }

    List<CorpusCase> merged(int n) {
        List<CorpusCase> out = new ArrayList<>();
        String repeat = Demo.withOption(demo.notebook, "merged: repeat");
        String once = Demo.withOption(demo.notebook, "merged: once");
        Set<ErrorKey> mergedKey = Set.of(ErrorKey.MERGED_VALUE);
        for (int i = 0; i < n; i++) {
            int[] level = Demo.LEVELS[random.nextInt(Demo.LEVELS.length)];
            if (level[0] <= Demo.EXCLUDED_ROW && Demo.EXCLUDED_ROW <= level[1]) {
                level = Demo.LEVELS[0]; // S5 holds the excluded injection: merge the first standard instead
            }
            int a = level[0];
            int b = level[1];
            String nominal = "nominal C" + a + ":C" + b;
            switch (i % 8) {
                case 0, 1 -> out.add(demo.sheet("merged", nominal + " merged", x -> mergeColumn(x, 'C', a, b), new Refused(mergedKey)));
                case 2 -> out.add(demo.sheet("merged", nominal + ", merged: repeat", x -> mergeColumn(x, 'C', a, b), repeat, new Same()));
                case 3 -> {
                    List<String> lost = new ArrayList<>();
                    for (int r = a + 1; r <= b; r++) {
                        lost.add("C" + r);
                    }
                    out.add(demo.sheet("merged", nominal + ", merged: once", x -> mergeColumn(x, 'C', a, b), once,
                            new NotFrom(Demo.addresses(lost.toArray(String[]::new)), b - a)));
                }
                case 4 -> out.add(demo.sheet("merged", "peak areas D" + a + ":D" + (a + 1) + " merged",
                        x -> mergeColumn(x, 'D', a, a + 1), new Refused(mergedKey)));
                case 5 -> out.add(demo.sheet("merged", "peak areas D" + a + ":D" + (a + 1) + ", merged: repeat",
                        x -> mergeColumn(x, 'D', a, a + 1), repeat, new Faithful(Demo.address("D" + (a + 1)), demo.value("D" + a))));
                case 6 -> out.add(demo.sheet("merged", "labels A" + a + ":A" + b + " merged (text is shown in every row)",
                        x -> mergeColumn(x, 'A', a, b), new Same()));
                default -> out.add(demo.sheet("merged", "overlapping merges in column F",
                        x -> SheetEdits.merge(x, "F" + a + ":F" + (a + 1), "F" + (a + 1) + ":F" + (a + 2)), new Refused(MALFORMED)));
            }
        }
        return out;
    }

    List<CorpusCase> shiftedHeaders(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            switch (i % 8) {
                case 0 -> out.add(range("A7:F31", new Refused(Set.of())));
                case 1 -> out.add(range("A9:F31", new Refused(Set.of())));
                case 2 -> out.add(range("B8:F31", new Same()));
                case 3 -> out.add(range("A8:D" + (31 + random.nextInt(5)), new Same()));
                case 4 -> out.add(range("A8:F30", new NotFrom(Set.of(), 1)));
                case 5 -> out.add(demo.sheet("shifted-header", "header renamed 'Nominal conc (mg/L)'",
                        x -> cell(x, "C8", SheetEdits.text("C8", "Nominal conc (mg/L)")), new Refused(Set.of(ErrorKey.MISSING_COLUMN))));
                case 6 -> out.add(demo.sheet("shifted-header", "header with spaces and capitals",
                        x -> cell(x, "C8", SheetEdits.text("C8", "  NOMINAL   (mg/L) ")), new Same()));
                default -> {
                    // Every row from the header down moved one row lower; the notebook still names A8:F31.
                    boolean fixed = i % 16 == 7;
                    String notebook = fixed ? demo.notebook.replace("A8:F31", "A9:F32").replace("Calibration!D23", "Calibration!D24")
                            : demo.notebook;
                    out.add(demo.sheet("shifted-header", "rows moved down one" + (fixed ? ", notebook updated" : ""),
                            LayoutMutations::shiftDown, notebook, fixed ? new NotFrom(Set.of(), 0) : new Refused(Set.of())));
                }
            }
        }
        return out;
    }

    private CorpusCase range(String range, CorpusCase.Expectation e) {
        return demo.sheet("shifted-header", "range " + range, x -> x, demo.notebook.replace("A8:F31", range), e);
    }

    /** Rows 8 and below one row lower (C29's formula refers to B6, above them). */
    static String shiftDown(String xml) {
        StringBuilder sb = new StringBuilder();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("<row r=\"(\\d+)\"(.*?)</row>").matcher(xml);
        int last = 0;
        while (m.find()) {
            int r = Integer.parseInt(m.group(1));
            sb.append(xml, last, m.start());
            String row = m.group();
            if (r >= 8) {
                row = row.replace("<row r=\"" + r + "\"", "<row r=\"" + (r + 1) + "\"")
                        .replaceAll("<c r=\"([A-Z]+)" + r + "\"", "<c r=\"$1" + (r + 1) + "\"");
            }
            sb.append(row);
            last = m.end();
        }
        sb.append(xml.substring(last));
        return sb.toString().replace("<dimension ref=\"A1:F31\"/>", "<dimension ref=\"A1:F32\"/>");
    }

    List<CorpusCase> duplicates(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            int row = usedRow();
            String a = (random.nextBoolean() ? "C" : "D") + row;
            switch (i % 8) {
                case 0, 1 -> {
                    String el = SheetEdits.element(demo.sheet, a);
                    String twice = i % 2 == 0 ? el + el : el + SheetEdits.number(a, "999");
                    out.add(demo.sheet("duplicate-xml", "cell " + a + " written twice", x -> cell(x, a, twice), new Refused(MALFORMED)));
                }
                case 2 -> {
                    String el = SheetEdits.rowElement(demo.sheet, row);
                    out.add(demo.sheet("duplicate-xml", "row " + row + " written twice", x -> x.replace(el, el + el), new Refused(MALFORMED)));
                }
                case 3 -> out.add(demo.sheet("duplicate-xml", "cell " + a + " inside row " + (row + 40),
                        x -> x.replace("<c r=\"" + a + "\"", "<c r=\"" + a.charAt(0) + (row + 40) + "\""), new Refused(MALFORMED)));
                case 4 -> out.add(demo.sheet("duplicate-xml", "cells of row " + row + " without addresses",
                        x -> x.replace(SheetEdits.rowElement(x, row), SheetEdits.rowElement(x, row).replaceAll(" r=\"[A-F]" + row + "\"", "")),
                        new Same()));
                case 5 -> {
                    // A row without its number is the row after the previous one: right after row row-1, wrong after a gap.
                    boolean follows = Demo.ROWS.contains(row - 1) || row == 9;
                    out.add(demo.sheet("duplicate-xml", "row " + row + " without its number",
                            x -> x.replace("<row r=\"" + row + "\">", "<row>"), follows ? new Same() : new Refused(MALFORMED)));
                }
                case 6 -> {
                    int other = usedRow();
                    out.add(demo.sheet("duplicate-xml", "rows " + row + " and " + other + " in swapped order", x -> swap(x, row, other),
                            new Same()));
                }
                default -> out.add(demo.workbook("duplicate-xml", "a cell written twice on sheet Blanks",
                        demo.parts.edit("xl/worksheets/sheet2.xml", x -> x.replaceFirst("(<c r=\"B6\"[^>]*>.*?</c>)", "$1$1")),
                        demo.notebook, new Refused(MALFORMED)));
            }
        }
        return out;
    }

    private static String swap(String xml, int a, int b) {
        if (a == b) {
            return xml;
        }
        String ra = SheetEdits.rowElement(xml, a);
        String rb = SheetEdits.rowElement(xml, b);
        return xml.replace(ra, "\u0000A").replace(rb, ra).replace("\u0000A", rb);
    }

    List<CorpusCase> longStrings(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            int length = 1000 * (1 + random.nextInt(200));
            String s = "lot H-26-118 ".repeat(length / 13 + 1).substring(0, length);
            int row = usedRow();
            switch (i % 6) {
                case 0 -> out.add(demo.sheet("long-strings", length + "-character note in F" + row, x -> note(x, row, s), new Same()));
                case 1 -> out.add(demo.sheet("long-strings", length + "-character text in D" + row,
                        x -> cell(x, "D" + row, SheetEdits.text("D" + row, s)), new Refused(Set.of(ErrorKey.NOT_A_NUMBER))));
                case 2 -> out.add(demo.sheet("long-strings", length + "-character header of column F",
                        x -> cell(x, "F8", SheetEdits.text("F8", s)), new Same()));
                case 3 -> out.add(demo.sheet("long-strings", length * 10 + "-character narrative paragraph", x -> x,
                        demo.notebook.replace("## Linearity\n", "## Linearity\n\n" + s.repeat(10) + "\n"), new Same()));
                case 4 -> out.add(demo.sheet("long-strings", length + "-character exclusion reason", x -> x,
                        demo.notebook.replace("reason: Air bubble", "reason: " + s + " Air bubble"), new Same()));
                default -> out.add(demo.sheet("long-strings", "a " + length + "-character number in D" + row,
                        x -> cell(x, "D" + row, SheetEdits.number("D" + row, "1" + "0".repeat(Math.min(length, 400)))),
                        new Refused(Set.of(ErrorKey.NOT_A_NUMBER))));
            }
        }
        return out;
    }

    /** The row with its note in column F set (the demo has notes in a few rows only). */
    private static String note(String xml, int row, String text) {
        if (xml.contains("<c r=\"F" + row + "\"")) {
            return cell(xml, "F" + row, SheetEdits.text("F" + row, text));
        }
        String el = SheetEdits.rowElement(xml, row);
        return xml.replace(el, el.substring(0, el.length() - "</row>".length()) + SheetEdits.text("F" + row, text) + "</row>");
    }

    List<CorpusCase> nonLatin(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String t = NON_LATIN[random.nextInt(NON_LATIN.length)];
            int row = usedRow();
            switch (i % 5) {
                case 0 -> out.add(demo.sheet("non-latin", "note '" + t + "' in F" + row, x -> note(x, row, t), new Same()));
                case 1 -> {
                    String header = t.replace("\u202E", "") + " (mg/L)";
                    String x = t.replace("\u202E", "").strip();
                    out.add(demo.sheet("non-latin", "x header '" + header + "', notebook updated",
                            s -> cell(s, "C8", SheetEdits.text("C8", header)), demo.notebook.replace("x: Nominal", "x: " + x), new Same()));
                }
                case 2 -> out.add(demo.sheet("non-latin", "narrative and title in '" + t + "'", s -> s,
                        demo.notebook.replace("## Purpose and scope", "## " + t + "\n\n" + t + " " + t + "\n\n## Purpose and scope")
                                .replace("title: Validation of", "title: " + t.replace("\u202E", "") + " — Validation of"), new Same()));
                case 3 -> out.add(demo.sheet("non-latin", "'" + t + "' in D" + row, s -> cell(s, "D" + row, SheetEdits.text("D" + row, t)),
                        new Refused(Set.of(ErrorKey.NOT_A_NUMBER))));
                default -> out.add(demo.sheet("non-latin", "exclusion reason '" + t + "'", s -> s,
                        demo.notebook.replace("reason: Air bubble", "reason: " + t + " Air bubble"), new Same()));
            }
        }
        // A sheet renamed in non-Latin letters, the notebook following it.
        out.add(demo.workbook("non-latin", "sheet renamed 'Калибровка'",
                demo.parts.edit("xl/workbook.xml", x -> x.replace("name=\"Calibration\"", "name=\"Калибровка\"")),
                demo.notebook.replace("lab!Calibration!", "lab!Калибровка!").replace("cell: Calibration!", "cell: Калибровка!"),
                new Anything()));
        return out;
    }
}
