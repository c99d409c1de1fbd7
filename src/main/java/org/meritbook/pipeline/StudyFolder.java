package org.meritbook.pipeline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.locks.ReentrantLock;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;

/**
 * A study's output folder ({@code out/<study>/}), in which every revision's output set lives in a
 * folder of its own, {@code rev<N>/}. A set is written into a hidden staging folder beside it and
 * published by one rename of that folder, so a reader (or a run killed at any point) sees a revision's
 * files all together or not at all. A lock on {@code .meritbook.lock} makes "look at what is
 * published, then publish" one step for every meritbook process; the lock holder also removes, or
 * restores, what an interrupted run left behind.
 */
public final class StudyFolder {
    /** The lock file; it stays in the folder (deleting a lock file would race with its next user). */
    public static final String LOCK_FILE = ".meritbook.lock";
    static final String STAGING = ".staging-";
    static final String SET_ASIDE = ".replaced-";
    private static final Pattern STAGED_NAME = Pattern.compile(Pattern.quote(STAGING) + "rev[0-9]+-[0-9a-f]+");
    private static final Pattern SET_ASIDE_NAME = Pattern.compile(Pattern.quote(SET_ASIDE) + "(rev[0-9]+)-[0-9a-f]+");

    /** In-process exclusion: a JVM cannot hold two file locks on one file, so its threads queue here first. */
    private static final Map<Path, ReentrantLock> IN_PROCESS = new ConcurrentHashMap<>();
    private static final SecureRandom RANDOM = new SecureRandom();

    private final Path folder;

    public StudyFolder(Path folder) {
        this.folder = folder.toAbsolutePath().normalize();
    }

    public Path path() {
        return folder;
    }

    /** The folder of one revision's output set, {@code rev<N>}. */
    public Path revision(int revision) {
        return folder.resolve(revisionName(revision));
    }

    public static String revisionName(int revision) {
        return "rev" + revision;
    }

    /**
     * Takes the study's lock, waiting while another run holds it.
     *
     * @param waiting told once when the lock is held by someone else and this call waits for it
     */
    public Lock lock(Runnable waiting) {
        boolean told = false;
        ReentrantLock local = IN_PROCESS.computeIfAbsent(folder, f -> new ReentrantLock());
        if (!local.tryLock()) {
            waiting.run();
            told = true;
            local.lock();
        }
        FileChannel channel = null;
        try {
            Files.createDirectories(folder);
            channel = FileChannel.open(folder.resolve(LOCK_FILE), StandardOpenOption.CREATE, StandardOpenOption.WRITE);
            FileLock lock = channel.tryLock();
            if (lock == null) {
                if (!told) {
                    waiting.run();
                }
                lock = channel.lock();
            }
            return new Lock(channel, lock, local);
        } catch (IOException | RuntimeException e) {
            closeQuietly(channel, e);
            local.unlock();
            if (e instanceof IOException io) {
                throw OutputProblem.of(folder, io);
            }
            throw (RuntimeException) e;
        }
    }

    private static void closeQuietly(FileChannel channel, Exception cause) {
        if (channel != null) {
            try {
                channel.close();
            } catch (IOException suppressed) {
                cause.addSuppressed(suppressed);
            }
        }
    }

    /** How a publication went. */
    public enum Outcome {
        /** the revision's set did not exist and now does */
        NEW,
        /** the same set was already published; nothing was written */
        UNCHANGED,
        /** a different set of the same revision was replaced ({@code --force}) */
        REPLACED
    }

    /**
     * @param folder  the revision's folder
     * @param files   its files, in the order given
     * @param outcome what happened
     */
    public record Published(Path folder, List<Path> files, Outcome outcome) {
        public Published {
            files = List.copyOf(files);
        }
    }

    /** The held lock: only its holder cleans up and publishes. */
    public final class Lock implements AutoCloseable {
        private final FileChannel channel;
        private final FileLock lock;
        private final ReentrantLock local;

        private Lock(FileChannel channel, FileLock lock, ReentrantLock local) {
            this.channel = channel;
            this.lock = lock;
            this.local = local;
        }

        /**
         * Removes what interrupted runs left: an unfinished staging folder is deleted; a revision set
         * aside by a {@code --force} run that died before its replacement was in place is put back,
         * and deleted when the replacement is there. While the lock is held no other run is writing,
         * so everything found is a leftover.
         *
         * @return one line per leftover, saying what was done
         */
        public List<String> cleanUp() {
            List<String> notes = new ArrayList<>();
            for (Path p : list()) {
                String name = p.getFileName().toString();
                Matcher staging = STAGED_NAME.matcher(name);
                Matcher aside = SET_ASIDE_NAME.matcher(name);
                if (staging.matches()) {
                    Folders.deleteTree(p);
                    notes.add("removed " + name + ", an output set an interrupted run left unfinished");
                } else if (aside.matches()) {
                    Path original = folder.resolve(aside.group(1));
                    if (Files.exists(original)) {
                        Folders.deleteTree(p);
                        notes.add("removed " + name + ", the set an interrupted --force run had already replaced");
                    } else {
                        rename(p, original);
                        notes.add("restored " + aside.group(1) + ", which an interrupted --force run had set aside");
                    }
                } else if (name.startsWith(".") && name.endsWith(".part") && Files.isRegularFile(p)) {
                    delete(p);
                    notes.add("removed " + name + ", a file an interrupted run left half-written");
                }
            }
            return notes;
        }

