package org.meritbook.dossier;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.distribution.TDistribution;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Setting;
import org.meritbook.analysis.TableCell;
import org.meritbook.analysis.Verdict;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.FigureSpec.Series;
import org.meritbook.figures.FigureSpec.Style;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.pipeline.InputFile;
import org.meritbook.stats.Interval;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.AnalysisKind;
import org.meritbook.study.FrontMatter;
import org.meritbook.study.Narrative;
import org.meritbook.study.SourceFile;
import org.meritbook.study.Study;
import org.meritbook.study.StudyElement;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;

/**
 * TEST FIXTURE ONLY: a synthetic study whose numbers are invented (a made-up calibration of 21
 * points, one excluded, fitted here by ordinary least squares so that the figures and the trail are
 * self-consistent). Nothing here is a reference value; it exercises the dossier's layout.
 */
public final class DossierFixtures {
    /** Nominal concentrations (mg/L), three injections each: invented. */
    static final double[] LEVELS = {0.05, 0.10, 0.25, 0.50, 1.00, 1.50, 2.00};
    /** Invented peak areas: roughly 1520·x + 3 with a little scatter; P17 is the excluded injection. */
    static final double[] AREAS = {
        79.6, 80.9, 78.8, 155.2, 157.9, 154.7, 383.6, 386.1, 381.0, 763.2, 765.9, 758.4,
        1523.8, 1519.1, 1527.6, 2285.0, 2141.7, 2279.9, 3041.2, 3049.9, 3036.4};
    static final int EXCLUDED = 16; // zero-based: P17, Calibration!C21
    static final String EXCLUSION_REASON = "Injection failure recorded in the run log (fixture)";

    /** Options that make a study hostile: markup, template syntax and scripts in user text. */
    public record Text(String title, String yHeader, String narrative, String laboratory) {
    }

    public static final Text PLAIN = new Text(
            "Validation of nitrite in drinking water by ion chromatography (test fixture)",
            "Peak area (µS·min)",
            "Seven standards, three injections each, 0.05 to 2.0 mg/L. *Invented data for testing.*",
            "Fixture Water Laboratory (invented)");

    public static final Text HOSTILE = new Text(
            "Fixture <script>alert('t')</script> ${title} & <b>bold</b> Ελληνικά Кириллица 中文标题",
            "Area <script>x()</script> ${oops} & Co (µS·min)",
            "Raw <script>alert(1)</script> and <b>tags</b>, a ${freemarker} and <#if x>, an & ampersand.\n\n"
                    + "Greek: μέθοδος επικύρωσης. Cyrillic: валидация методики. CJK: 方法验证 and 検証.\n\n"
                    + "A very long word: " + "Pneumonoultramicroscopicsilicovolcanoconiosis".repeat(4) + ".\n\n"
                    + "<div style=\"color:red\">html block</div>\n\n[link](javascript:alert(1))",
            "Lab & Co <i>QA</i> ${lab}");

    private DossierFixtures() {
    }

    public static StudyResults results(Path dir) {
        return results(dir, PLAIN);
    }

