package org.meritbook.workbook;

import java.util.List;

/**
 * What a workbook holds, by name: for a starter notebook and for messages.
 *
 * @param sheets       sheet names in workbook order
 * @param definedNames user-visible defined names
 * @param tables       Excel table names
 */
public record WorkbookContents(List<String> sheets, List<String> definedNames, List<String> tables) {
    public WorkbookContents {
        sheets = List.copyOf(sheets);
        definedNames = List.copyOf(definedNames);
        tables = List.copyOf(tables);
    }
}
