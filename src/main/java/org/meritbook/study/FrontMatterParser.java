package org.meritbook.study;

import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.Problem;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.ScalarNode;

/**
 * Reads the YAML front matter between the {@code ---} lines at the top of the notebook: typed keys
 * validated, every key kept as written, workbooks under {@code sources:} resolved against the
 * notebook's folder.
 */
final class FrontMatterParser {
    private static final Pattern REVISION = Pattern.compile("[1-9][0-9]{0,8}");
    private static final Pattern ISO_DATE = Pattern.compile("[0-9]{4}-[0-9]{2}-[0-9]{2}");
    /** Aliases appear before the first '!' of a data reference, so they are kept to simple words. */
    static final Pattern ALIAS = Pattern.compile("[A-Za-z0-9_][A-Za-z0-9_.-]*");
    /** Every front-matter key meritbook reads; a lab's own keys start with {@code x-}. */
    static final List<String> KEYS = List.of("title", "method", "laboratory", "revision", "revision-reason",
            "prepared-by", "date", "criteria", "sources", "status", "reviewed-by", "reviewed-on", "approved-by",
            "approved-on");
    /** A lab's own key, kept in results.json and never read. */
    static final String OWN_KEY_PREFIX = "x-";
    /** What {@code meritbook new} leaves to fill in: {@code <analyte>}, {@code <method id>}. */
    private static final Pattern PLACEHOLDER = Pattern.compile("<[^<>\\n]{1,60}>");

    /**
     * @param frontMatter the typed front matter (null when the title or the whole block is unusable)
     * @param sources     declared workbooks by alias
     * @param bodyLine    first notebook line after the closing {@code ---}
     */
    record Result(FrontMatter frontMatter, Map<String, SourceFile> sources, int bodyLine) {
    }

    private final NotebookText text;
    private final Path notebookDir;
    private final Problems problems;

    FrontMatterParser(NotebookText text, Path notebookFile, Problems problems) {
        this.text = text;
        Path parent = notebookFile.toAbsolutePath().getParent();
        this.notebookDir = parent == null ? notebookFile.toAbsolutePath() : parent;
        this.problems = problems;
    }

    Result parse() {
        if (text.lineCount() == 0 || !isFence(text.line(1))) {
            problems.add(ErrorKey.FRONT_MATTER, 1, "a front matter at the top: a '---' line, 'title: ...', a '---' line",
                    text.lineCount() == 0 ? "an empty notebook" : Problems.quote(text.line(1)),
                    "Start the notebook with '---', then 'title: <study title>' and the other keys, then '---'.");
            return new Result(null, Map.of(), 1);
        }
        int close = 2;
        while (close <= text.lineCount() && !isClosing(text.line(close))) {
            close++;
        }
        if (close > text.lineCount()) {
            problems.add(ErrorKey.FRONT_MATTER, 1, "a closing '---' line after the front matter",
                    "no closing line before the end of the notebook",
                    "Add a line '---' after the last front-matter key.");
            return new Result(null, Map.of(), text.lineCount() + 1);
        }
        YamlSnippet yaml = new YamlSnippet(2, ErrorKey.FRONT_MATTER, problems);
        boolean blank = close == 2 || text.joined(2, close - 1).isBlank();
        Optional<Node> root = blank ? Optional.empty() : yaml.compose(text.joined(2, close - 1));
        if (root.isEmpty() && !blank) {
            return new Result(null, Map.of(), close + 1); // syntax error reported; a "missing title" would be noise
        }
        if (root.isPresent() && !(root.get() instanceof MappingNode)) {
            problems.add(ErrorKey.FRONT_MATTER, yaml.lineOf(root.get()), "'key: value' lines", YamlSnippet.describe(root.get()),
                    "Write the front matter as 'title: ...', 'method: ...' lines.");
            return new Result(null, Map.of(), close + 1);
        }
        Map<String, YamlSnippet.Entry> entries = root.map(r -> yaml.entries((MappingNode) r)).orElse(Map.of());
        return new Result(frontMatter(yaml, entries), sources(yaml, entries), close + 1);
    }

    private FrontMatter frontMatter(YamlSnippet yaml, Map<String, YamlSnippet.Entry> entries) {
        unknownKeys(entries);
        Status.check(entries, this::scalar, problems);
        Map<String, Object> all = new LinkedHashMap<>();
        entries.values().forEach(e -> all.put(e.name(), yaml.toPlain(e.value())));
        String title = scalar(entries, "title");
        if (title == null || title.isBlank()) {
            YamlSnippet.Entry t = entries.get("title");
            problems.add(ErrorKey.FRONT_MATTER, t == null ? 1 : t.line(), "a 'title:' in the front matter",
                    t == null ? "no title" : "an empty title",
                    "Add 'title: <what is validated>' between the '---' lines.");
        }
        return new FrontMatter(title, scalar(entries, "method"), scalar(entries, "laboratory"),
                revision(entries), scalar(entries, "revision-reason"), scalar(entries, "prepared-by"),
                date(entries), scalar(entries, "criteria"), Collections.unmodifiableMap(all), placeholders(entries));
    }

