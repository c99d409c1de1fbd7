package org.meritbook.criteria;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisKind;
import org.meritbook.study.Suggestion;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.constructor.SafeConstructor;
import org.yaml.snakeyaml.error.YAMLException;

/**
 * A laboratory's own acceptance profile, a YAML file:
 *
 * <pre>
 * name: QC-lab linearity
 * description: SOP QA-12, section 4
 * compare: as-computed             # or rounded-to-limit (optional; as-computed when absent)
 * exclusions-record: [by, on]      # every exclude: entry says who and when (optional)
 * rules:
 *   - quantity: r_squared          # any calibration quantity name
 *     at-least: 0.998              # or at-most:
 *     characteristic: Linearity
 *     source: SOP QA-12 §4.2
 *   - quantity: deviation_percent  # every back-calculated standard
 *     within: 15
 *     lowest-level-within: 20
 *     fraction: 0.75
 *     minimum-levels: 6
 *   - kind: accuracy               # per level, the LLOQ set apart (LevelRule)
 *     quantity: error_percent
 *     within: 15                   # |value|; or at-most: with lowest-level-at-most:
 *     lowest-level-within: 20
 *   - kind: unknowns               # the run's QCs together (QcRunRule)
 *     quantity: qc_deviation_percent
 *     within: 15
 *     fraction: 2/3
 *     fraction-per-level: 0.5
 *     minimum-levels: 3            # the run's QC design: 3 levels, 2 QCs each
 *     minimum-per-level: 2
 *   - kind: detection-limit        # the limit is another quantity of the section (BoundRule)
 *     quantity: loq
 *     not-above: reporting_limit   # or not-below:
 * </pre>
 */
final class ProfileFile {
    private static final Set<String> TOP = Set.of("name", "description", "compare", "exclusions-record", "rules");
    private static final Set<String> RULE = Set.of("kind", "quantity", "at-least", "at-most", "within",
            "lowest-level-within", "lowest-level-at-most", "fraction", "fraction-per-level", "minimum-levels",
            "minimum-per-level", "not-above",
            "not-below",
            "characteristic", "source", "model");
    /** The keys that make a rule judge several members at once: a calibration's standards or a run's QCs. */
    private static final List<String> RUN_KEYS = List.of("fraction", "fraction-per-level", "minimum-levels",
            "minimum-per-level");
    /** The keys that give a rule its limit; a rule has exactly one. */
    private static final List<String> LIMITS = List.of("at-least", "at-most", "within", "not-above", "not-below");

    private ProfileFile() {
    }

