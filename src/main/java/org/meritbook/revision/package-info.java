/**
 * The records of a run that tools and reviewers read back: results.json, the input manifest with
 * SHA-256 checksums, revision diffs, and the verification of a dossier. Everything read back from a
 * file is treated as untrusted: validated field by field, parsed without repair, never allowed to
 * choose a path.
 */
package org.meritbook.revision;
