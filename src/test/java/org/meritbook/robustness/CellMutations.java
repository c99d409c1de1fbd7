package org.meritbook.robustness;

import static org.meritbook.robustness.SheetEdits.cell;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import org.meritbook.error.ErrorKey;
import org.meritbook.robustness.CorpusCase.Faithful;
import org.meritbook.robustness.CorpusCase.NotFrom;
import org.meritbook.robustness.CorpusCase.Refused;
import org.meritbook.robustness.CorpusCase.Same;

/**
 * Mutations of single cells of the demo's calibration sheet: text, error values, empty values, dates,
 * huge, tiny and non-finite numbers, formulas without results. A mutation of a cell the fits use must
 * be refused with its cell; the same mutation of a cell no fit uses must leave the numbers unchanged;
 * a valid extreme number must be used exactly as written.
 */
final class CellMutations {
    private static final Set<ErrorKey> NOT_A_NUMBER = Set.of(ErrorKey.NOT_A_NUMBER, ErrorKey.CENSORED_VALUE);
    private static final String[] TEXTS = {"n.d.", "<0.05", "ND", "BLQ", "abc", "21,08", "1 234", "≈4.6", "4.6 mAU", "—", "?",
        "TRUE", "  ", "0x10", "1e", "--1", "4.6.1", "+-2", "∞", "NaN", "Infinity", "-inf", "1.#INF", "1e309", "1e-400"};
    private static final String[] ERRORS = {"#DIV/0!", "#N/A", "#VALUE!", "#REF!", "#NUM!", "#NAME?", "#NULL!",
        "#GETTING_DATA", "#BOGUS!", "#", ""};
    private static final String[] NOT_FINITE = {"NaN", "nan", "INF", "-INF", "Infinity", "-Infinity", "inf", "1.#INF",
        "1.#QNAN", "1e309", "-1e309", "2e308", "1.8e308", "1E+400", "1e-400", "2e-324", "-1e-999"};
    private static final String[] HUGE = {"1e300", "-1e300", "1.7976931348623157E308", "9.9e307", "1e200", "1.0E100"};
    private static final String[] TINY = {"4.9E-324", "1e-320", "2.2250738585072014E-308", "1e-300", "5e-324", "-4.9E-324"};

    private final Demo demo;
    private final SplittableRandom random;

    CellMutations(Demo demo, SplittableRandom random) {
        this.demo = demo;
        this.random = random;
    }

    private String usedCell() {
        List<String> used = Demo.usedCells();
        return used.get(random.nextInt(used.size()));
    }

    private String unusedCell() {
        List<String> unused = Demo.unusedCells(demo.sheet);
        return unused.get(random.nextInt(unused.size()));
    }

    private static <T> T pick(SplittableRandom random, T[] items) {
        return items[random.nextInt(items.length)];
    }

