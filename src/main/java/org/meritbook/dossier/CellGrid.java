package org.meritbook.dossier;

import java.util.HashSet;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.TableCell;

/**
 * Where a data table's values sit in the workbook. When the table is one row per sheet row on one
 * sheet ({@link #compact()}), a value's cell is its column's letter and its row's number, so the
 * dossier prints those once (under the header, in the first column) instead of an address in every
 * cell. A column whose cells are not in one sheet column keeps an address per cell; a table whose
 * rows are not one per sheet row keeps an address in every cell.
 */
final class CellGrid {
    private static final Pattern ADDRESS = Pattern.compile("^(?:(.+)!)?\\$?([A-Za-z]{1,3})\\$?(\\d+)$");
    /** Raw text longer than this, or with a space, makes a column free text (it may wrap). */
    private static final int SHORT_TEXT = 12;

    /** A parsed cell address. */
    record Address(String sheet, String column, int row) {
        static Optional<Address> parse(String address) {
            if (address == null) {
                return Optional.empty();
            }
            Matcher m = ADDRESS.matcher(address.strip());
            if (!m.matches()) {
                return Optional.empty();
            }
            return Optional.of(new Address(m.group(1) == null ? "" : m.group(1),
                    m.group(2).toUpperCase(Locale.ROOT), Integer.parseInt(m.group(3))));
        }
    }

    private final boolean compact;
    private final String[] letters;
    private final String[] rows;
    private final boolean[] computed;
    private final boolean[] text;
    private final String range;
    private final String labelColumn;

    private CellGrid(boolean compact, String[] letters, String[] rows, boolean[] computed, boolean[] text, String range,
                     String labelColumn) {
        this.compact = compact;
        this.letters = letters;
        this.rows = rows;
        this.computed = computed;
        this.text = text;
        this.range = range;
        this.labelColumn = labelColumn;
    }

    static CellGrid of(DataTable t) {
        int nc = t.headers().size();
        int nr = t.rows().size();
        String[] letters = new String[nc];
        boolean[] mixed = new boolean[nc];
        boolean[] computed = new boolean[nc];
        boolean[] text = new boolean[nc];
        String[] rows = new String[nr];
        Set<String> sheets = new HashSet<>();
        Set<Integer> seenRows = new HashSet<>();
        boolean rowsOk = nr > 0;
        int minCol = Integer.MAX_VALUE, maxCol = -1, minRow = Integer.MAX_VALUE, maxRow = -1;
        boolean[] rawSeen = new boolean[nc];
        for (int i = 0; i < nr; i++) {
            Integer rowNumber = null;
            boolean rowMixed = false;
            for (int j = 0; j < nc; j++) {
                TableCell c = t.rows().get(i).cells().get(j);
                if (c.quantity() != null) {
                    computed[j] = true;
                    continue;
                }
                String raw = c.raw() == null ? "" : c.raw();
                if (raw.length() > SHORT_TEXT || raw.strip().contains(" ")) {
                    text[j] = true;
                }
                if (c.address() == null || c.address().isBlank()) {
                    if (!raw.isBlank()) {
                        mixed[j] = true; // a value without an address cannot be told by letter and row
                    }
                    continue;
                }
                rawSeen[j] = true;
                Optional<Address> a = Address.parse(c.address());
                if (a.isEmpty()) {
                    mixed[j] = true;
                    rowMixed = true;
                    continue;
                }
                Address ad = a.get();
                sheets.add(ad.sheet());
                if (letters[j] == null) {
                    letters[j] = ad.column();
                } else if (!letters[j].equals(ad.column())) {
                    mixed[j] = true;
                }
                if (rowNumber == null) {
                    rowNumber = ad.row();
                } else if (rowNumber != ad.row()) {
                    rowMixed = true;
                }
                int col = columnIndex(ad.column());
                minCol = Math.min(minCol, col);
                maxCol = Math.max(maxCol, col);
                minRow = Math.min(minRow, ad.row());
                maxRow = Math.max(maxRow, ad.row());
            }
            if (rowNumber == null || rowMixed || !seenRows.add(rowNumber)) {
                rowsOk = false;
            } else {
                rows[i] = String.valueOf(rowNumber);
            }
        }
        for (int j = 0; j < nc; j++) {
            if (computed[j] && rawSeen[j]) {
                computed[j] = false; // a column mixing read and computed values is shown as read, cell by cell
                mixed[j] = true;
            }
            if (mixed[j]) {
                letters[j] = null;
            }
            if (computed[j]) {
                text[j] = false;
            }
        }
        boolean compact = rowsOk && sheets.size() == 1 && maxCol >= 0;
        String range = "";
        String labelColumn = "";
        if (compact) {
            String sheet = sheets.iterator().next();
            range = (sheet.isEmpty() ? "" : sheet + "!") + columnName(minCol) + minRow + ":" + columnName(maxCol) + maxRow;
            labelColumn = labelColumn(t, letters, rows);
        }
        return new CellGrid(compact, letters, rows, computed, text, range, labelColumn);
    }

    /** The column whose cell address (letter and row) is every row's label, or empty. */
    private static String labelColumn(DataTable t, String[] letters, String[] rows) {
        for (String letter : letters) {
            if (letter == null) {
                continue;
            }
            boolean all = true;
            for (int i = 0; i < rows.length && all; i++) {
                String label = t.rows().get(i).label();
                all = label != null && label.equalsIgnoreCase(letter + rows[i]);
            }
            if (all) {
                return letter;
            }
        }
        return "";
    }

    boolean compact() {
        return compact;
    }

    /** The sheet row of row {@code i}; only meaningful when compact. */
    String row(int i) {
        return rows[i] == null ? "" : rows[i];
    }

    /** The column's sheet letter, or empty when its cells are not in one sheet column. */
    String letter(int j) {
        return letters[j] == null ? "" : letters[j];
    }

    boolean computed(int j) {
        return computed[j];
    }

    boolean text(int j) {
        return text[j];
    }

    /** True when the cells of column {@code j} print their own address. */
    boolean addressShown(int j) {
        return !compact || letters[j] == null;
    }

    /** e.g. {@code Calibration!A9:F31}; empty when not compact. */
    String range() {
        return range;
    }

    /** The letter of the column whose cells name the points, or empty. */
    String labelColumn() {
        return labelColumn;
    }

    static int columnIndex(String letters) {
        int n = 0;
        for (int i = 0; i < letters.length(); i++) {
            n = n * 26 + (letters.charAt(i) - 'A' + 1);
        }
        return n - 1;
    }

    static String columnName(int index) {
        StringBuilder b = new StringBuilder();
        for (int n = index + 1; n > 0; n = (n - 1) / 26) {
            b.insert(0, (char) ('A' + (n - 1) % 26));
        }
        return b.toString();
    }
}
