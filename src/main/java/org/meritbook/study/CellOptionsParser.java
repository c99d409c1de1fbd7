package org.meritbook.study;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;
import org.meritbook.error.ErrorKey;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;

/**
 * Reads the YAML body of one analysis cell and checks it against its kind: option names, required
 * options, value shapes, enumerated values, nested data sets, exclusions and data references.
 * Cross-cell checks (ids, references to calibrations) are {@link CellIds}' concern.
 */
final class CellOptionsParser {

    /** The options of one cell as read; unusable options are reported and left out. */
    record Result(Map<String, OptionValue> options, List<Exclusion> exclusions, Set<String> rejected) {
        static final Result EMPTY = new Result(Map.of(), List.of(), Set.of());
    }

    private final Map<String, SourceFile> sources;
    private final Problems problems;

    CellOptionsParser(Map<String, SourceFile> sources, Problems problems) {
        this.sources = sources;
        this.problems = problems;
    }

    /**
     * @param body      the cell's body, lines joined with '\n'
     * @param bodyLine  notebook line of the body's first line
     * @param fenceLine notebook line of the opening fence (where missing options are reported)
     */
    Result parse(AnalysisKind kind, String body, int bodyLine, int fenceLine) {
        YamlSnippet yaml = new YamlSnippet(bodyLine, ErrorKey.NOTEBOOK_SYNTAX, problems);
        Optional<Node> root = body.isBlank() ? Optional.empty() : yaml.compose(body);
        if (root.isEmpty() && !body.isBlank()) {
            return Result.EMPTY; // syntax error reported; missing options would only add noise
        }
        if (root.isPresent() && !(root.get() instanceof MappingNode)) {
            problems.add(ErrorKey.NOTEBOOK_SYNTAX, yaml.lineOf(root.get()), "options as 'name: value' lines",
                    YamlSnippet.describe(root.get()),
                    "Write one option per line, e.g. 'data: runs!Calibration!A4:C25'.");
            return Result.EMPTY;
        }
        Map<String, OptionValue> options = new LinkedHashMap<>();
        root.ifPresent(r -> yaml.entries((MappingNode) r).values()
                .forEach(e -> options.put(e.name(), yaml.toOption(e.value(), e.line()))));

        List<String> allowed = Stream.concat(kind.requiredOptions().stream(), kind.optionalOptions().stream()).toList();
        Map<String, OptionValue> kept = new LinkedHashMap<>();
        List<Exclusion> exclusions = new ArrayList<>();
        Set<String> rejected = new HashSet<>();
        for (Map.Entry<String, OptionValue> option : options.entrySet()) {
            String name = option.getKey();
            OptionValue value = option.getValue();
            if (!kind.allows(name)) {
                problems.add(ErrorKey.UNKNOWN_OPTION, value.line(),
                        "an option of a " + kind.keyword() + " cell (" + Problems.list(allowed) + ")", Problems.quote(name),
                        "Correct the option name" + Suggestion.hint(name, allowed) + " or remove the line.");
                continue;
            }
            if (name.equals(OptionRules.EXCLUDE)) {
                exclusions.addAll(new ExclusionParser(problems).parse(value));
            } else if (!checkValue(kind, name, value)) {
                rejected.add(name);
                continue;
            }
            kept.put(name, value);
        }
        List<String> missing = kind.requiredOptions().stream().filter(r -> !options.containsKey(r)).toList();
        if (!missing.isEmpty()) {
            problems.add(ErrorKey.MISSING_OPTION, fenceLine,
                    "the options a " + kind.keyword() + " cell needs (" + Problems.list(kind.requiredOptions()) + ")",
                    "no " + Problems.list(missing),
                    "Add " + Problems.list(missing.stream().map(m -> "'" + m + ": ...'").toList()) + " to the cell.");
        }
        return new Result(kept, exclusions, Set.copyOf(rejected));
    }

    /** Checks one option value by its name; false when it was reported. */
    private boolean checkValue(AnalysisKind kind, String name, OptionValue value) {
        if (name.equals(OptionRules.METHODS)) {
            return checkMethods(value);
        }
        // Replicate response columns, and their internal standards side by side in the same order.
        if (kind == AnalysisKind.CALIBRATION && (name.equals("y") || name.equals("internal-standard")) && !value.isScalar()) {
            return checkColumnList(name, value);
        }
        // The LLOQ level, or a list of them when several QC samples stand at the LLOQ.
        if (name.equals(OptionRules.LLOQ_LEVEL) && !value.isScalar()) {
            return checkLevelList(name, value);
        }
        OptionRules.DataSet set = OptionRules.DATA_SETS.get(name);
        if (set != null) {
            return checkDataSet(name, set, value);
        }
        return checkScalar(name, value, OptionRules.CHOICES.containsKey(name) ? OptionRules.CHOICES.get(name) : null,
                OptionRules.CHOICES.containsKey(name) ? OptionRules.shown(name) : null);
    }

