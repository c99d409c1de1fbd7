package org.meritbook.study;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * The edits the live page may make to a notebook, done on its text line by line so that everything
 * else — narrative, comments, indentation, quoting, blank lines — stays exactly as written. Each
 * edit is checked by parsing the result again: an edit that would not read back as intended is
 * refused with {@link EditRefused}, and the caller writes nothing.
 */
public final class NotebookEdits {
    private static final Pattern TOP_LEVEL_KEY = Pattern.compile("^[A-Za-z][A-Za-z0-9_-]*\\s*:.*");
    private static final Pattern ENTRY_START = Pattern.compile("^(\\s*)-\\s.*");

    private NotebookEdits() {
    }

    /** An edit that cannot be made safely; the message says why and what to do instead. */
    public static final class EditRefused extends RuntimeException {
        private static final long serialVersionUID = 1L;

        public EditRefused(String message) {
            super(message);
        }
    }

    /**
     * Adds an {@code exclude:} entry to a cell.
     *
     * @param text    the notebook text
     * @param file    the notebook's path (for parsing and messages)
     * @param cellId  the cell
     * @param address the cell to exclude, {@code Sheet!C17}
     * @param reason  why (required)
     * @param by      who excluded it, or null
     * @param on      when (ISO date), or null
     */
    public static String exclude(String text, Path file, String cellId, String address, String reason, String by,
                                 String on) {
        requireSingleLine("reason", reason, true);
        requireSingleLine("by", by, false);
        requireSingleLine("on", on, false);
        AnalysisCell cell = cellOf(text, file, cellId);
        if (cell.exclusions().stream().anyMatch(e -> same(e, address))) {
            throw new EditRefused(address + " is already excluded in cell '" + cellId + "'.");
        }
        List<String> lines = lines(text);
        int close = closingFence(lines, cell.line());
        List<String> entry = new ArrayList<>();
        Optional<OptionValue> exclude = cell.option("exclude");
        int insertAt;
        String indent;
        if (exclude.isEmpty()) {
            entry.add("exclude:");
            indent = "  ";
            insertAt = close;
        } else {
            int keyLine = exclude.get().line() - 1;
            if (!lines.get(keyLine).strip().matches("exclude\\s*:\\s*(#.*)?")) {
                throw new EditRefused("The 'exclude:' list of cell '" + cellId + "' at line " + (keyLine + 1)
                        + " is written on one line; write it as one '- cell:' entry per line to edit it from the page.");
            }
            insertAt = blockEnd(lines, keyLine, close);
            indent = entryIndent(lines, keyLine, insertAt).orElse("  ");
        }
        entry.add(indent + "- cell: " + yamlScalar(address));
        String inner = indent + "  ";
        entry.add(inner + "reason: " + yamlScalar(reason));
        if (by != null) {
            entry.add(inner + "by: " + yamlScalar(by));
        }
        if (on != null) {
            entry.add(inner + "on: " + yamlScalar(on));
        }
        lines.addAll(insertAt, entry);
        String edited = join(lines, text);
        AnalysisCell after = cellOf(edited, file, cellId);
        boolean added = after.exclusions().size() == cell.exclusions().size() + 1
                && after.exclusions().stream().anyMatch(e -> same(e, address) && e.reason().equals(reason));
        if (!added) {
            throw new EditRefused("The exclusion of " + address + " could not be written so that it reads back; "
                    + "add it to cell '" + cellId + "' by hand.");
        }
        return edited;
    }

