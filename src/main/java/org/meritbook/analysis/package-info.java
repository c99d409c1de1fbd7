/**
 * Analyses: one class per characteristic turns a notebook cell and its data blocks into a
 * {@link org.meritbook.analysis.SectionResult} — named quantities, each with its trail step, a data
 * table, figure specifications, verdicts and warnings. Analyses do not format numbers for display.
 */
package org.meritbook.analysis;
