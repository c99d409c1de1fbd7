/**
 * Accuracy (trueness): % recovery and % error against known values, per level and overall, with
 * spike recovery against unspiked portions and measured signals read back through an earlier
 * calibration. Statistics come from {@code org.meritbook.stats}.
 */
package org.meritbook.analysis.accuracy;
