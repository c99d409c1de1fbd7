package org.meritbook.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Name;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFTable;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Keeps the committed demo workbook, its generator and the demo notebook in step: the generator
 * must reproduce the committed file cell for cell, and the file must have the layout the
 * notebook's references and the README describe.
 */
class DemoWorkbookTest {

    private static final Path DEMO = Path.of("demo-data");
    private static final Path WORKBOOK = DEMO.resolve(DemoWorkbookGenerator.FILE_NAME);
    private static final Path NOTEBOOK = DEMO.resolve("hmf-honey-validation.md");

    @Test
    void generatorReproducesTheCommittedWorkbookCellForCell(@TempDir Path tmp) throws IOException {
        Path fresh = DemoWorkbookGenerator.write(tmp);
        List<String> committed = snapshot(WORKBOOK);
        List<String> regenerated = snapshot(fresh);
        // Guards against comparing two empty snapshots.
        assertTrue(committed.size() > 300, "snapshot too small: " + committed.size());
        // Line by line, so a failure names the first differing cell instead of printing both workbooks.
        String hint = "demo-data workbook and generator differ; rerun DemoWorkbookGenerator and commit the file";
        for (int i = 0; i < Math.min(committed.size(), regenerated.size()); i++) {
            assertEquals(committed.get(i), regenerated.get(i), hint);
        }
        assertEquals(committed.size(), regenerated.size(), hint);
    }

    @Test
    void twoRunsWriteIdenticalBytes(@TempDir Path tmp) throws IOException {
        byte[] first = Files.readAllBytes(DemoWorkbookGenerator.write(tmp.resolve("first")));
        byte[] second = Files.readAllBytes(DemoWorkbookGenerator.write(tmp.resolve("second")));
        assertArrayEquals(first, second, "regenerating must not change the committed file's bytes");
    }

    @Test
    void calibrationHasSevenLevelsOfThreeInjectionsAfterTheNotebookExclusion() throws IOException {
        String notebook = Files.readString(NOTEBOOK, StandardCharsets.UTF_8);
        assertTrue(notebook.contains("  lab: " + DemoWorkbookGenerator.FILE_NAME),
                "the notebook's source alias 'lab' must name the workbook");
        List<String> cells = analysisCells(notebook);
        assertEquals(2, cells.size(), "expected the two calibration cells");

        try (XSSFWorkbook wb = open(WORKBOOK)) {
            for (String cell : cells) {
                String data = option(cell, "data");
                Matcher ref = Pattern.compile("lab!(\\w+)!([A-Z]+\\d+):([A-Z]+\\d+)").matcher(data);
                assertTrue(ref.matches(), "unexpected data reference " + data);
                Sheet sheet = wb.getSheet(ref.group(1));
                assertNotNull(sheet, "no sheet " + ref.group(1));
                CellReference first = new CellReference(ref.group(2));
                CellReference last = new CellReference(ref.group(3));
                int xCol = headerColumn(sheet, first, last, option(cell, "x"));
                int yCol = headerColumn(sheet, first, last, option(cell, "y"));
                int notesCol = headerColumn(sheet, first, last, "Notes");

                Matcher ex = Pattern.compile("- cell: Calibration!([A-Z]+\\d+)").matcher(cell);
                assertTrue(ex.find(), "the cell names no exclusion");
                CellReference excluded = new CellReference(ex.group(1));
                assertEquals(yCol, excluded.getCol(), "the exclusion must name a peak area");
                assertTrue(excluded.getRow() > first.getRow() && excluded.getRow() <= last.getRow(),
                        "the excluded cell lies outside the data range");

                Map<Double, List<Double>> kept = new TreeMap<>();
                List<Double> excludedLevel = new ArrayList<>();
                double excludedArea = Double.NaN;
                int blankRows = 0;
                int textNumbers = 0;
                int formulas = 0;
                for (int r = first.getRow() + 1; r <= last.getRow(); r++) {
                    Row row = sheet.getRow(r);
                    if (row == null) {
                        blankRows++;
                        continue;
                    }
                    Cell x = row.getCell(xCol);
                    Cell y = row.getCell(yCol);
                    formulas += x.getCellType() == CellType.FORMULA ? 1 : 0;
                    textNumbers += y.getCellType() == CellType.STRING ? 1 : 0;
                    double nominal = number(x);
                    double area = number(y);
                    if (r == excluded.getRow()) {
                        excludedArea = area;
                        String note = row.getCell(notesCol, Row.MissingCellPolicy.CREATE_NULL_AS_BLANK).getStringCellValue();
                        assertTrue(note.contains("air bubble"), "excluded row's note: " + note);
                        excludedLevel.add(nominal);
                    } else {
                        kept.computeIfAbsent(nominal, k -> new ArrayList<>()).add(area);
                    }
                }
                assertEquals(1, blankRows, "one blank row inside the table");
                assertEquals(1, textNumbers, "one peak area stored as text");
                assertEquals(1, formulas, "one nominal written as a formula");
                assertEquals(DemoWorkbookGenerator.LEVELS.length, kept.size(), "levels: " + kept.keySet());
                for (Map.Entry<Double, List<Double>> level : kept.entrySet()) {
                    assertEquals(DemoWorkbookGenerator.INJECTIONS, level.getValue().size(),
                            "injections kept at " + level.getKey() + " mg/L");
                }
                // The excluded injection is the obvious outlier of its level; its neighbours agree.
                List<Double> same = kept.get(excludedLevel.get(0));
                double mean = same.stream().mapToDouble(Double::doubleValue).average().orElseThrow();
                assertTrue(excludedArea < 0.85 * mean, "excluded area " + excludedArea + " vs mean " + mean);
                for (double a : same) {
                    assertTrue(Math.abs(a / mean - 1) < 0.03, "kept area " + a + " vs mean " + mean);
                }
            }
        }
    }

