package org.meritbook.pipeline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes an output file so that a reader never sees it half-written: the bytes go to a temporary
 * file in the same folder, which is then moved into place.
 */
public final class AtomicFiles {
    private AtomicFiles() {
    }

    public static void write(Path target, byte[] bytes) {
        try {
            Path folder = target.toAbsolutePath().getParent();
            Files.createDirectories(folder);
            Path temp = Files.createTempFile(folder, "." + target.getFileName(), ".part");
            try {
                Files.write(temp, bytes);
                move(temp, target);
            } finally {
                Files.deleteIfExists(temp);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + target, e);
        }
    }

    private static void move(Path temp, Path target) throws IOException {
        try {
            Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