    private boolean checkScalar(String name, OptionValue value, List<String> choices, List<String> shown) {
        if (!value.isScalar()) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, value.line(), "a single value for '" + name + "'", Problems.describe(value),
                    "Write '" + name + ": <value>' on one line.");
            return false;
        }
        String text = value.text();
        if (text.isBlank()) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, value.line(), "a value for '" + name + "'", "nothing",
                    "Write the value after '" + name + ":' or remove the line.");
            return false;
        }
        if (choices != null && !choices.contains(text)) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, value.line(), name + " one of " + Problems.list(shown), Problems.quote(text),
                    "Choose one of the listed values" + Suggestion.hint(text, shown) + ".");
            return false;
        }
        if (name.equals(OptionRules.ID) && !OptionRules.ID_PATTERN.matcher(text).matches()) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, value.line(),
                    "an id of lower-case letters, digits and '-', not starting with '-'", Problems.quote(text),
                    "Choose an id such as 'linearity' or 'day-2'.");
            return false;
        }
        if (name.equals(OptionRules.DATA)) {
            return checkReference(value);
        }
        return true;
    }

    /** Replicate response columns side by side: {@code y: [B, C, D]}, each a header or a letter. */
    private boolean checkColumnList(String name, OptionValue value) {
        if (!isListOfWords(value)) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, value.line(), "one column or a list of columns for '" + name + "'",
                    Problems.describe(value), "Write '" + name + ": Area' or, for replicates in columns, '"
                            + name + ": [B, C, D]'.");
            return false;
        }
        return true;
    }

    /** The LLOQ levels: {@code lloq-level: [LLOQ-1, LLOQ-2]}, each as the section shows it. */
    private boolean checkLevelList(String name, OptionValue value) {
        if (!isListOfWords(value)) {
            String found = !(value.value() instanceof List<?>) ? Problems.describe(value)
                    : value.list().isEmpty() ? "an empty list" : "a list holding a blank or nested value";
            problems.add(ErrorKey.BAD_OPTION_VALUE, value.line(), "one level or a list of levels for '" + name + "'",
                    found, "Write '" + name + ": QC-LLOQ' or '" + name + ": [LLOQ-1, LLOQ-2]'.");
            return false;
        }
        return true;
    }

    /** A non-empty list whose items are all written, none a list or a map. */
    private static boolean isListOfWords(OptionValue value) {
        return value.value() instanceof List<?> && !value.list().isEmpty()
                && value.list().stream().allMatch(v -> v.isScalar() && !v.text().isBlank());
    }

    private boolean checkMethods(OptionValue value) {
        List<String> choices = OptionRules.METHOD_CHOICES;
        if (!(value.value() instanceof List) || value.list().isEmpty()) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, value.line(), "a list of methods from " + Problems.list(choices),
                    value.value() instanceof List ? "an empty list" : Problems.describe(value),
                    "Write the methods as a list, e.g. 'methods: [blank, response-sd]'.");
            return false;
        }
        boolean ok = true;
        Set<String> seen = new HashSet<>();
        for (OptionValue item : value.list()) {
            String text = item.isScalar() ? item.text() : null;
            if (text == null || !choices.contains(text)) {
                problems.add(ErrorKey.BAD_OPTION_VALUE, item.line(), "a detection-limit method, one of " + Problems.list(choices),
                        Problems.describe(item),
                        "Choose methods from the list" + (text == null ? "" : Suggestion.hint(text, choices)) + ".");
                ok = false;
            } else if (!seen.add(text)) {
                problems.add(ErrorKey.BAD_OPTION_VALUE, item.line(), "each method once", Problems.quote(text) + " again",
                        "Remove the repeated method.");
                ok = false;
            }
        }
        return ok;
    }

    private boolean checkDataSet(String name, OptionRules.DataSet set, OptionValue value) {
        if (!(value.value() instanceof Map)) {
            problems.add(ErrorKey.BAD_OPTION_VALUE, value.line(),
                    "'" + name + ":' followed by indented " + Problems.list(set.required()) + " lines",
                    Problems.describe(value),
                    "Indent 'data: source!Sheet!A1:B9' and 'column: <header>' under '" + name + ":'.");
            return false;
        }
        boolean ok = true;
        for (Map.Entry<String, OptionValue> entry : value.map().entrySet()) {
            String key = entry.getKey();
            if (!set.all().contains(key)) {
                problems.add(ErrorKey.UNKNOWN_OPTION, entry.getValue().line(),
                        "an entry of '" + name + "' (" + Problems.list(set.all()) + ")", Problems.quote(key),
                        "Correct the name" + Suggestion.hint(key, set.all()) + " or remove the line.");
                ok = false;
            } else {
                List<String> choices = set.choices().get(key);
                ok &= checkScalar(key, entry.getValue(), choices, choices);
            }
        }
        List<String> missing = set.required().stream().filter(r -> !value.map().containsKey(r)).toList();
        if (!missing.isEmpty()) {
            problems.add(ErrorKey.MISSING_OPTION, value.line(),
                    "the entries of '" + name + "' (" + Problems.list(set.required()) + ")", "no " + Problems.list(missing),
                    "Add " + Problems.list(missing.stream().map(m -> "'" + m + ": ...'").toList()) + " under '" + name + ":'.");
            ok = false;
        }
        return ok;
    }

    private boolean checkReference(OptionValue value) {
        DataReferenceParser.Parsed parsed = DataReferenceParser.parse(value.text(), value.line());
        if (!parsed.ok()) {
            problems.add(ErrorKey.BAD_DATA_REFERENCE, value.line(), DataReferenceParser.ACCEPTED, parsed.found(), parsed.fix());
            return false;
        }
        String alias = parsed.reference().source();
        if (!sources.containsKey(alias)) {
            List<String> declared = List.copyOf(sources.keySet());
            problems.add(ErrorKey.UNDECLARED_SOURCE, value.line(),
                    "a source declared under 'sources:' (" + (declared.isEmpty() ? "none is declared" : Problems.list(declared)) + ")",
                    Problems.quote(alias) + " in " + Problems.quote(value.text()),
                    "Use a declared alias" + Suggestion.hint(alias, declared)
                            + " or declare it in the front matter: 'sources:' then '  " + alias + ": <file>.xlsx'.");
            return false;
        }
        return true;
    }
}
