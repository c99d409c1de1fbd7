package org.meritbook.serve;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.meritbook.revision.RevisionDiff;

/**
 * The body of {@code GET /status}. Written with Jackson, so any text from a notebook or a workbook
 * inside a problem arrives in the browser as a JSON string, never as markup.
 */
final class StatusJson {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private StatusJson() {
    }

    static byte[] of(Snapshot s, String notebookName) {
        return of(s, notebookName, null, List.of());
    }

    /**
     * @param latest the latest published revision compared with the preview, or null before a run succeeds
     * @param lines  the notebook's lines now, to quote a problem's line and name its cell (empty: none quoted)
     */
    static byte[] of(Snapshot s, String notebookName, RevisionIssuer.Latest latest, List<String> lines) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("run", s.run());
        root.put("state", s.state().word());
        ArrayNode problems = root.putArray("problems");
        for (ShownProblem p : s.problems()) {
            ObjectNode o = problems.addObject().put("key", p.key()).put("where", p.where()).put("expected", p.expected())
                    .put("found", p.found()).put("fix", p.fix()).put("message", p.message());
            NotebookLines.of(p.where(), notebookName, lines).ifPresent(place -> o.put("line", place.line())
                    .put("line_text", place.text()).put("cell", place.cell()));
        }
        if (s.elapsedMs() < 0) {
            root.putNull("elapsed_ms");
        } else {
            root.put("elapsed_ms", s.elapsedMs());
        }
        root.put("finished_at", s.finishedAt() == null ? null : s.finishedAt().toString());
        Snapshot.Issued issued = s.issued();
        if (issued == null) {
            root.putNull("revision");
            root.putNull("title");
            root.putNull("verdicts");
        } else {
            root.put("revision", issued.revision());
            root.put("title", issued.title());
            // The outcome of the dossier shown (dossier_run), which a later failed run does not replace.
            Outcome o = issued.outcome();
            root.putObject("verdicts").put("passed", o.passed()).put("failed", o.failed())
                    .put("not_evaluable", o.notEvaluable()).put("warnings", o.warnings()).put("level", o.level().word());
        }
        ObjectNode changes = root.putObject("changes");
        changes.put("since_run", issued == null ? 0 : issued.sinceRun());
        ArrayNode changed = changes.putArray("results");
        if (issued != null) {
            for (RevisionDiff.Change c : issued.changed()) {
                // what is section.quantity; quantity names may hold ':' but section ids hold no '.'.
                int dot = c.what().indexOf('.');
                changed.addObject().put("section", dot < 0 ? "" : c.what().substring(0, dot))
                        .put("name", c.what().substring(dot + 1)).put("before", c.before()).put("after", c.after());
            }
        }
        // The run whose dossier /dossier serves: the page reloads its view when this changes.
        root.put("dossier_run", issued == null ? 0 : issued.run());
        root.put("dossier_finished_at", issued == null || issued.at() == null ? null : issued.at().toString());
        root.put("notebook", notebookName);
        if (latest == null || issued == null) {
            root.putNull("issued");
        } else {
            ObjectNode o = root.putObject("issued");
            if (latest.revision() == 0) {
                o.putNull("latest");
            } else {
                o.put("latest", latest.revision());
            }
            o.put("differs", latest.differs());
            // The notebook's revision is already published: issuing the preview needs the next one.
            o.put("needs_new_revision", latest.differs() && latest.revision() >= issued.revision());
            o.put("next_revision", RevisionIssuer.revisionToIssue(issued.revision(), latest.revision()));
        }
        try {
            return MAPPER.writeValueAsString(root).getBytes(StandardCharsets.UTF_8);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("status could not be serialised", e);
        }
    }
}
