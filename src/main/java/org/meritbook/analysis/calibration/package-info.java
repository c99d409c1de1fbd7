/**
 * Calibration and linearity: the straight-line fit of response on concentration, its trail,
 * data table and figures. Statistics come from {@code org.meritbook.stats}.
 */
package org.meritbook.analysis.calibration;