    /** Writes the fixture notebook and workbook into {@code dir} (they are attached) and builds the results. */
    public static StudyResults results(Path dir, Text text) {
        try {
            Path notebook = dir.resolve("nitrite-fixture.md");
            String md = "---\ntitle: " + text.title() + "\n---\n(test fixture notebook)\n" + text.narrative() + "\n";
            Files.writeString(notebook, md, StandardCharsets.UTF_8);
            Path workbook = dir.resolve("nitrite-fixture.xlsx");
            byte[] wb = "TEST FIXTURE: stands in for a workbook's bytes".getBytes(StandardCharsets.US_ASCII);
            Files.write(workbook, wb);

            FrontMatter fm = new FrontMatter(text.title(), "FIX-IC-07", text.laboratory(), 2,
                    "Day 2 replicate 4 corrected from 0.512 to 0.521 (copying error)", "A. Fixture",
                    "2026-03-14", "trace-water", Map.of());
            Map<String, SourceFile> sources = new LinkedHashMap<>();
            sources.put("runs", new SourceFile("runs", workbook, "nitrite-fixture.xlsx", 9));
            List<StudyElement> elements = List.of(
                    new Narrative("# " + text.title() + "\n\nPurpose: show the method is fit for nitrite "
                            + "at trace level.\n\n## Linearity\n" + text.narrative(), 12),
                    new AnalysisCell("calibration", AnalysisKind.CALIBRATION, "Linearity", 20, Map.of(), List.of()),
                    new Narrative("## Repeatability\nSix replicate determinations at 0.5 mg/L on one day.", 32),
                    new AnalysisCell("precision", AnalysisKind.PRECISION, "Repeatability", 35, Map.of(), List.of()),
                    new Narrative("## Conclusion\nThe fixture ends here.", 44));
            Study study = new Study(notebook, md, fm, sources, elements);
            List<InputFile> inputs = List.of(
                    new InputFile("notebook", "nitrite-fixture.md", sha256(md.getBytes(StandardCharsets.UTF_8)),
                            md.getBytes(StandardCharsets.UTF_8).length, List.of()),
                    new InputFile("runs", "nitrite-fixture.xlsx", sha256(wb), wb.length,
                            List.of("Calibration!A4:C25", "Precision!B3:B9")));
            return new StudyResults(study, inputs, List.of(calibration(text), precision()),
                    List.of(new StudyResults.SoftwareComponent("meritbook", "0.1.0-SNAPSHOT"),
                            new StudyResults.SoftwareComponent("Apache POI", "5.4.1"),
                            new StudyResults.SoftwareComponent("Apache Commons Math", "3.6.1")));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static SectionResult calibration(Text text) {
        int n = AREAS.length;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = LEVELS[i / 3];
        }
        // Ordinary least squares on the points kept (fixture arithmetic, not the product's).
        double sx = 0, sy = 0;
        int m = 0;
        for (int i = 0; i < n; i++) {
            if (i != EXCLUDED) {
                sx += x[i];
                sy += AREAS[i];
                m++;
            }
        }
        double xbar = sx / m, ybar = sy / m, sxx = 0, sxy = 0, syy = 0;
        for (int i = 0; i < n; i++) {
            if (i != EXCLUDED) {
                sxx += (x[i] - xbar) * (x[i] - xbar);
                sxy += (x[i] - xbar) * (AREAS[i] - ybar);
                syy += (AREAS[i] - ybar) * (AREAS[i] - ybar);
            }
        }
        double b = sxy / sxx, a = ybar - b * xbar, sse = 0;
        for (int i = 0; i < n; i++) {
            if (i != EXCLUDED) {
                double e = AREAS[i] - a - b * x[i];
                sse += e * e;
            }
        }
        int df = m - 2;
        double s = Math.sqrt(sse / df), seB = s / Math.sqrt(sxx), seA = s * Math.sqrt(1.0 / m + xbar * xbar / sxx);
        double t = new TDistribution(df).inverseCumulativeProbability(0.975);
        double r = sxy / Math.sqrt(sxx * syy);

        String yUnit = "µS·min";
        List<Quantity> q = new ArrayList<>();
        List<Step> steps = new ArrayList<>();
        List<StepInput> xy = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (i != EXCLUDED) {
                xy.add(StepInput.number("x[" + (i + 1) + "]", x[i], "mg/L", "Calibration!A" + (i + 5)));
                xy.add(StepInput.number("y[" + (i + 1) + "]", AREAS[i], yUnit, "Calibration!C" + (i + 5)));
            }
        }
        xy.add(StepInput.text("weighting", "none", "notebook line 24"));
        q.add(new Quantity("n", "Number of points used", m, null, "calibration.n", null, false, NumberKind.COUNT));
        steps.add(new Step("calibration.n", "Number of points used", "n = count of points not excluded",
                List.of(StepInput.number("points read", n, null, "Calibration!A4:C25"),
                        StepInput.number("excluded", 1, null, "notebook line 26")), m, null, null));
        q.add(new Quantity("slope", "Slope (sensitivity)", b, yUnit + " per mg/L", "calibration.slope",
                new Interval(b - t * seB, b + t * seB, 0.95), true));
        steps.add(new Step("calibration.slope", "Slope (sensitivity)", "b = Σ(x−x̄)(y−ȳ) / Σ(x−x̄)²", xy, b,
                yUnit + " per mg/L", "Ordinary least squares"));
        q.add(new Quantity("intercept", "Intercept", a, yUnit, "calibration.intercept",
                new Interval(a - t * seA, a + t * seA, 0.95), true));
        steps.add(new Step("calibration.intercept", "Intercept", "a = ȳ − b·x̄",
                List.of(StepInput.number("ȳ", ybar, yUnit, "calibration.slope"),
                        StepInput.number("b", b, yUnit + " per mg/L", "calibration.slope"),
                        StepInput.number("x̄", xbar, "mg/L", "calibration.slope")), a, yUnit, "Ordinary least squares"));
        q.add(new Quantity("slope_se", "Standard error of the slope", seB, yUnit + " per mg/L", "calibration.slope_se",
                null, false));
        steps.add(new Step("calibration.slope_se", "Standard error of the slope", "SE(b) = s(y/x) / √Σ(x−x̄)²",
                List.of(StepInput.number("s(y/x)", s, yUnit, "calibration.residual_sd"),
                        StepInput.number("Σ(x−x̄)²", sxx, "(mg/L)²", "calibration.slope")), seB, yUnit + " per mg/L",
                null));
        q.add(new Quantity("r", "Correlation coefficient r", r, null, "calibration.r", null, false, NumberKind.CORRELATION));
        steps.add(new Step("calibration.r", "Correlation coefficient r", "r = Σ(x−x̄)(y−ȳ) / √(Σ(x−x̄)²·Σ(y−ȳ)²)",
                List.of(StepInput.number("Σ(x−x̄)(y−ȳ)", sxy, null, "calibration.slope"),
                        StepInput.number("Σ(x−x̄)²", sxx, null, "calibration.slope"),
                        StepInput.number("Σ(y−ȳ)²", syy, null, "calibration.slope")), r, null, null));
        q.add(new Quantity("r_squared", "Coefficient of determination r²", r * r, null, "calibration.r_squared",
                null, true, NumberKind.CORRELATION));
        steps.add(new Step("calibration.r_squared", "Coefficient of determination r²", "r² = r·r",
                List.of(StepInput.number("r", r, null, "calibration.r")), r * r, null, null));
        q.add(new Quantity("residual_sd", "Residual standard deviation s(y/x)", s, yUnit, "calibration.residual_sd",
                null, true));
        steps.add(new Step("calibration.residual_sd", "Residual standard deviation s(y/x)", "s(y/x) = √(Σe² / (n−2))",
                List.of(StepInput.number("Σe²", sse, yUnit + "²", "calibration.slope"),
                        StepInput.number("n", m, null, "calibration.n")), s, yUnit, null));

        List<DataTable.Row> rows = new ArrayList<>();
        double[] stdRes = new double[n];
        double[] dev = new double[n];
        java.util.Map<String, Double> nominals = new java.util.LinkedHashMap<>();
        for (int i = 0; i < n; i++) {
            String p = "P" + (i + 1);
            nominals.put(p, x[i]);
            double back = (AREAS[i] - a) / b;
            dev[i] = (back - x[i]) / x[i] * 100;
            stdRes[i] = (AREAS[i] - a - b * x[i]) / s;
            q.add(new Quantity("back_calculated:" + p, "Back-calculated concentration, " + p, back, "mg/L",
                    "calibration.back_calculated:" + p, null, false));
            steps.add(new Step("calibration.back_calculated:" + p, "Back-calculated concentration, " + p,
                    "x̂ = (y − a) / b", List.of(StepInput.number("y", AREAS[i], yUnit, "Calibration!C" + (i + 5)),
                            StepInput.number("a", a, yUnit, "calibration.intercept"),
                            StepInput.number("b", b, yUnit + " per mg/L", "calibration.slope")), back, "mg/L", null));
            q.add(new Quantity("deviation_percent:" + p, "Deviation from nominal, " + p, dev[i], "%",
                    "calibration.deviation_percent:" + p, null, false));
            steps.add(new Step("calibration.deviation_percent:" + p, "Deviation from nominal, " + p,
                    "d = (x̂ − x) / x × 100", List.of(
                            StepInput.number("x̂", back, "mg/L", "calibration.back_calculated:" + p),
                            StepInput.number("x", x[i], "mg/L", "Calibration!A" + (i + 5))), dev[i], "%", null));
            rows.add(new DataTable.Row(p, List.of(
                    TableCell.raw(fmtRaw(x[i]), "Calibration!A" + (i + 5)),
                    TableCell.raw(String.valueOf(1 + i % 3), "Calibration!B" + (i + 5)),
                    TableCell.raw(fmtRaw(AREAS[i]), "Calibration!C" + (i + 5)),
                    TableCell.computed("back_calculated:" + p),
                    TableCell.computed("deviation_percent:" + p)), i == EXCLUDED ? EXCLUSION_REASON : null));
        }
        DataTable table = new DataTable(List.of("Nominal (mg/L)", "Injection", text.yHeader(),
                "Back-calculated (mg/L)", "Deviation (%)"), rows);

        List<FigureSpec> figures = figures(x, a, b, s, t, m, xbar, sxx, stdRes, dev, text);
        List<Verdict> verdicts = List.of(
                new Verdict("Linearity", "r_squared", "r² ≥ 0.995", Verdict.Outcome.PASS,
                        String.format(java.util.Locale.ROOT, "r² = %.5f", r * r)),
                new Verdict("Residual scatter", "residual_sd", "s(y/x) ≤ 10 µS·min", Verdict.Outcome.PASS,
                        "s(y/x) below the limit"));
        return new SectionResult("calibration", AnalysisKind.CALIBRATION, "Linearity",
                List.of(new Setting("Model", "linear"), new Setting("Weighting", "none (1)"),
                        new Setting("Data", "runs!Calibration!A4:C25"), new Setting("Confidence level", "95 %")),
                q, steps, table, figures, verdicts,
                List.of("Point P17 (Calibration!C21) is excluded: " + EXCLUSION_REASON + ".",
                        "Lack-of-fit test not evaluable in this fixture: the fixture does not compute it."),
                List.of(new org.meritbook.analysis.NominalValues(nominals)));
    }