    /** Removes the {@code exclude:} entry for {@code address} from a cell (the point is restored). */
    public static String restore(String text, Path file, String cellId, String address) {
        AnalysisCell cell = cellOf(text, file, cellId);
        Exclusion target = cell.exclusions().stream().filter(e -> same(e, address)).findFirst()
                .orElseThrow(() -> new EditRefused(address + " is not excluded in cell '" + cellId + "'."));
        List<String> lines = lines(text);
        int close = closingFence(lines, cell.line());
        int keyLine = cell.option("exclude").orElseThrow().line() - 1;
        int end = blockEnd(lines, keyLine, close);
        int from = target.line() - 1;
        if (from <= keyLine || from >= end || !ENTRY_START.matcher(lines.get(from)).matches()) {
            throw new EditRefused("The exclusion of " + address + " at line " + target.line()
                    + " is not written as a '- cell:' entry of its own; remove it by hand.");
        }
        String entryIndent = ENTRY_START.matcher(lines.get(from)).replaceFirst("$1");
        int to = from + 1;
        while (to < end && !startsEntryAt(lines.get(to), entryIndent)) {
            to++;
        }
        lines.subList(from, to).clear();
        if (cell.exclusions().size() == 1) {
            // The list is now empty: its key goes too (with any comment lines left under it).
            int stillEnd = blockEnd(lines, keyLine, closingFence(lines, cell.line()));
            boolean onlyComments = lines.subList(keyLine + 1, stillEnd).stream()
                    .allMatch(l -> l.isBlank() || l.strip().startsWith("#"));
            if (onlyComments) {
                lines.remove(keyLine);
            }
        }
        String edited = join(lines, text);
        AnalysisCell after = cellOf(edited, file, cellId);
        boolean removed = after.exclusions().size() == cell.exclusions().size() - 1
                && after.exclusions().stream().noneMatch(e -> same(e, address));
        if (!removed) {
            throw new EditRefused("The exclusion of " + address + " could not be removed cleanly; remove it by hand.");
        }
        return edited;
    }

    /**
     * Raises {@code revision:} by one and sets {@code revision-reason:}, for issuing a new revision
     * from the page.
     */
    public static String nextRevision(String text, Path file, String reason) {
        requireSingleLine("reason", reason, true);
        return withRevision(text, file, StudyParser.parse(text, file).frontMatter().revision() + 1, reason);
    }

    /** Sets {@code revision:} to {@code next} and {@code revision-reason:} to {@code reason}. */
    public static String withRevision(String text, Path file, int next, String reason) {
        requireSingleLine("reason", reason, true);
        if (next < 1) {
            throw new EditRefused("A revision is a whole number from 1 on, not " + next + ".");
        }
        List<String> lines = lines(text);
        int end = frontMatterEnd(lines);
        int revisionLine = keyLine(lines, end, "revision");
        String reasonLine = "revision-reason: " + yamlScalar(reason);
        if (revisionLine < 0) {
            lines.add(end, "revision: " + next);
            lines.add(end + 1, reasonLine);
        } else {
            lines.set(revisionLine, "revision: " + next);
            int reasonAt = keyLine(lines, end, "revision-reason");
            if (reasonAt < 0) {
                lines.add(revisionLine + 1, reasonLine);
            } else {
                int to = reasonAt + 1;
                while (to < end && (lines.get(to).startsWith(" ") || lines.get(to).startsWith("\t"))) {
                    to++; // a folded or block reason spans indented continuation lines
                }
                lines.subList(reasonAt + 1, to).clear();
                lines.set(reasonAt, reasonLine);
            }
        }
        String edited = join(lines, text);
        FrontMatter after = StudyParser.parse(edited, file).frontMatter();
        if (after.revision() != next || !reason.equals(after.revisionReason())) {
            throw new EditRefused("The front matter could not be updated to revision " + next
                    + "; set 'revision:' and 'revision-reason:' by hand.");
        }
        return edited;
    }

    /** Whether an entry names this cell, however the address is quoted or cased. */
    private static boolean same(Exclusion e, String address) {
        int bang = address.lastIndexOf('!');
        if (bang < 0) {
            return false;
        }
        String sheet = address.substring(0, bang).strip();
        if (sheet.length() > 1 && sheet.startsWith("'") && sheet.endsWith("'")) {
            sheet = sheet.substring(1, sheet.length() - 1).replace("''", "'");
        }
        return e.sheet().equals(sheet) && e.cell().equalsIgnoreCase(address.substring(bang + 1).strip().replace("$", ""));
    }

