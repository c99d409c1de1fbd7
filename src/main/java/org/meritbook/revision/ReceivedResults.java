package org.meritbook.revision;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;

/**
 * results.json as received: from a file or a dossier that anybody may have edited. Every field that
 * meritbook writes is checked against the schema (docs/results.md) before any of it is used, and
 * each deviation is reported with the file, the JSON path, what was expected and what was found, so
 * that {@code verify} and {@code diff} never fail on a missing or mistyped field.
 */
public final class ReceivedResults {
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final Pattern SHA256 = Pattern.compile("[0-9a-f]{64}");
    /** A source alias as the notebook allows it, or the manifest's own aliases. */
    private static final Pattern ALIAS = Pattern.compile("[A-Za-z0-9_.-]{1,64}");
    private static final Pattern PLAIN_KEY = Pattern.compile("[A-Za-z_][A-Za-z0-9_]*");
    private static final Set<String> OUTCOMES = Set.of("pass", "fail", "not_evaluable");
    private static final int SHOWN = 20;

    private final String file;
    private final List<Problem> problems = new ArrayList<>();

    private ReceivedResults(String file) {
        this.file = file;
    }

    /**
     * @param bytes the received results.json
     * @param file  how to name it in messages, e.g. {@code "study-rev1.pdf (attached results.json)"}
     * @return the parsed tree, every field of which has the type the schema gives it
     * @throws InputException (exit 2) listing every deviation, each located by its JSON path
     */
    public static JsonNode parse(byte[] bytes, String file) {
        JsonNode tree;
        try {
            tree = MAPPER.readTree(bytes);
        } catch (IOException e) {
            throw new InputException(ErrorKey.CORRUPT_FILE, file, "results.json in JSON",
                    "text that is not JSON (" + firstLine(e.getMessage()) + ")",
                    "The file was altered or damaged; use the results.json that meritbook run wrote.");
        }
        if (tree == null || !tree.isObject()) {
            throw new InputException(ErrorKey.CORRUPT_FILE, file, "a results.json object", "no JSON object",
                    "Use the results.json that meritbook run wrote.");
        }
        JsonNode schema = tree.get("schema");
        if (schema == null || !schema.isTextual() || !ResultsJson.SCHEMA.equals(schema.asText())) {
            throw new InputException(ErrorKey.CORRUPT_FILE, file + ", at $.schema", "'" + ResultsJson.SCHEMA + "'",
                    describe(schema), "Read it with the meritbook version that wrote it.");
        }
        ReceivedResults check = new ReceivedResults(file);
        check.root(tree);
        if (!check.problems.isEmpty()) {
            List<Problem> shown = new ArrayList<>(check.problems.subList(0, Math.min(SHOWN, check.problems.size())));
            if (check.problems.size() > SHOWN) {
                Problem last = check.problems.get(check.problems.size() - 1);
                shown.add(new Problem(ErrorKey.CORRUPT_FILE, file, "no further deviations",
                        (check.problems.size() - SHOWN) + " more, the last at " + last.where(), last.fix()));
            }
            throw new InputException(shown);
        }
        return tree;
    }

    private void root(JsonNode root) {
        JsonNode study = object(root, "study", "$");
        if (study != null) {
            study(study, "$.study");
        }
        eachObject(root, "inputs", "$", this::input);
        eachObject(root, "sections", "$", this::section);
        eachObject(root, "trail", "$", this::step);
        eachObject(root, "software", "$", (n, p) -> {
            text(n, "name", p, false);
            text(n, "version", p, false);
        });
    }