    static AcceptanceProfile read(Path file, String written) {
        String where = file.getFileName().toString();
        Object root;
        try {
            root = new Yaml(new SafeConstructor(new LoaderOptions()))
                    .load(new String(Files.readAllBytes(file), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new InputException(ErrorKey.FILE_NOT_FOUND, where, "a readable acceptance profile file",
                    "no such file at " + file.toAbsolutePath().normalize(),
                    "Correct 'criteria:' in the front matter (a built-in profile name or a .yaml path).");
        } catch (YAMLException e) {
            throw bad(where, "a YAML acceptance profile", "text that is not valid YAML (" + firstLine(e) + ")");
        }
        Map<?, ?> top = map(root, where, "the profile");
        unknownKeys(top, TOP, where, "the profile");
        List<Rule> rules = new ArrayList<>();
        Object list = top.get("rules");
        if (!(list instanceof List<?> items) || items.isEmpty()) {
            throw bad(where, "a 'rules:' list with at least one rule", String.valueOf(list));
        }
        int n = 0;
        for (Object item : items) {
            n++;
            rules.add(rule(map(item, where, "rule " + n), where, "rule " + n));
        }
        String name = top.get("name") == null ? written : String.valueOf(top.get("name"));
        String description = top.get("description") == null ? "" : String.valueOf(top.get("description"));
        return new AcceptanceProfile(name, description, written, rules, comparison(top.get("compare"), where),
                exclusionRecord(top.get("exclusions-record"), where));
    }

    private static List<String> exclusionRecord(Object written, String where) {
        if (written == null) {
            return List.of();
        }
        List<?> keys = written instanceof List<?> l ? l : List.of(written);
        List<String> out = new ArrayList<>();
        for (Object k : keys) {
            // YAML 1.1 reads a bare 'on' as true: in this list it can only mean the key 'on'
            String key = Boolean.TRUE.equals(k) ? "on" : String.valueOf(k);
            if (!AcceptanceProfile.EXCLUSION_KEYS.contains(key) || out.contains(key)) {
                throw bad(where, "'exclusions-record:' as a list of " + AcceptanceProfile.EXCLUSION_KEYS
                        + ", each once", "'" + written + "'");
            }
            out.add(key);
        }
        return out;
    }

    private static Rule rule(Map<?, ?> r, String where, String which) {
        unknownKeys(r, RULE, where, which);
        String kindWord = r.get("kind") == null ? "calibration" : String.valueOf(r.get("kind"));
        AnalysisKind kind = AnalysisKind.fromKeyword(kindWord).orElseThrow(() -> bad(where,
                which + ": a kind among " + AnalysisKind.keywords(), "'" + kindWord + "'"));
        Object quantity = r.get("quantity");
        if (quantity == null) {
            throw bad(where, which + ": a 'quantity:' (a results.json name such as r_squared)", "none");
        }
        String q = String.valueOf(quantity);
        String base = q.contains(":") ? q.substring(0, q.indexOf(':')) : q;
        if (!kind.reportedNames().contains(base)) {
            // A misspelt name would judge nothing and pass silently: refuse it when the profile is read.
            throw bad(where, which + ": a quantity that a " + kind.keyword() + " cell reports ("
                    + String.join(", ", kind.reportedNames()) + ")",
                    "'" + q + "'" + Suggestion.hint(base, kind.reportedNames()));
        }
        String characteristic = r.get("characteristic") == null ? q : String.valueOf(r.get("characteristic"));
        String source = r.get("source") == null ? "laboratory profile" : String.valueOf(r.get("source"));
        if (q.equals("deviation_percent")) {
            checkGroupRule(r, Set.of("within", "lowest-level-within", "fraction", "minimum-levels"),
                    "a rule on a calibration's deviation_percent", where, which);
            double within = positive(r, "within", where, which);
            double lowest = r.containsKey("lowest-level-within") ? positive(r, "lowest-level-within", where, which) : within;
            double fraction = r.containsKey("fraction") ? fraction(r, "fraction", false, where, which) : 1.0;
            return new DeviationRule(characteristic, within, lowest, fraction, levels(r, where, which), source);
        }
        if (q.equals("qc_deviation_percent") && kind == AnalysisKind.UNKNOWNS && RUN_KEYS.stream().anyMatch(r::containsKey)) {
            checkGroupRule(r, Set.of("within", "lowest-level-within", "fraction", "fraction-per-level", "minimum-levels",
                    "minimum-per-level"), "a rule on a run's QCs together", where, which);
            double within = positive(r, "within", where, which);
            double lowest = r.containsKey("lowest-level-within") ? positive(r, "lowest-level-within", where, which) : within;
            double fraction = r.containsKey("fraction") ? fraction(r, "fraction", false, where, which) : 1.0;
            double perLevel = r.containsKey("fraction-per-level") ? fraction(r, "fraction-per-level", true, where, which) : 0;
            QcRunRule.Design design = new QcRunRule.Design(whole(r, "minimum-levels", where, which),
                    whole(r, "minimum-per-level", where, which));
            return new QcRunRule(characteristic, within, lowest, fraction, perLevel, design, source);
        }
        for (String only : RUN_KEYS) {
            if (r.containsKey(only)) {
                throw bad(where, which + ": '" + only + ":' only in a rule on a calibration's deviation_percent or on a "
                        + "run's QCs (an unknowns cell's qc_deviation_percent)", "'" + only + ":' on " + q);
            }
        }
        List<String> given = LIMITS.stream().filter(r::containsKey).toList();
        if (given.size() != 1) {
            throw bad(where, which + ": exactly one of 'at-least:', 'at-most:', 'within:', 'not-above:' or "
                    + "'not-below:'", given.isEmpty() ? "none" : String.join(", ", given));
        }
        String limitKey = given.get(0);
        pairedOnly(r, "lowest-level-within", "within", limitKey, where, which);
        pairedOnly(r, "lowest-level-at-most", "at-most", limitKey, where, which);
        String model = r.get("model") == null ? null : String.valueOf(r.get("model"));
        boolean levels = limitKey.equals("within") || r.containsKey("lowest-level-at-most");
        if (model != null && (levels || limitKey.startsWith("not-"))) {
            throw bad(where, which + ": 'model:' only in a rule with 'at-least:' or 'at-most:' alone", "'model: "
                    + model + "'");
        }
        if (limitKey.startsWith("not-")) {
            return new BoundRule(kind, characteristic, q, limitKey.equals("not-below"),
                    bound(r, limitKey, kind, where, which), q, String.valueOf(r.get(limitKey)), source);
        }
        if (levels) {
            if (q.contains(":")) {
                throw bad(where, which + ": a family name without ':<level>' for a rule per level", "'" + q + "'");
            }
            boolean within = limitKey.equals("within");
            double limit = number(r, limitKey, where, which);
            String lowestKey = within ? "lowest-level-within" : "lowest-level-at-most";
            double lowest = r.containsKey(lowestKey) ? number(r, lowestKey, where, which) : limit;
            return new LevelRule(kind, characteristic, q, within, limit, lowest, q, source);
        }
        boolean atLeast = limitKey.equals("at-least");
        double limit = number(r, limitKey, where, which);
        List<String> models = AnalysisKind.choicesOf("model");
        if (model != null && (kind != AnalysisKind.CALIBRATION || !models.contains(model))) {
            throw bad(where, which + ": 'model:' one of " + String.join(", ", models) + " (calibration rules only)",
                    "'" + model + "'" + Suggestion.hint(model, models));
        }
        return new QuantityRule(kind, characteristic, q, atLeast, limit, q, model, source);
    }

    /** {@code minimum-levels:}, a whole number, 0 when absent. */
    private static int levels(Map<?, ?> r, String where, String which) {
        return whole(r, "minimum-levels", where, which);
    }

    /** A count the rule asks for; 0 when the key is absent. */
    private static int whole(Map<?, ?> r, String key, String where, String which) {
        if (!r.containsKey(key)) {
            return 0;
        }
        double n = number(r, key, where, which);
        if (n != Math.rint(n) || n > Integer.MAX_VALUE) {
            throw bad(where, which + ": a whole number for '" + key + "'", "'" + r.get(key) + "'");
        }
        return (int) n;
    }

    /** A key that qualifies one limit key ({@code lowest-level-within:} qualifies {@code within:}). */
    private static void pairedOnly(Map<?, ?> r, String key, String with, String limitKey, String where, String which) {
        if (r.containsKey(key) && !limitKey.equals(with)) {
            throw bad(where, which + ": '" + key + ":' only beside '" + with + ":'", "'" + key + ":' beside '"
                    + limitKey + ":'");
        }
    }

    /**
     * The name of the quantity a {@code not-above:} or {@code not-below:} rule compares with: one the
     * kind reports, refused with "did you mean" otherwise, as a misspelt name would leave the rule
     * not evaluable for ever.
     */
    private static String bound(Map<?, ?> r, String key, AnalysisKind kind, String where, String which) {
        Object v = r.get(key);
        String name = v instanceof String text ? text.strip() : null;
        if (name == null || !kind.reportedNames().contains(name)) {
            throw bad(where, which + ": for '" + key + "' the name of another quantity a " + kind.keyword()
                    + " cell reports (" + String.join(", ", kind.reportedNames()) + "); a number goes after '"
                    + (key.equals("not-above") ? "at-most" : "at-least") + ":'",
                    "'" + v + "'" + (name == null ? "" : Suggestion.hint(name, kind.reportedNames())));
        }
        return name;
    }

    private static Comparison comparison(Object written, String where) {
        if (written == null) {
            return Comparison.AS_COMPUTED;
        }
        String w = String.valueOf(written);
        return Comparison.fromWord(w).orElseThrow(() -> bad(where, "'compare:' one of " + String.join(", ", Comparison.words()),
                "'" + w + "'" + Suggestion.hint(w, Comparison.words())));
    }

    /**
     * A rule that judges several members at once: only {@code allowed} beside the keys of every rule (any
     * other is refused, never ignored), and {@code within:} among them.
     */
    private static void checkGroupRule(Map<?, ?> r, Set<String> allowed, String what, String where, String which) {
        Set<String> common = Set.of("kind", "quantity", "characteristic", "source");
        List<String> other = r.keySet().stream().map(String::valueOf).filter(k -> !common.contains(k) && !allowed.contains(k))
                .sorted().toList();
        if (!other.isEmpty()) {
            throw bad(where, which + ": in " + what + " only " + allowed.stream().sorted().map(k -> "'" + k + ":'").toList(),
                    other.stream().map(k -> "'" + k + ":'").toList().toString());
        }
        if (!r.containsKey("within")) {
            throw bad(where, which + ": 'within:' (the allowed |% deviation|) in " + what, "none");
        }
    }

    private static double positive(Map<?, ?> r, String key, String where, String which) {
        double v = number(r, key, where, which);
        if (v <= 0) {
            throw bad(where, which + ": a positive number for '" + key + "'", "'" + r.get(key) + "'");
        }
        return v;
    }

    /**
     * A share: a number in (0, 1] ([0, 1] when {@code zeroAllowed}), or a ratio written as such ("2/3"), so
     * that two thirds is exactly two thirds: 0.667 of 6 QCs would ask for 4.002 of them.
     */
    private static double fraction(Map<?, ?> r, String key, boolean zeroAllowed, String where, String which) {
        Object v = r.get(key);
        double f = Double.NaN;
        if (v instanceof Number n) {
            f = n.doubleValue();
        } else if (v instanceof String text && text.matches("\\s*[0-9]+\\s*/\\s*[1-9][0-9]*\\s*")) {
            String[] parts = text.split("/");
            f = Double.parseDouble(parts[0].strip()) / Double.parseDouble(parts[1].strip());
        }
        if (!(f <= 1 && (zeroAllowed ? f >= 0 : f > 0))) {
            throw bad(where, which + ": for '" + key + "' a share in " + (zeroAllowed ? "[0, 1]" : "(0, 1]")
                    + ", as a number (0.75) or a ratio (2/3)", "'" + v + "'");
        }
        return f;
    }

    private static double number(Map<?, ?> r, String key, String where, String which) {
        Object v = r.get(key);
        if (v instanceof Number n && Double.isFinite(n.doubleValue()) && n.doubleValue() >= 0) {
            return n.doubleValue();
        }
        throw bad(where, which + ": a non-negative number for '" + key + "'", "'" + v + "'");
    }

    private static Map<?, ?> map(Object o, String where, String what) {
        if (o instanceof Map<?, ?> m) {
            return m;
        }
        throw bad(where, what + " as a YAML map of keys", o == null ? "nothing" : "'" + o + "'");
    }

    private static void unknownKeys(Map<?, ?> m, Set<String> allowed, String where, String what) {
        for (Object k : m.keySet()) {
            if (!allowed.contains(String.valueOf(k))) {
                throw new InputException(ErrorKey.UNKNOWN_OPTION, where, what + ": one of " + allowed.stream().sorted().toList(),
                        "'" + k + "'", "Correct or remove the key.");
            }
        }
    }

    private static InputException bad(String where, String expected, String found) {
        return new InputException(ErrorKey.BAD_OPTION_VALUE, where, expected, found,
                "Correct the acceptance profile file (its format is in docs/criteria.md).");
    }

    private static String firstLine(Exception e) {
        String m = String.valueOf(e.getMessage());
        int nl = m.indexOf('\n');
        return nl < 0 ? m : m.substring(0, nl);
    }
}
