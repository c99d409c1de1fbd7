package org.meritbook.analysis;

/**
 * One cell of a section's data table: either raw workbook content (text as the workbook showed it,
 * with its address) or a computed value (a quantity name; the dossier formats it).
 *
 * @param raw      text as read, or null for a computed cell
 * @param address  source cell ({@code Calibration!C17}), or null for a computed cell
 * @param quantity name of the quantity shown, or null for a raw cell
 */
public record TableCell(String raw, String address, String quantity) {
    public static TableCell raw(String raw, String address) {
        return new TableCell(raw, address, null);
    }

    public static TableCell computed(String quantity) {
        return new TableCell(null, null, quantity);
    }
}
