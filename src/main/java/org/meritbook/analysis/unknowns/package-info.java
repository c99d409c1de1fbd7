/**
 * Unknowns and QC samples read back through an earlier straight-line calibration: x₀ with s(x₀)
 * and its interval, the result in the sample's units through mass, volume and dilution, QC
 * deviations from their known values, and flags for samples outside the calibrated span or below
 * the LOQ.
 */
package org.meritbook.analysis.unknowns;
