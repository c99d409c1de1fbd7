package org.meritbook.revision;

import java.util.List;

/**
 * The outcome of verifying a dossier: its attached inputs re-run and compared with its attached
 * results, its pages compared with the dossier those inputs render to, and (on request) the lab's
 * current workbooks compared with the ones it carries.
 *
 * @param dossier     the PDF's file name
 * @param sections    sections re-run
 * @param quantities  quantities compared
 * @param pages       pages compared
 * @param differences everything that does not match, in plain words (a result, a page, a workbook);
 *                    empty when the dossier is exactly what its attachments give
 * @param notes       what else a reviewer should know (later updates appended to the file, a
 *                    different meritbook version), never a reason to refuse
 * @param signatures  the signatures found, with what each covers
 */
public record Verification(String dossier, int sections, int quantities, int pages, List<String> differences,
                           List<String> notes, List<Signature> signatures) {
    public Verification {
        differences = List.copyOf(differences);
        notes = List.copyOf(notes);
        signatures = List.copyOf(signatures);
    }

    public boolean reproduced() {
        return differences.isEmpty();
    }

    /**
     * A signature field's signature.
     *
     * @param name         the signer's name as the signature states it, or null
     * @param signedOn     the signing date it states (yyyy-mm-dd), or null
     * @param wholeFile    whether its byte range covers the whole file as received (nothing appended after it)
     * @param coveredBytes how far into the file it reaches
     * @param fileBytes    the file's length
     */
    public record Signature(String name, String signedOn, boolean wholeFile, long coveredBytes, long fileBytes) {
        public String describe() {
            String who = name == null || name.isBlank() ? "a signature without a name" : "the signature of " + name;
            String when = signedOn == null ? "" : ", dated " + signedOn;
            return who + when + (wholeFile ? ": covers the whole document"
                    : ": covers the first " + coveredBytes + " of " + fileBytes + " bytes; what was appended after it "
                    + "is not signed");
        }
    }
}
