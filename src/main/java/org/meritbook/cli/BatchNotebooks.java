package org.meritbook.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.publishing.PublishingSequence;

/**
 * The notebooks of a batch {@code run}, checked before any of them runs: two arguments that are
 * one file, or that would publish into one study folder, would fight over one revision history
 * (the second would find the first's revision, or be refused as a changed one).
 */
final class BatchNotebooks {
    private BatchNotebooks() {
    }

    /** Every pair in conflict, in one exception (exit 2); nothing has run when it is thrown. */
    static void requireSeparate(List<Path> notebooks, Path out) {
        List<Problem> problems = new ArrayList<>();
        for (int i = 0; i < notebooks.size(); i++) {
            for (int j = i + 1; j < notebooks.size(); j++) {
                conflict(notebooks, i, j, out, problems);
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
    }

    private static void conflict(List<Path> notebooks, int i, int j, Path out, List<Problem> problems) {
        Path a = notebooks.get(i);
        Path b = notebooks.get(j);
        String where = "run arguments " + (i + 1) + " and " + (j + 1) + " (" + a + ", " + b + ")";
        if (sameFile(a, b)) {
            problems.add(new Problem(ErrorKey.REPEATED_NOTEBOOK, where, "each notebook given once",
                    "the same file twice", "Give it once: a batch runs each study once."));
            return;
        }
        Path folderA = PublishingSequence.studyFolder(out, a);
        Path folderB = PublishingSequence.studyFolder(out, b);
        String nameA = folderA.getFileName().toString();
        String nameB = folderB.getFileName().toString();
        // Compared ignoring letter case: on Windows and macOS file systems X/ and x/ are one folder.
        if (nameA.toLowerCase(Locale.ROOT).equals(nameB.toLowerCase(Locale.ROOT))) {
            String found = nameA.equals(nameB) ? "both would publish into " + folderA
                    : "they would publish into " + folderA + " and " + folderB
                            + ", one folder where file names ignore letter case";
            problems.add(new Problem(ErrorKey.SHARED_STUDY_FOLDER, where,
                    "notebooks that publish into different study folders (each has its own revision history)",
                    found, "Rename one of the notebooks, or run it on its own with another -o DIR."));
        }
    }

    /** One file named twice, by the same path, another path to it, or a link; a missing file only by its path. */
    private static boolean sameFile(Path a, Path b) {
        if (Files.exists(a) && Files.exists(b)) {
            try {
                return Files.isSameFile(a, b);
            } catch (IOException e) {
                // Unreadable here: the run of each reports it with its location; compare by path meanwhile.
                return normalised(a).equals(normalised(b));
            }
        }
        return normalised(a).equals(normalised(b));
    }

    private static Path normalised(Path p) {
        return p.toAbsolutePath().normalize();
    }
}
