package org.meritbook.pipeline;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/**
 * An output folder or file the user's environment does not let meritbook write: a read-only folder,
 * a file where a folder should be, a folder where a file should be, a full disk. These are the
 * user's to fix, so they are located input errors (exit 2) with a fix, never an internal error.
 */
final class OutputProblem {
    private static final String ELSEWHERE = "or choose another output folder with -o DIR.";

    private OutputProblem() {
    }

    /** The located error for an I/O failure while writing at {@code path}. */
    static InputException of(Path path, IOException e) {
        Path file = fileInTheWay(path);
        if (file != null) {
            return new InputException(ErrorKey.OUTPUT_NOT_WRITABLE, file.toString(),
                    "a folder to write the output set in", "a file of that name",
                    "Move or rename that file, " + ELSEWHERE);
        }
        if (e instanceof AccessDeniedException || Files.exists(path) && !Files.isWritable(path)) {
            return new InputException(ErrorKey.OUTPUT_NOT_WRITABLE, path.toString(),
                    "an output folder meritbook may write in", "no permission to write there (a read-only folder "
                            + "or file system)", "Make the folder writable, " + ELSEWHERE);
        }
        String reason = e instanceof FileSystemException fs && fs.getReason() != null ? fs.getReason()
                : e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return new InputException(ErrorKey.OUTPUT_NOT_WRITABLE, path.toString(), "an output folder meritbook can write in",
                "'" + reason + "'", "Check the disk space and the folder's permissions, " + ELSEWHERE);
    }

    /** A folder where one of the output files goes. */
    static InputException folderInTheWay(Path path) {
        return new InputException(ErrorKey.OUTPUT_NOT_WRITABLE, path.toString(), "no file yet, or this revision's "
                + "output file", "a folder of that name", "Move or rename the folder, " + ELSEWHERE);
    }

    /** The nearest existing ancestor of {@code path} (itself included) that is a regular file, or null. */
    static Path fileInTheWay(Path path) {
        for (Path p = path.toAbsolutePath(); p != null; p = p.getParent()) {
            if (Files.isRegularFile(p)) {
                return p;
            }
            if (Files.isDirectory(p)) {
                return null;
            }
        }
        return null;
    }
}
