package org.meritbook.robustness;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Edits of a worksheet's XML text, the way other programs and hand edits change it. */
final class SheetEdits {
    private SheetEdits() {
    }

    private static Pattern cellPattern(String address) {
        return Pattern.compile("<c r=\"" + address + "\"[^>]*?(?:/>|>.*?</c>)");
    }

    /** The sheet with one cell's whole element replaced (the cell must exist). */
    static String cell(String xml, String address, String element) {
        Matcher m = cellPattern(address).matcher(xml);
        if (!m.find()) {
            throw new IllegalArgumentException("no cell " + address);
        }
        return xml.substring(0, m.start()) + element + xml.substring(m.end());
    }

    /** The cell's element as written. */
    static String element(String xml, String address) {
        Matcher m = cellPattern(address).matcher(xml);
        if (!m.find()) {
            throw new IllegalArgumentException("no cell " + address);
        }
        return m.group();
    }

    static String number(String address, String stored) {
        return "<c r=\"" + address + "\" s=\"6\" t=\"n\"><v>" + stored + "</v></c>";
    }

    static String text(String address, String text) {
        return "<c r=\"" + address + "\" t=\"inlineStr\"><is><t xml:space=\"preserve\">" + escape(text) + "</t></is></c>";
    }

    static String error(String address, String code) {
        return "<c r=\"" + address + "\" t=\"e\"><v>" + escape(code) + "</v></c>";
    }

    /** A formula as a program that does not calculate writes it: {@code value} null for no value element. */
    static String formula(String address, String formula, String value) {
        return "<c r=\"" + address + "\"><f>" + escape(formula) + "</f>" + (value == null ? "" : "<v>" + value + "</v>") + "</c>";
    }

    static String removeCell(String xml, String address) {
        return cell(xml, address, "");
    }

    static String hideRow(String xml, int row) {
        return rowAttributes(xml, row, " hidden=\"1\"");
    }

    static String zeroHeightRow(String xml, int row) {
        return rowAttributes(xml, row, " ht=\"0\" customHeight=\"1\"");
    }

    private static String rowAttributes(String xml, int row, String attributes) {
        String open = "<row r=\"" + row + "\"";
        if (!xml.contains(open + ">")) {
            throw new IllegalArgumentException("no row " + row);
        }
        return xml.replace(open + ">", open + attributes + ">");
    }

    static String removeRow(String xml, int row) {
        return xml.replaceFirst("<row r=\"" + row + "\"[^>]*>.*?</row>", "");
    }

    /** The row's element as written. */
    static String rowElement(String xml, int row) {
        Matcher m = Pattern.compile("<row r=\"" + row + "\"[^>]*>.*?</row>").matcher(xml);
        if (!m.find()) {
            throw new IllegalArgumentException("no row " + row);
        }
        return m.group();
    }

    /** Hides a column described by a {@code <col min=n max=n>} element. */
    static String hideColumn(String xml, int oneBased) {
        String col = "<col min=\"" + oneBased + "\" max=\"" + oneBased + "\"";
        if (!xml.contains(col)) {
            throw new IllegalArgumentException("no col element " + oneBased);
        }
        return xml.replace(col, col + " hidden=\"true\"");
    }

    /** Merges cells (the other cells of the region should be blank, as a spreadsheet program leaves them). */
    static String merge(String xml, String... ranges) {
        StringBuilder cells = new StringBuilder("<mergeCells count=\"" + ranges.length + "\">");
        for (String r : ranges) {
            cells.append("<mergeCell ref=\"").append(r).append("\"/>");
        }
        cells.append("</mergeCells>");
        return xml.replace("</sheetData>", "</sheetData>" + cells);
    }

    static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
