package org.meritbook.revision;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.pipeline.Folders;
import org.meritbook.pipeline.SoftwareInventory;
import org.meritbook.pipeline.SourceTypes;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.pipeline.StudyResults.SoftwareComponent;
import org.meritbook.study.Study;
import org.meritbook.pipeline.Sha256;

/**
 * Verifies a dossier from what it carries, treating the file as untrusted: it must be an intact PDF
 * (no truncation, nothing PDFBox would have to repair); the attached notebook and workbooks, matched
 * to the manifest by SHA-256, are unpacked under names meritbook makes and re-run; every quantity
 * must equal the attached results.json exactly, and results.json as a whole must be what the re-run
 * writes; and the dossier the same code renders from those inputs must be the file received, byte
 * for byte, or at least show the same text on every page. Revisions a PDF reader appended later
 * (a signature) are allowed when the original revision is exactly the re-rendered dossier and the
 * pages still show what it shows; the signatures found are reported with what they cover.
 */
public final class DossierVerifier {
    private static final String RESULTS = "results.json";
    private static final String NOTEBOOK = "notebook";
    private static final int SHOWN_JSON = 5;

    /** Renders the dossier PDF the way {@code meritbook run} does (the revision package does not render). */
    @FunctionalInterface
    public interface Renderer {
        byte[] pdf(StudyResults results, byte[] resultsJson, RevisionContext revisions);
    }

    private final Function<Study, StudyResults> runner;
    private final Renderer renderer;

    /**
     * @param runner   the pipeline that re-runs the study (the same analyses as {@code meritbook run})
     * @param renderer the renderer that wrote the dossier (the same templates as the run used)
     */
    public DossierVerifier(Function<Study, StudyResults> runner, Renderer renderer) {
        this.runner = runner;
        this.renderer = renderer;
    }

    public Verification verify(Path pdf) {
        return verify(pdf, Optional.empty());
    }

    /**
     * @param against a folder with the lab's current copies of the workbooks, to be compared with the
     *                ones the dossier carries
     */
    public Verification verify(Path pdf, Optional<Path> against) {
        if (against.isPresent() && !Files.isDirectory(against.get())) {
            throw new InputException(ErrorKey.FILE_NOT_FOUND, against.get().toString(),
                    "a folder with the lab's workbooks", "no such folder",
                    "Give the folder that holds the current copies of the study's workbooks.");
        }
        try (ReceivedDossier received = ReceivedDossier.open(pdf)) {
            String name = received.name();
            Map<String, byte[]> attached = received.attachments();
            byte[] resultsBytes = attached.get(RESULTS);
            if (resultsBytes == null) {
                throw new InputException(ErrorKey.CORRUPT_FILE, name,
                        "a dossier PDF carrying results.json and its inputs",
                        attached.isEmpty() ? "no attached files" : "the attachments " + attached.keySet(),
                        "Verify the PDF that meritbook run wrote, not a copy printed or re-saved by another program.");
            }
            JsonNode recorded = ReceivedResults.parse(resultsBytes, name + " (attached results.json)");
            List<String> differences = new ArrayList<>();
            List<String> notes = new ArrayList<>();
            RevisionContext revisions = RecordedChanges.fromJson(recorded);
            Path folder = null;
            byte[] expectedPdf;
            int quantities;
            try {
                // A private temporary folder (mode 0700) for the unpacked inputs, removed afterwards.
                folder = Files.createTempDirectory("meritbook-verify-");
                Study study = Unpacker.unpack(recorded, attached, folder, name);
                // The software a dossier states is a record of where it was made, not something to recompute.
                StudyResults rerun = runner.apply(study).withSoftware(software(recorded));
                quantities = compareQuantities(recorded, ResultsJson.toTree(rerun), differences);
                byte[] expectedJson = ResultsJson.toBytes(rerun, revisions);
                if (differences.isEmpty() && !Arrays.equals(expectedJson, resultsBytes)) {
                    differences.addAll(recordDifferences(resultsBytes, expectedJson, name));
                }
                expectedPdf = renderer.pdf(rerun, expectedJson, revisions);
            } catch (IOException e) {
                throw new UncheckedIOException("cannot unpack the dossier's inputs into a temporary folder", e);
            } finally {
                Folders.deleteTree(folder);
            }
            int pages = comparePages(received, expectedPdf, differences, notes);
            String version = recordedVersion(recorded);
            if (!differences.isEmpty() && !version.equals(SoftwareInventory.ownVersion())) {
                notes.add("the dossier was written by meritbook " + version + " and is verified by meritbook "
                        + SoftwareInventory.ownVersion() + ": another version may compute or render differently");
            }
            against.ifPresent(dir -> compareCopies(recorded, attached, dir, differences, notes));
            return new Verification(name, recorded.get("sections").size(), quantities, pages, differences, notes,
                    received.signatures());
        }
    }

