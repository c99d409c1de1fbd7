package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.meritbook.pipeline.Sha256;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The demo study end to end through the command line; its calibration is checked against an
 * independent computation: the workbook read here with POI directly, and the weighted fit done by
 * Apache Commons Math (general-purpose library) on the √w-scaled problem.
 */
class DemoRunTest {
    private static final Path NOTEBOOK = Path.of("demo-data/hmf-honey-validation.md");
    private static final Path WORKBOOK = Path.of("demo-data/hmf-honey-validation.xlsx");

    @TempDir
    static Path out;
    static JsonNode results;
    static String stdout;

    @BeforeAll
    static void runDemo() throws Exception {
        CommandLine cl = Main.commandLine();
        StringWriter text = new StringWriter();
        cl.setOut(new PrintWriter(text));
        assertEquals(Main.DONE, cl.execute("run", NOTEBOOK.toString(), "-o", out.toString()));
        stdout = text.toString();
        results = new ObjectMapper().readTree(out.resolve("hmf-honey-validation/rev1/results.json").toFile());
    }

    /** Standards in Calibration!C9:D31 as the analyst sees them, minus the blank row and the excluded D23. */
    private static double[][] standardsReadIndependently() throws Exception {
        String notebook = Files.readString(NOTEBOOK);
        assertTrue(notebook.contains("cell: Calibration!D23"), "the demo notebook excludes D23");
        List<double[]> points = new ArrayList<>();
        try (InputStream in = Files.newInputStream(WORKBOOK); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            Sheet sheet = wb.getSheet("Calibration");
            for (int r = 8; r <= 30; r++) { // rows 9..31
                Row row = sheet.getRow(r);
                if (row == null || row.getCell(2) == null || row.getCell(2).getCellType() == CellType.BLANK
                        || r == 22) { // row 23 is excluded
                    continue;
                }
                points.add(new double[] {number(row.getCell(2)), number(row.getCell(3))});
            }
        }
        return points.toArray(new double[0][]);
    }

    private static double number(Cell c) {
        return switch (c.getCellType()) {
            case NUMERIC -> c.getNumericCellValue();
            case STRING -> Double.parseDouble(c.getStringCellValue().trim());
            case FORMULA -> c.getNumericCellValue(); // the cached result
            default -> throw new AssertionError("unexpected cell " + c.getAddress());
        };
    }

    /** The demo's weighting: auto keeps 1/y² on these data (its trail step shows the comparison). */
    @Test
    void weightedCalibrationMatchesAnIndependentFit() throws Exception {
        double[][] p = standardsReadIndependently();
        int n = p.length;
        double meanRaw = 0;
        for (double[] pt : p) {
            meanRaw += 1 / (pt[1] * pt[1]) / n;
        }
        double[] sy = new double[n];
        double[][] sx = new double[n][2];
        for (int i = 0; i < n; i++) {
            double sw = Math.sqrt(1 / (p[i][1] * p[i][1]) / meanRaw); // 1/y² weights, normalised to mean 1
            sy[i] = sw * p[i][1];
            sx[i][0] = sw;
            sx[i][1] = sw * p[i][0];
        }
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
        ols.setNoIntercept(true);
        ols.newSampleData(sy, sx);
        double[] beta = ols.estimateRegressionParameters();
        double[] se = ols.estimateRegressionParametersStandardErrors();
        JsonNode q = section("linearity").get("quantities");
        assertEquals(n, q.get("n").get("value").asInt());
        assertEquals(beta[1], q.get("slope").get("value").asDouble(), 1e-9 * Math.abs(beta[1]));
        assertEquals(beta[0], q.get("intercept").get("value").asDouble(), 1e-9);
        assertEquals(se[1], q.get("slope_se").get("value").asDouble(), 1e-9 * se[1]);
        assertEquals(se[0], q.get("intercept_se").get("value").asDouble(), 1e-9 * se[0]);
        assertEquals(ols.estimateRegressionStandardError(), q.get("residual_sd").get("value").asDouble(), 1e-9);
        assertEquals("mAU·s per mg/L", q.get("slope").get("unit").asText());
        assertEquals("1/y^2 (chosen by auto)", section("linearity").get("settings").get("Weighting").asText());
        // the equation rounded as the dossier rounds a quantity with an interval: the slope 41.55 ± 0.40, the
        // intercept to the two decimals its own 95 % half-width allows (so 0.40, not the 0.396 of a fixed 3 digits)
        assertEquals("Peak area (mAU·s) = 0.40 + 41.55 · Nominal (mg/L)",
                section("linearity").get("settings").get("Calibration equation").asText());
    }

    @Test
    void unweightedCheckMatchesAnIndependentFit() throws Exception {
        double[][] p = standardsReadIndependently();
        org.apache.commons.math3.stat.regression.SimpleRegression reg =
                new org.apache.commons.math3.stat.regression.SimpleRegression();
        for (double[] pt : p) {
            reg.addData(pt[0], pt[1]);
        }
        JsonNode q = section("unweighted-check").get("quantities");
        assertEquals(reg.getSlope(), q.get("slope").get("value").asDouble(), 1e-9 * reg.getSlope());
        assertEquals(reg.getIntercept(), q.get("intercept").get("value").asDouble(), 1e-9);
        assertEquals(reg.getRSquare(), q.get("r_squared").get("value").asDouble(), 1e-12);
        assertEquals(reg.getR(), q.get("r").get("value").asDouble(), 1e-12);
    }

    @Test
    void resultsCarryTheInputsChecksumsAndTheTrail() {
        JsonNode inputs = results.get("inputs");
        assertEquals("meritbook-results/1", results.get("schema").asText());
        assertEquals(Sha256.of(NOTEBOOK), inputs.get(0).get("sha256").asText());
        assertEquals(Sha256.of(WORKBOOK), inputs.get(1).get("sha256").asText());
        assertEquals("Calibration!A8:F31", inputs.get(1).get("ranges").get(0).asText());
        // The demo generator stamps the workbook's core property "modified" 2026-11-20T09:00Z.
        assertEquals("2026-11-20", inputs.get(1).get("saved_on").asText());
        assertTrue(inputs.get(0).get("saved_on").isNull(), "a notebook records no save date");
        // Every quantity names a step that exists in the trail.
        List<String> stepIds = new ArrayList<>();
        results.get("trail").forEach(s -> stepIds.add(s.get("id").asText()));
        results.get("sections").forEach(s -> s.get("quantities").forEach(qn ->
                assertTrue(stepIds.contains(qn.get("step").asText()), qn.get("step").asText())));
        // The slope's step cites the raw cells through the data step.
        JsonNode dataStep = results.get("trail").get(stepIds.indexOf("linearity.n"));
        assertEquals("Calibration!D9", dataStep.get("inputs").get(1).get("source").asText());
        assertTrue(stdout.contains("linearity"), stdout);
    }

    @Test
    void theExcludedInjectionIsKeptVisibleWithItsReason() throws Exception {
        String trail = Files.readString(out.resolve("hmf-honey-validation/rev1/trail.md"));
        assertTrue(trail.contains("excluded Calibration!D23 | Air bubble"), "trail shows the exclusion");
        assertTrue(section("linearity").get("quantities").has("back_calculated:D23"));
    }

    private static JsonNode section(String id) {
        for (JsonNode s : results.get("sections")) {
            if (s.get("id").asText().equals(id)) {
                return s;
            }
        }
        throw new AssertionError("no section " + id);
    }
}
