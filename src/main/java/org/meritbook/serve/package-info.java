/**
 * The live notebook ({@code meritbook serve}): a preview on 127.0.0.1 (or an address given with
 * {@code --bind}) that re-runs the study through the ordinary pipeline whenever the notebook or a
 * workbook it declares changes. {@link org.meritbook.serve.LiveStudy} holds the latest run as an
 * immutable {@link org.meritbook.serve.Snapshot}, {@link org.meritbook.serve.FileWatcher} notices saves,
 * {@link org.meritbook.serve.LiveServer} answers the browser. The page explains every number from the
 * dossier's own trail; its three changes (exclude, restore, issue) are checked by {@code PageActions},
 * written into the notebook by {@code NotebookWriter} (atomically, with a numbered backup) and issued by
 * {@code RevisionIssuer} through {@link org.meritbook.publishing.PublishingSequence}. Workbooks are never written.
 */
package org.meritbook.serve;
