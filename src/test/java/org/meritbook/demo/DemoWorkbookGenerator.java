package org.meritbook.demo;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.Date;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.poi.ooxml.POIXMLProperties;
import org.apache.poi.ss.SpreadsheetVersion;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.CreationHelper;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.HorizontalAlignment;
import org.apache.poi.ss.usermodel.Name;
import org.apache.poi.ss.util.AreaReference;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xssf.usermodel.XSSFCell;
import org.apache.poi.xssf.usermodel.XSSFFormulaEvaluator;
import org.apache.poi.xssf.usermodel.XSSFRow;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFTable;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Writes the bundled demo workbook: an invented validation of 5-hydroxymethylfurfural (HMF) in
 * honey by HPLC-DAD at the invented Fenwick Moor Food Laboratory. All values are simulated from
 * the true models below with a fixed seed, then rounded as an instrument or LIMS export would
 * round them; the quirks (blank row, number stored as text, formula cell, merged header, censored
 * entry, a bad injection) are placed on purpose for the reader to cope with.
 *
 * <p>Run with the test classpath: {@code java -cp ... org.meritbook.demo.DemoWorkbookGenerator
 * demo-data}. {@link DemoWorkbookTest} regenerates the file and compares it cell by cell with the
 * committed copy.
 */
public final class DemoWorkbookGenerator {

    /** The committed workbook's file name (the notebook's {@code sources:} entry names it). */
    public static final String FILE_NAME = "hmf-honey-validation.xlsx";

    /** Date of every zip entry, the same as the core properties' created/modified. */
    static final LocalDateTime ENTRY_TIME = LocalDateTime.of(2026, 11, 20, 9, 0);

    /** Fixed so the committed file can be regenerated exactly. */
    static final long SEED = 20261109L;

    // True calibration model: area = INTERCEPT + SLOPE * c, with c in mg/L and area in mAU·s.
    static final double SLOPE = 41.8;
    static final double INTERCEPT = 0.35;
    // Noise SD = sqrt((CV * mean)^2 + FLOOR^2): mostly proportional, so 1/x weighting matters.
    static final double AREA_CV = 0.012;
    static final double AREA_FLOOR_SD = 0.05;

    /** Calibration levels in mg/L; the top one is written as a formula on the working standard. */
    static final double[] LEVELS = {0.10, 0.25, 0.50, 1.00, 2.50, 5.00, 10.0};
    static final int INJECTIONS = 3;
    static final double WORKING_STANDARD = 20.0;

    // The layout the notebook's references depend on (1-based rows as Excel shows them).
    static final int CAL_HEADER_ROW = 8;
    static final int CAL_LAST_ROW = 31;
    /** Standard S5 (index 4), injection 2: the air-bubble injection, reinjected as injection 4. */
    static final int BAD_LEVEL = 4;
    static final int BAD_INJECTION = 2;
    /** The bad injection keeps only this fraction of its expected area (part of the loop was air). */
    static final double BAD_FRACTION = 0.72;

    // Procedural blanks: area of the HMF window in blanks, mAU·s.
    static final int BLANKS = 10;
    static final double BLANK_MEAN = 0.41;
    static final double BLANK_SD = 0.12;

    // Spikes: honey with natural HMF, spiked at three levels (mg/kg).
    static final double BACKGROUND = 8.6;
    static final double[] SPIKE_ADDED = {5.0, 20.0, 40.0};
    static final String[] SPIKE_LEVEL = {"low", "mid", "high"};
    static final double[] SPIKE_RECOVERY = {0.96, 0.99, 1.01};
    static final double[] SPIKE_CV = {0.035, 0.025, 0.025};
    static final double BACKGROUND_CV = 0.03;
    static final int SPIKE_REPLICATES = 6;

    // Precision: two QC levels, 4 days, one analyst per day, 6 replicates per day and level.
    static final String[] QC_LEVEL = {"QC-N", "QC-S"};
    static final double[] QC_TRUE = {8.6, 38.3};
    static final int DAYS = 4;
    static final int QC_REPLICATES = 6;
    static final double BETWEEN_DAY_CV = 0.015;
    static final double REPEATABILITY_CV = 0.02;
    static final String[] DAY_ANALYST = {"IH", "PN", "IH", "PN"};
    static final LocalDate FIRST_DAY = LocalDate.of(2026, 11, 10);

