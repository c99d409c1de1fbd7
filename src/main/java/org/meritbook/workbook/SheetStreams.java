package org.meritbook.workbook;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;
import java.util.function.BooleanSupplier;
import java.util.zip.Deflater;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLOutputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;
import javax.xml.stream.XMLStreamWriter;
import org.apache.commons.compress.archivers.zip.ZipArchiveEntry;
import org.apache.commons.compress.archivers.zip.ZipArchiveInputStream;
import org.apache.commons.compress.archivers.zip.ZipArchiveOutputStream;

/**
 * Splits the large worksheets of an .xlsx package off POI's usermodel. POI's {@code XSSFWorkbook}
 * builds an XML tree of every cell (about 720 bytes each), so a 100,000-row block of four columns
 * needs more heap than the whole study. For each worksheet part above the threshold, its XML is
 * read once (on its bytes by {@link SheetDataScanner} when it is UTF-8, as spreadsheet programs
 * write it, else with StAX): the plain cells go into a compact {@link StreamedSheet}, and the part is
 * rewritten for POI with its {@code <sheetData>} reduced to the formula cells (in their rows, every
 * position written out), so POI still opens the package with the sheet's merged regions, column
 * widths, tables and names, and renders each formula, shared ones included, itself. The rest of
 * the package is copied unchanged.
 *
 * <p>Its result is used only once {@link PackageScan} has checked the package against the budget,
 * refused document type declarations and rows or cells written twice, so this pass needs no checks
 * of its own beyond well-formedness. It may run alongside the check ({@link SplitAhead}), held to the
 * byte budget and stopped when the check fails.
 */
final class SheetStreams {
    /** Sheets with more cells than this are streamed unless the system property says otherwise. */
    static final long DEFAULT_THRESHOLD = 50_000;
    /** System property: the cell count above which a sheet is streamed (0 streams every sheet with a cell; for tests). */
    static final String THRESHOLD_PROPERTY = "meritbook.workbook.stream-above-cells";

    private static final XMLInputFactory INPUT = input();
    private static final XMLOutputFactory OUTPUT = XMLOutputFactory.newDefaultFactory();

    /**
     * @param lightPackage the package to open with POI
     * @param sheets       the streamed sheets by part name as POI names parts ("/xl/worksheets/sheet1.xml")
     */
    record Split(byte[] lightPackage, Map<String, StreamedSheet> sheets) {
    }

    private SheetStreams() {
    }

    /** The threshold in force: the system property when set to a whole number, else the default. */
    static long threshold() {
        String p = System.getProperty(THRESHOLD_PROPERTY);
        if (p == null || p.isBlank()) {
            return DEFAULT_THRESHOLD;
        }
        try {
            return Long.parseLong(p.strip());
        } catch (NumberFormatException e) {
            return DEFAULT_THRESHOLD;
        }
    }

    private static XMLInputFactory input() {
        XMLInputFactory f = XMLInputFactory.newDefaultFactory();
        f.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        f.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        f.setProperty(XMLInputFactory.IS_COALESCING, true);
        f.setXMLReporter((message, type, info, location) -> { });
        return f;
    }

    /** The worksheet parts with more cells than {@code threshold}: the ones to stream. */
    static Set<String> large(Map<String, Long> cellsByPart, long threshold) {
        Set<String> large = new LinkedHashSet<>();
        cellsByPart.forEach((part, cells) -> {
            if (cells > threshold) {
                large.add(part);
            }
        });
        return large;
    }

    /**
     * Splits the parts named {@code large} (zip entry names) off the package.
     *
     * @param bytes       the package; what is read from it counts only once {@link PackageScan} has passed it
     * @param budget      the bytes to inflate, all entries together, before giving up with an IOException,
     *                    and the cells the streamed sheets may hold together, before giving up with an
     *                    IllegalStateException (the check counts against the same budget, so a checked
     *                    package never reaches either)
     * @param stop        asked as the package is read; true gives up with an IOException
     */
    static Split split(byte[] bytes, Set<String> large, WorkbookBudget budget, BooleanSupplier stop)
            throws IOException, XMLStreamException {
        Map<String, StreamedSheet> sheets = new HashMap<>();
        long room = budget.maxCells();
        ByteArrayOutputStream light = new ByteArrayOutputStream(bytes.length);
        try (ZipArchiveInputStream zip = new ZipArchiveInputStream(new ByteArrayInputStream(bytes));
             ZipArchiveOutputStream out = new ZipArchiveOutputStream(light)) {
            InputStream in = new Bounded(zip, budget.maxBytes(), stop);
            out.setLevel(Deflater.BEST_SPEED);
            ZipArchiveEntry entry;
            while ((entry = zip.getNextEntry()) != null) {
                ZipArchiveEntry copy = new ZipArchiveEntry(entry.getName());
                out.putArchiveEntry(copy);
                if (large.contains(entry.getName())) {
                    StreamedSheet sheet = new StreamedSheet(room);
                    out.write(transform(in, sheet));
                    room = sheet.room();
                    sheets.put("/" + entry.getName(), sheet);
                } else {
                    in.transferTo(out);
                }
                out.closeArchiveEntry();
            }
        }
        return new Split(light.toByteArray(), sheets);
    }

