package org.meritbook.workbook;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.zip.CRC32;
import org.apache.commons.compress.archivers.zip.ZipArchiveEntry;
import org.apache.commons.compress.archivers.zip.ZipArchiveInputStream;
import org.apache.commons.compress.archivers.zip.ZipFile;
import org.apache.commons.compress.utils.SeekableInMemoryByteChannel;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;

/**
 * Checks an .xlsx or .xlsm package (a zip of XML parts) before POI parses it, so that a damaged or
 * hostile file ends in a located error instead of an exhausted heap, a hang or a silently chosen
 * value:
 *
 * <ul>
 *   <li>the zip's central directory must be readable (a file cut short is not), list each part
 *       once, and declare no more than the byte budget;</li>
 *   <li>every entry is then inflated the way POI reads it (entry by entry from the local headers),
 *       counting the bytes actually produced against the budget, so a zip bomb whose headers
 *       understate its size is stopped once it passes the budget; each entry's CRC-32 and size must
 *       match the directory, so a damaged entry never yields changed numbers. No limit on the
 *       compression ratio: genuine repetitive text (a long note) compresses more than 100-fold, and
 *       the counted bytes already bound what a bomb can cost;</li>
 *   <li>every XML part is read with StAX ({@link XmlPartScan}): no document type declaration (the
 *       way to entity expansion), no absurd nesting, and in each worksheet every row and cell at one
 *       position only; cells and shared strings are counted against the cell budget.</li>
 * </ul>
 */
final class PackageScan {
    /** POI's default limit on the number of parts ({@code ZipSecureFile.getMaxFileCount}). */
    static final int MAX_PARTS = 1000;
    /** XML elements allowed per budgeted cell: a sheet needs about two per cell (c and v) and one per row. */
    static final long ELEMENTS_PER_CELL = 10;

    private PackageScan() {
    }

    /**
     * The first step of the check: the zip's central directory, by entry name, each entry listed once
     * and the declared sizes within the budget.
     *
     * @param where where to report package-level problems (the file and the data reference)
     * @throws InputException CORRUPT_FILE or WORKBOOK_TOO_LARGE
     */
    static Map<String, ZipArchiveEntry> directory(byte[] bytes, String where, String expected, WorkbookBudget budget) {
        return directory(bytes, new Problems(where, expected), budget);
    }

    /**
     * @param bytes     the whole file
     * @param directory its central directory, from {@link #directory(byte[], String, String, WorkbookBudget)}
     * @param fileName  the file name, for cell locations ("lab.xlsx, Calibration!B5")
     * @param where     where to report package-level problems (the file and the data reference)
     * @return the number of cells of each worksheet part, by zip entry name
     * @throws InputException CORRUPT_FILE, WORKBOOK_TOO_LARGE or MALFORMED_SHEET
     */
    static Map<String, Long> check(byte[] bytes, Map<String, ZipArchiveEntry> directory, String fileName, String where,
                                   String expected, WorkbookBudget budget) {
        Problems problems = new Problems(where, expected);
        XmlPartScan.Tally tally = new XmlPartScan.Tally(budget, ELEMENTS_PER_CELL);
        Map<String, XmlPartScan.Facts> parts = new LinkedHashMap<>();
        Set<String> seen = new HashSet<>();
        long[] total = {0};
        try (ZipArchiveInputStream zip = new ZipArchiveInputStream(new ByteArrayInputStream(bytes))) {
            ZipArchiveEntry entry;
            while ((entry = zip.getNextEntry()) != null) {
                String name = entry.getName();
                ZipArchiveEntry listed = directory.get(name);
                if (!seen.add(name) || listed == null) {
                    throw problems.corrupt("a zip entry " + name + " that the zip's directory "
                            + (listed == null ? "does not list" : "lists once but the file holds twice"));
                }
                if (entry.isDirectory()) {
                    continue;
                }
                Meter meter = new Meter(zip, name, total, budget, where);
                XmlPartScan.Facts facts = read(meter, name, listed, tally, problems, budget);
                if (facts != null) {
                    parts.put(name, facts);
                }
                meter.finish(listed, problems);
            }
        } catch (Over e) {
            throw e.error();
        } catch (IOException e) {
            throw problems.corrupt("a zip package that cannot be read to its end (" + reason(e) + ")", e);
        }
        if (seen.size() != directory.size()) {
            List<String> missing = directory.keySet().stream().filter(n -> !seen.contains(n)).limit(5).toList();
            throw problems.corrupt("a zip whose directory lists entries that are not in the file (" + String.join(", ", missing) + ")");
        }
        missingSheetParts(parts, seen, problems);
        malformedSheets(fileName, parts);
        Map<String, Long> cells = new LinkedHashMap<>();
        parts.forEach((name, facts) -> {
            if (facts.worksheet()) {
                cells.put(name, facts.cells);
            }
        });
        return cells;
    }

