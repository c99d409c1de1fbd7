package org.meritbook.revision;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Stream;
import org.meritbook.criteria.AcceptanceProfiles;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.study.FrontMatter;
import org.meritbook.study.SourceFile;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;

/**
 * Verifies a dossier from what it carries: the attached notebook and workbooks are re-run, and every
 * quantity of the new results must equal the attached results.json exactly (same names, same
 * doubles). Attachments are matched to the manifest by SHA-256, so a tampered input is caught too.
 * Nothing outside the PDF is read; the inputs are unpacked into a temporary folder, removed after.
 */
public final class DossierVerifier {
    private static final String RESULTS = "results.json";

    private final Function<Study, StudyResults> runner;

    /** @param runner the pipeline that re-runs the study (the same analyses as {@code meritbook run}) */
    public DossierVerifier(Function<Study, StudyResults> runner) {
        this.runner = runner;
    }

    public Verification verify(Path pdf) {
        String name = pdf.getFileName().toString();
        if (!Files.isRegularFile(pdf)) {
            throw new InputException(ErrorKey.FILE_NOT_FOUND, name, "a dossier PDF", "no such file",
                    "Give the path of a dossier written by meritbook run.");
        }
        Map<String, byte[]> attached = DossierAttachments.read(pdf);
        byte[] resultsBytes = attached.get(RESULTS);
        if (resultsBytes == null) {
            throw new InputException(ErrorKey.CORRUPT_FILE, name, "a dossier PDF carrying results.json and its inputs",
                    attached.isEmpty() ? "no attached files" : "the attachments " + attached.keySet(),
                    "Verify the PDF that meritbook run wrote, not a copy printed or re-saved by another program.");
        }
        JsonNode recorded = ReceivedResults.parse(resultsBytes, name + " (attached results.json)");
        Path folder = null;
        try {
            folder = Files.createTempDirectory("meritbook-verify-");
            Study study = unpack(recorded, attached, folder, name);
            StudyResults rerun = runner.apply(study);
            return compare(name, recorded, ResultsJson.toTree(rerun));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot unpack the dossier's inputs into a temporary folder", e);
        } finally {
            delete(folder);
        }
    }

    /** Writes the attached inputs under their manifest paths' file names and points the study at them. */
    private static Study unpack(JsonNode recorded, Map<String, byte[]> attached, Path folder, String pdf)
            throws IOException {
        Map<String, byte[]> bySha = new HashMap<>();
        attached.forEach((n, bytes) -> bySha.put(Sha256.of(bytes), bytes));
        Map<String, Path> unpacked = new LinkedHashMap<>();
        for (JsonNode input : recorded.get("inputs")) {
            String alias = input.get("alias").asText();
            byte[] bytes = bySha.get(input.get("sha256").asText());
            if (bytes == null) {
                throw new InputException(ErrorKey.CORRUPT_FILE, pdf,
                        "an attached file with the SHA-256 the manifest records for '" + alias + "' ("
                                + input.get("path").asText() + ")",
                        "none: the attachment is missing or was altered",
                        "The dossier's inputs no longer match its manifest; treat the dossier as not verified.");
            }
            Path file = folder.resolve(alias + "-" + Path.of(input.get("path").asText()).getFileName());
            Files.write(file, bytes);
            unpacked.put(alias, file);
        }
        Path notebookFile = unpacked.get("notebook");
        Study study = StudyParser.parse(new String(Files.readAllBytes(notebookFile), StandardCharsets.UTF_8),
                notebookFile.resolveSibling(recorded.get("study").get("file").asText()));
        Map<String, SourceFile> sources = new LinkedHashMap<>();
        for (SourceFile s : study.sources().values()) {
            Path file = unpacked.get(s.alias());
            sources.put(s.alias(), new SourceFile(s.alias(), file == null ? s.path() : file, s.written(), s.line()));
        }
        Files.copy(notebookFile, study.file());
        FrontMatter fm = study.frontMatter();
        Path profile = unpacked.get(AcceptanceProfiles.MANIFEST_ALIAS);
        if (profile != null) {
            // The lab's acceptance profile, as attached, stands in for the file the notebook names.
            fm = new FrontMatter(fm.title(), fm.method(), fm.laboratory(), fm.revision(), fm.revisionReason(),
                    fm.preparedBy(), fm.date(), profile.toString(), fm.all());
        }
        return new Study(study.file(), study.text(), fm, sources, study.elements());
    }

    private static Verification compare(String pdf, JsonNode recorded, JsonNode rerun) {
        List<String> differences = new ArrayList<>();
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
        return new Verification(pdf, before.size(), count, differences);
    }

    private static Map<String, JsonNode> sections(JsonNode results) {
        Map<String, JsonNode> out = new LinkedHashMap<>();
        results.get("sections").forEach(s -> out.put(s.get("id").asText(), s));
        return out;
    }

    private static void delete(Path folder) {
        if (folder == null) {
            return;
        }
        try (Stream<Path> files = Files.walk(folder)) {
            for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot remove the temporary folder " + folder, e);
        }
    }
}