    /** A misspelt key would be kept and never read, so its value silently goes missing from the dossier. */
    private void unknownKeys(Map<String, YamlSnippet.Entry> entries) {
        for (YamlSnippet.Entry e : entries.values()) {
            if (!KEYS.contains(e.name()) && !e.name().startsWith(OWN_KEY_PREFIX)) {
                problems.add(ErrorKey.FRONT_MATTER, e.line(), "a front-matter key meritbook reads (" + String.join(", ", KEYS)
                        + "), or a lab's own key starting with '" + OWN_KEY_PREFIX + "'",
                        Problems.quote(e.name()) + Suggestion.hint(e.name(), KEYS),
                        "Correct the key, or rename it '" + OWN_KEY_PREFIX + e.name() + "' to keep it as the lab's own.");
            }
        }
    }

    /** A dossier is never issued with the starter notebook's blanks still in it; a preview may show them. */
    private List<Problem> placeholders(Map<String, YamlSnippet.Entry> entries) {
        List<Problem> out = new java.util.ArrayList<>();
        for (YamlSnippet.Entry e : entries.values()) {
            if (e.value() instanceof ScalarNode s) {
                java.util.regex.Matcher m = PLACEHOLDER.matcher(s.getValue());
                if (m.find()) {
                    out.add(new Problem(ErrorKey.FRONT_MATTER, problems.where(e.line()), "the study's own value for '" + e.name() + "'",
                            "the placeholder " + Problems.quote(m.group()) + " left by 'meritbook new'",
                            "Replace " + m.group() + " with the real value before issuing the dossier."));
                }
            }
        }
        return out;
    }

    /** A typed text key: null when absent or empty, reported when it is a list or a map. */
    private String scalar(Map<String, YamlSnippet.Entry> entries, String key) {
        YamlSnippet.Entry e = entries.get(key);
        if (e == null) {
            return null;
        }
        if (!(e.value() instanceof ScalarNode s)) {
            problems.add(ErrorKey.FRONT_MATTER, e.line(), "a single text value for '" + key + "'", YamlSnippet.describe(e.value()),
                    "Write '" + key + ": <text>' on one line.");
            return null;
        }
        return s.getValue().isBlank() ? null : s.getValue();
    }

    private int revision(Map<String, YamlSnippet.Entry> entries) {
        String written = scalar(entries, "revision");
        if (written == null) {
            return 1;
        }
        if (!REVISION.matcher(written).matches()) {
            problems.add(ErrorKey.FRONT_MATTER, entries.get("revision").line(), "a positive whole number for 'revision'",
                    Problems.quote(written), "Write the revision as 1, 2, 3, ...");
            return 1;
        }
        return Integer.parseInt(written);
    }

    private String date(Map<String, YamlSnippet.Entry> entries) {
        String written = scalar(entries, "date");
        if (written == null) {
            return null;
        }
        boolean valid = ISO_DATE.matcher(written).matches();
        if (valid) {
            try {
                LocalDate.parse(written);
            } catch (DateTimeException e) {
                valid = false;
            }
        }
        if (!valid) {
            problems.add(ErrorKey.FRONT_MATTER, entries.get("date").line(), "a date as yyyy-mm-dd, e.g. 2025-03-14",
                    Problems.quote(written), "Write the date in ISO form (year-month-day) and check that the day exists.");
            return null;
        }
        return written;
    }

    private Map<String, SourceFile> sources(YamlSnippet yaml, Map<String, YamlSnippet.Entry> entries) {
        YamlSnippet.Entry declared = entries.get("sources");
        Map<String, SourceFile> out = new LinkedHashMap<>();
        if (declared == null) {
            return out;
        }
        if (!(declared.value() instanceof MappingNode map)) {
            boolean empty = declared.value() instanceof ScalarNode s && s.getValue().isBlank();
            if (!empty) {
                problems.add(ErrorKey.FRONT_MATTER, declared.line(), "'sources:' followed by 'alias: workbook path' lines",
                        YamlSnippet.describe(declared.value()), "Indent one 'alias: file.xlsx' line per workbook under 'sources:'.");
            }
            return out;
        }
        for (YamlSnippet.Entry e : yaml.entries(map).values()) {
            source(e).ifPresent(s -> out.put(s.alias(), s));
        }
        return out;
    }

    private Optional<SourceFile> source(YamlSnippet.Entry e) {
        if (!ALIAS.matcher(e.name()).matches()) {
            problems.add(ErrorKey.FRONT_MATTER, e.line(), "a source alias of letters, digits, '_', '.' or '-'",
                    Problems.quote(e.name()), "Rename the alias, e.g. 'runs', and use it in data references as runs!Sheet!A1:C9.");
            return Optional.empty();
        }
        if (!(e.value() instanceof ScalarNode s) || s.getValue().isBlank()) {
            problems.add(ErrorKey.FRONT_MATTER, e.line(), "a workbook path for source '" + e.name() + "'",
                    YamlSnippet.describe(e.value()),
                    "Write '" + e.name() + ": <file>.xlsx' with the path relative to the notebook's folder.");
            return Optional.empty();
        }
        String written = s.getValue();
        Path relative;
        try {
            relative = Path.of(written);
        } catch (InvalidPathException ex) {
            problems.add(ErrorKey.FRONT_MATTER, e.line(), "a workbook path", Problems.quote(written),
                    "Correct the file name.");
            return Optional.empty();
        }
        // Relative paths resolve against the notebook's folder; absolute ones (a shared drive) stand as written.
        return Optional.of(new SourceFile(e.name(), notebookDir.resolve(relative).normalize(), written, e.line()));
    }

    private static boolean isFence(String line) {
        return line.replace("\uFEFF", "").stripTrailing().equals("---");
    }

    private static boolean isClosing(String line) {
        String l = line.stripTrailing();
        return l.equals("---") || l.equals("...");
    }
}