    private static List<SoftwareComponent> software(JsonNode recorded) {
        List<SoftwareComponent> out = new ArrayList<>();
        recorded.get("software").forEach(s -> out.add(new SoftwareComponent(s.get("name").asText(),
                s.get("version").asText())));
        return out;
    }

    private static String recordedVersion(JsonNode recorded) {
        for (JsonNode s : recorded.get("software")) {
            if (s.get("name").asText().equals("meritbook")) {
                return s.get("version").asText();
            }
        }
        return "(version not recorded)";
    }

    private static int compareQuantities(JsonNode recorded, JsonNode rerun, List<String> differences) {
        Map<String, JsonNode> before = sections(recorded);
        Map<String, JsonNode> after = sections(rerun);
        int count = 0;
        for (Map.Entry<String, JsonNode> e : before.entrySet()) {
            JsonNode now = after.get(e.getKey());
            if (now == null) {
                differences.add("section '" + e.getKey() + "' is not produced by the re-run");
                continue;
            }
            JsonNode was = e.getValue().get("quantities");
            JsonNode is = now.get("quantities");
            for (Iterator<String> names = was.fieldNames(); names.hasNext(); ) {
                String q = names.next();
                count++;
                if (!is.has(q)) {
                    differences.add(e.getKey() + "." + q + ": recorded " + was.get(q).get("value").asText()
                            + ", not produced by the re-run");
                } else if (Double.doubleToLongBits(was.get(q).get("value").asDouble())
                        != Double.doubleToLongBits(is.get(q).get("value").asDouble())) {
                    differences.add(e.getKey() + "." + q + ": recorded " + was.get(q).get("value").asText()
                            + ", re-run gives " + is.get(q).get("value").asText());
                }
            }
            for (Iterator<String> names = is.fieldNames(); names.hasNext(); ) {
                String q = names.next();
                if (!was.has(q)) {
                    differences.add(e.getKey() + "." + q + ": produced by the re-run but not recorded");
                }
            }
        }
        for (String id : after.keySet()) {
            if (!before.containsKey(id)) {
                differences.add("section '" + id + "' is produced by the re-run but not recorded");
            }
        }
        return count;
    }

    /** Where results.json differs from what the re-run writes, when no quantity does (a trail step, a setting…). */
    private static List<String> recordDifferences(byte[] recorded, byte[] expected, String name) {
        List<String> out = JsonDifferences.of(ReceivedResults.parse(recorded, name),
                ReceivedResults.parse(expected, "the re-run's results.json"), SHOWN_JSON);
        if (out.isEmpty()) {
            int at = 0;
            while (at < recorded.length && at < expected.length && recorded[at] == expected[at]) {
                at++;
            }
            out.add("results.json holds the re-run's content but not its bytes (they differ from byte " + at + " on)");
        }
        return out;
    }

    /**
     * Compares the file with the dossier the attachments render to.
     *
     * @return the number of pages compared
     */
    private static int comparePages(ReceivedDossier received, byte[] expected, List<String> differences,
                                    List<String> notes) {
        try (PDDocument rendered = Loader.loadPDF(expected)) {
            PDDocument given = received.document();
            List<String> givenText = PageComparison.texts(given);
            List<String> expectedText = PageComparison.texts(rendered);
            List<String> textual = PageComparison.textDifferences(givenText, expectedText);
            differences.addAll(textual);
            if (received.startsWith(expected)) {
                if (received.length() > expected.length) {
                    int updates = received.revisionEnds().size() - 1;
                    notes.add("the dossier as issued (its first " + expected.length + " bytes) is exactly the one its "
                            + "attachments render to; " + Math.max(updates, 1) + " later update"
                            + (updates > 1 ? "s were" : " was") + " appended by another program"
                            + (textual.isEmpty() ? " without changing what any page shows" : ""));
                    if (textual.isEmpty()) {
                        differences.addAll(PageComparison.drawingDifferences(given, rendered));
                    }
                }
            } else if (textual.isEmpty()) {
                List<String> other = new ArrayList<>(PageComparison.drawingDifferences(given, rendered));
                other.addAll(attachmentDifferences(received.attachments(), attachmentsOf(rendered)));
                if (other.isEmpty()) {
                    int at = 0;
                    byte[] bytes = received.bytes();
                    while (at < bytes.length && at < expected.length && bytes[at] == expected[at]) {
                        at++;
                    }
                    other.add("the file is not the dossier its attachments render to, although every page shows the "
                            + "same text (its metadata or structure differs from byte " + at + " on)");
                }
                differences.addAll(other);
            }
            return givenText.size();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the re-rendered dossier", e);
        }
    }

