package org.meritbook.workbook;

import org.apache.poi.openxml4j.util.ZipArchiveFakeEntry;
import org.apache.poi.openxml4j.util.ZipSecureFile;

/**
 * POI's own zip limits ({@code ZipSecureFile}), set in step with the reading budget.
 * {@link PackageScan} has counted every inflated byte and cell against the budget before POI opens a
 * package, so POI's limits must never be lower than the budget, or a workbook within it would fail
 * with POI's message instead of being read. POI's ratio rule (no entry may inflate more than 100-fold
 * after its first 100 kB) is turned off for the same reason: a genuine long note of repeated text
 * compresses further than that, and the counted budget already bounds what a zip bomb can cost.
 */
final class PoiLimits {
    private PoiLimits() {
    }

    /** Raises POI's process-wide limits to at least the budget; never lowers them (readers may differ in budget). */
    static synchronized void allow(WorkbookBudget budget) {
        ZipSecureFile.setMinInflateRatio(0);
        if (ZipSecureFile.getMaxEntrySize() < budget.maxBytes()) {
            ZipSecureFile.setMaxEntrySize(budget.maxBytes());
        }
        int largestArray = (int) Math.min(Integer.MAX_VALUE - 16, budget.maxBytes());
        if (ZipArchiveFakeEntry.getMaxEntrySize() < largestArray) {
            ZipArchiveFakeEntry.setMaxEntrySize(largestArray);
        }
    }
}
