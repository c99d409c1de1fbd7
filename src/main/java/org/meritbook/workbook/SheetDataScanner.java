package org.meritbook.workbook;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import javax.xml.stream.XMLStreamException;

/**
 * The streaming reader's pass over one large UTF-8 worksheet part ({@link SheetStreams}), on its
 * bytes instead of through StAX: the JDK's parser spends most of a 100,000-row read on checks
 * the package check ({@link PackageScan}) has already made on the same part (well-formed, strictly
 * decoded, no document type declaration, no entity other than the five predefined ones and
 * character references). What it reads is what the StAX reader reads: the same cells into the
 * {@link StreamedSheet}, by the same XML rules (line ends read as "\n", entities and character
 * references decoded, white space in attribute values read as spaces), and the same part for
 * POI, with its sheetData reduced to the formula cells in their rows; everything outside
 * sheetData is copied byte for byte, and inside it the formula cells are copied as written but
 * for their position.
 */
final class SheetDataScanner {
    private final InputStream in;
    private final byte[] buf;
    private int pos;
    private int lim;
    private final StreamedSheet sheet;
    private final Bytes out = new Bytes(1 << 16);
    private final Map<String, String> types = new HashMap<>();
    /** the current row's and cell's start tags, and the one read last (swapped, not copied) */
    private Tag rowTag = new Tag();
    private Tag cellTag = new Tag();
    private Tag child = new Tag();
    /** a formula cell's content as written, between its start and end tags */
    private final Bytes inner = new Bytes(256);
    private final Bytes text = new Bytes(64);
    private final Bytes value = new Bytes(64);
    private final Bytes direct = new Bytes(64);
    private final Bytes runs = new Bytes(64);
    /** text as XML reads it (entities decoded, line ends as "\n"), and a comment's or CDATA section's bytes */
    private final Bytes decoded = new Bytes(64);
    private final Bytes markupBody = new Bytes(64);
    /** whether the cell read last has a {@code <v>}, an inline string's own {@code <t>}, and runs */
    private boolean valueSeen;
    private boolean directSeen;
    private boolean runsSeen;
    private int lastRow;
    private int rowNumber;
    private int lastCol;
    private boolean rowWritten;

    /**
     * @param head the part's first bytes, already read to see its encoding
     * @param rest the remainder of the part
     */
    SheetDataScanner(byte[] head, int headLength, InputStream rest, StreamedSheet sheet) {
        this.in = rest;
        this.buf = Arrays.copyOf(head, Math.max(head.length, 1 << 16));
        this.lim = headLength;
        this.sheet = sheet;
    }

    /**
     * True when the part's first bytes say UTF-8 (a byte-order mark, an XML declaration naming
     * UTF-8 or none, or no declaration): the other encodings are left to StAX.
     */
    static boolean utf8(byte[] head, int n) {
        if (n >= 2 && ((head[0] == (byte) 0xFE && head[1] == (byte) 0xFF) || (head[0] == (byte) 0xFF && head[1] == (byte) 0xFE)
                || head[0] == 0 || head[1] == 0)) {
            return false;
        }
        int start = n >= 3 && head[0] == (byte) 0xEF && head[1] == (byte) 0xBB && head[2] == (byte) 0xBF ? 3 : 0;
        String s = new String(head, start, n - start, StandardCharsets.ISO_8859_1);
        if (!s.startsWith("<?xml")) {
            return true;
        }
        int end = s.indexOf("?>");
        if (end < 0) {
            return false;
        }
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("encoding\\s*=\\s*(['\"])([^'\"]*)\\1").matcher(s.substring(0, end));
        return !m.find() || m.group(2).equalsIgnoreCase("UTF-8");
    }

    /** Reads the part into the sheet and returns the part as POI is to see it. */
    byte[] run() throws IOException, XMLStreamException {
        int depth = 0;
        int c;
        while ((c = read()) >= 0) {
            if (c != '<') {
                out.add(c);
                continue;
            }
            int d = next();
            if (d == '/') {
                copyEndTag();
                depth--;
            } else if (d == '?' || d == '!') {
                copyMarkup(d);
            } else {
                child.read(d);
                out.add(child.raw);
                if (!child.empty) {
                    depth++;
                    if (depth == 2 && child.local("sheetData")) {
                        sheetData();
                        depth--;
                    }
                }
            }
        }
        sheet.seal();
        return out.toArray();
    }

