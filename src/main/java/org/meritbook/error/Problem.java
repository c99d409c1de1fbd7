package org.meritbook.error;

import java.util.Objects;

/**
 * One located input problem, phrased as expected-versus-found with a fix.
 *
 * @param key      stable key for tests and tools
 * @param where    the file and the notebook line or cell, e.g. {@code "runs.xlsx, Calibration!C17"}
 *                 or {@code "study.md line 23"}
 * @param expected what was expected there
 * @param found    what was found there (quoted raw text where there is some)
 * @param fix      how to fix it, one sentence
 */
public record Problem(ErrorKey key, String where, String expected, String found, String fix) {
    public Problem {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(where, "where");
        Objects.requireNonNull(expected, "expected");
        Objects.requireNonNull(found, "found");
        Objects.requireNonNull(fix, "fix");
    }

    /** The one-line form printed to users: {@code where: expected X but found Y. Fix.} */
    public String message() {
        return where + ": expected " + expected + " but found " + found + ". " + fix;
    }
}
