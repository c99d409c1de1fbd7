package org.meritbook.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** A study's notebook and the workbooks beside it, copied to a new temporary folder a benchmark may save into. */
final class StudyCopy {
    private StudyCopy() {
    }

    /** @return the copied notebook */
    static Path of(Path notebook, String folderPrefix) throws IOException {
        Path dir = Files.createTempDirectory(folderPrefix);
        Path copy = dir.resolve(notebook.getFileName());
        Files.copy(notebook, copy);
        try (var files = Files.list(notebook.toAbsolutePath().getParent())) {
            for (Path f : files.filter(p -> p.toString().endsWith(".xlsx")).toList()) {
                Files.copy(f, dir.resolve(f.getFileName()));
            }
        }
        return copy;
    }
}
