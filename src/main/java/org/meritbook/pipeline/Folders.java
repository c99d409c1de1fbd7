package org.meritbook.pipeline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;

/** Removing a folder meritbook made (a staging folder, a temporary one), contents first. */
public final class Folders {
    private Folders() {
    }

    /** Deletes {@code root} and everything in it; nothing happens when it is null or absent. */
    public static void deleteTree(Path root) {
        if (root == null || !Files.exists(root)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot remove " + root, e);
        }
    }
}
