package org.meritbook.workbook;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.PushbackInputStream;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

/**
 * Reads one XML part of an .xlsx package with StAX before POI parses it, and reports what could
 * make POI's reading unsafe or ambiguous: a document type declaration (the only way to entity
 * expansion; a workbook never carries one, and none is processed here), nesting deeper than any
 * workbook needs, elements beyond the budget, and in a worksheet the positions of its rows and cells,
 * so that a row or cell written twice is found before POI silently keeps one of them.
 *
 * <p>Positions follow the rule POI and spreadsheet programs use for rows and cells written without
 * an {@code r} attribute: one after the last row (cell) so far.
 */
final class XmlPartScan {
    /** OOXML nests a few levels deep (rich text in a comment is among the deepest, under 12). */
    static final int MAX_DEPTH = 256;
    /** Problems listed per part; a damaged sheet can hold thousands, and the first ones say enough. */
    static final int LISTED = 20;

    private static final XMLInputFactory FACTORY = factory();

    /** One damaged row or cell of a worksheet: {@code at} is "B5" or "row 7". */
    record Damage(String at, String found) {
    }

    /** A relationship of a .rels part. */
    record Relationship(String id, String type, String target, boolean external) {
    }

    /** What one part holds, as far as the package check needs it. */
    static final class Facts {
        String root = "";
        long cells;
        final List<Damage> damages = new ArrayList<>();
        int moreDamages;
        /** workbook.xml: sheet name by relationship id, in workbook order. */
        final Map<String, String> sheets = new java.util.LinkedHashMap<>();
        /** .rels parts */
        final List<Relationship> relationships = new ArrayList<>();

        boolean worksheet() {
            return root.equals("worksheet");
        }

        void damage(String at, String found) {
            if (damages.size() < LISTED) {
                damages.add(new Damage(at, found));
            } else {
                moreDamages++;
            }
        }
    }

    /**
     * Why a part was refused: its message is the "found" part of a located error, or null when the
     * package went over its budget (the {@link Tally} says which limit).
     */
    static final class Refused extends Exception {
        private static final long serialVersionUID = 1L;

        Refused(String found) {
            super(found);
        }

        boolean overBudget() {
            return getMessage() == null;
        }
    }

    /** Counts elements and cells across every part of one package, against the budget. */
    static final class Tally {
        private final long maxElements;
        private final long maxCells;
        long elements;
        long cells;

        Tally(WorkbookBudget budget, long elementsPerCell) {
            this.maxCells = budget.maxCells();
            this.maxElements = budget.maxCells() > Long.MAX_VALUE / elementsPerCell
                    ? Long.MAX_VALUE : budget.maxCells() * elementsPerCell;
        }

        boolean overElements() {
            return elements > maxElements;
        }

        boolean overCells() {
            return cells > maxCells;
        }
    }

    private XmlPartScan() {
    }

    private static XMLInputFactory factory() {
        XMLInputFactory f = XMLInputFactory.newDefaultFactory();
        f.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        f.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        f.setProperty(XMLInputFactory.IS_REPLACING_ENTITY_REFERENCES, false);
        f.setProperty(XMLInputFactory.IS_COALESCING, false);
        // Problems are reported as located errors; the parser must not also print them to the console.
        f.setXMLReporter((message, type, info, location) -> { });
        return f;
    }

    /**
     * @param in    the part's bytes as they are inflated
     * @param part  the part name, for messages
     * @param tally the package's running counts; the scan stops as soon as one is over budget
     * @throws Refused when the part is not well-formed XML or is refused outright (the message says why)
     * @throws IOException from the stream (the caller knows whether it was the budget)
     */
    static Facts scan(InputStream in, String part, Tally tally) throws Refused, IOException {
        Facts facts = new Facts();
        XMLStreamReader r;
        try {
            Reader text = decoded(in);
            synchronized (FACTORY) {
                r = FACTORY.createXMLStreamReader(text);
            }
        } catch (XMLStreamException e) {
            throw notXml(part, e, in);
        }
        try {
            new Walker(r, facts, tally, part).walk();
        } catch (XMLStreamException e) {
            throw notXml(part, e, in);
        } finally {
            try {
                r.close();
            } catch (XMLStreamException e) {
                // A reader over bytes in memory holds nothing that must be released.
            }
        }
        return facts;
    }

