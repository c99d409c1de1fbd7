package org.meritbook.pipeline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.SecureRandom;
import java.util.HexFormat;

/**
 * Writes a single output file so that a reader never sees it half-written: the bytes go to a hidden
 * temporary file in the same folder, which is then moved into place. The temporary file is created
 * like any other file of the user's, so the result has the mode the umask gives (a shared folder's
 * colleagues can read it), never the private mode of {@link Files#createTempFile}. A revision's
 * output set is published as a whole by {@link StudyFolder} instead.
 */
public final class AtomicFiles {
    private static final SecureRandom RANDOM = new SecureRandom();

    private AtomicFiles() {
    }

    public static void write(Path target, byte[] bytes) {
        try {
            Path folder = target.toAbsolutePath().getParent();
            Files.createDirectories(folder);
            byte[] suffix = new byte[6];
            RANDOM.nextBytes(suffix);
            Path temp = folder.resolve("." + target.getFileName() + "." + HexFormat.of().formatHex(suffix) + ".part");
            try {
                Files.write(temp, bytes, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
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