    private static Map<String, byte[]> attachmentsOf(PDDocument doc) {
        Map<String, byte[]> out = new LinkedHashMap<>();
        try {
            var names = doc.getDocumentCatalog().getNames();
            if (names != null && names.getEmbeddedFiles() != null && names.getEmbeddedFiles().getNames() != null) {
                for (var e : names.getEmbeddedFiles().getNames().entrySet()) {
                    out.put(e.getKey(), e.getValue().getEmbeddedFile().toByteArray());
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the re-rendered dossier's attachments", e);
        }
        return out;
    }

    private static List<String> attachmentDifferences(Map<String, byte[]> given, Map<String, byte[]> expected) {
        List<String> out = new ArrayList<>();
        for (Map.Entry<String, byte[]> e : given.entrySet()) {
            byte[] wanted = expected.get(e.getKey());
            if (wanted == null) {
                out.add("the attachment " + e.getKey() + " is not one the re-rendered dossier carries");
            } else if (!Arrays.equals(wanted, e.getValue())) {
                out.add("the attachment " + e.getKey() + " differs from the one the re-rendered dossier carries");
            }
        }
        expected.keySet().stream().filter(n -> !given.containsKey(n))
                .forEach(n -> out.add("the re-rendered dossier carries " + n + ", which this one does not"));
        return out;
    }

    /** {@code --against DIR}: each attached workbook against the lab's copy of the same name in DIR. */
    private static void compareCopies(JsonNode recorded, Map<String, byte[]> attached, Path dir,
                                      List<String> differences, List<String> notes) {
        Map<String, byte[]> bySha = new LinkedHashMap<>();
        attached.values().forEach(b -> bySha.put(Sha256.of(b), b));
        for (JsonNode input : recorded.get("inputs")) {
            String alias = input.get("alias").asText();
            String written = input.get("path").asText();
            Optional<String> ext = SourceTypes.extension(written);
            if (alias.equals(NOTEBOOK) || ext.isEmpty()) {
                continue;
            }
            String fileName = written.replace('\\', '/').substring(written.replace('\\', '/').lastIndexOf('/') + 1);
            Path copy = dir.resolve(Unpacker.plainName(fileName, "the manifest's path for '" + alias + "'"));
            String label = alias + " (" + written + ")";
            if (!Files.isRegularFile(copy)) {
                differences.add(label + ": no copy named " + fileName + " in " + dir);
                continue;
            }
            if (Sha256.of(copy).equals(input.get("sha256").asText())) {
                notes.add(label + ": " + copy + " is byte-identical to the copy the dossier carries");
                continue;
            }
            byte[] lab;
            try {
                lab = Files.readAllBytes(copy);
            } catch (IOException e) {
                throw new InputException(ErrorKey.CORRUPT_FILE, copy.toString(), "a readable workbook",
                        e.getClass().getSimpleName(), "Check the file's permissions.");
            }
            String sheet = fileName.substring(0, fileName.lastIndexOf('.'));
            String where = WorkbookCells.firstDifference(bySha.get(input.get("sha256").asText()), lab, ext.get(), sheet)
                    .map(d -> "; first differing cell " + d)
                    .orElse("; every cell agrees (the files differ in formatting or metadata only)");
            differences.add(label + ": " + copy + " differs from the copy the dossier carries" + where);
        }
    }

    private static Map<String, JsonNode> sections(JsonNode results) {
        Map<String, JsonNode> out = new LinkedHashMap<>();
        results.get("sections").forEach(s -> out.put(s.get("id").asText(), s));
        return out;
    }
}
