package org.meritbook.revision;

import java.util.List;

/**
 * One input of a run as the manifest lists it.
 *
 * @param alias  the source alias, or {@code "notebook"} for the study file
 * @param path   the path as written in the notebook (the notebook's own file name for it)
 * @param sha256 lower-case hex SHA-256 of the file's bytes
 * @param bytes  file size
 * @param ranges the ranges read from it, e.g. {@code Calibration!A4:C25}, in first-use order
 */
public record InputFile(String alias, String path, String sha256, long bytes, List<String> ranges) {
    public InputFile {
        ranges = List.copyOf(ranges);
    }
}
