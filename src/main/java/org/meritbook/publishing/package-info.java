/**
 * The one publishing sequence: run the study, find its earlier revisions, write results.json with
 * them, render the dossier. {@code run} issues it as a revision's output set, {@code serve} shows its
 * HTML as the preview, {@code verify} re-renders through it, so the three never assemble it apart.
 * Above pipeline, revision and dossier, below cli and serve.
 */
package org.meritbook.publishing;
