/**
 * Reading lab workbooks (.xlsx, .xlsm, .xls through Apache POI; .csv through Commons CSV) into
 * {@link org.meritbook.workbook.DataBlock}s: typed columns, names and units from headers, and every
 * value with its {@code Sheet!A1} address. Owns the data reference forms (range, whole columns,
 * defined name, Excel table, sheet with auto-detection), messy layouts (title rows, merged headers,
 * blank rows, cached formula results, numbers stored as text, censored results), the located
 * errors for bad files and references, and {@link org.meritbook.workbook.NumericColumn}, which turns a
 * column into numbers or reports every cell that is not one.
 *
 * <p>Workbooks are read into memory and never written or locked. Formulas are never evaluated.
 * Nothing is guessed silently: every choice the reader makes on the user's behalf is recorded in
 * {@link org.meritbook.workbook.DataBlock#decisions()}. No statistics here.
 */
package org.meritbook.workbook;
