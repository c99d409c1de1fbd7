package org.meritbook.analysis.accuracy;

import org.meritbook.workbook.CellValue;

/**
 * One result of an accuracy cell as read.
 *
 * @param label           the row's name in quantity names: the measured cell's address without the sheet (F6)
 * @param level           the level it belongs to
 * @param measured        the measured cell (a result, or a signal under {@code calibration:})
 * @param known           the known cell (nominal, certified, or amount added under {@code unspiked:})
 * @param unspiked        the paired unspiked cell, or null without {@code unspiked:}
 * @param measuredValue   the measured number (NaN when the cell holds none)
 * @param knownValue      the known number (NaN when the cell holds none)
 * @param unspikedValue   the unspiked number, NaN when the row has none
 * @param exclusionReason why the row is left out, or null
 */
record AccuracyRow(String label, String level, CellValue measured, CellValue known, CellValue unspiked,
                   double measuredValue, double knownValue, double unspikedValue, String exclusionReason) {
    boolean used() {
        return exclusionReason == null;
    }

    boolean hasUnspiked() {
        return !Double.isNaN(unspikedValue);
    }
}
