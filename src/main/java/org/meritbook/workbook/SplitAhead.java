package org.meritbook.workbook;

import java.util.Collection;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;
import org.apache.commons.compress.archivers.zip.ZipArchiveEntry;

/**
 * The large worksheets of a package split off ({@link SheetStreams}) on a second thread while
 * {@link PackageScan} checks the package on the caller's. Each pass reads the whole sheet and
 * neither needs the other's result, so on two cores a large workbook opens in the time of the
 * longer one, not of both.
 *
 * <p>The parts are guessed from the sizes the zip's directory declares, once the check has read and
 * accepted that directory and before it reads the parts: a part of
 * more than {@value #BYTES_PER_CELL} bytes per cell of the threshold may hold that many cells. The
 * guess is used only when, the check passed, it names exactly the parts that the check's cell counts
 * pick, and only if it finished without error; otherwise the split is made again after the check,
 * as without it. Nothing it read counts before the check has passed; meanwhile its inflated bytes
 * and its cells are held to the budget, and it stops at its next read once the check has ended
 * without taking it.
 */
final class SplitAhead {
    /** The fewest bytes a cell takes in a worksheet part: {@code <c><v>1</v></c>}. */
    static final long BYTES_PER_CELL = 15;

    private final Set<String> parts;
    private final FutureTask<SheetStreams.Split> task;
    private volatile boolean abandoned;

    private SplitAhead(byte[] bytes, Set<String> parts, WorkbookBudget budget) {
        this.parts = parts;
        this.task = new FutureTask<>(() -> SheetStreams.split(bytes, parts, budget, () -> abandoned));
    }

    /**
     * Starts splitting the worksheet parts that may be above {@code threshold} cells; null when none may be.
     *
     * @param directory the zip's central directory, as the package check read it
     */
    static SplitAhead start(byte[] bytes, Collection<ZipArchiveEntry> directory, long threshold, WorkbookBudget budget) {
        Set<String> guessed = guess(directory, threshold);
        if (guessed.isEmpty()) {
            return null;
        }
        SplitAhead ahead = new SplitAhead(bytes, guessed, budget);
        Thread thread = new Thread(ahead.task, "meritbook-split-ahead");
        thread.setDaemon(true);
        try {
            thread.start();
        } catch (OutOfMemoryError | IllegalThreadStateException e) {
            return null; // no thread to be had (a busy server): the split is made after the check, as without one
        }
        return ahead;
    }

    /** Worksheet parts whose declared size leaves room for more than {@code threshold} cells. */
    static Set<String> guess(Collection<ZipArchiveEntry> directory, long threshold) {
        long minBytes = threshold > Long.MAX_VALUE / BYTES_PER_CELL ? Long.MAX_VALUE : (threshold + 1) * BYTES_PER_CELL;
        Set<String> parts = new TreeSet<>();
        for (ZipArchiveEntry e : directory) {
            String name = e.getName();
            if (name.startsWith("xl/worksheets/") && name.endsWith(".xml") && e.getSize() >= minBytes) {
                parts.add(name);
            }
        }
        return parts;
    }

    /** The check failed: the split stops at its next read and nobody waits for it. */
    void abandon() {
        abandoned = true;
    }

    /**
     * The split, when it is of exactly {@code large} and finished without error; else null, and the
     * caller splits again (a wrong guess costs only the second thread's time).
     */
    SheetStreams.Split take(Set<String> large) {
        if (!parts.equals(large)) {
            abandon();
            return null;
        }
        try {
            return task.get();
        } catch (ExecutionException e) {
            return null; // split again on the checked package: that run reports the error, if any
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            abandon();
            return null;
        }
    }
}