    /** The central directory, by entry name, checked for duplicates and declared sizes. */
    private static Map<String, ZipArchiveEntry> directory(byte[] bytes, Problems problems, WorkbookBudget budget) {
        String where = problems.where();
        Map<String, ZipArchiveEntry> byName = new HashMap<>();
        try (ZipFile zip = ZipFile.builder().setSeekableByteChannel(new SeekableInMemoryByteChannel(bytes)).get()) {
            long declared = 0;
            var entries = zip.getEntries();
            while (entries.hasMoreElements()) {
                ZipArchiveEntry e = entries.nextElement();
                if (byName.put(e.getName(), e) != null) {
                    throw problems.corrupt("a zip that lists the entry " + e.getName() + " twice");
                }
                if (byName.size() > MAX_PARTS) {
                    throw budget.tooManyBytes(where, "a zip of more than " + MAX_PARTS + " entries");
                }
                if (e.getSize() > 0) {
                    declared += e.getSize();
                }
                if (declared > budget.maxBytes()) {
                    throw budget.tooManyBytes(where, "entries that declare more than "
                            + WorkbookBudget.megabytes(budget.maxBytes()) + " uncompressed");
                }
            }
        } catch (IOException | RuntimeException e) {
            if (e instanceof InputException input) {
                throw input;
            }
            throw problems.corrupt("a zip package whose directory cannot be read (the file is cut short or damaged)", e);
        }
        if (byName.isEmpty()) {
            throw problems.corrupt("an empty zip package");
        }
        return byName;
    }

    /**
     * Reads one entry through the meter: XML parts through StAX, others only counted. Null for
     * non-XML parts. When a part cannot be read, the rest of the entry is inflated first: a checksum
     * that does not match says the entry is damaged, which is the cause to report.
     */
    private static XmlPartScan.Facts read(Meter meter, String name, ZipArchiveEntry listed, XmlPartScan.Tally tally,
                                          Problems problems, WorkbookBudget budget) throws IOException {
        String where = problems.where();
        String lower = name.toLowerCase(Locale.ROOT);
        if (!lower.endsWith(".xml") && !lower.endsWith(".rels")) {
            meter.drain();
            return null;
        }
        try {
            XmlPartScan.Facts facts = XmlPartScan.scan(meter, name, tally);
            meter.drain(); // trailing bytes after the root element are counted too
            return facts;
        } catch (XmlPartScan.Refused e) {
            if (meter.failure() != null) {
                throw meter.failure();
            }
            if (e.overBudget()) {
                throw tally.overCells()
                        ? budget.tooManyCells(where, "more than " + String.format(Locale.ROOT, "%,d", budget.maxCells())
                                + " cells and shared strings")
                        : budget.tooManyCells(where, "more than " + String.format(Locale.ROOT, "%,d",
                                budget.maxCells() * ELEMENTS_PER_CELL) + " XML elements in its parts");
            }
            meter.drain();
            meter.finish(listed, problems);
            throw problems.corrupt(e.getMessage());
        } catch (IOException e) {
            if (meter.failure() != null) {
                throw meter.failure();
            }
            throw e;
        }
    }

    /**
     * A sheet the workbook part lists must have its part in the file: POI leaves such a sheet out
     * without a word, and the reader would then report a sheet the analyst can see in the workbook's
     * own list as missing.
     */
    private static void missingSheetParts(Map<String, XmlPartScan.Facts> parts, Set<String> seen, Problems problems) {
        List<String> missing = new ArrayList<>();
        sheetNames(parts).forEach((part, sheet) -> {
            if (!seen.contains(part)) {
                missing.add("'" + sheet + "' (part " + part + ")");
            }
        });
        if (!missing.isEmpty()) {
            java.util.Collections.sort(missing);
            throw problems.corrupt("a package whose workbook part lists the sheet" + (missing.size() == 1 ? " " : "s ")
                    + String.join(", ", missing) + ", which the file does not hold (it is damaged or was cut short)");
        }
    }

