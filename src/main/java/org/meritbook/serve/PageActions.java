package org.meritbook.serve;

import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import org.meritbook.criteria.AcceptanceProfile;
import org.meritbook.criteria.AcceptanceProfiles;
import org.meritbook.error.InputException;
import org.meritbook.study.Exclusion;
import org.meritbook.study.NotebookEdits;
import org.meritbook.study.StudyParser;

/**
 * The three changes the page may ask for — exclude a point, restore one, issue a revision — checked
 * against the run the page shows and carried out on the notebook through {@link NotebookEdits} and
 * {@link NotebookWriter}. Workbooks are never written. Each answer is a status and a sentence the
 * page shows as it is.
 */
final class PageActions {
    private static final Pattern DATE = Pattern.compile("[0-9]{4}-[0-9]{2}-[0-9]{2}");

    private final LiveStudy study;
    private final NotebookWriter writer;
    private final RevisionIssuer issuer;

    PageActions(LiveStudy study, NotebookWriter writer, RevisionIssuer issuer) {
        this.study = study;
        this.writer = writer;
        this.issuer = issuer;
    }

    /** An answer: HTTP status and what to tell the analyst. */
    record Reply(int status, String message) {
        static Reply ok(String message) {
            return new Reply(200, message);
        }

        static Reply refused(String message) {
            return new Reply(409, message);
        }
    }

    Reply exclude(int run, String section, String address, String reason, String by, String on) {
        Snapshot.Issued shown = study.snapshot().issued();
        Reply stale = stale(shown, run);
        if (stale != null) {
            return stale;
        }
        if (reason == null || reason.isBlank()) {
            return new Reply(400, "Give the reason for excluding " + address + ".");
        }
        if (on != null && !DATE.matcher(on).matches()) {
            return new Reply(400, "Write the date as YYYY-MM-DD (found '" + on + "').");
        }
        for (String key : exclusionRecord()) {
            String given = key.equals("by") ? by : on;
            if (given == null || given.isBlank()) {
                return new Reply(400, "The lab's acceptance profile asks " + (key.equals("by") ? "who excluded"
                        : "when they excluded") + " each point: fill in '" + (key.equals("by") ? "by" : "on") + "'.");
            }
        }
        PointIndex.Section s = shown.points().section(section).orElse(null);
        if (s == null) {
            return new Reply(400, "The study has no cell '" + section + "'.");
        }
        if (!s.cited().contains(address)) {
            return Reply.refused(address + " is not a value the statistics of cell '" + section
                    + "' use; choose a value of a column the cell reads.");
        }
        return edit(text -> NotebookEdits.exclude(text, study.notebook(), section, address, reason.strip(),
                blankToNull(by), blankToNull(on)), "Excluded " + address + " from cell '" + section + "'");
    }

    /**
     * What the study's profile asks every exclusion to say besides its reason. A notebook or profile
     * that cannot be read asks nothing here: the run that follows reports it where it is.
     */
    private List<String> exclusionRecord() {
        try {
            AcceptanceProfile profile = AcceptanceProfiles.of(StudyParser.parse(study.notebook()));
            return profile == null ? List.of() : profile.exclusionRecord();
        } catch (InputException e) {
            return List.of();
        }
    }

    Reply restore(int run, String section, String address) {
        Snapshot.Issued shown = study.snapshot().issued();
        Reply stale = stale(shown, run);
        if (stale != null) {
            return stale;
        }
        PointIndex.Section s = shown.points().section(section).orElse(null);
        if (s == null) {
            return new Reply(400, "The study has no cell '" + section + "'.");
        }
        List<Exclusion> entries = s.excluding(address);
        if (entries.isEmpty()) {
            return Reply.refused("No exclusion in the notebook leaves out the row of " + address + " in cell '" + section
                    + "' (a row the reader or 'censored: drop' left out is restored in the notebook's options).");
        }
        return edit(text -> {
            String edited = text;
            for (Exclusion e : entries) {
                edited = NotebookEdits.restore(edited, study.notebook(), section, e.address());
            }
            return edited;
        }, "Restored " + String.join(", ", entries.stream().map(Exclusion::address).toList()) + " in cell '" + section + "'");
    }

    Reply issue(String reason) {
        Snapshot now = study.snapshot();
        if (!now.problems().isEmpty() || now.state() != Snapshot.State.OK || now.issued() == null) {
            return Reply.refused("Not issued: the preview has " + (now.problems().isEmpty() ? "not finished its run"
                    : now.problems().size() + " open problem" + (now.problems().size() == 1 ? "" : "s"))
                    + "; resolve it first.");
        }
        if (reason == null || reason.isBlank()) {
            return new Reply(400, "Give the reason for the new revision.");
        }
        RevisionIssuer.Latest latest = issuer.latest(now.issued().json());
        if (!latest.differs()) {
            return Reply.refused("Not issued: the preview is the same as revision " + latest.revision()
                    + ", already in " + issuer.folder() + ".");
        }
        try {
            RevisionIssuer.Result r = issuer.issue(reason.strip());
            return Reply.ok("Issued revision " + r.revision() + " into " + r.published().folder());
        } catch (NotebookEdits.EditRefused e) {
            return Reply.refused(e.getMessage());
        } catch (InputException e) {
            return Reply.refused("Not issued: " + e.getMessage());
        }
    }

    private Reply edit(java.util.function.UnaryOperator<String> edit, String done) {
        try {
            NotebookWriter.Written w = writer.apply(edit);
            Path backup = w.backup();
            return Reply.ok(done + "; the previous notebook is kept as " + backup.getFileName() + ".");
        } catch (NotebookEdits.EditRefused e) {
            return Reply.refused(e.getMessage());
        } catch (InputException e) {
            return Reply.refused("The edit would not read back: " + e.getMessage());
        }
    }

    private static Reply stale(Snapshot.Issued shown, int run) {
        if (shown == null) {
            return Reply.refused("No run has succeeded yet.");
        }
        if (shown.run() != run) {
            return Reply.refused("The page showed run " + run + ", but run " + shown.run()
                    + " is current now; look again and repeat.");
        }
        return null;
    }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s.strip();
    }
}