    /**
     * Reads one worksheet part into {@code sheet} and returns the part as POI is to see it: a UTF-8
     * part on its bytes ({@link SheetDataScanner}), any other through StAX.
     */
    private static byte[] transform(InputStream part, StreamedSheet sheet) throws XMLStreamException, IOException {
        byte[] head = new byte[1 << 16];
        int n = part.readNBytes(head, 0, head.length);
        if (SheetDataScanner.utf8(head, n)) {
            return new SheetDataScanner(head, n, part, sheet).run();
        }
        return transformStax(new java.io.SequenceInputStream(new ByteArrayInputStream(head, 0, n), part), sheet);
    }

    private static byte[] transformStax(InputStream part, StreamedSheet sheet) throws XMLStreamException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        XMLStreamReader r;
        synchronized (INPUT) {
            r = INPUT.createXMLStreamReader(new NonClosing(part));
        }
        XMLStreamWriter w;
        synchronized (OUTPUT) {
            w = OUTPUT.createXMLStreamWriter(out, "UTF-8");
        }
        try {
            new Transformer(r, w, sheet).run();
            sheet.seal();
            w.flush();
        } finally {
            r.close();
            w.close();
        }
        return out.toByteArray();
    }

    /** The event loop: copies the part, keeping only the formula cells of sheetData, and fills the sheet. */
    private static final class Transformer {
        private final XMLStreamReader r;
        private final XMLStreamWriter w;
        private final StreamedSheet sheet;
        private final Map<String, String> types = new HashMap<>();
        private int depth;
        private int sheetDataDepth = -1;
        private int lastRow; // 1-based; 0 before the first row
        private int rowNumber;
        private int lastCol; // 1-based within the row
        private StreamedSheet.Row row;
        /** the current row's start tag, written before its first formula cell */
        private boolean rowWritten;
        private String rowPrefix;
        private String rowNamespace;
        private String[][] rowAttributes;

        Transformer(XMLStreamReader r, XMLStreamWriter w, StreamedSheet sheet) {
            this.r = r;
            this.w = w;
            this.sheet = sheet;
        }

        void run() throws XMLStreamException {
            w.writeStartDocument("UTF-8", "1.0");
            while (r.hasNext()) {
                int event = r.next();
                switch (event) {
                    case XMLStreamConstants.START_ELEMENT -> start();
                    case XMLStreamConstants.END_ELEMENT -> end();
                    case XMLStreamConstants.CHARACTERS, XMLStreamConstants.SPACE, XMLStreamConstants.CDATA -> {
                        if (sheetDataDepth < 0 || depth == sheetDataDepth) {
                            w.writeCharacters(r.getText());
                        }
                    }
                    default -> {
                        // comments and processing instructions carry nothing POI reads
                    }
                }
            }
            w.writeEndDocument();
        }

        private void start() throws XMLStreamException {
            depth++;
            if (sheetDataDepth < 0) {
                copyStart();
                if (depth == 2 && r.getLocalName().equals("sheetData")) {
                    sheetDataDepth = depth;
                }
                return;
            }
            if (depth == sheetDataDepth + 1 && r.getLocalName().equals("row")) {
                startRow();
            } else if (depth == sheetDataDepth + 2 && r.getLocalName().equals("c") && row != null) {
                cell();
                depth--; // cell() reads to the cell's end tag
            } else {
                skip();
                depth--;
            }
        }

        private void end() throws XMLStreamException {
            if (sheetDataDepth < 0 || depth == sheetDataDepth) {
                w.writeEndElement();
                if (depth == sheetDataDepth) {
                    sheetDataDepth = -1;
                }
            } else if (depth == sheetDataDepth + 1 && row != null) {
                sheet.addRow(rowNumber - 1, row);
                if (rowWritten) {
                    w.writeEndElement();
                }
                row = null;
            }
            depth--;
        }

        private void copyStart() throws XMLStreamException {
            String prefix = r.getPrefix() == null ? "" : r.getPrefix();
            String ns = r.getNamespaceURI() == null ? "" : r.getNamespaceURI();
            w.writeStartElement(prefix, r.getLocalName(), ns);
            for (int i = 0; i < r.getNamespaceCount(); i++) {
                String p = r.getNamespacePrefix(i);
                if (p == null || p.isEmpty()) {
                    w.writeDefaultNamespace(r.getNamespaceURI(i));
                } else {
                    w.writeNamespace(p, r.getNamespaceURI(i));
                }
            }
            for (int i = 0; i < r.getAttributeCount(); i++) {
                writeAttribute(r.getAttributePrefix(i), r.getAttributeNamespace(i), r.getAttributeLocalName(i),
                        r.getAttributeValue(i));
            }
        }

        private void writeAttribute(String prefix, String ns, String local, String value) throws XMLStreamException {
            if (ns == null || ns.isEmpty()) {
                w.writeAttribute(local, value);
            } else {
                w.writeAttribute(prefix == null ? "" : prefix, ns, local, value);
            }
        }

        /** A row element: its position (one after the last row when it names none, as POI reads it) and attributes. */
        private void startRow() {
            String at = attribute("r");
            rowNumber = at == null ? lastRow + 1 : Integer.parseInt(at.strip());
            lastRow = Math.max(lastRow, rowNumber);
            lastCol = 0;
            row = StreamedSheet.Row.of(attribute("hidden"), attribute("ht"));
            rowWritten = false;
            rowPrefix = r.getPrefix() == null ? "" : r.getPrefix();
            rowNamespace = r.getNamespaceURI() == null ? "" : r.getNamespaceURI();
            rowAttributes = new String[r.getAttributeCount()][];
            for (int i = 0; i < r.getAttributeCount(); i++) {
                rowAttributes[i] = new String[] {r.getAttributePrefix(i), r.getAttributeNamespace(i), r.getAttributeLocalName(i),
                    r.getAttributeValue(i)};
            }
        }

        /** One cell: a plain cell is kept in the sheet; a formula cell is written out for POI, whole. */
        private void cell() throws XMLStreamException {
            int col = StreamedSheet.column(attribute("r"), lastCol);
            lastCol = Math.max(lastCol, col);
            String t = attribute("t");
            String type = t == null ? "n" : types.computeIfAbsent(t.strip(), k -> k);
            String s = attribute("s");
            int style = s == null ? -1 : StreamedSheet.styleIndex(s);
            String[] attributes = new String[r.getAttributeCount() * 4];
            for (int i = 0; i < r.getAttributeCount(); i++) {
                attributes[i * 4] = r.getAttributePrefix(i);
                attributes[i * 4 + 1] = r.getAttributeNamespace(i);
                attributes[i * 4 + 2] = r.getAttributeLocalName(i);
                attributes[i * 4 + 3] = r.getAttributeValue(i);
            }
            String prefix = r.getPrefix() == null ? "" : r.getPrefix();
            String ns = r.getNamespaceURI() == null ? "" : r.getNamespaceURI();
            CellContent content = content();
            if (content.formula) {
                row.add(col - 1, null, null, -1, null);
                writeRowStart();
                w.writeStartElement(prefix, "c", ns);
                for (int i = 0; i < attributes.length; i += 4) {
                    if (!attributes[i + 2].equals("r") || (attributes[i + 1] != null && !attributes[i + 1].isEmpty())) {
                        writeAttribute(attributes[i], attributes[i + 1], attributes[i + 2], attributes[i + 3]);
                    }
                }
                w.writeAttribute("r", CellRef.columnLetters(col - 1) + rowNumber);
                content.xml.forEach(this::writeRaw);
                w.writeEndElement();
            } else {
                row.add(col - 1, type, content.value, style, content.inline);
            }
        }

        private void writeRowStart() throws XMLStreamException {
            if (rowWritten) {
                return;
            }
            w.writeStartElement(rowPrefix, "row", rowNamespace);
            for (String[] a : rowAttributes) {
                if (!a[2].equals("r") || (a[1] != null && !a[1].isEmpty())) {
                    writeAttribute(a[0], a[1], a[2], a[3]);
                }
            }
            w.writeAttribute("r", String.valueOf(rowNumber));
            rowWritten = true;
        }

        private void writeRaw(Event e) {
            try {
                e.write(w);
            } catch (XMLStreamException x) {
                throw new IllegalStateException(x);
            }
        }

        /** A cell's children: its value, inline text, and (for a formula cell) the events to write out again. */
        private static final class CellContent {
            boolean formula;
            String value;
            String inline;
            final java.util.List<Event> xml = new java.util.ArrayList<>();
        }

        /** One recorded event of a cell's content, written again for a formula cell. */
        private interface Event {
            void write(XMLStreamWriter w) throws XMLStreamException;
        }

        /**
         * Reads a cell's content to its end tag: {@code <v>}, {@code <f>}, and an inline string's text
         * (its runs joined, phonetic runs left out, as POI reads it).
         */
        private CellContent content() throws XMLStreamException {
            CellContent c = new CellContent();
            StringBuilder v = null;
            StringBuilder direct = null;
            StringBuilder runs = null;
            String[] path = new String[8];
            int level = 0;
            while (true) {
                int event = r.next();
                if (event == XMLStreamConstants.START_ELEMENT) {
                    String name = r.getLocalName();
                    if (level < path.length) {
                        path[level] = name;
                    }
                    level++;
                    if (level == 1 && name.equals("f")) {
                        c.formula = true;
                    } else if (level == 1 && name.equals("v")) {
                        v = new StringBuilder();
                    } else if (level == 2 && name.equals("t") && "is".equals(path[0])) {
                        direct = direct == null ? new StringBuilder() : direct;
                    } else if (level == 3 && name.equals("t") && "is".equals(path[0]) && "r".equals(path[1])) {
                        runs = runs == null ? new StringBuilder() : runs;
                    }
                    recordStart(c);
                } else if (event == XMLStreamConstants.CHARACTERS || event == XMLStreamConstants.CDATA
                        || event == XMLStreamConstants.SPACE) {
                    String text = r.getText();
                    if (level == 1 && "v".equals(path[0]) && v != null) {
                        v.append(text);
                    } else if (level == 2 && "is".equals(path[0]) && "t".equals(path[1]) && direct != null) {
                        direct.append(text);
                    } else if (level == 3 && "is".equals(path[0]) && "r".equals(path[1]) && "t".equals(path[2]) && runs != null) {
                        runs.append(text);
                    }
                    if (level > 0) {
                        c.xml.add(x -> x.writeCharacters(text));
                    }
                } else if (event == XMLStreamConstants.END_ELEMENT) {
                    if (level == 0) {
                        break;
                    }
                    level--;
                    c.xml.add(XMLStreamWriter::writeEndElement);
                }
            }
            c.value = v == null ? null : v.toString();
            c.inline = runs != null ? runs.toString() : direct == null ? null : direct.toString();
            if (!c.formula) {
                c.xml.clear();
            }
            return c;
        }

        private void recordStart(CellContent c) {
            String prefix = r.getPrefix() == null ? "" : r.getPrefix();
            String ns = r.getNamespaceURI() == null ? "" : r.getNamespaceURI();
            String local = r.getLocalName();
            String[][] attributes = new String[r.getAttributeCount()][];
            for (int i = 0; i < r.getAttributeCount(); i++) {
                attributes[i] = new String[] {r.getAttributePrefix(i), r.getAttributeNamespace(i), r.getAttributeLocalName(i),
                    r.getAttributeValue(i)};
            }
            c.xml.add(x -> {
                x.writeStartElement(prefix, local, ns);
                for (String[] a : attributes) {
                    if (a[1] == null || a[1].isEmpty()) {
                        x.writeAttribute(a[2], a[3]);
                    } else {
                        x.writeAttribute(a[0] == null ? "" : a[0], a[1], a[2], a[3]);
                    }
                }
            });
        }

        /** Skips an element of sheetData that is neither a row nor a cell, to its end tag. */
        private void skip() throws XMLStreamException {
            int level = 1;
            while (level > 0) {
                int event = r.next();
                if (event == XMLStreamConstants.START_ELEMENT) {
                    level++;
                } else if (event == XMLStreamConstants.END_ELEMENT) {
                    level--;
                }
            }
        }

        private String attribute(String localName) {
            return XmlPartScan.unqualifiedAttribute(r, localName);
        }
    }

    /** The current zip entry's bytes, counted across entries against a limit, and given up on request. */
    private static final class Bounded extends ChunkReadStream {
        private final InputStream in;
        private final long max;
        private final BooleanSupplier stop;
        private long inflated;

        Bounded(InputStream zip, long max, BooleanSupplier stop) {
            this.in = zip;
            this.max = max;
            this.stop = stop;
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            if (stop.getAsBoolean()) {
                throw new IOException("split given up");
            }
            int n = in.read(b, off, len);
            if (n > 0) {
                inflated += n;
                if (inflated > max) {
                    throw new IOException("more than " + max + " bytes inflated");
                }
            }
            return n;
        }

        @Override
        public void close() {
            // the zip stream goes on to the next entry; its owner closes it
        }
    }

    /** Keeps the StAX reader from closing the zip stream it reads one entry of. */
    private static final class NonClosing extends java.io.FilterInputStream {
        NonClosing(InputStream in) {
            super(in);
        }

        @Override
        public void close() {
            // the zip stream goes on to the next entry
        }
    }
}