    List<CorpusCase> text(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String t = pick(random, TEXTS);
            switch (i % 4) {
                case 0, 1 -> {
                    String a = usedCell();
                    out.add(demo.sheet("text", "text '" + t + "' in " + a, x -> cell(x, a, SheetEdits.text(a, t)),
                            new Refused(NOT_A_NUMBER)));
                }
                case 2 -> {
                    String a = unusedCell();
                    out.add(demo.sheet("text", "text '" + t + "' in unused " + a, x -> cell(x, a, SheetEdits.text(a, t)), new Same()));
                }
                default -> {
                    // A number stored as text: read as the same number.
                    String a = usedCell();
                    if (a.equals("D16") || a.equals("C29")) {
                        a = "C9";
                    }
                    String stored = demo.stored.get(a);
                    String b = a;
                    out.add(demo.sheet("text", "number stored as text '" + stored + "' in " + a,
                            x -> cell(x, b, SheetEdits.text(b, " " + stored + " ")), new Same()));
                }
            }
        }
        // Censored results left out under censored: drop: the row goes, with its reason.
        for (int i = 0; i < n / 6; i++) {
            String a = "D" + Demo.usedCells().get(random.nextInt(Demo.usedCells().size())).substring(1);
            out.add(demo.sheet("text", "censored '<0.5' in " + a + ", censored: drop", x -> cell(x, a, SheetEdits.text(a, "<0.5")),
                    Demo.withOption(demo.notebook, "censored: drop"), new NotFrom(Demo.addresses(a), 1)));
        }
        return out;
    }

    List<CorpusCase> errors(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String code = pick(random, ERRORS);
            boolean used = i % 3 != 2;
            String a = used ? usedCell() : unusedCell();
            String element = i % 5 == 4 ? "<c r=\"" + a + "\" t=\"e\"><f>1/0</f><v>" + code + "</v></c>" : SheetEdits.error(a, code);
            out.add(demo.sheet("error", "error value '" + code + "' in " + (used ? "" : "unused ") + a, x -> cell(x, a, element),
                    used ? new Refused(NOT_A_NUMBER) : new Same()));
        }
        return out;
    }

    List<CorpusCase> empty(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String a = usedCell();
            int row = Integer.parseInt(a.substring(1));
            switch (i % 5) {
                case 0 -> out.add(demo.sheet("empty", "empty stored value in " + a,
                        x -> cell(x, a, "<c r=\"" + a + "\" s=\"6\" t=\"n\"><v></v></c>"), new Refused(NOT_A_NUMBER)));
                case 1 -> out.add(demo.sheet("empty", "self-closed value in " + a,
                        x -> cell(x, a, "<c r=\"" + a + "\" t=\"n\"><v/></c>"), new Refused(NOT_A_NUMBER)));
                case 2 -> out.add(demo.sheet("empty", "cell " + a + " removed", x -> SheetEdits.removeCell(x, a),
                        new Refused(NOT_A_NUMBER)));
                case 3 -> out.add(demo.sheet("empty", "cell " + a + " without a value element",
                        x -> cell(x, a, "<c r=\"" + a + "\" s=\"6\"/>"), new Refused(NOT_A_NUMBER)));
                default -> out.add(demo.sheet("empty", "row " + row + " removed", x -> SheetEdits.removeRow(x, row),
                        new NotFrom(Set.of(), 1)));
            }
        }
        return out;
    }

    List<CorpusCase> dates(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            switch (i % 4) {
                case 0 -> {
                    String a = usedCell().equals("D16") ? "D17" : usedCell();
                    String el = SheetEdits.element(demo.sheet, a);
                    // s="4" is the workbook's yyyy-mm-dd style: the number shows as a date.
                    String dated = el.replaceFirst(" s=\"\\d+\"", "").replaceFirst("<c r=\"" + a + "\"", "<c r=\"" + a + "\" s=\"4\"");
                    out.add(demo.sheet("date", "date style on " + a, x -> cell(x, a, dated), new Refused(NOT_A_NUMBER)));
                }
                case 1 -> {
                    String a = usedCell();
                    out.add(demo.sheet("date", "ISO date cell in " + a,
                            x -> cell(x, a, "<c r=\"" + a + "\" t=\"d\"><v>2026-11-0" + (1 + random.nextInt(9)) + "</v></c>"),
                            new Refused(NOT_A_NUMBER)));
                }
                case 2 -> {
                    String a = "E" + Demo.ROWS.get(random.nextInt(Demo.ROWS.size()));
                    String el = SheetEdits.element(demo.sheet, a).replaceFirst(" s=\"\\d+\"", " s=\"4\"");
                    out.add(demo.sheet("date", "date style on unused " + a, x -> cell(x, a, el), new Same()));
                }
                default -> out.add(demo.sheet("date", "run date B4 changed",
                        x -> cell(x, "B4", "<c r=\"B4\" t=\"n\" s=\"4\"><v>" + (46000 + random.nextInt(900)) + "</v></c>"), new Same()));
            }
        }
        return out;
    }

    /** Huge and tiny numbers that a double holds: read exactly (the analysis may then say what it cannot support). */
    List<CorpusCase> extremes(String category, String[] values, int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String v = pick(random, values);
            String a = usedCell();
            out.add(demo.sheet(category, v + " in " + a, x -> cell(x, a, SheetEdits.number(a, v)),
                    new Faithful(Demo.address(a), Double.parseDouble(v))));
        }
        return out;
    }

    List<CorpusCase> huge(int n) {
        return extremes("huge", HUGE, n);
    }

    List<CorpusCase> tiny(int n) {
        return extremes("tiny", TINY, n);
    }

    List<CorpusCase> notFinite(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String v = pick(random, NOT_FINITE);
            boolean used = i % 4 != 3;
            String a = used ? usedCell() : unusedCell();
            String element = i % 3 == 0 ? SheetEdits.text(a, v) : SheetEdits.number(a, v);
            out.add(demo.sheet("nan-inf", "'" + v + "' in " + (used ? "" : "unused ") + a, x -> cell(x, a, element),
                    used ? new Refused(NOT_A_NUMBER) : new Same()));
        }
        return out;
    }

    /** Formulas without a stored result, as openpyxl and converters write them. */
    List<CorpusCase> formulas(int n) {
        List<CorpusCase> out = new ArrayList<>();
        String evaluate = Demo.withOption(demo.notebook, "formulas: evaluate");
        Set<ErrorKey> noResult = Set.of(ErrorKey.FORMULA_WITHOUT_RESULT);
        for (int i = 0; i < n; i++) {
            String v = i % 2 == 0 ? "" : null; // <v></v> or no value element
            switch (i % 8) {
                case 0, 1 -> out.add(demo.sheet("formula", "C29 re-saved without its result" + (i % 2 == 0 ? "" : ", evaluated"),
                        x -> cell(x, "C29", "<c r=\"C29\" s=\"6\"><f>$B$6/2</f>" + (v == null ? "" : "<v></v>") + "</c>"),
                        i % 2 == 0 ? demo.notebook : evaluate, i % 2 == 0 ? new Refused(noResult) : new Same()));
                case 2, 3 -> {
                    // An x cell as a reference to another injection of the same standard: the same value.
                    int[] level = Demo.LEVELS[random.nextInt(Demo.LEVELS.length)];
                    int row = level[0] + 1 + random.nextInt(level[1] - level[0]);
                    String a = "C" + row;
                    boolean eval = i % 8 == 3;
                    out.add(demo.sheet("formula", a + " =C" + level[0] + " without result" + (eval ? ", evaluated" : ""),
                            x -> cell(x, a, SheetEdits.formula(a, "C" + level[0], v)), eval ? evaluate : demo.notebook,
                            eval ? new Same() : new Refused(noResult)));
                }
                case 4 -> {
                    String a = usedCell().equals("D16") ? "D17" : usedCell();
                    String stored = demo.stored.get(a);
                    out.add(demo.sheet("formula", a + " =" + stored + " evaluated", x -> cell(x, a, SheetEdits.formula(a, stored, v)),
                            evaluate, new Same()));
                }
                case 5 -> {
                    String a = "D" + Demo.usedCells().get(random.nextInt(Demo.usedCells().size())).substring(1);
                    if (a.equals("D16")) {
                        a = "D17";
                    }
                    String b = a;
                    double twice = demo.value(a) * 2;
                    out.add(demo.sheet("formula", a + " =" + demo.stored.get(a) + "*2 evaluated",
                            x -> cell(x, b, SheetEdits.formula(b, demo.stored.get(b) + "*2", v)), evaluate,
                            new Faithful(Demo.address(a), twice)));
                }
                case 6 -> {
                    String f = pick(random, new String[] {"1/0", "CUBEVALUE(\"x\")", "[1]Sheet1!A1", "NA()", "SQRT(-1)", "C9&\"x\"",
                        "SUM(A1:XFD1048576)", "FOO(1)", "INDIRECT(\"A1\")+1"});
                    String a = usedCell();
                    out.add(demo.sheet("formula", a + " =" + f + " evaluated", x -> cell(x, a, SheetEdits.formula(a, f, v)), evaluate,
                            new Refused(Set.of(ErrorKey.FORMULA_NOT_EVALUATED, ErrorKey.NOT_A_NUMBER))));
                }
                default -> out.add(demo.sheet("formula", "B6 outside the block without its result",
                        x -> cell(x, "B6", SheetEdits.formula("B6", "40/2", v)), new Same()));
            }
        }
        return out;
    }
}