    /** Every damaged row or cell of every worksheet, located by sheet name, in one error. */
    private static void malformedSheets(String fileName, Map<String, XmlPartScan.Facts> parts) {
        Map<String, String> sheetNames = sheetNames(parts);
        List<Problem> problems = new ArrayList<>();
        for (Map.Entry<String, XmlPartScan.Facts> p : parts.entrySet()) {
            XmlPartScan.Facts f = p.getValue();
            if (!f.worksheet() || f.damages.isEmpty()) {
                continue;
            }
            String sheet = sheetNames.get(p.getKey());
            for (int i = 0; i < f.damages.size(); i++) {
                XmlPartScan.Damage d = f.damages.get(i);
                String cell = d.at().startsWith("row") ? " " + d.at() : "!" + d.at();
                String at = sheet != null ? sheet + cell : "sheet part " + p.getKey() + cell;
                String more = i == f.damages.size() - 1 && f.moreDamages > 0
                        ? " (and " + f.moreDamages + " more such problems in this sheet)" : "";
                problems.add(new Problem(ErrorKey.MALFORMED_SHEET, fileName + ", " + at,
                        "each row and cell of the sheet stored once, at one position", d.found() + more,
                        "Open the workbook in a spreadsheet program and save it again (it rewrites the sheet), "
                                + "then check the cells named; or use an intact copy."));
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
    }

    /** Worksheet part name → sheet name, from the workbook part and its relationships. */
    private static Map<String, String> sheetNames(Map<String, XmlPartScan.Facts> parts) {
        Map<String, String> out = new HashMap<>();
        XmlPartScan.Facts root = parts.get("_rels/.rels");
        if (root == null) {
            return out;
        }
        for (XmlPartScan.Relationship rel : root.relationships) {
            if (rel.type() == null || !rel.type().endsWith("/officeDocument") || rel.target() == null || rel.external()) {
                continue;
            }
            String workbook = resolve("", rel.target());
            XmlPartScan.Facts wb = parts.get(workbook);
            XmlPartScan.Facts rels = parts.get(relsOf(workbook));
            if (wb == null || rels == null) {
                continue;
            }
            String folder = workbook.contains("/") ? workbook.substring(0, workbook.lastIndexOf('/') + 1) : "";
            for (XmlPartScan.Relationship r : rels.relationships) {
                String sheet = wb.sheets.get(r.id());
                if (sheet != null && r.target() != null && !r.external()) {
                    out.put(resolve(folder, r.target()), sheet);
                }
            }
        }
        return out;
    }

    private static String relsOf(String part) {
        int slash = part.lastIndexOf('/');
        return part.substring(0, slash + 1) + "_rels/" + part.substring(slash + 1) + ".rels";
    }

    /** A relationship target as a zip entry name: absolute ("/xl/…") or relative to the source's folder. */
    private static String resolve(String folder, String target) {
        String path = target.startsWith("/") ? target.substring(1) : folder + target;
        List<String> segments = new ArrayList<>();
        for (String s : path.split("/")) {
            if (s.equals("..")) {
                if (!segments.isEmpty()) {
                    segments.remove(segments.size() - 1);
                }
            } else if (!s.isEmpty() && !s.equals(".")) {
                segments.add(s);
            }
        }
        return String.join("/", segments);
    }

    /** Where package problems are reported and what was expected there. */
    private record Problems(String where, String expected) {
        InputException corrupt(String found) {
            return ReadErrors.corrupt(where, expected, found, null);
        }

        InputException corrupt(String found, Throwable cause) {
            return ReadErrors.corrupt(where, expected, found, cause);
        }
    }

    private static String reason(Exception e) {
        String m = e.getMessage();
        return e.getClass().getSimpleName() + (m == null || m.isBlank() ? "" : ": " + m.replaceAll("\\s+", " ").strip());
    }

    /**
     * The bytes of one zip entry as they are inflated: counted against the package's byte budget, and
     * checked against the directory's CRC-32 and size at the end. The budget passed is remembered and
     * reported as an IOException, which stops any reader of the stream.
     */
    static final class Meter extends ChunkReadStream {
        private final ZipArchiveInputStream zip;
        private final String name;
        private final long[] total;
        private final WorkbookBudget budget;
        private final CRC32 crc = new CRC32();
        private final String where;
        private long inflated;
        private IOException failure;

        Meter(ZipArchiveInputStream zip, String name, long[] total, WorkbookBudget budget, String where) {
            this.zip = zip;
            this.name = name;
            this.total = total;
            this.budget = budget;
            this.where = where;
        }

        /** The limit this entry passed, if any, as the located error to report. */
        IOException failure() {
            return failure;
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            if (failure != null) {
                throw failure;
            }
            int n = zip.read(b, off, len);
            if (n > 0) {
                crc.update(b, off, n);
                inflated += n;
                total[0] += n;
                if (total[0] > budget.maxBytes()) {
                    failure = new Over(budget.tooManyBytes(where, "parts that inflate to more than "
                            + WorkbookBudget.megabytes(budget.maxBytes()) + " (" + name + " among them)"));
                    throw failure;
                }
            }
            return n;
        }

        void drain() throws IOException {
            byte[] buffer = new byte[64 * 1024];
            while (read(buffer, 0, buffer.length) >= 0) {
                // counted and checked in read
            }
        }

        void finish(ZipArchiveEntry listed, Problems problems) {
            if (listed.getSize() >= 0 && listed.getSize() != inflated) {
                throw problems.corrupt("the entry " + name + ", which holds " + inflated + " bytes where the zip's directory says "
                        + listed.getSize());
            }
            if (listed.getCrc() >= 0 && listed.getCrc() != crc.getValue()) {
                throw problems.corrupt("the entry " + name + ", whose content does not match its checksum (damaged)");
            }
        }
    }

    /** The budget passed inside a stream; carries the located error. */
    static final class Over extends IOException {
        private static final long serialVersionUID = 1L;
        private final transient InputException error;

        Over(InputException error) {
            super(error.getMessage());
            this.error = error;
        }

        InputException error() {
            return error;
        }
    }
}
