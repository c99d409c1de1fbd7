package org.meritbook.analysis.calibration;

import org.meritbook.workbook.CellValue;

/**
 * One calibration standard measurement as read, used or excluded.
 *
 * @param label           the response cell's A1 address (e.g. {@code C7}), used in quantity names
 * @param row             the block row it is on (several points share a row with replicate columns)
 * @param xCell           the nominal concentration cell
 * @param yCell           the response cell
 * @param x               nominal concentration, NaN when excluded and not numeric
 * @param y               response, NaN when excluded and not numeric
 * @param exclusionReason why the point is left out of the fit, or null when used
 * @param isCell          the internal standard's response cell when y is the ratio yCell / isCell, else null
 */
record CalibrationPoint(String label, int row, CellValue xCell, CellValue yCell, double x, double y, String exclusionReason,
                        CellValue isCell) {
    boolean used() {
        return exclusionReason == null;
    }
}
