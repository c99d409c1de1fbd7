package org.meritbook.robustness;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import org.apache.poi.poifs.crypt.EncryptionInfo;
import org.apache.poi.poifs.crypt.EncryptionMode;
import org.apache.poi.poifs.crypt.Encryptor;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.meritbook.error.ErrorKey;
import org.meritbook.robustness.CorpusCase.ErrorOrSame;
import org.meritbook.robustness.CorpusCase.Refused;
import org.meritbook.workbook.XlsxParts;

/**
 * Damage to the workbook file as a whole: cut short, bytes overwritten, encrypted, zip bombs with
 * honest and lying headers, entity expansion in any XML part.
 */
final class PackageMutations {
    private static final Set<ErrorKey> CORRUPT = Set.of(ErrorKey.CORRUPT_FILE);
    private static final Set<ErrorKey> TOO_LARGE = Set.of(ErrorKey.WORKBOOK_TOO_LARGE);
    private static final String[] XML_PARTS = {"xl/sharedStrings.xml", Demo.SHEET, "xl/workbook.xml", "xl/styles.xml",
        "[Content_Types].xml", "_rels/.rels", "docProps/core.xml", "xl/_rels/workbook.xml.rels", "xl/worksheets/sheet4.xml"};
    /** 1 MB of one byte deflated about 1000-fold: the payload of bombs that declare a size. */
    private static final byte[] SMALL_BOMB = XlsxParts.deflatedRepeats(1, (byte) ' ');
    /** 210 MB of spaces deflated about 1000-fold: more than the default budget of 200 MB, whatever the headers say. */
    private static final byte[] BOMB = XlsxParts.deflatedRepeats(210, (byte) ' ');

    private final Demo demo;
    private final SplittableRandom random;
    private final byte[] original;

    PackageMutations(Demo demo, SplittableRandom random) {
        this.demo = demo;
        this.random = random;
        this.original = demo.parts.zip();
    }

