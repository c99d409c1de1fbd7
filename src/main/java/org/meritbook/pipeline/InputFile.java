package org.meritbook.pipeline;

import java.util.List;

/**
 * One input of a run as the manifest lists it.
 *
 * @param alias  the source alias, or {@code "notebook"} for the study file
 * @param path   the path as written in the notebook (the notebook's own file name for it)
 * @param sha256 lower-case hex SHA-256 of the file's bytes
 * @param bytes  file size
 * @param ranges the ranges read from it, e.g. {@code Calibration!A4:C25}, in first-use order
 * @param savedOn the last-saved date the file records about itself (ISO yyyy-mm-dd, UTC), or null
 */
public record InputFile(String alias, String path, String sha256, long bytes, List<String> ranges, String savedOn) {
    public InputFile {
        ranges = List.copyOf(ranges);
    }

    /** An input that records no save date of its own (the notebook, a CSV file). */
    public InputFile(String alias, String path, String sha256, long bytes, List<String> ranges) {
        this(alias, path, sha256, bytes, ranges, null);
    }
}