    private static List<FigureSpec> figures(double[] x, double a, double b, double s, double t, int m, double xbar,
                                            double sxx, double[] stdRes, double[] dev, Text text) {
        int n = x.length;
        double[] ux = new double[n - 1], uy = new double[n - 1], ur = new double[n - 1], ud = new double[n - 1];
        for (int i = 0, j = 0; i < n; i++) {
            if (i != EXCLUDED) {
                ux[j] = x[i];
                uy[j] = AREAS[i];
                ur[j] = stdRes[i];
                ud[j] = dev[i];
                j++;
            }
        }
        int k = 41;
        double[] gx = new double[k], fit = new double[k], cl = new double[k], cu = new double[k],
                pl = new double[k], pu = new double[k];
        for (int i = 0; i < k; i++) {
            gx[i] = 2.0 * i / (k - 1);
            fit[i] = a + b * gx[i];
            double lev = 1.0 / m + (gx[i] - xbar) * (gx[i] - xbar) / sxx;
            cl[i] = fit[i] - t * s * Math.sqrt(lev);
            cu[i] = fit[i] + t * s * Math.sqrt(lev);
            pl[i] = fit[i] - t * s * Math.sqrt(1 + lev);
            pu[i] = fit[i] + t * s * Math.sqrt(1 + lev);
        }
        double[] ex = {x[EXCLUDED]};
        String yTitle = text.yHeader();
        return List.of(
                new FigureSpec("calibration.fit", "Calibration: points, fitted line and 95 % bands",
                        "Nominal concentration (mg/L)", yTitle, List.of(
                        new Series("Standards", Style.POINTS, ux, uy),
                        new Series("Excluded", Style.EXCLUDED_POINTS, ex, new double[] {AREAS[EXCLUDED]}),
                        new Series("Fitted line", Style.LINE, gx, fit),
                        new Series("95 % confidence band", Style.DASHED, gx, cl),
                        new Series("95 % confidence band", Style.DASHED, gx, cu),
                        new Series("95 % prediction band", Style.DOTTED, gx, pl),
                        new Series("95 % prediction band", Style.DOTTED, gx, pu))),
                new FigureSpec("calibration.residuals", "Standardized residuals against concentration",
                        "Nominal concentration (mg/L)", "Standardized residual (1)", List.of(
                        new Series("Standardized residual", Style.POINTS, ux, ur),
                        new Series("Zero", Style.REFERENCE, new double[] {0, 2}, new double[] {0, 0}),
                        new Series("±2", Style.DOTTED, new double[] {0, 2}, new double[] {2, 2}),
                        new Series("±2", Style.DOTTED, new double[] {0, 2}, new double[] {-2, -2}))),
                new FigureSpec("calibration.deviation", "Back-calculated deviation from nominal with tolerance",
                        "Nominal concentration (mg/L)", "Deviation from nominal (%)", List.of(
                        new Series("Deviation", Style.POINTS, ux, ud),
                        new Series("Excluded", Style.EXCLUDED_POINTS, ex, new double[] {dev[EXCLUDED]}),
                        new Series("Zero", Style.REFERENCE, new double[] {0, 2}, new double[] {0, 0}),
                        new Series("Tolerance ±15 %", Style.DOTTED, new double[] {0, 2}, new double[] {15, 15}),
                        new Series("Tolerance ±15 %", Style.DOTTED, new double[] {0, 2}, new double[] {-15, -15}))));
    }

