package org.meritbook.error;

import java.util.List;
import java.util.stream.Collectors;

/**
 * Bad input (notebook, workbook, or data that cannot support a method). Carries every
 * problem found in one pass so the user fixes the input once. Exit code 2.
 */
public class InputException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final transient List<Problem> problems;

    public InputException(List<Problem> problems) {
        super(problems.stream().map(Problem::message).collect(Collectors.joining(System.lineSeparator())));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("an InputException needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    public InputException(Problem problem) {
        this(List.of(problem));
    }

    public InputException(ErrorKey key, String where, String expected, String found, String fix) {
        this(new Problem(key, where, expected, found, fix));
    }

    public List<Problem> problems() {
        return problems;
    }

    /** The key of the first problem; convenient in tests. */
    public ErrorKey key() {
        return problems.get(0).key();
    }
}