    /** The content of sheetData and its end tag: rows are read, formula cells written out. */
    private void sheetData() throws IOException, XMLStreamException {
        while (true) {
            int c = next();
            if (c != '<') {
                out.add(c);
                continue;
            }
            int d = next();
            if (d == '/') {
                copyEndTag();
                return;
            }
            if (d == '?' || d == '!') {
                copyMarkup(d);
                continue;
            }
            child.read(d);
            if (child.local("row")) {
                Tag spare = rowTag;
                rowTag = child;
                child = spare;
                row();
            } else if (!child.empty) {
                skipElement();
            }
        }
    }

    private void row() throws IOException, XMLStreamException {
        String at = rowTag.value("r");
        rowNumber = at == null ? lastRow + 1 : Integer.parseInt(at.strip());
        lastRow = Math.max(lastRow, rowNumber);
        lastCol = 0;
        rowWritten = false;
        StreamedSheet.Row row = StreamedSheet.Row.of(rowTag.value("hidden"), rowTag.value("ht"));
        if (!rowTag.empty) {
            while (true) {
                int c = next();
                if (c != '<') {
                    continue;
                }
                int d = next();
                if (d == '/') {
                    skipTo('>');
                    break;
                }
                if (d == '?' || d == '!') {
                    markup(d, null, null);
                    continue;
                }
                child.read(d);
                if (child.local("c")) {
                    Tag spare = cellTag;
                    cellTag = child;
                    child = spare;
                    cell(row);
                } else if (!child.empty) {
                    skipElement();
                }
            }
        }
        sheet.addRow(rowNumber - 1, row);
        if (rowWritten) {
            writeEndTag(rowTag);
        }
    }

    private void cell(StreamedSheet.Row row) throws IOException, XMLStreamException {
        int col = StreamedSheet.column(cellTag.value("r"), lastCol);
        lastCol = Math.max(lastCol, col);
        String t = cellTag.value("t");
        String type = t == null ? "n" : types.computeIfAbsent(t.strip(), k -> k);
        String s = cellTag.value("s");
        int style = s == null ? -1 : StreamedSheet.styleIndex(s);
        boolean formula = !cellTag.empty && content();
        if (formula) {
            row.add(col - 1, null, null, -1, null);
            writeRowStart();
            out.add(cellTag.raw.a, 0, cellTag.nameEnd);
            cellTag.attributesBut("r", out);
            out.add(" r=\"" + CellRef.columnLetters(col - 1) + rowNumber + "\">");
            out.add(inner.a, 0, inner.n);
            writeEndTag(cellTag);
        } else if (cellTag.empty) {
            row.add(col - 1, type, null, style, null);
        } else {
            row.add(col - 1, type, valueSeen ? value.string() : null, style,
                    runsSeen ? runs.string() : directSeen ? direct.string() : null);
        }
    }

    /**
     * Reads a cell's content to its end tag, as the StAX reader did: {@code <v>}, {@code <f>} and an
     * inline string's text (its runs joined, phonetic runs left out); the content is kept as written
     * in {@link #inner} for a formula cell. Returns whether the cell has a formula.
     */
    private boolean content() throws IOException, XMLStreamException {
        inner.n = 0;
        valueSeen = false;
        directSeen = false;
        runsSeen = false;
        value.n = 0;
        direct.n = 0;
        runs.n = 0;
        boolean formula = false;
        String[] path = new String[8];
        int level = 0;
        while (true) {
            int c = next();
            if (c != '<') {
                text.n = 0;
                int end = textTo(c, text);
                inner.add(text.a, 0, text.n);
                appendText(level, path, decoded);
                if (end < 0) {
                    break;
                }
                c = '<';
            }
            int d = next();
            if (d == '/') {
                int mark = inner.n;
                inner.add('<');
                inner.add('/');
                copyTo('>', inner);
                if (level == 0) {
                    inner.n = mark; // the cell's own end tag is written from its start tag's name
                    return formula;
                }
                level--;
            } else if (d == '!' || d == '?') {
                inner.add('<');
                decoded.n = 0;
                if (markup(d, inner, decoded)) {
                    appendText(level, path, decoded);
                }
            } else {
                child.read(d);
                inner.add(child.raw);
                String name = child.localName();
                if (level < path.length) {
                    path[level] = name;
                }
                level++;
                if (level == 1 && name.equals("f")) {
                    formula = true;
                } else if (level == 1 && name.equals("v")) {
                    value.n = 0;
                    valueSeen = true;
                } else if (level == 2 && name.equals("t") && "is".equals(path[0])) {
                    directSeen = true;
                } else if (level == 3 && name.equals("t") && "is".equals(path[0]) && "r".equals(path[1])) {
                    runsSeen = true;
                }
                if (child.empty) {
                    level--;
                }
            }
        }
        throw new XMLStreamException("a cell the package check let through unclosed");
    }