    List<CorpusCase> truncated(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            int length = i == 0 ? 0 : i == 1 ? 22 : random.nextInt(original.length - 1);
            out.add(demo.bytes("zip-truncated", "cut to " + length + " of " + original.length + " bytes",
                    Arrays.copyOf(original, length), demo.notebook, new Refused(CORRUPT)));
        }
        return out;
    }

    List<CorpusCase> corrupt(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            byte[] damaged = original.clone();
            int hits = 1 + random.nextInt(8);
            StringBuilder where = new StringBuilder();
            for (int h = 0; h < hits; h++) {
                int at = random.nextInt(damaged.length);
                damaged[at] = (byte) random.nextInt(256);
                where.append(h == 0 ? "" : ",").append(at);
            }
            out.add(demo.bytes("zip-corrupt", hits + " bytes overwritten at " + where, damaged, demo.notebook, new ErrorOrSame()));
        }
        // Checksums and sizes that do not match an entry's content.
        for (String part : List.of(Demo.SHEET, "xl/sharedStrings.xml", "xl/styles.xml")) {
            XlsxParts.Raw crc = new XlsxParts.Raw();
            XlsxParts.Raw size = new XlsxParts.Raw();
            for (XlsxParts.Raw.Entry e : demo.parts.rawEntries()) {
                crc.add(e.name().equals(part) ? e.withCrc(e.crc() ^ 0x10) : e);
                size.add(e.name().equals(part) ? e.withSize(e.size() + 1) : e);
            }
            out.add(demo.bytes("zip-corrupt", "wrong checksum of " + part, crc.bytes(), demo.notebook, new Refused(CORRUPT)));
            out.add(demo.bytes("zip-corrupt", "wrong size of " + part, size.bytes(), demo.notebook, new Refused(CORRUPT)));
        }
        return out;
    }

    List<CorpusCase> encrypted(int n) {
        byte[] agile = encrypt(original, EncryptionMode.agile);
        byte[] standard = encrypt(original, EncryptionMode.standard);
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            boolean isAgile = i % 2 == 0;
            out.add(demo.bytes("encrypted", (isAgile ? "agile" : "standard") + " encryption, case " + i, isAgile ? agile : standard,
                    demo.notebook, new Refused(Set.of(ErrorKey.ENCRYPTED_FILE))));
        }
        return out;
    }

    static byte[] encrypt(byte[] xlsx, EncryptionMode mode) {
        try (POIFSFileSystem fs = new POIFSFileSystem()) {
            Encryptor enc = new EncryptionInfo(mode).getEncryptor();
            enc.confirmPassword("Fenwick");
            try (OutputStream os = enc.getDataStream(fs)) {
                os.write(xlsx);
            }
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            fs.writeFilesystem(out);
            return out.toByteArray();
        } catch (IOException | java.security.GeneralSecurityException e) {
            throw new IllegalStateException(e);
        }
    }

    /**
     * Zip bombs in a sheet, the shared strings, an image and a thumbnail: one declaring its size (300
     * MB, refused from the directory), one declaring 1 kB and holding 210 MB (refused once the inflated
     * bytes pass the budget), one declaring 1 kB and holding 1 MB (a size that lies: a damaged file).
     */
    List<CorpusCase> bombs(int n) {
        List<CorpusCase> out = new ArrayList<>();
        String[] parts = {Demo.SHEET, "xl/sharedStrings.xml", "xl/media/image1.png", "docProps/thumbnail.jpeg"};
        for (int i = 0; i < n; i++) {
            String part = parts[i % parts.length];
            int kind = (i / parts.length) % 3;
            XlsxParts.Raw.Entry bomb = switch (kind) {
                case 0 -> new XlsxParts.Raw.Entry(part, SMALL_BOMB, 8, 0, 300L << 20, true);
                case 1 -> new XlsxParts.Raw.Entry(part, BOMB, 8, 0, 1024, true);
                default -> new XlsxParts.Raw.Entry(part, SMALL_BOMB, 8, 0, 1024, true);
            };
            XlsxParts.Raw raw = new XlsxParts.Raw();
            boolean replaced = false;
            for (XlsxParts.Raw.Entry e : demo.parts.rawEntries()) {
                replaced |= e.name().equals(part);
                raw.add(e.name().equals(part) ? bomb : e);
            }
            if (!replaced) {
                raw.add(bomb);
            }
            String what = new String[] {"declared 300 MB", "210 MB declared as 1 kB", "1 MB declared as 1 kB"}[kind];
            out.add(demo.bytes("zip-bomb", what + " in " + part, raw.bytes(), demo.notebook,
                    new Refused(kind == 2 ? Set.of(ErrorKey.CORRUPT_FILE) : TOO_LARGE)));
        }
        // More parts than any workbook has.
        XlsxParts.Raw many = new XlsxParts.Raw();
        demo.parts.rawEntries().forEach(many::add);
        for (int k = 0; k < 1200; k++) {
            many.add(XlsxParts.Raw.Entry.deflated("customXml/item" + k + ".xml", "<a/>".getBytes(java.nio.charset.StandardCharsets.UTF_8)));
        }
        out.add(demo.bytes("zip-bomb", "1,200 extra parts", many.bytes(), demo.notebook, new Refused(TOO_LARGE)));
        return out;
    }

    List<CorpusCase> entities(int n) {
        String laughs = "<!DOCTYPE x [<!ENTITY a \"aaaaaaaaaa\">" + levels(9) + "]>";
        String[] doctypes = {laughs,
            "<!DOCTYPE x [<!ENTITY e SYSTEM \"file:///etc/passwd\">]>",
            "<!DOCTYPE x [<!ENTITY % p SYSTEM \"http://127.0.0.1:9/x.dtd\"> %p;]>",
            "<!DOCTYPE x SYSTEM \"http://127.0.0.1:9/x.dtd\">",
            "<!DOCTYPE x [<!ENTITY big \"" + "B".repeat(50_000) + "\">]>"};
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String part = XML_PARTS[i % XML_PARTS.length];
            int kind = (i / XML_PARTS.length) % doctypes.length;
            String doctype = doctypes[kind];
            String use = kind == 0 ? "&a9;" : kind == 4 ? "&big;".repeat(1000) : "&e;";
            XlsxParts changed = demo.parts.edit(part, x -> {
                int decl = x.indexOf("?>");
                String withType = decl >= 0 ? x.substring(0, decl + 2) + doctype + x.substring(decl + 2) : doctype + x;
                // Use the entity where text is allowed: in the first value or string, if any.
                return withType.replaceFirst("<t>", "<t>" + use).replaceFirst("<v>0</v>", "<v>0" + (use.equals("&e;") ? "&e;" : "") + "</v>");
            });
            out.add(demo.workbook("entity-expansion", "document type " + kind + " in " + part, changed,
                    demo.notebook, new Refused(CORRUPT)));
        }
        return out;
    }

    /** Entities a1..aN, each ten references to the one before: 10^N expansions. */
    private static String levels(int n) {
        StringBuilder sb = new StringBuilder();
        for (int k = 1; k <= n; k++) {
            String prev = k == 1 ? "a" : "a" + (k - 1);
            sb.append("<!ENTITY a").append(k).append(" \"").append(("&" + prev + ";").repeat(10)).append("\">");
        }
        return sb.toString();
    }
}
