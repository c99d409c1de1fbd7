package org.meritbook.revision;

import java.util.List;
import java.util.Optional;

/**
 * What a new revision's dossier says about the earlier ones: their history, and what changed since
 * the latest earlier revision found in the output folder.
 *
 * @param earlier   earlier revisions, oldest first
 * @param changes   the differences from the latest earlier revision, when its dossier was found
 * @param sinceFile the file the changes were computed from (e.g. {@code study-rev1.pdf}), or null
 */
public record RevisionContext(List<RevisionEntry> earlier, Optional<RevisionDiff> changes, String sinceFile) {
    public RevisionContext {
        earlier = List.copyOf(earlier);
    }

    /** A first revision, or one whose predecessors are not in the output folder. */
    public static RevisionContext none() {
        return new RevisionContext(List.of(), Optional.empty(), null);
    }
}