    private void study(JsonNode study, String path) {
        text(study, "file", path, false);
        text(study, "title", path, false);
        integer(study, "revision", path);
        object(study, "front_matter", path);
        if (study.has("acceptance")) {
            JsonNode a = object(study, "acceptance", path);
            if (a != null) {
                String ap = path + ".acceptance";
                text(a, "name", ap, false);
                text(a, "origin", ap, true);
                text(a, "description", ap, true);
                eachObject(a, "rules", ap, (r, p) -> {
                    text(r, "rule", p, false);
                    text(r, "source", p, true);
                });
            }
        }
        if (study.has("warnings")) {
            eachText(study, "warnings", path);
        }
        if (study.has("history")) {
            eachObject(study, "history", path, (h, p) -> {
                integer(h, "revision", p);
                text(h, "date", p, true);
                text(h, "reason", p, true);
                text(h, "prepared_by", p, true);
            });
        }
        if (study.has("changes") && !study.get("changes").isNull()) {
            JsonNode c = object(study, "changes", path);
            if (c != null) {
                String cp = path + ".changes";
                text(c, "since", cp, false);
                for (String group : RecordedChanges.GROUPS) {
                    eachObject(c, group, cp, (ch, p) -> {
                        text(ch, "what", p, false);
                        text(ch, "before", p, true);
                        text(ch, "after", p, true);
                    });
                }
            }
        }
    }

    private void input(JsonNode in, String path) {
        JsonNode alias = text(in, "alias", path, false);
        if (alias != null && !ALIAS.matcher(alias.asText()).matches()) {
            add(path + ".alias", "an alias of letters, digits, '_', '.' or '-'", describe(alias));
        }
        text(in, "path", path, false);
        JsonNode sha = text(in, "sha256", path, false);
        if (sha != null && !SHA256.matcher(sha.asText()).matches()) {
            add(path + ".sha256", "64 lower-case hexadecimal digits", describe(sha));
        }
        JsonNode bytes = integer(in, "bytes", path);
        if (bytes != null && bytes.asLong() < 0) {
            add(path + ".bytes", "a file size of 0 or more", describe(bytes));
        }
        eachText(in, "ranges", path);
        text(in, "saved_on", path, true);
    }

    private void section(JsonNode s, String path) {
        text(s, "id", path, false);
        text(s, "kind", path, false);
        text(s, "title", path, true);
        JsonNode settings = object(s, "settings", path);
        if (settings != null) {
            settings.fieldNames().forEachRemaining(name -> text(settings, name, path + ".settings", false));
        }
        JsonNode quantities = object(s, "quantities", path);
        if (quantities != null) {
            for (Iterator<Map.Entry<String, JsonNode>> it = quantities.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                String qp = path + ".quantities" + key(e.getKey());
                if (!e.getValue().isObject()) {
                    add(qp, "an object {value, unit, label, step, summary}", describe(e.getValue()));
                    continue;
                }
                quantity(e.getValue(), qp);
            }
        }
        eachObject(s, "verdicts", path, (v, p) -> {
            text(v, "characteristic", p, false);
            text(v, "quantity", p, true);
            text(v, "rule", p, false);
            JsonNode outcome = text(v, "outcome", p, false);
            if (outcome != null && !OUTCOMES.contains(outcome.asText())) {
                add(p + ".outcome", "pass, fail or not_evaluable", describe(outcome));
            }
            text(v, "reason", p, true);
        });
        eachText(s, "warnings", path);
    }

    private void quantity(JsonNode q, String path) {
        number(q, "value", path, false);
        text(q, "unit", path, true);
        text(q, "label", path, false);
        text(q, "step", path, false);
        JsonNode summary = field(q, "summary", path);
        if (summary != null && !summary.isBoolean()) {
            add(path + ".summary", "true or false", describe(summary));
        }
        if (q.has("ci")) {
            JsonNode ci = object(q, "ci", path);
            if (ci != null) {
                number(ci, "low", path + ".ci", false);
                number(ci, "high", path + ".ci", false);
                number(ci, "level", path + ".ci", false);
            }
        }
    }

    private void step(JsonNode step, String path) {
        text(step, "id", path, false);
        text(step, "section", path, false);
        text(step, "label", path, false);
        text(step, "formula", path, false);
        eachObject(step, "inputs", path, (in, p) -> {
            text(in, "name", p, false);
            if (in.has("text")) {
                text(in, "text", p, false);
            } else {
                number(in, "value", p, true);
            }
            text(in, "unit", p, true);
            text(in, "source", p, false);
        });
        number(step, "value", path, true);
        text(step, "unit", path, true);
        text(step, "method", path, true);
    }

    // ---- typed field checks: each records a located problem and returns null when the field is wrong

    private interface Element {
        void check(JsonNode node, String path);
    }

