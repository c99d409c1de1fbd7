/**
 * The validation dossier: a typed view-model built from {@link org.meritbook.pipeline.StudyResults},
 * laid out by Freemarker templates (report-templates/, or a lab's own copy), rendered to HTML and to
 * PDF/A-3 with embedded fonts, the inputs and results.json attached, and byte-identical output for
 * identical inputs. Numbers are formatted here, once, by {@link org.meritbook.dossier.DisplayFormatter};
 * templates only lay out. Computes no statistics.
 */
package org.meritbook.dossier;