    private void appendText(int level, String[] path, Bytes t) {
        if (t.n == 0) {
            return;
        }
        if (level == 1 && "v".equals(path[0]) && valueSeen) {
            value.add(t.a, 0, t.n);
        } else if (level == 2 && "is".equals(path[0]) && "t".equals(path[1]) && directSeen) {
            direct.add(t.a, 0, t.n);
        } else if (level == 3 && "is".equals(path[0]) && "r".equals(path[1]) && "t".equals(path[2]) && runsSeen) {
            runs.add(t.a, 0, t.n);
        }
    }

    /**
     * Reads text from its first byte {@code c} to the next '<' (consumed) or the end: the bytes as
     * written into {@code raw}, the text as XML reads it into {@link #decoded}. Returns '<' or -1.
     */
    private int textTo(int c, Bytes raw) throws IOException, XMLStreamException {
        decoded.n = 0;
        while (c >= 0 && c != '<') {
            raw.add(c);
            if (c == '&') {
                StringBuilder name = new StringBuilder();
                int e;
                while ((e = next()) != ';') {
                    raw.add(e);
                    name.append((char) e);
                }
                raw.add(';');
                decoded.addCodePoint(entity(name.toString()));
            } else if (c == '\r') {
                decoded.add('\n');
                int e = read();
                if (e == '\n') {
                    raw.add(e);
                    e = read();
                }
                c = e;
                continue;
            } else {
                decoded.add(c);
            }
            c = read();
        }
        return c;
    }

    private static int entity(String name) throws XMLStreamException {
        switch (name) {
            case "lt":
                return '<';
            case "gt":
                return '>';
            case "amp":
                return '&';
            case "quot":
                return '"';
            case "apos":
                return '\'';
            default:
                if (name.startsWith("#x")) {
                    return Integer.parseInt(name.substring(2), 16);
                }
                if (name.startsWith("#")) {
                    return Integer.parseInt(name.substring(1));
                }
                throw new XMLStreamException("an entity '&" + name + ";' the package check let through");
        }
    }

    private void writeRowStart() {
        if (rowWritten) {
            return;
        }
        out.add(rowTag.raw.a, 0, rowTag.nameEnd);
        rowTag.attributesBut("r", out);
        out.add(" r=\"" + rowNumber + "\">");
        rowWritten = true;
    }

    /**
     * A comment, processing instruction or CDATA section after "<!" or "<?" ({@code d}), read to its
     * end; copied to {@code raw} when given. A CDATA section's text, line ends read as "\n", goes to
     * {@code cdata} when given. Returns whether it was a CDATA section.
     */
    private boolean markup(int d, Bytes raw, Bytes cdata) throws IOException, XMLStreamException {
        add(raw, d);
        String end;
        boolean isCdata = false;
        if (d == '?') {
            end = "?>";
        } else {
            int e = next();
            add(raw, e);
            if (e == '-') {
                add(raw, next());
                end = "-->";
            } else if (e == '[') {
                for (int i = 0; i < "CDATA[".length(); i++) {
                    add(raw, next());
                }
                end = "]]>";
                isCdata = true;
            } else {
                throw new XMLStreamException("a declaration the package check let through");
            }
        }
        Bytes body = markupBody;
        body.n = 0;
        while (!body.endsWith(end)) {
            int c = next();
            add(raw, c);
            body.add(c);
        }
        if (isCdata && cdata != null) {
            int stop = body.n - end.length();
            for (int i = 0; i < stop; i++) {
                byte b = body.a[i];
                if (b == '\r') {
                    cdata.add('\n');
                    if (i + 1 < stop && body.a[i + 1] == '\n') {
                        i++;
                    }
                } else {
                    cdata.add(b & 0xff);
                }
            }
        }
        return isCdata;
    }