    private JsonNode field(JsonNode parent, String name, String path) {
        JsonNode n = parent.get(name);
        if (n == null) {
            add(path + key(name), "the field '" + name + "'", "nothing (the field is missing)");
        }
        return n;
    }

    private JsonNode object(JsonNode parent, String name, String path) {
        JsonNode n = field(parent, name, path);
        if (n != null && !n.isObject()) {
            add(path + key(name), "an object", describe(n));
            return null;
        }
        return n;
    }

    private JsonNode text(JsonNode parent, String name, String path, boolean nullable) {
        JsonNode n = field(parent, name, path);
        if (n == null || (nullable && n.isNull())) {
            return null;
        }
        if (!n.isTextual()) {
            add(path + key(name), nullable ? "a text or null" : "a text", describe(n));
            return null;
        }
        return n;
    }

    private JsonNode integer(JsonNode parent, String name, String path) {
        JsonNode n = field(parent, name, path);
        if (n != null && !n.canConvertToExactIntegral()) {
            add(path + key(name), "a whole number", describe(n));
            return null;
        }
        if (n != null && !n.canConvertToLong()) {
            add(path + key(name), "a whole number of at most 19 digits", describe(n));
            return null;
        }
        return n;
    }

    /**
     * A finite number; {@code nonFinite} also allows the texts "NaN", "Infinity" and "-Infinity" that
     * the JSON writer gives a trail step or input that is not a finite number.
     */
    private void number(JsonNode parent, String name, String path, boolean nonFinite) {
        JsonNode n = field(parent, name, path);
        if (n == null) {
            return;
        }
        boolean special = nonFinite && n.isTextual() && Set.of("NaN", "Infinity", "-Infinity").contains(n.asText());
        if (!special && !(n.isNumber() && Double.isFinite(n.asDouble()))) {
            add(path + key(name), "a number", describe(n));
        }
    }

    private void eachText(JsonNode parent, String name, String path) {
        JsonNode n = array(parent, name, path);
        if (n != null) {
            for (int i = 0; i < n.size(); i++) {
                if (!n.get(i).isTextual()) {
                    add(path + key(name) + "[" + i + "]", "a text", describe(n.get(i)));
                }
            }
        }
    }

    private void eachObject(JsonNode parent, String name, String path, Element element) {
        JsonNode n = array(parent, name, path);
        if (n != null) {
            for (int i = 0; i < n.size(); i++) {
                String p = path + key(name) + "[" + i + "]";
                if (n.get(i).isObject()) {
                    element.check(n.get(i), p);
                } else {
                    add(p, "an object", describe(n.get(i)));
                }
            }
        }
    }

    private JsonNode array(JsonNode parent, String name, String path) {
        JsonNode n = field(parent, name, path);
        if (n != null && !n.isArray()) {
            add(path + key(name), "an array", describe(n));
            return null;
        }
        return n;
    }

    private void add(String path, String expected, String found) {
        problems.add(new Problem(ErrorKey.CORRUPT_FILE, file + ", at " + path, expected, found,
                "The results were altered or written by another program; use the results.json that meritbook run "
                        + "wrote, or the dossier that carries it."));
    }

    /** {@code .name}, or {@code ["name:with:colons"]} for a key that is not a plain identifier. */
    private static String key(String name) {
        return PLAIN_KEY.matcher(name).matches() ? "." + name
                : "[\"" + name.replace("\\", "\\\\").replace("\"", "\\\"") + "\"]";
    }

    static String describe(JsonNode n) {
        if (n == null || n.isMissingNode()) {
            return "nothing (the field is missing)";
        }
        if (n.isNull()) {
            return "null";
        }
        if (n.isTextual()) {
            String t = n.asText();
            return "the text \"" + (t.length() > 40 ? t.substring(0, 40) + "…" : t) + "\"";
        }
        if (n.isNumber()) {
            return "the number " + n.asText();
        }
        if (n.isBoolean()) {
            return n.asText();
        }
        return n.isArray() ? "an array" : "an object";
    }

    private static String firstLine(String message) {
        if (message == null) {
            return "unreadable";
        }
        int nl = message.indexOf('\n');
        return nl < 0 ? message : message.substring(0, nl);
    }
}
