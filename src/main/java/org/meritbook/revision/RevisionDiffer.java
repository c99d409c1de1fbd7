package org.meritbook.revision;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.revision.RevisionDiff.Change;

/**
 * Compares two runs of a study from their results.json (given directly, or read from a dossier PDF's
 * attachment). Input cells are compared as the calculation trail cites them, by cell address, so a
 * corrected value shows up as {@code Calibration!D16: 21.08 → 21.80} next to the results it moved.
 */
public final class RevisionDiffer {
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    private RevisionDiffer() {
    }

    public static RevisionDiff diff(Path before, Path after) {
        return diff(before.getFileName().toString(), read(before), after.getFileName().toString(), read(after));
    }

    /** Two runs' results.json as bytes (the live preview keeps them in memory). */
    public static RevisionDiff diff(String beforeLabel, byte[] before, String afterLabel, byte[] after) {
        return diff(parse(beforeLabel, before), parse(afterLabel, after));
    }

    /** A results.json read and checked once, to be compared with several others (the live preview's runs). */
    public record Parsed(String label, JsonNode tree) {
    }

    /** @throws org.meritbook.error.InputException as {@link ReceivedResults#parse} */
    public static Parsed parse(String label, byte[] json) {
        return new Parsed(label, ReceivedResults.parse(json, label));
    }

    public static RevisionDiff diff(Parsed before, Parsed after) {
        return diff(before.label(), before.tree(), after.label(), after.tree());
    }

    static RevisionDiff diff(String beforeLabel, JsonNode before, String afterLabel, JsonNode after) {
        return new RevisionDiff(beforeLabel, afterLabel,
                changes(inputs(before), inputs(after)),
                changes(cells(before), cells(after)),
                changes(settings(before), settings(after)),
                changes(quantities(before), quantities(after)));
    }

    /**
     * The differences as JSON for tools: {@code {before, after, identical, inputs[], cells[], settings[],
     * results[]}}, each change {@code {what, before, after}} with null for added or removed.
     */
    public static String toJson(RevisionDiff diff) {
        ObjectNode n = JSON.createObjectNode();
        n.put("before", diff.before()).put("after", diff.after()).put("identical", diff.identical());
        RecordedChanges.addGroups(n, diff);
        try {
            return JSON.writeValueAsString(n) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("the differences could not be serialised", e);
        }
    }

    /** results.json of a run: the file itself, or the one attached to a dossier PDF. */
    static JsonNode read(Path file) {
        String name = file.getFileName().toString();
        if (!Files.isRegularFile(file)) {
            throw new InputException(ErrorKey.FILE_NOT_FOUND, name, "a results.json or a dossier PDF", "no such file",
                    "Give the path of a results.json or a dossier written by meritbook run.");
        }
        boolean pdf = name.toLowerCase(Locale.ROOT).endsWith(".pdf");
        byte[] bytes;
        if (pdf) {
            try (ReceivedDossier dossier = ReceivedDossier.open(file)) {
                bytes = dossier.attachments().get("results.json");
            }
        } else {
            try {
                bytes = Files.readAllBytes(file);
            } catch (IOException e) {
                throw new InputException(ErrorKey.CORRUPT_FILE, name, "a readable file", e.getMessage(), "Check the file.");
            }
        }
        if (bytes == null) {
            throw new InputException(ErrorKey.CORRUPT_FILE, name, "a dossier PDF carrying results.json",
                    "no attached results.json", "Give a dossier written by meritbook run, or its results.json.");
        }
        return ReceivedResults.parse(bytes, pdf ? name + " (attached results.json)" : name);
    }

    private static Map<String, String> inputs(JsonNode results) {
        Map<String, String> out = new LinkedHashMap<>();
        results.get("inputs").forEach(i -> out.put(i.get("alias").asText() + " (" + i.get("path").asText() + ")",
                "SHA-256 " + i.get("sha256").asText().substring(0, 12) + "…"));
        return out;
    }

    /** Every workbook cell the trail cites (sources of the form Sheet!A1), with the value read. */
    private static Map<String, String> cells(JsonNode results) {
        Map<String, String> out = new LinkedHashMap<>();
        for (JsonNode step : results.get("trail")) {
            for (JsonNode input : step.get("inputs")) {
                String source = input.get("source").asText();
                if (source.matches(".+![A-Z]{1,3}[0-9]+") && input.has("value")) {
                    out.putIfAbsent(source, input.get("value").asText());
                }
            }
        }
        return out;
    }

    private static Map<String, String> settings(JsonNode results) {
        Map<String, String> out = new LinkedHashMap<>();
        for (JsonNode section : results.get("sections")) {
            String id = section.get("id").asText();
            section.get("settings").fields().forEachRemaining(s -> out.put(id + " " + s.getKey(), s.getValue().asText()));
        }
        return out;
    }

    private static Map<String, String> quantities(JsonNode results) {
        Map<String, String> out = new LinkedHashMap<>();
        for (JsonNode section : results.get("sections")) {
            String id = section.get("id").asText();
            section.get("quantities").fields().forEachRemaining(q -> {
                JsonNode unit = q.getValue().get("unit");
                out.put(id + "." + q.getKey(), q.getValue().get("value").asText()
                        + (unit == null || unit.isNull() ? "" : " " + unit.asText()));
            });
        }
        return out;
    }

    private static List<Change> changes(Map<String, String> before, Map<String, String> after) {
        Set<String> keys = new LinkedHashSet<>(before.keySet());
        keys.addAll(after.keySet());
        List<Change> out = new ArrayList<>();
        for (String k : keys) {
            String b = before.get(k);
            String a = after.get(k);
            if (b == null || !b.equals(a)) {
                out.add(new Change(k, b, a));
            }
        }
        return out;
    }
}
