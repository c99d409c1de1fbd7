/**
 * Figures: a {@link org.meritbook.figures.FigureSpec} (data computed by an analysis) drawn as a
 * deterministic vector SVG with XChart, for both the PDF and the HTML dossier. Owns the palette and
 * the chart typography; computes no fits.
 */
package org.meritbook.figures;
