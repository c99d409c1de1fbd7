/**
 * The records of a run that tools and reviewers read back: results.json, the input manifest with
 * SHA-256 checksums, and (later) revision diffs and verification.
 */
package org.meritbook.revision;