    static SectionResult precision() {
        double[] v = {0.503, 0.498, 0.511, 0.489, 0.521, 0.507};
        double mean = 0, ss = 0;
        for (double d : v) {
            mean += d / v.length;
        }
        for (double d : v) {
            ss += (d - mean) * (d - mean);
        }
        double sd = Math.sqrt(ss / (v.length - 1)), cv = sd / mean * 100;
        List<StepInput> in = new ArrayList<>();
        for (int i = 0; i < v.length; i++) {
            in.add(StepInput.number("x[" + (i + 1) + "]", v[i], "mg/L", "Precision!B" + (i + 4)));
        }
        List<DataTable.Row> rows = new ArrayList<>();
        for (int i = 0; i < v.length; i++) {
            rows.add(new DataTable.Row("R" + (i + 1), List.of(TableCell.raw(fmtRaw(v[i]), "Precision!B" + (i + 4))),
                    null));
        }
        return new SectionResult("precision", AnalysisKind.PRECISION, "Repeatability",
                List.of(new Setting("Grouping", "none (single run)")),
                List.of(new Quantity("mean", "Mean", mean, "mg/L", "precision.mean", null, false),
                        new Quantity("sd", "Standard deviation", sd, "mg/L", "precision.sd",
                                new Interval(sd * 0.624, sd * 2.453, 0.95), true),
                        new Quantity("cv_percent", "Relative standard deviation (CV)", cv, "%",
                                "precision.cv_percent", null, true)),
                List.of(new Step("precision.mean", "Mean", "x̄ = Σx / n", in, mean, "mg/L", null),
                        new Step("precision.sd", "Standard deviation", "s = √(Σ(x−x̄)² / (n−1))",
                                List.of(StepInput.number("x̄", mean, "mg/L", "precision.mean")), sd, "mg/L", null),
                        new Step("precision.cv_percent", "Relative standard deviation (CV)", "CV = s / x̄ × 100",
                                List.of(StepInput.number("s", sd, "mg/L", "precision.sd"),
                                        StepInput.number("x̄", mean, "mg/L", "precision.mean")), cv, "%", null)),
                new DataTable(List.of("Result (mg/L)"), rows),
                List.of(),
                List.of(new Verdict("Repeatability", "cv_percent", "CV ≤ 2 %", Verdict.Outcome.FAIL,
                                String.format(java.util.Locale.ROOT, "CV = %.2f %% exceeds 2 %%", cv)),
                        new Verdict("Intermediate precision", "intermediate_sd", "CV(intermediate) ≤ 3 %",
                                Verdict.Outcome.NOT_EVALUABLE, "only one run: no between-run variance")),
                List.of());
    }

    private static String fmtRaw(double d) {
        return new java.math.BigDecimal(Double.toString(d)).stripTrailingZeros().toPlainString();
    }

    static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
