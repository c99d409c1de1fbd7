package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.TableCell;

/** How a data table's cells are told: by column letter and sheet row when they can be, else one by one. */
class CellGridTest {
    private static DataTable.Row row(String label, TableCell... cells) {
        return new DataTable.Row(label, List.of(cells), null);
    }

    @Test
    void oneRowPerSheetRowOnOneSheetIsCompact() {
        DataTable t = new DataTable(List.of("Nominal (mg/L)", "Area", "Deviation (%)"), List.of(
                row("D9", TableCell.raw("0.10", "Calibration!C9"), TableCell.raw("4.60", "Calibration!D9"),
                        TableCell.computed("deviation_percent:D9")),
                row("D11", TableCell.raw("0.10", "Calibration!C11"), TableCell.raw("4.66", "Calibration!D11"),
                        TableCell.computed("deviation_percent:D11"))));
        CellGrid g = CellGrid.of(t);
        assertTrue(g.compact());
        assertEquals("Calibration!C9:D11", g.range());
        assertEquals(List.of("C", "D", ""), List.of(g.letter(0), g.letter(1), g.letter(2)));
        assertEquals(List.of("9", "11"), List.of(g.row(0), g.row(1)));
        assertTrue(g.computed(2));
        assertFalse(g.addressShown(0));
        assertEquals("D", g.labelColumn(), "labels are the column D cells");
    }

    @Test
    void aColumnWhoseCellsAreInDifferentSheetColumnsKeepsItsAddresses() {
        DataTable t = new DataTable(List.of("x", "y"), List.of(
                row("p1", TableCell.raw("1", "S!A2"), TableCell.raw("5", "S!B2")),
                row("p2", TableCell.raw("2", "S!A3"), TableCell.raw("6", "S!C3"))));
        CellGrid g = CellGrid.of(t);
        assertTrue(g.compact());
        assertFalse(g.addressShown(0), "column A is told by its letter");
        assertTrue(g.addressShown(1), "B then C: each cell keeps its address");
        assertEquals("", g.letter(1));
        assertEquals("", g.labelColumn(), "labels are not cell names");
    }

    @Test
    void rowsThatAreNotOnePerSheetRowKeepEveryAddress() {
        DataTable transposed = new DataTable(List.of("x", "y"), List.of(
                row("p1", TableCell.raw("1", "S!B2"), TableCell.raw("5", "S!B3")),
                row("p2", TableCell.raw("2", "S!C2"), TableCell.raw("6", "S!C3"))));
        assertFalse(CellGrid.of(transposed).compact(), "a row spanning two sheet rows");
        DataTable repeated = new DataTable(List.of("x"), List.of(
                row("p1", TableCell.raw("1", "S!A2")), row("p2", TableCell.raw("2", "S!A2"))));
        assertFalse(CellGrid.of(repeated).compact(), "two rows on one sheet row");
        DataTable twoSheets = new DataTable(List.of("x"), List.of(
                row("p1", TableCell.raw("1", "S!A2")), row("p2", TableCell.raw("2", "T!A3"))));
        assertFalse(CellGrid.of(twoSheets).compact(), "two sheets");
        assertTrue(CellGrid.of(twoSheets).addressShown(0));
        DataTable csv = new DataTable(List.of("x"), List.of(row("p1", TableCell.raw("1", "runs.csv line 2"))));
        assertFalse(CellGrid.of(csv).compact(), "an address that is not a cell reference");
    }

    @Test
    void columnNamesAndIndicesRoundTrip() {
        for (String name : List.of("A", "Z", "AA", "AZ", "BA", "ZZ", "AAA")) {
            assertEquals(name, CellGrid.columnName(CellGrid.columnIndex(name)));
        }
        assertEquals(26, CellGrid.columnIndex("AA"));
    }
}