    // Detection-limit studies run on the results (mg/kg), in a sugar-syrup blank matrix free of HMF.
    /** A second stream, so that the sheets added for the limit studies leave the earlier sheets unchanged. */
    static final long LIMITS_SEED = 20261116L;
    static final double MDL_SPIKE = 0.50;
    static final int MDL_SPIKES = 8;
    static final double MDL_SPIKE_CV = 0.045;
    static final int MDL_BLANKS = 10;
    static final double MDL_BLANK_MEAN = 0.02;
    static final double MDL_BLANK_SD = 0.018;
    static final String[] MDL_BATCH = {"B1", "B1", "B1", "B2", "B2", "B2", "B3", "B3"};
    // CLSI EP17-style study: blank results and three low-level samples, six replicates each.
    static final int LOB_BLANKS = 20;
    static final double LOB_BLANK_MEAN = 0.01;
    static final double LOB_BLANK_SD = 0.02;
    static final String[] LOW_SAMPLE = {"LL-1", "LL-2", "LL-3"};
    static final double[] LOW_TRUE = {0.08, 0.12, 0.20};
    static final double LOW_SD = 0.022;
    static final int LOW_REPLICATES = 6;
    // Signal-to-noise of the lowest standard (S1, 0.10 mg/L): peak height and baseline noise in mAU.
    static final double SN_HEIGHT = 0.62;
    static final double SN_NOISE = 0.021;
    // Routine samples and QCs read back through the reporting calibration (mg/kg in honey).
    static final String[] SAMPLE_ID = {"H-26-201", "H-26-202", "H-26-203", "H-26-204", "H-26-205", "H-26-206",
        "H-26-206"};
    static final double[] SAMPLE_TRUE = {3.2, 12.5, 27.8, 41.3, 0.35, 152.0, 152.0};
    /** H-26-206 is above the calibrated span undiluted, then rerun diluted 1 + 4. */
    static final int[] SAMPLE_DILUTION = {1, 1, 1, 1, 1, 1, 5};
    static final String[] QC_ID = {"QC-L", "QC-M", "QC-H"};
    static final double[] QC_NOMINAL = {2.0, 20.0, 80.0};
    static final double PORTION_G = 5.00;
    static final double PORTION_SD_G = 0.015;
    static final double FINAL_VOLUME_ML = 50.0;

    private DemoWorkbookGenerator() {
    }

    public static void main(String[] args) throws IOException {
        Path folder = Path.of(args.length > 0 ? args[0] : "demo-data");
        Path written = write(folder);
        System.out.println("wrote " + written);
    }

    /** Writes the workbook into {@code folder} (created if needed) and returns its path. */
    public static Path write(Path folder) throws IOException {
        Files.createDirectories(folder);
        Path target = folder.resolve(FILE_NAME);
        // Written beside the target and moved, so a failed run never leaves half a file.
        Path tmp = folder.resolve(FILE_NAME + ".tmp");
        try (XSSFWorkbook wb = build()) {
            ByteArrayOutputStream poi = new ByteArrayOutputStream();
            wb.write(poi);
            Files.write(tmp, withFixedEntryTimes(poi.toByteArray()));
        } catch (IOException | RuntimeException e) {
            Files.deleteIfExists(tmp);
            throw e;
        }
        Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        return target;
    }

