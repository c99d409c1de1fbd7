/** Figures: charts described as data ({@link org.meritbook.figures.FigureSpec}) and drawn as SVG. */
package org.meritbook.figures;
