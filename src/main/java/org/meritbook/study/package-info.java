/**
 * The study notebook: parsing its YAML front matter, narrative Markdown and analysis cells into a
 * {@link org.meritbook.study.Study}; cell options checked against their
 * {@link org.meritbook.study.AnalysisKind}, exclusions, data references ({@code source!Sheet!A1:D40})
 * and cell ids. Every problem is reported with the notebook line, what was expected and a fix.
 * This package never opens a workbook: whether a sheet or cell exists is the workbook reader's concern.
 */
package org.meritbook.study;
