package org.meritbook.study;

import java.util.List;
import java.util.Map;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;

/**
 * The notebook's YAML front matter. Known keys are typed; every key as written is kept in
 * {@code all} (insertion order) so results.json can carry it back.
 *
 * @param title          study title (required)
 * @param method         method identifier, e.g. {@code HCW-IC-07}
 * @param laboratory     laboratory name
 * @param revision       revision number, 1 when absent
 * @param revisionReason why this revision was issued
 * @param preparedBy     who prepared it
 * @param date           the revision date as written (ISO yyyy-mm-dd), or null
 * @param criteria       acceptance profile name or file, or null
 * @param all            every front-matter key as written (values as plain strings, lists or maps)
 * @param unfilled       placeholders left by {@code meritbook new} ({@code <analyte>}), one located
 *                       problem each: a preview may show them, a dossier is never issued with them
 */
public record FrontMatter(String title, String method, String laboratory, int revision, String revisionReason,
                          String preparedBy, String date, String criteria, Map<String, Object> all,
                          List<Problem> unfilled) {
    public FrontMatter {
        unfilled = unfilled == null ? List.of() : List.copyOf(unfilled);
    }

    /** A front matter with nothing left to fill in. */
    public FrontMatter(String title, String method, String laboratory, int revision, String revisionReason,
                       String preparedBy, String date, String criteria, Map<String, Object> all) {
        this(title, method, laboratory, revision, revisionReason, preparedBy, date, criteria, all, List.of());
    }

    /** Refuses to issue a dossier while a placeholder is left. */
    public void requireFilledIn() {
        if (!unfilled.isEmpty()) {
            throw new InputException(unfilled);
        }
    }
}
