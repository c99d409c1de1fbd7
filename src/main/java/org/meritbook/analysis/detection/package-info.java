/**
 * The {@code detection-limit} kind: detection and quantitation limits by each method a cell lists
 * (blank, response-sd, mdl, lob-lod, prediction-band, signal-noise), computed by the procedures of
 * {@link org.meritbook.stats.limits} and shown side by side. A method the data cannot support is a
 * "not evaluable, because …" warning; the others go on.
 */
package org.meritbook.analysis.detection;
