/**
 * The linear range of an earlier calibration: the widest contiguous span of its levels whose
 * back-calculated deviations and response factors stay within tolerance, bounded below by an LOQ.
 */
package org.meritbook.analysis.range;