    @Test
    void weightedFitOfTheKeptStandardsRecoversTheSimulatedLine() throws IOException {
        List<double[]> points = new ArrayList<>();
        try (XSSFWorkbook wb = open(WORKBOOK)) {
            Sheet sheet = wb.getSheet("Calibration");
            for (int r = DemoWorkbookGenerator.CAL_HEADER_ROW; r < DemoWorkbookGenerator.CAL_LAST_ROW; r++) {
                Row row = sheet.getRow(r);
                if (row != null && !row.getCell(5, Row.MissingCellPolicy.CREATE_NULL_AS_BLANK)
                        .getStringCellValue().contains("air bubble")) {
                    points.add(new double[] {number(row.getCell(2)), number(row.getCell(3))});
                }
            }
        }
        assertEquals(21, points.size());
        // Weighted least squares with w = 1/x (closed form); common practice.
        double sw = 0;
        double swx = 0;
        double swy = 0;
        double swxx = 0;
        double swxy = 0;
        for (double[] p : points) {
            double w = 1 / p[0];
            sw += w;
            swx += w * p[0];
            swy += w * p[1];
            swxx += w * p[0] * p[0];
            swxy += w * p[0] * p[1];
        }
        double slope = (sw * swxy - swx * swy) / (sw * swxx - swx * swx);
        double intercept = (swy - slope * swx) / sw;
        assertEquals(DemoWorkbookGenerator.SLOPE, slope, 0.02 * DemoWorkbookGenerator.SLOPE);
        assertEquals(DemoWorkbookGenerator.INTERCEPT, intercept, 0.25);
    }

