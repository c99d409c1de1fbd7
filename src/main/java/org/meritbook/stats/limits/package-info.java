/**
 * Detection and quantitation limits by each published procedure, as pure numerics on plain values
 * or on a fitted {@link org.meritbook.stats.regression.LineFit}: the blank-based limit ȳ_b + k·s_b
 * through a line ({@link org.meritbook.stats.limits.BlankLimit}); ICH Q2's 3.3σ/S and 10σ/S ({@link
 * org.meritbook.stats.limits.ResponseSdLimit}); the US EPA method detection limit, 40 CFR 136
 * Appendix B Rev. 2 ({@link org.meritbook.stats.limits.SpikedMdl}, {@link
 * org.meritbook.stats.limits.BlankMdl}, {@link org.meritbook.stats.limits.EpaMdl}); CLSI EP17-style
 * limit of blank and limit of detection ({@link org.meritbook.stats.limits.LimitOfBlank}, {@link
 * org.meritbook.stats.limits.Ep17LimitOfDetection}); and the ISO 11843-2 / Hubaux–Vos critical value
 * and minimum detectable value from a calibration's prediction band ({@link
 * org.meritbook.stats.limits.PredictionBandLimits}).
 *
 * <p>Each record keeps its inputs and the choice made (a type: {@link
 * org.meritbook.stats.limits.BlankBasis}, {@link org.meritbook.stats.limits.SigmaSource}, {@link
 * org.meritbook.stats.limits.LobMethod}, {@link org.meritbook.stats.limits.ZeroWeightSource}, the
 * blank rule of the MDL) so that a dossier can state how each limit was obtained. Censored results
 * ("n.d.", "&lt;0.05") are never numbers here: a caller passes the numeric results and, where a
 * procedure uses it, the count of those that gave none. A limit the data cannot support throws
 * {@link org.meritbook.stats.UnusableDataException} (a zero SD, a falling slope, too few results).
 */
package org.meritbook.stats.limits;
