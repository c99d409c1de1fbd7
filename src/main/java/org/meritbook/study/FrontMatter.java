package org.meritbook.study;

import java.util.Map;

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
 */
public record FrontMatter(String title, String method, String laboratory, int revision, String revisionReason,
                          String preparedBy, String date, String criteria, Map<String, Object> all) {
}