    /**
     * The part as text, decoded strictly: OOXML parts are UTF-8 or UTF-16 (ECMA-376 Part 2, from
     * memory), told apart by their first bytes. Decoding here, not in the parser, keeps a damaged byte
     * a located error: the JDK's parser would also print it to the console.
     */
    private static Reader decoded(InputStream in) throws IOException {
        PushbackInputStream p = new PushbackInputStream(in, 4);
        byte[] head = new byte[4];
        int n = p.readNBytes(head, 0, 4);
        Charset charset = StandardCharsets.UTF_8;
        int skip = 0;
        if (n >= 2 && (head[0] & 0xff) == 0xFE && (head[1] & 0xff) == 0xFF) {
            charset = StandardCharsets.UTF_16BE;
            skip = 2;
        } else if (n >= 2 && (head[0] & 0xff) == 0xFF && (head[1] & 0xff) == 0xFE) {
            charset = StandardCharsets.UTF_16LE;
            skip = 2;
        } else if (n >= 2 && head[0] == '<' && head[1] == 0) {
            charset = StandardCharsets.UTF_16LE;
        } else if (n >= 2 && head[0] == 0 && head[1] == '<') {
            charset = StandardCharsets.UTF_16BE;
        } else if (n >= 3 && (head[0] & 0xff) == 0xEF && (head[1] & 0xff) == 0xBB && (head[2] & 0xff) == 0xBF) {
            skip = 3;
        }
        if (n > skip) {
            p.unread(head, skip, n - skip);
        }
        return new InputStreamReader(p, charset.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT));
    }

    /** An IOException from the stream (the budget, or a damaged entry) wins over the XML error it caused. */
    private static Refused notXml(String part, XMLStreamException e, InputStream in) throws IOException {
        // The stream's own failure (the budget, a damaged zip entry) is rethrown; bytes that are not
        // in the part's encoding are the part's damage, reported like any XML that is not well-formed.
        if (e.getNestedException() instanceof IOException io && !(io instanceof CharacterCodingException)) {
            throw io;
        }
        if (in instanceof PackageScan.Meter m && m.failure() != null) {
            throw m.failure();
        }
        String detail = e.getMessage() == null ? "" : e.getMessage().replaceAll("\\s+", " ").strip();
        if (detail.length() > 160) {
            detail = detail.substring(0, 160) + "…";
        }
        return new Refused("the part " + part + ", which is not well-formed XML" + (detail.isEmpty() ? "" : " (" + detail + ")"));
    }

    /** The event loop over one part. */
    private static final class Walker {
        private final XMLStreamReader r;
        private final Facts facts;
        private final Tally tally;
        private final String part;
        private int depth;
        /** depth of the worksheet's sheetData element, or -1 outside it */
        private int sheetData = -1;
        private final BitSet rowsSeen = new BitSet();
        private final BitSet colsSeen = new BitSet();
        private int lastRow; // 1-based; 0 before the first row
        private int row;
        private int lastCol; // 1-based within the row; 0 before the first cell
        private boolean rowUsable;

        Walker(XMLStreamReader r, Facts facts, Tally tally, String part) {
            this.r = r;
            this.facts = facts;
            this.tally = tally;
            this.part = part;
        }

        void walk() throws XMLStreamException, Refused {
            while (r.hasNext()) {
                int event = r.next();
                if (event == XMLStreamConstants.DTD) {
                    throw new Refused("a document type declaration in the part " + part
                            + " (a workbook never needs one; it can expand entities without bound, so it is not read)");
                }
                if (event == XMLStreamConstants.ENTITY_REFERENCE) {
                    throw new Refused("an entity reference '&" + r.getLocalName() + ";' in the part " + part
                            + ", which no workbook uses");
                }
                if (event == XMLStreamConstants.START_ELEMENT) {
                    start();
                } else if (event == XMLStreamConstants.END_ELEMENT) {
                    if (depth == sheetData) {
                        sheetData = -1;
                    }
                    depth--;
                }
            }
        }

        private void start() throws Refused {
            depth++;
            if (depth > MAX_DEPTH) {
                throw new Refused("XML nested more than " + MAX_DEPTH + " elements deep in the part " + part);
            }
            tally.elements++;
            if (tally.overElements()) {
                throw new Refused(null);
            }
            String name = r.getLocalName();
            if (depth == 1) {
                facts.root = name;
                return;
            }
            switch (facts.root) {
                case "worksheet" -> worksheet(name);
                case "sst" -> {
                    if (depth == 2 && name.equals("si")) {
                        count();
                    }
                }
                case "workbook" -> {
                    if (name.equals("sheet")) {
                        String id = relationshipId();
                        if (id != null) {
                            facts.sheets.put(id, attribute("name"));
                        }
                    }
                }
                case "Relationships" -> {
                    if (name.equals("Relationship")) {
                        facts.relationships.add(new Relationship(attribute("Id"), attribute("Type"), attribute("Target"),
                                "External".equalsIgnoreCase(attribute("TargetMode"))));
                    }
                }
                default -> {
                    // other parts are only checked for depth, declarations and size
                }
            }
        }

        private void count() throws Refused {
            facts.cells++;
            tally.cells++;
            if (tally.overCells()) {
                throw new Refused(null);
            }
        }

        private void worksheet(String name) throws Refused {
            if (depth == 2 && name.equals("sheetData")) {
                sheetData = depth;
            } else if (sheetData > 0 && depth == sheetData + 1 && name.equals("row")) {
                row();
            } else if (sheetData > 0 && depth == sheetData + 2 && name.equals("c")) {
                cell();
            }
        }

        private void row() {
            String r1 = attribute("r");
            colsSeen.clear();
            lastCol = 0;
            rowUsable = false;
            int n;
            if (r1 == null) {
                n = lastRow + 1;
            } else {
                n = parseRow(r1.strip());
                if (n < 1) {
                    facts.damage("row '" + r1 + "'", "a row numbered '" + r1
                            + "', which is not a row of a worksheet (1 to " + RangeText.MAX_ROWS + ")");
                    return;
                }
            }
            if (n > RangeText.MAX_ROWS) {
                facts.damage("row " + n, "a row beyond the last row of a worksheet (" + RangeText.MAX_ROWS + ")");
                return;
            }
            if (rowsSeen.get(n)) {
                facts.damage("row " + n, "row " + n + " written twice in the sheet's XML (a spreadsheet program writes each row once)");
                return;
            }
            rowsSeen.set(n);
            row = n;
            lastRow = Math.max(lastRow, n);
            rowUsable = true;
        }

        private void cell() throws Refused {
            count();
            if (!rowUsable) {
                return; // the row is already reported
            }
            String ref = attribute("r");
            int col;
            if (ref == null) {
                col = lastCol + 1;
            } else {
                long parsed = cellAddress(ref.strip());
                if (parsed < 0) {
                    facts.damage("row " + row, "a cell reference '" + ref + "', which is not a cell address such as B5");
                    return;
                }
                col = (int) (parsed >>> 32);
                int refRow = (int) parsed;
                if (refRow != row) {
                    facts.damage(ref.strip().toUpperCase(Locale.ROOT), "a cell " + ref.strip().toUpperCase(Locale.ROOT)
                            + " written inside row " + row + ", so its row is ambiguous");
                    return;
                }
            }
            if (col > RangeText.MAX_COLS) {
                facts.damage("row " + row, "a cell beyond the last column of a worksheet (XFD)");
                return;
            }
            if (colsSeen.get(col)) {
                String at = CellRef.columnLetters(col - 1) + row;
                facts.damage(at, "cell " + at + " written twice in the sheet's XML (a spreadsheet program writes each cell once)");
                return;
            }
            colsSeen.set(col);
            lastCol = Math.max(lastCol, col);
        }

        private String attribute(String localName) {
            return unqualifiedAttribute(r, localName);
        }

        /** The {@code r:id} of a workbook's sheet element (relationships namespace, strict or transitional). */
        private String relationshipId() {
            for (int i = 0; i < r.getAttributeCount(); i++) {
                String ns = r.getAttributeNamespace(i);
                if (r.getAttributeLocalName(i).equals("id") && ns != null && ns.contains("relationships")) {
                    return r.getAttributeValue(i);
                }
            }
            return null;
        }
    }

    /** 1-based row number, or -1 when the text is not a positive whole number of up to 8 digits. */
    private static int parseRow(String text) {
        return parseRow(text, 0, text.length());
    }

    /** {@link #parseRow(String)} of the characters from {@code from} to {@code to} (exclusive), without a substring. */
    private static int parseRow(String text, int from, int to) {
        if (to <= from || to - from > 8) {
            return -1;
        }
        int n = 0;
        for (int i = from; i < to; i++) {
            char ch = text.charAt(i);
            if (ch < '0' || ch > '9') {
                return -1;
            }
            n = n * 10 + (ch - '0');
        }
        return n >= 1 ? n : -1;
    }

    /**
     * A cell address as the pattern {@code \$?([A-Za-z]{1,3})\$?([0-9]{1,7})} reads it, without a
     * regular expression (it runs once per cell of every sheet): the 1-based column in the high 32
     * bits and the row ({@link #parseRow}, -1 for row 0) in the low 32, or -1 when the text is not
     * such an address.
     */
    static long cellAddress(String text) {
        int i = 0;
        int n = text.length();
        if (i < n && text.charAt(i) == '$') {
            i++;
        }
        int letters = i;
        int col = 0;
        while (i < n && i - letters < 4 && isLetter(text.charAt(i))) {
            col = col * 26 + (Character.toUpperCase(text.charAt(i)) - 'A' + 1);
            i++;
        }
        if (i == letters || i - letters > 3) {
            return -1;
        }
        if (i < n && text.charAt(i) == '$') {
            i++;
        }
        int digits = i;
        while (i < n && text.charAt(i) >= '0' && text.charAt(i) <= '9') {
            i++;
        }
        if (i != n || i == digits || i - digits > 7) {
            return -1;
        }
        int row = parseRow(text, digits, n);
        return ((long) col << 32) | (row & 0xffffffffL);
    }

    private static boolean isLetter(char ch) {
        return (ch >= 'A' && ch <= 'Z') || (ch >= 'a' && ch <= 'z');
    }

    /** The value of the attribute {@code localName} in no namespace on the reader's current element, or null. */
    static String unqualifiedAttribute(XMLStreamReader r, String localName) {
        for (int i = 0; i < r.getAttributeCount(); i++) {
            if (r.getAttributeLocalName(i).equals(localName) && (r.getAttributeNamespace(i) == null
                    || r.getAttributeNamespace(i).isEmpty())) {
                return r.getAttributeValue(i);
            }
        }
        return null;
    }
}
