package org.meritbook.revision;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.meritbook.criteria.AcceptanceProfiles;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.SourceFile;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.pipeline.Sha256;

/**
 * Unpacks a received dossier's inputs into a fresh private folder so that the study can run again,
 * in folders meritbook makes: each workbook as {@code inputs/source-<n>/<its file name>}, the notebook
 * as {@code study/<its file name>}, file names used only once they are plain names (no separator, no
 * {@code ..}, no control character), and a lab's profile file where the notebook's relative
 * {@code criteria:} path finds it, inside the folder. Nothing a dossier says can make a file appear anywhere else; a source the
 * notebook declares but the dossier does not carry points at a file that does not exist, so the run
 * never reads the verifying machine's own files.
 */
final class Unpacker {
    private static final String NOTEBOOK = "notebook";
    private static final int MAX_CLIMB = 16;

    private Unpacker() {
    }

    /**
     * @param recorded the validated results.json
     * @param attached attachment name → bytes
     * @param folder   an empty private folder
     * @param label    the dossier, for messages
     */
    static Study unpack(JsonNode recorded, Map<String, byte[]> attached, Path folder, String label) throws IOException {
        Map<String, byte[]> bySha = new HashMap<>();
        attached.forEach((n, bytes) -> bySha.put(Sha256.of(bytes), bytes));
        Map<String, byte[]> byAlias = new LinkedHashMap<>();
        for (JsonNode input : recorded.get("inputs")) {
            String alias = input.get("alias").asText();
            byte[] bytes = bySha.get(input.get("sha256").asText());
            if (bytes == null) {
                throw new InputException(ErrorKey.CORRUPT_FILE, label,
                        "an attached file with the SHA-256 the manifest records for '" + alias + "' ("
                                + input.get("path").asText() + ")",
                        "none: the attachment is missing or was altered",
                        "The dossier's inputs no longer match its manifest; treat the dossier as not verified.");
            }
            byAlias.put(alias, bytes);
        }
        byte[] notebookBytes = byAlias.get(NOTEBOOK);
        if (notebookBytes == null) {
            throw new InputException(ErrorKey.CORRUPT_FILE, label + " (attached results.json), at $.inputs",
                    "an input with the alias 'notebook'", "none", "Verify a dossier that meritbook run wrote.");
        }
        String name = plainName(recorded.get("study").get("file").asText(),
                label + " (attached results.json), at $.study.file");
        String text = new String(notebookBytes, StandardCharsets.UTF_8); // only to find criteria:
        Path root = Files.createDirectory(folder.resolve("study"));

        // Where the notebook must sit for its criteria: path to find the attached profile inside the folder.
        Study first = StudyParser.parse(text, root.resolve(name));
        Path notebookDir = root;
        Path profile = null;
        if (byAlias.containsKey(AcceptanceProfiles.MANIFEST_ALIAS) && AcceptanceProfiles.file(first).isPresent()) {
            Path written = relative(first.frontMatter().criteria().strip(), label);
            int climb = 0;
            while (climb < written.getNameCount() && written.getName(climb).toString().equals("..")) {
                climb++;
            }
            if (climb > MAX_CLIMB || climb == written.getNameCount()) {
                throw unsafe(label + ", notebook's criteria:", written.toString());
            }
            for (int i = 1; i <= climb; i++) {
                notebookDir = notebookDir.resolve("up" + i);
            }
            profile = root;
            for (int i = climb; i < written.getNameCount(); i++) {
                profile = profile.resolve(plainName(written.getName(i).toString(), label + ", notebook's criteria:"));
            }
            Files.createDirectories(notebookDir);
            Files.createDirectories(profile.getParent());
            Files.write(profile, byAlias.get(AcceptanceProfiles.MANIFEST_ALIAS));
        }
        Path notebook = notebookDir.resolve(name);
        Files.write(notebook, notebookBytes);
        Study study = StudyParser.parse(notebook); // as run reads it: strict UTF-8

        if (profile != null && !AcceptanceProfiles.file(study).map(profile::equals).orElse(false)) {
            throw new IllegalStateException("the attached profile was not placed where the notebook finds it");
        }

        Path inputs = Files.createDirectory(folder.resolve("inputs"));
        Map<String, SourceFile> sources = new LinkedHashMap<>();
        int n = 0;
        for (SourceFile s : study.sources().values()) {
            n++;
            byte[] bytes = byAlias.get(s.alias());
            Path file;
            if (bytes == null) {
                file = inputs.resolve("not-attached-" + n);
            } else {
                // The file name is part of what a run records (trail sources, a CSV's sheet name), so it is
                // kept, once checked to be a plain name, in a folder of meritbook's own per source.
                String written = s.written().replace('\\', '/');
                String fileName = plainName(written.substring(written.lastIndexOf('/') + 1),
                        label + ", notebook's source '" + s.alias() + "'");
                file = Files.createDirectory(inputs.resolve("source-" + n)).resolve(fileName);
                Files.write(file, bytes);
            }
            sources.put(s.alias(), new SourceFile(s.alias(), file, s.written(), s.line()));
        }
        return new Study(study.file(), study.text(), study.frontMatter(), sources, study.elements());
    }

    /** A relative path as written in the notebook; an absolute one could only point outside the folder. */
    private static Path relative(String written, String label) {
        Path p;
        try {
            p = Path.of(written.replace('\\', '/')).normalize();
        } catch (InvalidPathException e) {
            throw unsafe(label + ", notebook's criteria:", written);
        }
        if (p.isAbsolute() || written.startsWith("/") || written.startsWith("\\")
                || written.matches("(?i)[a-z]:.*") || p.getNameCount() == 0) {
            throw new InputException(ErrorKey.CORRUPT_FILE, label + ", notebook's criteria:",
                    "a profile file named relative to the notebook, so that verify can put the attached copy there",
                    "the absolute path '" + written + "'",
                    "Re-issue the dossier with the profile named relative to the notebook (e.g. profiles/lab.yaml).");
        }
        return p;
    }

    /** A name that can be used as one file name in a folder meritbook made, or a located refusal. */
    static String plainName(String name, String where) {
        boolean bad = name.isEmpty() || name.length() > 255 || name.equals(".") || name.equals("..")
                || name.indexOf('/') >= 0 || name.indexOf('\\') >= 0;
        for (int i = 0; i < name.length() && !bad; i++) {
            int type = Character.getType(name.charAt(i));
            bad = type == Character.CONTROL || type == Character.FORMAT || type == Character.LINE_SEPARATOR
                    || type == Character.PARAGRAPH_SEPARATOR;
        }
        if (bad) {
            throw unsafe(where, name);
        }
        return name;
    }

    private static InputException unsafe(String where, String found) {
        return new InputException(ErrorKey.CORRUPT_FILE, where,
                "a plain file name (no folder separator, no '..', no control character)", "'" + visible(found) + "'",
                "A dossier never chooses where its files go; treat this one as not verified.");
    }

    /** Control and format characters as {@code \\uXXXX}, so the message shows what is there. */
    private static String visible(String s) {
        StringBuilder b = new StringBuilder();
        for (char c : s.toCharArray()) {
            int type = Character.getType(c);
            if (type == Character.CONTROL || type == Character.FORMAT) {
                b.append(String.format(Locale.ROOT, "\\u%04X", (int) c));
            } else {
                b.append(c);
            }
        }
        return b.toString();
    }
}
