package org.meritbook.serve;

import java.util.Objects;
import org.meritbook.error.Problem;

/**
 * A problem as the live page lists it: an input problem with its location, or an internal error
 * (key {@code INTERNAL_ERROR}) so that a failed run is never silent.
 */
public record ShownProblem(String key, String where, String expected, String found, String fix, String message) {
    public ShownProblem {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(where, "where");
        Objects.requireNonNull(expected, "expected");
        Objects.requireNonNull(found, "found");
        Objects.requireNonNull(fix, "fix");
        Objects.requireNonNull(message, "message");
    }

    static ShownProblem of(Problem p) {
        return new ShownProblem(p.key().name(), p.where(), p.expected(), p.found(), p.fix(), p.message());
    }

    static ShownProblem internal(String where, Throwable e) {
        String found = e.getClass().getName() + (e.getMessage() == null ? "" : ": " + e.getMessage());
        String fix = "Please report it with the input that caused it; the console shows the details.";
        return new ShownProblem("INTERNAL_ERROR", where, "a completed run", found, fix,
                where + ": internal error, " + found + ". " + fix);
    }
}