    /**
     * Rewrites the package with every zip entry dated {@link #ENTRY_TIME}: POI stamps entries with
     * the current time, so without this each regeneration would change the committed file's bytes.
     */
    static byte[] withFixedEntryTimes(byte[] xlsx) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(xlsx));
                ZipOutputStream zip = new ZipOutputStream(out)) {
            for (ZipEntry entry = in.getNextEntry(); entry != null; entry = in.getNextEntry()) {
                ZipEntry copy = new ZipEntry(entry.getName());
                copy.setTimeLocal(ENTRY_TIME); // local DOS time as given, independent of the time zone
                zip.putNextEntry(copy);
                in.transferTo(zip);
                zip.closeEntry();
            }
        }
        return out.toByteArray();
    }

    /** Builds the workbook in memory; same seed, same cells. */
    static XSSFWorkbook build() {
        Random random = new Random(SEED); // java.util.Random: its nextGaussian is specified, so stable across JDKs
        XSSFWorkbook wb = new XSSFWorkbook();
        Styles styles = new Styles(wb);
        calibration(wb, styles, random);
        blanks(wb, styles, random);
        spikes(wb, styles, random);
        precision(wb, styles, random);
        Random limits = new Random(LIMITS_SEED);
        mdlStudy(wb, styles, limits);
        lowLevelStudy(wb, styles, limits);
        signalNoise(wb, styles, limits);
        samples(wb, styles, limits);
        // Stores cached results, as Excel would on save, so a reader can use them without evaluating.
        XSSFFormulaEvaluator.evaluateAllFormulaCells(wb);
        POIXMLProperties.CoreProperties core = wb.getProperties().getCoreProperties();
        core.setTitle("HMF in honey – validation raw data (invented demo)");
        core.setCreator("meritbook demo generator");
        Optional<Date> fixed = Optional.of(Date.from(Instant.parse("2026-11-20T09:00:00Z")));
        core.setCreated(fixed);
        core.setModified(fixed);
        return wb;
    }

    private static void calibration(XSSFWorkbook wb, Styles styles, Random random) {
        XSSFSheet sh = wb.createSheet("Calibration");
        text(sh, 1, 0, "HMF calibration – HPLC-DAD, 285 nm", styles.title);
        text(sh, 2, 0, "Instrument", styles.label);
        text(sh, 2, 1, "LC-07 (quaternary pump, DAD), column C18 150 × 4.6 mm", null);
        text(sh, 3, 0, "Analyst", styles.label);
        text(sh, 3, 1, "IH", null);
        text(sh, 4, 0, "Run date", styles.label);
        date(sh, 4, 1, FIRST_DAY.minusDays(1), styles.date);
        text(sh, 5, 0, "Run id", styles.label);
        text(sh, 5, 1, "CAL-261109-A", null);
        text(sh, 6, 0, "Working standard (mg/L)", styles.label);
        number(sh, 6, 1, WORKING_STANDARD, null);

        String[] header = {"Std ID", "Injection", "Nominal (mg/L)", "Peak area (mAU·s)", "RT (min)", "Notes"};
        for (int c = 0; c < header.length; c++) {
            text(sh, CAL_HEADER_ROW, c, header[c], styles.header);
        }
        int row = CAL_HEADER_ROW + 1;
        for (int level = 0; level < LEVELS.length; level++) {
            if (level == 4) {
                row++; // a blank row left inside the table, as found in hand-kept sheets
            }
            double conc = LEVELS[level];
            double mean = INTERCEPT + SLOPE * conc;
            double sd = Math.hypot(AREA_CV * mean, AREA_FLOOR_SD);
            int injections = level == BAD_LEVEL ? INJECTIONS + 1 : INJECTIONS;
            for (int inj = 1; inj <= injections; inj++) {
                double area = mean + sd * random.nextGaussian();
                double rt = 6.42 + 0.008 * random.nextGaussian();
                String note = null;
                if (level == BAD_LEVEL && inj == BAD_INJECTION) {
                    area = mean * BAD_FRACTION + sd * random.nextGaussian();
                    note = "air bubble in sample loop – reinjected (inj. 4)";
                } else if (level == BAD_LEVEL && inj == INJECTIONS + 1) {
                    note = "reinjection of inj. 2";
                } else if (level == 0 && inj == 1) {
                    note = "first injection after equilibration";
                }
                text(sh, row, 0, "S" + (level + 1), null);
                number(sh, row, 1, inj, null);
                if (level == LEVELS.length - 1 && inj == 1) {
                    // Top standard typed as a dilution of the working standard, 1 + 1.
                    formula(sh, row, 2, "$B$6/2", styles.twoDecimals);
                } else {
                    number(sh, row, 2, conc, styles.twoDecimals);
                }
                if (level == 2 && inj == 2) {
                    // Pasted from the data system as text: a number stored as text.
                    text(sh, row, 3, fixed(area, 2), null);
                } else {
                    number(sh, row, 3, round(area, 2), styles.twoDecimals);
                }
                number(sh, row, 4, round(rt, 3), styles.threeDecimals);
                if (note != null) {
                    text(sh, row, 5, note, null);
                }
                row++;
            }
        }
        if (row - 1 != CAL_LAST_ROW) {
            throw new IllegalStateException("calibration table ends at row " + (row - 1));
        }
        widths(sh, 16, 10, 15, 18, 10, 44);
    }

    private static void blanks(XSSFWorkbook wb, Styles styles, Random random) {
        XSSFSheet sh = wb.createSheet("Blanks");
        text(sh, 1, 0, "Procedural blanks – HMF window (6.3–6.6 min), 285 nm", styles.title);
        text(sh, 2, 0, "Water taken through Carrez clarification and filtration; one blank per preparation.", null);
        // Two-row header: "Blank signal" merged over its two sub-columns; the outer ones span both rows.
        text(sh, 4, 0, "Blank ID", styles.header);
        text(sh, 4, 1, "Blank signal", styles.header);
        text(sh, 4, 3, "Prepared", styles.header);
        text(sh, 5, 1, "Area (mAU·s)", styles.header);
        text(sh, 5, 2, "Note", styles.header);
        sh.addMergedRegion(new CellRangeAddress(3, 3, 1, 2));
        sh.addMergedRegion(new CellRangeAddress(3, 4, 0, 0));
        sh.addMergedRegion(new CellRangeAddress(3, 4, 3, 3));
        for (int i = 0; i < BLANKS; i++) {
            int row = 6 + i;
            double area = BLANK_MEAN + BLANK_SD * random.nextGaussian();
            text(sh, row, 0, String.format(Locale.ROOT, "PB-%02d", i + 1), null);
            number(sh, row, 1, round(area, 2), styles.twoDecimals);
            if (i == 6) {
                text(sh, row, 2, "baseline step, integrated manually", null);
            }
            date(sh, row, 3, FIRST_DAY.plusDays(i / 3), styles.date);
        }
        Name name = wb.createName();
        name.setNameName("BlankSignals");
        name.setRefersToFormula("Blanks!$B$5:$C$15");
        widths(sh, 12, 14, 36, 12);
    }

    private static void spikes(XSSFWorkbook wb, Styles styles, Random random) {
        XSSFSheet sh = wb.createSheet("Spikes");
        text(sh, 1, 0, "Spike recovery – HMF in honey", styles.title);
        text(sh, 2, 0, "Matrix", styles.label);
        text(sh, 2, 1, "multifloral honey, lot H-26-118", null);
        text(sh, 3, 0, "Test portion", styles.label);
        text(sh, 3, 1, "5.00 g made up to 50 mL after Carrez clarification; results in mg/kg", null);
        String[] header = {"Sample ID", "Level", "Replicate", "Unspiked (mg/kg)", "Added (mg/kg)",
            "Measured (mg/kg)", "Reagent blank (mg/kg)", "Notes"};
        for (int c = 0; c < header.length; c++) {
            text(sh, 5, c, header[c], styles.header);
        }
        int row = 6;
        for (int level = 0; level < SPIKE_ADDED.length; level++) {
            for (int rep = 1; rep <= SPIKE_REPLICATES; rep++) {
                double unspiked = BACKGROUND * (1 + BACKGROUND_CV * random.nextGaussian());
                double measured = (BACKGROUND + SPIKE_ADDED[level] * SPIKE_RECOVERY[level])
                        * (1 + SPIKE_CV[level] * random.nextGaussian());
                text(sh, row, 0, "SP-" + SPIKE_LEVEL[level].toUpperCase(Locale.ROOT) + "-" + rep, null);
                text(sh, row, 1, SPIKE_LEVEL[level], null);
                number(sh, row, 2, rep, null);
                number(sh, row, 3, round(unspiked, 2), styles.twoDecimals);
                number(sh, row, 4, SPIKE_ADDED[level], styles.oneDecimal);
                number(sh, row, 5, round(measured, 2), styles.twoDecimals);
                if (row == 6) {
                    // The one reagent blank of the batch, reported censored by the LIMS; no analysis reads this column.
                    text(sh, row, 6, "<0.5", null);
                    text(sh, row, 7, "reagent blank carried through with the batch", null);
                }
                row++;
            }
        }
        widths(sh, 12, 8, 10, 16, 14, 16, 20, 42);
    }

    private static void precision(XSSFWorkbook wb, Styles styles, Random random) {
        XSSFSheet sh = wb.createSheet("Precision");
        text(sh, 1, 0, "Intermediate precision – HMF in honey (mg/kg)", styles.title);
        text(sh, 2, 0, "QC-N: honey lot H-26-118 as received; QC-S: same lot spiked with 30 mg/kg HMF.", null);
        String[] header = {"Day", "Date", "Analyst", "Level", "Replicate", "Result (mg/kg)"};
        int headerRow = 4;
        for (int c = 0; c < header.length; c++) {
            text(sh, headerRow, c, header[c], styles.header);
        }
        int row = headerRow + 1;
        for (int day = 0; day < DAYS; day++) {
            for (int level = 0; level < QC_LEVEL.length; level++) {
                double dayMean = QC_TRUE[level] * (1 + BETWEEN_DAY_CV * random.nextGaussian());
                for (int rep = 1; rep <= QC_REPLICATES; rep++) {
                    double result = dayMean * (1 + REPEATABILITY_CV * random.nextGaussian());
                    number(sh, row, 0, day + 1, null);
                    date(sh, row, 1, FIRST_DAY.plusDays(2L * day), styles.date);
                    text(sh, row, 2, DAY_ANALYST[day], null);
                    text(sh, row, 3, QC_LEVEL[level], null);
                    number(sh, row, 4, rep, null);
                    number(sh, row, 5, round(result, 2), styles.twoDecimals);
                    row++;
                }
            }
        }
        int lastRow = row - 1;
        XSSFTable table = sh.createTable(new AreaReference("A" + headerRow + ":F" + lastRow,
                SpreadsheetVersion.EXCEL2007));
        table.setName("PrecisionRuns");
        table.setDisplayName("PrecisionRuns");
        table.updateHeaders(); // column names from the header cells, not POI's "Column1…"
        table.getCTTable().addNewTableStyleInfo().setName("TableStyleLight9");
        table.getCTTable().getTableStyleInfo().setShowRowStripes(true);
        widths(sh, 6, 12, 9, 8, 10, 15);
    }

    /** Spiked blank-matrix samples and method blanks for the replicate-spike MDL procedure, in two blocks. */
    private static void mdlStudy(XSSFWorkbook wb, Styles styles, Random random) {
        XSSFSheet sh = wb.createSheet("MDL");
        text(sh, 1, 0, "Method detection limit – spiked sugar syrup and method blanks (results in mg/kg)", styles.title);
        text(sh, 2, 0, "Blank matrix: HMF-free sugar syrup; three preparation batches on three days.", null);
        String[] spikeHeader = {"Sample ID", "Batch", "Prepared", "Spiked (mg/kg)", "Result (mg/kg)"};
        String[] blankHeader = {"Blank ID", "Batch", "Prepared", "Result (mg/kg)"};
        for (int c = 0; c < spikeHeader.length; c++) {
            text(sh, 4, c, spikeHeader[c], styles.header);
        }
        for (int c = 0; c < blankHeader.length; c++) {
            text(sh, 4, 6 + c, blankHeader[c], styles.header);
        }
        for (int i = 0; i < MDL_SPIKES; i++) {
            int row = 5 + i;
            int batch = MDL_BATCH[i].charAt(1) - '1';
            text(sh, row, 0, String.format(Locale.ROOT, "MS-%02d", i + 1), null);
            text(sh, row, 1, MDL_BATCH[i], null);
            date(sh, row, 2, FIRST_DAY.plusDays(7L + batch), styles.date);
            number(sh, row, 3, MDL_SPIKE, styles.twoDecimals);
            number(sh, row, 4, round(MDL_SPIKE * (1 + MDL_SPIKE_CV * random.nextGaussian()), 3), styles.threeDecimals);
        }
        for (int i = 0; i < MDL_BLANKS; i++) {
            int row = 5 + i;
            int batch = i * 3 / MDL_BLANKS;
            text(sh, row, 6, String.format(Locale.ROOT, "MB-%02d", i + 1), null);
            text(sh, row, 7, "B" + (batch + 1), null);
            date(sh, row, 8, FIRST_DAY.plusDays(7L + batch), styles.date);
            number(sh, row, 9, round(MDL_BLANK_MEAN + MDL_BLANK_SD * random.nextGaussian(), 3), styles.threeDecimals);
        }
        widths(sh, 11, 7, 12, 14, 14, 3, 10, 7, 12, 14);
    }

    /** Blank results and low-level samples for the limit of blank and limit of detection, in two blocks. */
    private static void lowLevelStudy(XSSFWorkbook wb, Styles styles, Random random) {
        XSSFSheet sh = wb.createSheet("LowLevel");
        text(sh, 1, 0, "Limit of blank and limit of detection – results in mg/kg", styles.title);
        text(sh, 2, 0, "Blank honey-free syrup and three low-level samples, measured over five days.", null);
        String[] blankHeader = {"Blank ID", "Day", "Result (mg/kg)"};
        String[] lowHeader = {"Sample", "Replicate", "Day", "Result (mg/kg)"};
        for (int c = 0; c < blankHeader.length; c++) {
            text(sh, 4, c, blankHeader[c], styles.header);
        }
        for (int c = 0; c < lowHeader.length; c++) {
            text(sh, 4, 4 + c, lowHeader[c], styles.header);
        }
        for (int i = 0; i < LOB_BLANKS; i++) {
            int row = 5 + i;
            text(sh, row, 0, String.format(Locale.ROOT, "LB-%02d", i + 1), null);
            number(sh, row, 1, i / 4 + 1, null);
            number(sh, row, 2, round(LOB_BLANK_MEAN + LOB_BLANK_SD * random.nextGaussian(), 3), styles.threeDecimals);
        }
        int row = 5;
        for (int s = 0; s < LOW_SAMPLE.length; s++) {
            for (int rep = 1; rep <= LOW_REPLICATES; rep++) {
                text(sh, row, 4, LOW_SAMPLE[s], null);
                number(sh, row, 5, rep, null);
                number(sh, row, 6, (rep - 1) % 5 + 1, null);
                number(sh, row, 7, round(LOW_TRUE[s] + LOW_SD * random.nextGaussian(), 3), styles.threeDecimals);
                row++;
            }
        }
        widths(sh, 10, 6, 14, 3, 9, 10, 6, 14);
    }

    /** Peak height and baseline noise of the lowest standard, as read off the chromatograms. */
    private static void signalNoise(XSSFWorkbook wb, Styles styles, Random random) {
        XSSFSheet sh = wb.createSheet("SignalNoise");
        text(sh, 1, 0, "Signal-to-noise of standard S1 (0.10 mg/L), run CAL-261109-A", styles.title);
        text(sh, 2, 0, "Noise: peak-to-peak baseline over 1 min either side of the HMF peak.", null);
        String[] header = {"Injection", "Nominal (mg/L)", "Peak height (mAU)", "Noise (mAU)"};
        for (int c = 0; c < header.length; c++) {
            text(sh, 4, c, header[c], styles.header);
        }
        for (int inj = 1; inj <= INJECTIONS; inj++) {
            int row = 4 + inj;
            number(sh, row, 0, inj, null);
            number(sh, row, 1, LEVELS[0], styles.twoDecimals);
            number(sh, row, 2, round(SN_HEIGHT * (1 + 0.02 * random.nextGaussian()), 3), styles.threeDecimals);
            number(sh, row, 3, round(SN_NOISE * (1 + 0.08 * random.nextGaussian()), 4), null);
        }
        widths(sh, 10, 15, 17, 12);
    }

    /** Routine honey samples and QC samples, two injections each, with test-portion mass and dilution. */
    private static void samples(XSSFWorkbook wb, Styles styles, Random random) {
        XSSFSheet sh = wb.createSheet("Samples");
        text(sh, 1, 0, "Routine samples and QCs – run RS-261125-A, read back through the reporting calibration",
                styles.title);
        text(sh, 2, 0, "Test portion about 5 g made up to 50 mL; H-26-206 rerun diluted 1 + 4.", null);
        String[] header = {"Sample ID", "Type", "Injection", "Peak area (mAU·s)", "Mass (g)", "Volume (mL)",
            "Dilution", "Nominal (mg/kg)", "Notes"};
        for (int c = 0; c < header.length; c++) {
            text(sh, 4, c, header[c], styles.header);
        }
        int row = 5;
        for (int i = 0; i < SAMPLE_ID.length + QC_ID.length; i++) {
            boolean qc = i >= SAMPLE_ID.length;
            String id = qc ? QC_ID[i - SAMPLE_ID.length] : SAMPLE_ID[i];
            double content = qc ? QC_NOMINAL[i - SAMPLE_ID.length] * (1 + 0.02 * random.nextGaussian())
                    : SAMPLE_TRUE[i];
            int dilution = qc ? 1 : SAMPLE_DILUTION[i];
            double mass = round(PORTION_G + PORTION_SD_G * random.nextGaussian(), 3);
            double solution = content * mass / FINAL_VOLUME_ML / dilution;
            for (int inj = 1; inj <= 2; inj++) {
                double mean = INTERCEPT + SLOPE * solution;
                double area = mean + Math.hypot(AREA_CV * mean, AREA_FLOOR_SD) * random.nextGaussian();
                text(sh, row, 0, id, null);
                text(sh, row, 1, qc ? "QC" : "sample", null);
                number(sh, row, 2, inj, null);
                number(sh, row, 3, round(area, 2), styles.twoDecimals);
                number(sh, row, 4, mass, styles.threeDecimals);
                number(sh, row, 5, FINAL_VOLUME_ML, styles.oneDecimal);
                number(sh, row, 6, dilution, null);
                if (qc) {
                    number(sh, row, 7, QC_NOMINAL[i - SAMPLE_ID.length], styles.oneDecimal);
                }
                if (!qc && i == SAMPLE_ID.length - 2 && inj == 1) {
                    text(sh, row, 8, "above the top standard; rerun diluted", null);
                }
                row++;
            }
        }
        widths(sh, 11, 8, 10, 18, 9, 11, 9, 16, 36);
    }

    // --- cell helpers (1-based rows as Excel shows them, 0-based columns) ---

    private static XSSFCell cell(XSSFSheet sh, int row1, int col) {
        XSSFRow r = sh.getRow(row1 - 1);
        if (r == null) {
            r = sh.createRow(row1 - 1);
        }
        return r.createCell(col);
    }

    private static void text(XSSFSheet sh, int row1, int col, String value, CellStyle style) {
        XSSFCell c = cell(sh, row1, col);
        c.setCellValue(value);
        if (style != null) {
            c.setCellStyle(style);
        }
    }

    private static void number(XSSFSheet sh, int row1, int col, double value, CellStyle style) {
        XSSFCell c = cell(sh, row1, col);
        c.setCellValue(value);
        if (style != null) {
            c.setCellStyle(style);
        }
    }

    private static void date(XSSFSheet sh, int row1, int col, LocalDate value, CellStyle style) {
        XSSFCell c = cell(sh, row1, col);
        c.setCellValue(value);
        c.setCellStyle(style);
    }

    private static void formula(XSSFSheet sh, int row1, int col, String formula, CellStyle style) {
        XSSFCell c = cell(sh, row1, col);
        c.setCellFormula(formula);
        c.setCellStyle(style);
    }

    private static void widths(XSSFSheet sh, int... chars) {
        for (int i = 0; i < chars.length; i++) {
            sh.setColumnWidth(i, chars[i] * 256);
        }
    }

    /** Half-up rounding of the decimal value, as an instrument export prints it. */
    static double round(double value, int decimals) {
        return new BigDecimal(Double.toString(value)).setScale(decimals, RoundingMode.HALF_UP).doubleValue();
    }

    private static String fixed(double value, int decimals) {
        return new BigDecimal(Double.toString(value)).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
    }

    /** The few styles the sheets use, created once (a workbook holds a limited number of styles). */
    private static final class Styles {
        final CellStyle title;
        final CellStyle label;
        final CellStyle header;
        final CellStyle date;
        final CellStyle oneDecimal;
        final CellStyle twoDecimals;
        final CellStyle threeDecimals;

        Styles(XSSFWorkbook wb) {
            CreationHelper helper = wb.getCreationHelper();
            Font bold = wb.createFont();
            bold.setBold(true);
            Font big = wb.createFont();
            big.setBold(true);
            big.setFontHeightInPoints((short) 13);
            title = wb.createCellStyle();
            title.setFont(big);
            label = wb.createCellStyle();
            label.setFont(bold);
            header = wb.createCellStyle();
            header.setFont(bold);
            header.setAlignment(HorizontalAlignment.CENTER);
            header.setWrapText(true);
            date = wb.createCellStyle();
            date.setDataFormat(helper.createDataFormat().getFormat("yyyy-mm-dd"));
            oneDecimal = wb.createCellStyle();
            oneDecimal.setDataFormat(helper.createDataFormat().getFormat("0.0"));
            twoDecimals = wb.createCellStyle();
            twoDecimals.setDataFormat(helper.createDataFormat().getFormat("0.00"));
            threeDecimals = wb.createCellStyle();
            threeDecimals.setDataFormat(helper.createDataFormat().getFormat("0.000"));
        }
    }
}
