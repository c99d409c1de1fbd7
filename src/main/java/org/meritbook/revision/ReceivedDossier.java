package org.meritbook.revision;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import org.apache.pdfbox.pdfparser.PDFParser;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentNameDictionary;
import org.apache.pdfbox.pdmodel.PDEmbeddedFilesNameTreeNode;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.common.filespecification.PDEmbeddedFile;
import org.apache.pdfbox.pdmodel.interactive.digitalsignature.PDSignature;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/**
 * A dossier PDF as received, read the strict way: the file must end with {@code %%EOF} after its
 * last {@code startxref}, and its cross-reference data must parse without PDFBox's repair (which
 * would silently rebuild a truncated or damaged file from whatever objects it can still find).
 * Revisions appended later by a PDF reader (an incremental update, e.g. a signature) are recognised
 * by the {@code startxref … %%EOF} that ends each one.
 */
final class ReceivedDossier implements AutoCloseable {
    /** The end of one revision: {@code startxref}, its offset, {@code %%EOF} and the line end after it. */
    private static final Pattern REVISION_END = Pattern.compile("startxref[ \\t\\r\\n]+([0-9]{1,15})[ \\t\\r\\n]+%%EOF(\\r\\n|\\r|\\n)?");
    private static final Pattern TRAILING = Pattern.compile("startxref[ \\t\\r\\n]+([0-9]{1,15})[ \\t\\r\\n]+%%EOF[ \\t\\r\\n]*\\z");

    private final String name;
    private final byte[] bytes;
    private final PDDocument document;
    private final List<Integer> revisionEnds;

    private ReceivedDossier(String name, byte[] bytes, PDDocument document, List<Integer> revisionEnds) {
        this.name = name;
        this.bytes = bytes;
        this.document = document;
        this.revisionEnds = List.copyOf(revisionEnds);
    }

    /**
     * @throws InputException {@link ErrorKey#FILE_NOT_FOUND} for a missing file, {@link ErrorKey#CORRUPT_FILE}
     *                        for one that is not a PDF, is truncated, or needs repair to be read
     */
    static ReceivedDossier open(Path pdf) {
        String name = pdf.getFileName().toString();
        if (!Files.isRegularFile(pdf)) {
            throw new InputException(ErrorKey.FILE_NOT_FOUND, name, "a dossier PDF", "no such file",
                    "Give the path of a dossier written by meritbook run.");
        }
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(pdf);
        } catch (IOException e) {
            throw new InputException(ErrorKey.CORRUPT_FILE, name, "a readable file",
                    e.getClass().getSimpleName() + ": " + e.getMessage(), "Check the file's permissions.");
        }
        if (bytes.length < 8 || !new String(bytes, 0, 5, StandardCharsets.ISO_8859_1).equals("%PDF-")) {
            throw damaged(name, "a PDF file (starting with %PDF-)", "a file that is not a PDF",
                    "Give the dossier PDF that meritbook run wrote.");
        }
        // Latin-1 maps every byte to one char, so offsets in the text are offsets in the file.
        String text = new String(bytes, StandardCharsets.ISO_8859_1);
        Matcher last = TRAILING.matcher(text.substring(Math.max(0, text.length() - 1024)));
        if (!last.find()) {
            throw damaged(name, "a complete PDF that ends with %%EOF after its last startxref",
                    "a file of " + bytes.length + " bytes that ends without it (truncated, or damaged at its end)",
                    "Use an intact copy of the dossier; a cut or damaged file cannot be verified.");
        }
        List<Integer> ends = new ArrayList<>();
        Matcher m = REVISION_END.matcher(text);
        while (m.find()) {
            long offset = Long.parseLong(m.group(1));
            if (offset < m.start()) {
                ends.add(m.end());
            }
        }
        PDDocument doc;
        try {
            doc = new PDFParser(new RandomAccessReadBuffer(bytes)).parse(false);
        } catch (IOException e) {
            throw damaged(name, "a PDF whose cross-reference data reads without repair",
                    "one that does not (" + e.getMessage() + ")",
                    "Use an intact copy of the dossier; a damaged file cannot be verified.");
        }
        return new ReceivedDossier(name, bytes, doc, ends);
    }

    private static InputException damaged(String name, String expected, String found, String fix) {
        return new InputException(ErrorKey.CORRUPT_FILE, name, expected, "damage: " + found, fix);
    }

    String name() {
        return name;
    }

    byte[] bytes() {
        return bytes.clone();
    }

    int length() {
        return bytes.length;
    }

    /** Whether the file starts with exactly these bytes. */
    boolean startsWith(byte[] prefix) {
        return prefix.length <= bytes.length && java.util.Arrays.equals(bytes, 0, prefix.length, prefix, 0, prefix.length);
    }

    PDDocument document() {
        return document;
    }

    /** Offsets just past each revision's {@code %%EOF}, first the original's; more than one after updates. */
    List<Integer> revisionEnds() {
        return revisionEnds;
    }

    /** Attachment name → bytes, in the PDF's (sorted) name-tree order. */
    Map<String, byte[]> attachments() {
        Map<String, byte[]> files = new LinkedHashMap<>();
        try {
            PDDocumentNameDictionary names = document.getDocumentCatalog().getNames();
            PDEmbeddedFilesNameTreeNode tree = names == null ? null : names.getEmbeddedFiles();
            Map<String, PDComplexFileSpecification> specs = tree == null ? null : tree.getNames();
            if (specs != null) {
                for (Map.Entry<String, PDComplexFileSpecification> e : specs.entrySet()) {
                    PDEmbeddedFile file = e.getValue().getEmbeddedFile();
                    if (file != null) {
                        files.put(e.getKey(), file.toByteArray());
                    }
                }
            }
        } catch (IOException e) {
            throw damaged(name, "attachments that can be read", "one that cannot (" + e.getMessage() + ")",
                    "Use an intact copy of the dossier.");
        }
        return files;
    }

    /** The signatures the document carries, with what each one covers. */
    List<Verification.Signature> signatures() {
        List<Verification.Signature> out = new ArrayList<>();
        for (PDSignature s : document.getSignatureDictionaries()) {
            int[] range = s.getByteRange();
            boolean whole = range != null && range.length == 4 && range[0] == 0 && range[1] >= 0
                    && range[2] >= range[1] && (long) range[2] + range[3] == bytes.length;
            long covered = range == null || range.length != 4 ? 0 : (long) range[2] + range[3];
            Calendar signed = s.getSignDate();
            String when = signed == null ? null : signed.toInstant().toString().substring(0, 10);
            out.add(new Verification.Signature(s.getName(), when, whole, covered, bytes.length));
        }
        return out;
    }

    @Override
    public void close() {
        try {
            document.close();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot close " + name, e);
        }
    }
}