    private static void add(Bytes raw, int c) {
        if (raw != null) {
            raw.add(c);
        }
    }

    /** Skips an element's content to its end tag (its start tag was just read and is not empty). */
    private void skipElement() throws IOException, XMLStreamException {
        int level = 1;
        while (level > 0) {
            int c = next();
            if (c != '<') {
                continue;
            }
            int d = next();
            if (d == '/') {
                skipTo('>');
                level--;
            } else if (d == '?' || d == '!') {
                markup(d, null, null);
            } else {
                child.read(d);
                if (!child.empty) {
                    level++;
                }
            }
        }
    }

    private void copyTo(int stop) throws IOException, XMLStreamException {
        copyTo(stop, out);
    }

    /** Copies an end tag whose "&lt;/" has just been read. */
    private void copyEndTag() throws IOException, XMLStreamException {
        out.add('<');
        out.add('/');
        copyTo('>');
    }

    /** Copies a comment, CDATA section or processing instruction whose "&lt;" and {@code d} have just been read. */
    private void copyMarkup(int d) throws IOException, XMLStreamException {
        out.add('<');
        markup(d, out, null);
    }

    /** Writes the end tag of an element whose start tag was read, with the prefix it was written with. */
    private void writeEndTag(Tag tag) {
        out.add('<');
        out.add('/');
        out.add(tag.raw.a, 1, tag.nameEnd - 1);
        out.add('>');
    }

    private void copyTo(int stop, Bytes to) throws IOException, XMLStreamException {
        int c;
        do {
            c = next();
            to.add(c);
        } while (c != stop);
    }

    private void skipTo(int stop) throws IOException, XMLStreamException {
        while (next() != stop) {
            // an end tag holds nothing to read
        }
    }

    private int read() throws IOException {
        if (pos == lim) {
            int n = in.read(buf, 0, buf.length);
            if (n <= 0) {
                return -1;
            }
            pos = 0;
            lim = n;
        }
        return buf[pos++] & 0xff;
    }

    private int next() throws IOException, XMLStreamException {
        int c = read();
        if (c < 0) {
            throw new XMLStreamException("a worksheet part the package check let through that ends early");
        }
        return c;
    }

    /** One start tag as written: its bytes, the end of its name, and where each attribute's name and value lie. */
    private final class Tag {
        final Bytes raw = new Bytes(128);
        int nameEnd;
        int count;
        int[] nameStart = new int[8];
        int[] nameStop = new int[8];
        int[] valueStart = new int[8];
        int[] valueStop = new int[8];
        boolean empty;

        /** Reads a start tag whose first name byte {@code first} follows '<'. */
        void read(int first) throws IOException, XMLStreamException {
            raw.n = 0;
            count = 0;
            raw.add('<');
            int c = first;
            while (c != '>' && c != '/' && !space(c)) {
                raw.add(c);
                c = next();
            }
            nameEnd = raw.n;
            while (true) {
                while (space(c)) {
                    raw.add(c);
                    c = next();
                }
                if (c == '>') {
                    raw.add(c);
                    empty = false;
                    return;
                }
                if (c == '/') {
                    raw.add(c);
                    raw.add(next());
                    empty = true;
                    return;
                }
                if (count == nameStart.length) {
                    int n = count * 2;
                    nameStart = Arrays.copyOf(nameStart, n);
                    nameStop = Arrays.copyOf(nameStop, n);
                    valueStart = Arrays.copyOf(valueStart, n);
                    valueStop = Arrays.copyOf(valueStop, n);
                }
                nameStart[count] = raw.n;
                while (c != '=' && !space(c)) {
                    raw.add(c);
                    c = next();
                }
                nameStop[count] = raw.n;
                while (c != '\'' && c != '"') {
                    raw.add(c);
                    c = next();
                }
                raw.add(c);
                int quote = c;
                valueStart[count] = raw.n;
                while ((c = next()) != quote) {
                    raw.add(c);
                }
                valueStop[count] = raw.n;
                raw.add(c);
                count++;
                c = next();
            }
        }

        boolean local(String name) {
            int start = localStart();
            if (nameEnd - start != name.length()) {
                return false;
            }
            for (int i = 0; i < name.length(); i++) {
                if (raw.a[start + i] != name.charAt(i)) {
                    return false;
                }
            }
            return true;
        }

