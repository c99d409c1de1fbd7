package org.meritbook.revision;

import java.util.List;

/**
 * The outcome of re-running a dossier's attached inputs and comparing with its attached results.
 *
 * @param dossier     the PDF's file name
 * @param sections    sections re-run
 * @param quantities  quantities compared
 * @param differences every quantity that differs, is missing or is new, in plain words; empty when all
 *                    results were reproduced exactly
 */
public record Verification(String dossier, int sections, int quantities, List<String> differences) {
    public Verification {
        differences = List.copyOf(differences);
    }

    public boolean reproduced() {
        return differences.isEmpty();
    }
}