    private static AnalysisCell cellOf(String text, Path file, String cellId) {
        Study study = StudyParser.parse(text, file);
        return study.cell(cellId).orElseThrow(() -> new EditRefused("The notebook has no cell '" + cellId + "'."));
    }

    private static void requireSingleLine(String what, String value, boolean required) {
        if (value == null) {
            if (required) {
                throw new EditRefused("A " + what + " is required.");
            }
            return;
        }
        if (value.isBlank() || value.indexOf('\n') >= 0 || value.indexOf('\r') >= 0) {
            throw new EditRefused("The " + what + " must be one non-blank line.");
        }
    }

    /** Index of the cell's closing fence line, from the 1-based line of its opening fence. */
    private static int closingFence(List<String> lines, int fenceLine) {
        String open = lines.get(fenceLine - 1).stripLeading();
        char c = open.charAt(0);
        int n = 0;
        while (n < open.length() && open.charAt(n) == c) {
            n++;
        }
        for (int i = fenceLine; i < lines.size(); i++) {
            String s = lines.get(i).strip();
            if (s.length() >= n && s.chars().allMatch(ch -> ch == c)) {
                return i;
            }
        }
        throw new EditRefused("The cell at line " + fenceLine + " has no closing fence.");
    }

    /** The index after the last line of the block that starts at {@code keyLine} (the next key or the fence). */
    private static int blockEnd(List<String> lines, int keyLine, int close) {
        int end = keyLine + 1;
        int lastContent = keyLine;
        while (end < close && !TOP_LEVEL_KEY.matcher(lines.get(end)).matches()) {
            if (!lines.get(end).isBlank() && !lines.get(end).strip().startsWith("#")) {
                lastContent = end;
            }
            end++;
        }
        return lastContent + 1; // blank or comment lines before the next key stay where they are
    }

    private static Optional<String> entryIndent(List<String> lines, int keyLine, int end) {
        for (int i = keyLine + 1; i < end; i++) {
            var m = ENTRY_START.matcher(lines.get(i));
            if (m.matches()) {
                return Optional.of(m.group(1));
            }
        }
        return Optional.empty();
    }

    private static boolean startsEntryAt(String line, String indent) {
        var m = ENTRY_START.matcher(line);
        return m.matches() && m.group(1).equals(indent);
    }

    private static int frontMatterEnd(List<String> lines) {
        if (lines.isEmpty() || !lines.get(0).strip().equals("---")) {
            throw new EditRefused("The notebook has no front matter to record a revision in.");
        }
        for (int i = 1; i < lines.size(); i++) {
            if (lines.get(i).strip().equals("---")) {
                return i;
            }
        }
        throw new EditRefused("The notebook's front matter is not closed with '---'.");
    }

    private static int keyLine(List<String> lines, int end, String key) {
        Pattern p = Pattern.compile("^" + Pattern.quote(key) + "\\s*:.*");
        for (int i = 1; i < end; i++) {
            if (p.matcher(lines.get(i)).matches()) {
                return i;
            }
        }
        return -1;
    }

    /** A YAML double-quoted scalar: safe for any one-line text, colons and '#' included. */
    static String yamlScalar(String s) {
        StringBuilder b = new StringBuilder("\"");
        for (char ch : s.toCharArray()) {
            switch (ch) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\t' -> b.append("\\t");
                default -> {
                    if (ch < 0x20) {
                        b.append(String.format("\\x%02x", (int) ch));
                    } else {
                        b.append(ch);
                    }
                }
            }
        }
        return b.append('"').toString();
    }

    private static List<String> lines(String text) {
        return new ArrayList<>(List.of(text.split("\r?\n", -1)));
    }

    /** Joins with the line ending the notebook already uses. */
    private static String join(List<String> lines, String original) {
        return String.join(original.contains("\r\n") ? "\r\n" : "\n", lines);
    }
}
