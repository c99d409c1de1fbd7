package org.meritbook.workbook;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Parsed workbooks kept between the runs of one live session, each with the bytes it was parsed
 * from. A run still reads every file afresh; only when the bytes are the very same (compared in
 * full, not by a checksum) does it take the kept workbook instead of parsing it again, which is
 * most of a re-run's reading time when only the notebook changed. A kept workbook is lent to one
 * reader at a time and comes back when that reader closes, so two runs never share POI objects.
 * Thread-safe; closing it closes what it keeps.
 */
public final class WorkbookShelf implements AutoCloseable {
    /** A live session reads a handful of files; an edited notebook may switch to others. */
    private static final int KEPT = 8;

    /** A parsed workbook with what it was parsed from and under which budget. */
    record Kept(byte[] bytes, WorkbookBudget budget, SourceWorkbook workbook) {
    }

    /** By absolute path, least recently given back first. */
    private final Map<Path, Kept> kept = new LinkedHashMap<>(16, 0.75f, true);
    private boolean closed;

    /**
     * The workbook {@code file} holds now: the kept one when its bytes are unchanged (it leaves the
     * shelf until given back), else a newly parsed one. The checks on the file and the errors are
     * those of a reader without a shelf.
     */
    Kept take(Path key, Path file, String where, WorkbookBudget budget) {
        byte[] bytes = WorkbookFiles.read(file, where, budget);
        Kept found;
        synchronized (this) {
            found = kept.get(key);
            if (found != null && found.budget().equals(budget) && Arrays.equals(found.bytes(), bytes)) {
                kept.remove(key);
                return found;
            }
        }
        return new Kept(bytes, budget, WorkbookFiles.parse(file, bytes, where, budget));
    }

    /** Keeps a workbook taken from here for the next run; what it replaces, or what no longer fits, is closed. */
    void giveBack(Path key, Kept workbook) {
        List<SourceWorkbook> toClose = new ArrayList<>();
        synchronized (this) {
            if (closed) {
                toClose.add(workbook.workbook());
            } else {
                Kept replaced = kept.put(key, workbook);
                if (replaced != null) {
                    toClose.add(replaced.workbook());
                }
                var oldest = kept.entrySet().iterator();
                while (kept.size() > KEPT) {
                    toClose.add(oldest.next().getValue().workbook());
                    oldest.remove();
                }
            }
        }
        toClose.forEach(SourceWorkbook::close);
    }

    /** How many workbooks are kept now. */
    synchronized int size() {
        return kept.size();
    }

    @Override
    public void close() {
        List<Kept> toClose;
        synchronized (this) {
            closed = true;
            toClose = new ArrayList<>(kept.values());
            kept.clear();
        }
        toClose.forEach(k -> k.workbook().close());
    }
}
