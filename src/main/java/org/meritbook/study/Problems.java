package org.meritbook.study;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;

/**
 * Collects the problems of one notebook so the analyst sees all of them at once (STYLE §7), each
 * located as {@code "<file name> line N"}.
 */
final class Problems {
    private final String fileName;
    private final List<Problem> found = new ArrayList<>();
    private final List<Integer> lines = new ArrayList<>();

    Problems(String fileName) {
        this.fileName = fileName;
    }

    String where(int line) {
        return fileName + " line " + line;
    }

    void add(ErrorKey key, int line, String expected, String found, String fix) {
        this.found.add(new Problem(key, where(line), expected, found, fix));
        this.lines.add(line);
    }

    boolean isEmpty() {
        return found.isEmpty();
    }

    /** Throws one exception carrying every problem, in notebook line order. */
    void throwIfAny() {
        if (found.isEmpty()) {
            return;
        }
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < found.size(); i++) {
            order.add(i);
        }
        order.sort(Comparator.comparingInt(lines::get)); // stable: same-line problems keep their order
        throw new InputException(order.stream().map(found::get).toList());
    }

    /** {@code a, b, c} — how allowed values are listed in messages. */
    static String list(List<String> words) {
        return String.join(", ", words);
    }

    /** How an option value of the wrong shape is shown in a message. */
    static String describe(OptionValue value) {
        if (value.isScalar()) {
            return value.text().isBlank() ? "nothing" : quote(value.text());
        }
        return value.value() instanceof java.util.List ? "a list" : "a map";
    }

    /** Raw text found in the notebook is quoted, so blanks and punctuation stay visible. */
    static String quote(String text) {
        return "'" + text + "'";
    }
}
