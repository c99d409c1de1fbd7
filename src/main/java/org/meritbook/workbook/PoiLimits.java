package org.meritbook.workbook;

import org.apache.poi.openxml4j.util.ZipArchiveFakeEntry;
import org.apache.poi.openxml4j.util.ZipSecureFile;

/**
 * POI's own zip limits, kept in step with the reading budget. {@link PackageScan} enforces the budget
 * before POI opens a package; POI's limits are a second line that must never be lower than the
 * budget, or a workbook within it would fail with POI's message instead of being read. Its ratio
 * rule (an entry may not inflate more than 100-fold after its first 100 kB) is left at POI's
 * default, which the scan applies first with its own located message.
 */
final class PoiLimits {
    private PoiLimits() {
    }

    /** Raises POI's process-wide limits to at least the budget; never lowers them (readers may differ in budget). */
    static synchronized void allow(WorkbookBudget budget) {
        if (ZipSecureFile.getMaxEntrySize() < budget.maxBytes()) {
            ZipSecureFile.setMaxEntrySize(budget.maxBytes());
        }
        int largestArray = (int) Math.min(Integer.MAX_VALUE - 16, budget.maxBytes());
        if (ZipArchiveFakeEntry.getMaxEntrySize() < largestArray) {
            ZipArchiveFakeEntry.setMaxEntrySize(largestArray);
        }
    }
}
