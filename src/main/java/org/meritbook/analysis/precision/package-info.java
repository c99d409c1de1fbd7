/**
 * Precision: mean, SD and %CV of replicate results per level, and with a grouping column (run, day,
 * analyst) repeatability and intermediate precision from a one-way ANOVA, ISO 5725-2 limits and
 * outlier screening (flagged, never removed). Statistics come from {@code org.meritbook.stats}.
 */
package org.meritbook.analysis.precision;