        /**
         * Publishes a revision's output set: unchanged when the same files are already there, refused
         * when different ones are (unless {@code force}), otherwise staged and moved into place in one
         * rename.
         *
         * @param revision the revision number
         * @param files    file name → bytes, in the order to report them
         * @throws InputException {@link ErrorKey#OUTPUT_EXISTS} naming each file that differs, when a
         *                        different set of this revision exists and {@code force} is false
         */
        public Published publish(int revision, Map<String, byte[]> files, boolean force) {
            Path target = revision(revision);
            List<Path> paths = files.keySet().stream().map(target::resolve).toList();
            if (Files.isRegularFile(target)) {
                throw OutputProblem.of(target, new java.nio.file.NotDirectoryException(target.toString()));
            }
            for (Path p : paths) {
                if (Files.isDirectory(p)) { // even under --force: never delete a folder the user put there
                    throw OutputProblem.folderInTheWay(p);
                }
            }
            boolean exists = Files.exists(target);
            if (exists) {
                List<Problem> differing = differences(target, files);
                if (differing.isEmpty()) {
                    return new Published(target, paths, Outcome.UNCHANGED);
                }
                if (!force) {
                    throw new InputException(differing);
                }
            }
            Path staged = stage(revision, files);
            if (exists) {
                Path aside = folder.resolve(SET_ASIDE + revisionName(revision) + "-" + suffix());
                rename(target, aside);
                rename(staged, target);
                Folders.deleteTree(aside);
                return new Published(target, paths, Outcome.REPLACED);
            }
            rename(staged, target);
            return new Published(target, paths, Outcome.NEW);
        }

        private Path stage(int revision, Map<String, byte[]> files) {
            Path staged = folder.resolve(STAGING + revisionName(revision) + "-" + suffix());
            try {
                // Created like any file of the user's (mode from the umask), never with private permissions.
                Files.createDirectory(staged);
                for (Map.Entry<String, byte[]> f : files.entrySet()) {
                    try (FileChannel out = FileChannel.open(staged.resolve(f.getKey()), StandardOpenOption.CREATE_NEW,
                            StandardOpenOption.WRITE)) {
                        out.write(java.nio.ByteBuffer.wrap(f.getValue()));
                        out.force(true);
                    }
                }
            } catch (IOException e) {
                Folders.deleteTree(staged);
                throw OutputProblem.of(folder, e);
            }
            return staged;
        }

        private List<Problem> differences(Path target, Map<String, byte[]> files) {
            List<Problem> out = new ArrayList<>();
            for (Map.Entry<String, byte[]> f : files.entrySet()) {
                Path existing = target.resolve(f.getKey());
                if (!sameContent(existing, f.getValue())) {
                    out.add(new Problem(ErrorKey.OUTPUT_EXISTS, existing.toString(),
                            "no output of this revision yet, or the same content",
                            Files.exists(existing) ? "a file of the same revision with different content"
                                    : "an output set of this revision without this file",
                            "Raise 'revision:' in the notebook's front matter to issue a new revision, "
                                    + "or re-run with --force to replace this one."));
                }
            }
            for (Path p : listOf(target)) {
                if (!files.containsKey(p.getFileName().toString())) {
                    out.add(new Problem(ErrorKey.OUTPUT_EXISTS, p.toString(), "only this revision's output files",
                            "a file this run does not write", "Move the file away, or re-run with --force."));
                }
            }
            return out;
        }

        private List<Path> list() {
            return listOf(folder);
        }

        @Override
        public void close() {
            try {
                lock.release();
                channel.close();
            } catch (IOException e) {
                throw new UncheckedIOException("cannot release the lock on " + folder, e);
            } finally {
                local.unlock();
            }
        }
    }

    private static boolean sameContent(Path file, byte[] bytes) {
        try {
            return Files.isRegularFile(file) && Files.size(file) == bytes.length
                    && Arrays.equals(Files.readAllBytes(file), bytes);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the existing " + file, e);
        }
    }

    private static List<Path> listOf(Path dir) {
        try (Stream<Path> s = Files.list(dir)) {
            return s.sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot list " + dir, e);
        }
    }

    private static void rename(Path from, Path to) {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw OutputProblem.of(to.getParent(), e);
        }
    }

    private static void delete(Path p) {
        try {
            Files.deleteIfExists(p);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot remove " + p, e);
        }
    }

    private static String suffix() {
        byte[] b = new byte[6];
        RANDOM.nextBytes(b);
        return HexFormat.of().formatHex(b);
    }
}
