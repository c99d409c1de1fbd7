/**
 * The live notebook ({@code meritbook serve}): a preview on 127.0.0.1 that re-runs the study through
 * the ordinary pipeline whenever the notebook or a workbook it declares changes. {@link org.meritbook.serve.LiveStudy}
 * holds the latest run as an immutable {@link org.meritbook.serve.Snapshot}, {@link org.meritbook.serve.FileWatcher}
 * notices saves, {@link org.meritbook.serve.LiveServer} answers the browser. Nothing is written to disk: a
 * preview issues no dossier.
 */
package org.meritbook.serve;
