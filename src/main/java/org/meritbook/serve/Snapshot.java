package org.meritbook.serve;

import java.time.Instant;
import java.util.List;
import java.util.Objects;
import org.meritbook.revision.RevisionDiff;

/**
 * What the live study shows at one moment; replaced as a whole, never changed, so a request
 * always sees one consistent run.
 *
 * @param run        completed runs so far (successful or not); 0 before the first ends
 * @param state      the state the page shows
 * @param problems   the last completed run's problems; empty when it succeeded
 * @param elapsedMs  how long the last completed run took, or -1 before the first
 * @param finishedAt when the last completed run ended, or null before the first
 * @param issued     the latest successful run's outputs, or null before one succeeds
 */
public record Snapshot(int run, State state, List<ShownProblem> problems, long elapsedMs, Instant finishedAt, Issued issued) {
    /** The state line of the page: up to date, running, or input needs attention. */
    public enum State {
        OK, RUNNING, ERROR;

        /** The lower-case word used in /status. */
        public String word() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    /**
     * A successful run's outputs, kept while later runs fail. The byte arrays are never written to
     * after construction; they are served as they are.
     *
     * @param run      the run that produced them
     * @param title    the study's title
     * @param revision the revision in the notebook's front matter
     * @param html     the HTML dossier
     * @param json     results.json
     * @param outcome  the acceptance outcome counted from the run's results
     * @param sinceRun the earlier successful run the changes are counted from, or 0 when this is the first
     * @param changed  quantities whose value changed since that run ({@code section.name}, old, new; null for added or removed)
     * @param points   the cells of this run the page may exclude or restore
     * @param at       when the run's outputs were made (the page dates a kept, stale dossier by it)
     */
    public record Issued(int run, String title, int revision, byte[] html, byte[] json, Outcome outcome, int sinceRun,
                         List<RevisionDiff.Change> changed, PointIndex points, Instant at) {
        public Issued {
            Objects.requireNonNull(points, "points");
            changed = List.copyOf(changed);
            Objects.requireNonNull(title, "title");
            Objects.requireNonNull(outcome, "outcome");
            Objects.requireNonNull(html, "html");
            Objects.requireNonNull(json, "json");
        }
    }

    public Snapshot {
        Objects.requireNonNull(state, "state");
        problems = List.copyOf(problems);
    }

    static Snapshot initial() {
        return new Snapshot(0, State.RUNNING, List.of(), -1, null, null);
    }

    Snapshot running() {
        return new Snapshot(run, State.RUNNING, problems, elapsedMs, finishedAt, issued);
    }
}
