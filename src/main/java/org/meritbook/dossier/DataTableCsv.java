package org.meritbook.dossier;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.TableCell;

/**
 * A section's data table too long to print (more than {@link #SUMMARY_ABOVE_ROWS} rows): the dossier
 * shows its first and last rows, and the whole table travels as a CSV file attached to the PDF. The
 * CSV holds what the printed table would: each row's point label, each value as read (computed
 * values as the dossier shows them) beside its workbook cell, and the reason of an excluded row,
 * so every number is still tied to its source cell. RFC 4180 form: comma-separated, fields with a
 * comma, quotation mark or line break quoted, CRLF line ends, UTF-8 without byte order mark.
 */
final class DataTableCsv {
    /** A data table with more rows than this is summarised in the dossier and attached whole. */
    static final int SUMMARY_ABOVE_ROWS = 500;
    /** Rows printed at each end of a summarised table. */
    static final int SHOWN_AT_EACH_END = 10;
    /** The attachment alias of a section's table, "table:" and the section id. */
    static final String ALIAS_PREFIX = "table:";

    private DataTableCsv() {
    }

    static boolean summarised(DataTable t) {
        return t != null && t.rows().size() > SUMMARY_ABOVE_ROWS;
    }

    static String alias(SectionResult r) {
        return ALIAS_PREFIX + r.id();
    }

    static byte[] of(SectionResult r, DisplayFormatter format) {
        DataTable t = r.table();
        StringBuilder out = new StringBuilder();
        StringBuilder line = new StringBuilder();
        field(line, "Point");
        for (String h : t.headers()) {
            String header = h == null ? "" : h;
            field(line, header);
            field(line, header + " cell");
        }
        field(line, "Excluded because");
        end(out, line);
        for (DataTable.Row row : t.rows()) {
            field(line, row.label() == null ? "" : row.label());
            for (TableCell c : row.cells()) {
                if (c.quantity() != null) {
                    Quantity q = r.quantity(c.quantity()).orElseThrow(() -> new IllegalArgumentException(
                            "section " + r.id() + ": table cell refers to quantity " + c.quantity() + ", which it lacks"));
                    field(line, format.quantity(q).value());
                    field(line, "computed");
                } else {
                    field(line, c.raw() == null ? "" : c.raw());
                    field(line, c.address() == null ? "" : c.address());
                }
            }
            field(line, row.excluded() ? row.exclusionReason() : "");
            end(out, line);
        }
        return out.toString().getBytes(StandardCharsets.UTF_8);
    }

    private static void field(StringBuilder line, String value) {
        if (!line.isEmpty()) {
            line.append(',');
        }
        if (value.indexOf(',') >= 0 || value.indexOf('"') >= 0 || value.indexOf('\n') >= 0 || value.indexOf('\r') >= 0) {
            line.append('"').append(value.replace("\"", "\"\"")).append('"');
        } else {
            line.append(value);
        }
    }

    private static void end(StringBuilder out, StringBuilder line) {
        out.append(line).append("\r\n");
        line.setLength(0);
    }

    /** The rows a summary prints: the first and the last {@link #SHOWN_AT_EACH_END}. */
    static List<Integer> shownRows(int rows) {
        List<Integer> shown = new java.util.ArrayList<>();
        for (int i = 0; i < rows; i++) {
            if (i < SHOWN_AT_EACH_END || i >= rows - SHOWN_AT_EACH_END) {
                shown.add(i);
            }
        }
        return shown;
    }
}
