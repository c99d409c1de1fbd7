package org.meritbook.study;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.meritbook.error.ErrorKey;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;

/**
 * A YAML snippet of the notebook (the front matter or a cell body), composed with SnakeYAML's node
 * API rather than loaded, so that every value keeps its position and every scalar stays the text
 * written ({@code 1/x^2}, {@code 2024-05-01} and {@code 007} are not reinterpreted). Lines are
 * shifted to notebook lines.
 */
final class YamlSnippet {
    private final int firstLine;
    private final ErrorKey syntaxKey;
    private final Problems problems;

    /**
     * @param firstLine notebook line of the snippet's first line
     * @param syntaxKey the key for syntax errors and repeated keys in this snippet
     */
    YamlSnippet(int firstLine, ErrorKey syntaxKey, Problems problems) {
        this.firstLine = firstLine;
        this.syntaxKey = syntaxKey;
        this.problems = problems;
    }

    /** The composed root node; empty for an empty snippet or after a reported syntax error. */
    Optional<Node> compose(String yaml) {
        LoaderOptions options = new LoaderOptions();
        options.setAllowRecursiveKeys(false);
        try {
            return Optional.ofNullable(new Yaml(options).compose(new StringReader(yaml)));
        } catch (MarkedYAMLException e) {
            Mark mark = e.getProblemMark() != null ? e.getProblemMark() : e.getContextMark();
            int line = mark == null ? firstLine : lineOf(mark);
            String found = "a YAML error" + (e.getProblem() == null ? "" : ": " + e.getProblem().strip());
            if (e.getContext() != null && e.getContextMark() != null && e.getContextMark() != mark) {
                found += " (" + e.getContext().strip() + " at line " + lineOf(e.getContextMark()) + ")";
            }
            problems.add(syntaxKey, line, "valid YAML ('name: value', one per line)", found,
                    "Correct the YAML on this line; put quotes around a value that starts with a quote,"
                            + " '!', '&', '*' or '{', or contains ': ' (e.g. cell: \"'Day 1'!C5\").");
            return Optional.empty();
        } catch (YAMLException e) {
            problems.add(syntaxKey, firstLine, "valid YAML", "a YAML error: " + e.getMessage(), "Correct the YAML.");
            return Optional.empty();
        }
    }

    /** How a node that has the wrong shape is shown in a message. */
    static String describe(Node node) {
        if (node instanceof ScalarNode s) {
            return s.getValue().isBlank() ? "nothing" : Problems.quote(s.getValue());
        }
        return node instanceof SequenceNode ? "a list" : "a map";
    }

    int lineOf(Node node) {
        return lineOf(node.getStartMark());
    }

    private int lineOf(Mark mark) {
        return firstLine + mark.getLine();
    }

    /** The entries of a mapping node by key text, each with the line of its key; repeated keys reported. */
    Map<String, Entry> entries(MappingNode map) {
        Map<String, Entry> out = new LinkedHashMap<>();
        for (NodeTuple tuple : map.getValue()) {
            Node keyNode = tuple.getKeyNode();
            int line = lineOf(keyNode);
            if (!(keyNode instanceof ScalarNode key)) {
                problems.add(syntaxKey, line, "a name before ':'", "a list or map used as a name",
                        "Write each entry as 'name: value'.");
                continue;
            }
            Entry previous = out.get(key.getValue());
            if (previous != null) {
                problems.add(syntaxKey, line, "each name once",
                        Problems.quote(key.getValue()) + " again (first at line " + previous.line() + ")",
                        "Keep one of the two entries.");
                continue;
            }
            out.put(key.getValue(), new Entry(key.getValue(), tuple.getValueNode(), line));
        }
        return out;
    }

    /** An option value tree; a map value gets the line of its key, a list item its own line. */
    OptionValue toOption(Node node, int line) {
        if (node instanceof ScalarNode scalar) {
            return new OptionValue(scalar.getValue(), line);
        }
        if (node instanceof SequenceNode seq) {
            List<OptionValue> items = new ArrayList<>();
            for (Node item : seq.getValue()) {
                items.add(toOption(item, lineOf(item)));
            }
            return new OptionValue(List.copyOf(items), line);
        }
        Map<String, OptionValue> map = new LinkedHashMap<>();
        for (Entry e : entries((MappingNode) node).values()) {
            map.put(e.name(), toOption(e.value(), e.line()));
        }
        return new OptionValue(java.util.Collections.unmodifiableMap(map), line);
    }

    /** Plain strings, lists and maps (front matter kept as written for results.json). */
    Object toPlain(Node node) {
        if (node instanceof ScalarNode scalar) {
            return scalar.getValue();
        }
        if (node instanceof SequenceNode seq) {
            return seq.getValue().stream().map(this::toPlain).toList();
        }
        Map<String, Object> map = new LinkedHashMap<>();
        for (Entry e : entries((MappingNode) node).values()) {
            map.put(e.name(), toPlain(e.value()));
        }
        return java.util.Collections.unmodifiableMap(map);
    }

    /** One {@code name: value} entry with the notebook line of its name. */
    record Entry(String name, Node value, int line) {
    }
}
