package org.meritbook.robustness;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.meritbook.error.ErrorKey;

/**
 * One mutated input of the robustness corpus and what it must end in.
 *
 * @param category    the kind of damage, for the printed counts ("text", "zip-bomb", …)
 * @param label       what was done, for failure messages
 * @param files       the files of the case by name: the notebook and the workbook(s) it names
 * @param notebook    the name of the notebook among {@code files}
 * @param expectation what counts as a correct end
 */
record CorpusCase(String category, String label, Map<String, byte[]> files, String notebook, Expectation expectation) {
    CorpusCase {
        Objects.requireNonNull(category, "category");
        files = new LinkedHashMap<>(files);
        if (!files.containsKey(notebook)) {
            throw new IllegalArgumentException("no notebook " + notebook + " in " + files.keySet());
        }
    }

    /**
     * What a case must end in. Every case may also end in a located input error unless it must give
     * the baseline's numbers; none may end in an internal error, a hang, or an unlocated error.
     */
    sealed interface Expectation {
    }

    /** A benign change: the numbers of the unmutated run, bit for bit. */
    record Same() implements Expectation {
    }

    /** Damage the reader must refuse: a located input error, with one of these keys when any are given. */
    record Refused(Set<ErrorKey> keys) implements Expectation {
    }

    /**
     * Damage that may be left out by the notebook's choice: a located error, or a result in which no
     * trail step uses one of these cells as a number; {@code fewer} is how many calibration points
     * fewer than the unmutated run the first section must then have (or -1 for any number).
     */
    record NotFrom(Set<String> cells, int fewer) implements Expectation {
    }

    /** A valid extreme value: a result that uses exactly this value from this cell, a located error, or "not evaluable". */
    record Faithful(String cell, double value) implements Expectation {
    }

    /** Random damage: a located error, or the unmutated numbers (never other numbers). */
    record ErrorOrSame() implements Expectation {
    }

    /** A random but valid edit: a located error, or any result (which is still rendered). */
    record Anything() implements Expectation {
    }
}
