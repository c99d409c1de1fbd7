package org.meritbook.revision;

/**
 * One issued revision of a study, as the revision history lists it.
 *
 * @param revision   the revision number
 * @param date       its front-matter date as written, or null
 * @param reason     its revision-reason, or null
 * @param preparedBy who prepared it, or null
 */
public record RevisionEntry(int revision, String date, String reason, String preparedBy) {
}