    @Test
    void otherBlocksHaveTheDocumentedShape() throws IOException {
        try (XSSFWorkbook wb = open(WORKBOOK)) {
            XSSFSheet precision = wb.getSheet("Precision");
            XSSFTable table = precision.getTables().stream()
                    .filter(t -> t.getName().equals("PrecisionRuns")).findFirst().orElseThrow();
            assertEquals("A4:F52", table.getArea().formatAsString());
            assertEquals(List.of("Day", "Date", "Analyst", "Level", "Replicate", "Result (mg/kg)"),
                    table.getColumns().stream().map(c -> c.getName()).toList());
            Map<String, Integer> perDayAndLevel = new TreeMap<>();
            Map<Integer, String> analystOfDay = new TreeMap<>();
            for (int r = 4; r <= 51; r++) {
                Row row = precision.getRow(r);
                int day = (int) row.getCell(0).getNumericCellValue();
                perDayAndLevel.merge(day + "/" + row.getCell(3).getStringCellValue(), 1, Integer::sum);
                String analyst = row.getCell(2).getStringCellValue();
                assertEquals(analyst, analystOfDay.computeIfAbsent(day, d -> analyst), "one analyst per day");
                assertEquals(CellType.NUMERIC, row.getCell(5).getCellType());
            }
            assertEquals(8, perDayAndLevel.size(), perDayAndLevel.toString());
            assertTrue(perDayAndLevel.values().stream().allMatch(n -> n == 6), perDayAndLevel.toString());
            assertEquals(2, analystOfDay.values().stream().distinct().count());

            Name blanks = wb.getName("BlankSignals");
            assertEquals("Blanks!$B$5:$C$15", blanks.getRefersToFormula());
            Sheet blankSheet = wb.getSheet("Blanks");
            assertTrue(blankSheet.getMergedRegions().contains(CellRangeAddress.valueOf("B4:C4")));
            assertEquals("Area (mAU·s)", blankSheet.getRow(4).getCell(1).getStringCellValue());
            for (int r = 5; r <= 14; r++) {
                assertEquals(CellType.NUMERIC, blankSheet.getRow(r).getCell(1).getCellType(), "Blanks row " + (r + 1));
            }

            // The censored entry stays out of every column an analysis reads.
            Sheet spikes = wb.getSheet("Spikes");
            assertEquals("Reagent blank (mg/kg)", spikes.getRow(4).getCell(6).getStringCellValue());
            assertEquals("<0.5", spikes.getRow(5).getCell(6).getStringCellValue());
            for (int r = 5; r <= 22; r++) {
                for (int c = 3; c <= 5; c++) {
                    assertEquals(CellType.NUMERIC, spikes.getRow(r).getCell(c).getCellType(),
                            "Spikes " + new CellReference(r, c).formatAsString());
                }
            }
            assertNull(spikes.getRow(23), "nothing below the spike table");
        }
    }

    @Test
    void notebookHoldsTheCellsTheDemoShows() throws IOException {
        // Every kind is a real cell; the range and the samples come after the limits they are bounded by.
        String notebook = Files.readString(NOTEBOOK, StandardCharsets.UTF_8);
        Matcher fence = Pattern.compile("(?m)^```(\\S*)\\s*$").matcher(notebook);
        List<String> infos = new ArrayList<>();
        boolean open = false;
        while (fence.find()) {
            if (!open) {
                infos.add(fence.group(1));
            }
            open = !open;
        }
        assertFalse(open, "unclosed fence");
        assertEquals(List.of("calibration", "calibration", "detection-limit", "range", "detection-limit", "detection-limit",
                "accuracy", "precision", "unknowns"), infos);
    }

    // --- helpers ---