        String localName() {
            int start = localStart();
            return new String(raw.a, start, nameEnd - start, StandardCharsets.UTF_8);
        }

        private int localStart() {
            for (int i = nameEnd - 1; i > 0; i--) {
                if (raw.a[i] == ':') {
                    return i + 1;
                }
            }
            return 1;
        }

        /** True when attribute {@code i} is {@code name} in no namespace (no prefix; xmlns is a declaration). */
        private boolean is(int i, String name) {
            if (nameStop[i] - nameStart[i] != name.length()) {
                return false;
            }
            for (int k = 0; k < name.length(); k++) {
                if (raw.a[nameStart[i] + k] != name.charAt(k)) {
                    return false;
                }
            }
            return true;
        }

        /** The value of the unprefixed attribute, as XML reads it, or null. */
        String value(String name) throws XMLStreamException {
            for (int i = 0; i < count; i++) {
                if (is(i, name)) {
                    return attributeValue(valueStart[i], valueStop[i]);
                }
            }
            return null;
        }

        /** Writes every attribute but the unprefixed {@code name}, as written, each after one space. */
        void attributesBut(String name, Bytes to) {
            for (int i = 0; i < count; i++) {
                if (!is(i, name)) {
                    to.add(' ');
                    to.add(raw.a, nameStart[i], valueStop[i] + 1 - nameStart[i]);
                }
            }
        }

        /** Attribute-value normalisation: entities decoded, each literal tab, line end or space read as a space. */
        private String attributeValue(int start, int stop) throws XMLStreamException {
            boolean plain = true;
            for (int i = start; i < stop && plain; i++) {
                byte b = raw.a[i];
                plain = b != '&' && b != '\t' && b != '\n' && b != '\r';
            }
            if (plain) {
                return new String(raw.a, start, stop - start, StandardCharsets.UTF_8);
            }
            Bytes v = new Bytes(stop - start);
            for (int i = start; i < stop; i++) {
                byte b = raw.a[i];
                if (b == '&') {
                    int semi = i + 1;
                    while (raw.a[semi] != ';') {
                        semi++;
                    }
                    v.addCodePoint(entity(new String(raw.a, i + 1, semi - i - 1, StandardCharsets.ISO_8859_1)));
                    i = semi;
                } else if (b == '\r') {
                    v.add(' ');
                    if (i + 1 < stop && raw.a[i + 1] == '\n') {
                        i++;
                    }
                } else if (b == '\t' || b == '\n') {
                    v.add(' ');
                } else {
                    v.add(b & 0xff);
                }
            }
            return v.string();
        }
    }

    private static boolean space(int c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\r';
    }

    /** A growable byte array: ByteArrayOutputStream synchronises every write. */
    static final class Bytes {
        byte[] a;
        int n;

        Bytes(int capacity) {
            a = new byte[Math.max(16, capacity)];
        }

        void add(int b) {
            if (n == a.length) {
                a = Arrays.copyOf(a, n * 2);
            }
            a[n++] = (byte) b;
        }

        void add(byte[] b, int off, int len) {
            if (n + len > a.length) {
                a = Arrays.copyOf(a, Math.max(a.length * 2, n + len));
            }
            System.arraycopy(b, off, a, n, len);
            n += len;
        }

        void add(Bytes b) {
            add(b.a, 0, b.n);
        }

        void add(String ascii) {
            for (int i = 0; i < ascii.length(); i++) {
                add(ascii.charAt(i));
            }
        }

        void addCodePoint(int cp) {
            if (cp < 0x80) {
                add(cp);
            } else {
                byte[] utf8 = new String(Character.toChars(cp)).getBytes(StandardCharsets.UTF_8);
                add(utf8, 0, utf8.length);
            }
        }

        boolean endsWith(String ascii) {
            if (n < ascii.length()) {
                return false;
            }
            for (int i = 0; i < ascii.length(); i++) {
                if (a[n - ascii.length() + i] != ascii.charAt(i)) {
                    return false;
                }
            }
            return true;
        }

        String string() {
            return new String(a, 0, n, StandardCharsets.UTF_8);
        }

        byte[] toArray() {
            return Arrays.copyOf(a, n);
        }
    }
}