    private static XSSFWorkbook open(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return new XSSFWorkbook(in);
        }
    }

    /** One line per cell (address, type, value, formula, format), then merges, tables, names, dates. */
    private static List<String> snapshot(Path file) throws IOException {
        List<String> out = new ArrayList<>();
        try (XSSFWorkbook wb = open(file)) {
            for (Sheet sheet : wb) {
                out.add("sheet " + sheet.getSheetName());
                for (Row row : sheet) {
                    for (Cell cell : row) {
                        out.add(sheet.getSheetName() + "!" + cell.getAddress() + " " + describe(cell)
                                + " fmt=" + cell.getCellStyle().getDataFormatString());
                    }
                }
                for (CellRangeAddress merged : sheet.getMergedRegions()) {
                    out.add("merged " + sheet.getSheetName() + "!" + merged.formatAsString());
                }
                for (XSSFTable t : ((XSSFSheet) sheet).getTables()) {
                    out.add("table " + t.getName() + " " + t.getArea().formatAsString() + " "
                            + t.getColumns().stream().map(c -> c.getName()).toList());
                }
            }
            for (Name n : wb.getAllNames()) {
                out.add("name " + n.getNameName() + " " + n.getRefersToFormula());
            }
            var core = wb.getProperties().getCoreProperties();
            out.add("created " + core.getCreated().toInstant() + " modified " + core.getModified().toInstant());
        }
        return out;
    }

    private static String describe(Cell cell) {
        return switch (cell.getCellType()) {
            case FORMULA -> "FORMULA =" + cell.getCellFormula() + " cached " + cell.getCachedFormulaResultType()
                    + " " + cachedValue(cell);
            case NUMERIC -> "NUMERIC " + Double.toString(cell.getNumericCellValue());
            case STRING -> "STRING '" + cell.getStringCellValue() + "'";
            case BOOLEAN -> "BOOLEAN " + cell.getBooleanCellValue();
            case ERROR -> "ERROR " + cell.getErrorCellValue();
            default -> cell.getCellType().toString();
        };
    }

    private static String cachedValue(Cell cell) {
        return switch (cell.getCachedFormulaResultType()) {
            case NUMERIC -> Double.toString(cell.getNumericCellValue());
            case STRING -> "'" + cell.getStringCellValue() + "'";
            case BOOLEAN -> Boolean.toString(cell.getBooleanCellValue());
            default -> cell.getCachedFormulaResultType().toString();
        };
    }

    /** A cell's number as a reader would take it: numbers, cached formula results, numeric text. */
    private static double number(Cell cell) {
        return switch (cell.getCellType()) {
            case NUMERIC -> cell.getNumericCellValue();
            case FORMULA -> {
                assertEquals(CellType.NUMERIC, cell.getCachedFormulaResultType(), cell.getAddress().toString());
                yield cell.getNumericCellValue();
            }
            case STRING -> Double.parseDouble(cell.getStringCellValue().trim());
            default -> throw new AssertionError(cell.getAddress() + " holds no number: " + cell.getCellType());
        };
    }

    /** The fenced blocks whose info string is {@code calibration}, without their fences. */
    private static List<String> analysisCells(String notebook) {
        List<String> cells = new ArrayList<>();
        Matcher m = Pattern.compile("(?ms)^```calibration\\s*$(.*?)^```\\s*$").matcher(notebook);
        while (m.find()) {
            cells.add(m.group(1));
        }
        return cells;
    }

    private static String option(String cell, String key) {
        Matcher m = Pattern.compile("(?m)^" + key + ":\\s*(\\S.*?)\\s*$").matcher(cell);
        assertTrue(m.find(), "option " + key + " missing");
        return m.group(1);
    }

    /** Column of the header matching {@code name} with or without its unit part, as the notebook uses it. */
    private static int headerColumn(Sheet sheet, CellReference first, CellReference last, String name) {
        Row header = sheet.getRow(first.getRow());
        int found = -1;
        for (int c = first.getCol(); c <= last.getCol(); c++) {
            String text = header.getCell(c).getStringCellValue().trim();
            String bare = text.replaceFirst("\\s*\\(.*\\)$", "");
            if (text.equalsIgnoreCase(name) || bare.equalsIgnoreCase(name)) {
                assertEquals(-1, found, "two headers match " + name);
                found = c;
            }
        }
        assertTrue(found >= 0, "no header '" + name + "' in row " + (first.getRow() + 1));
        return found;
    }
}
