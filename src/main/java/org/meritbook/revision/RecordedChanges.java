package org.meritbook.revision;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.meritbook.revision.RevisionDiff.Change;

/**
 * The changes since the previous revision as results.json records them ({@code study.changes}), so
 * that a dossier carries what its "changes since" chapter says and {@code verify} can render that
 * chapter again from the attachments alone.
 */
final class RecordedChanges {
    /** The change lists, in the order the dossier shows them. */
    static final List<String> GROUPS = List.of("inputs", "cells", "settings", "results");

    private RecordedChanges() {
    }

    /** {@code {since, inputs[], cells[], settings[], results[]}}, or JSON null when there were none. */
    static JsonNode toJson(RevisionContext context) {
        if (context.changes().isEmpty()) {
            return JsonNodeFactory.instance.nullNode();
        }
        ObjectNode n = JsonNodeFactory.instance.objectNode();
        n.put("since", context.sinceFile());
        addGroups(n, context.changes().get());
        return n;
    }

    /** Adds the four change lists to {@code n} as arrays of {@code {what, before, after}}. */
    static void addGroups(ObjectNode n, RevisionDiff diff) {
        List<List<Change>> groups = List.of(diff.inputs(), diff.cells(), diff.settings(), diff.results());
        for (int g = 0; g < GROUPS.size(); g++) {
            ArrayNode changes = n.putArray(GROUPS.get(g));
            for (Change c : groups.get(g)) {
                changes.addObject().put("what", c.what()).put("before", c.before()).put("after", c.after());
            }
        }
    }

    /** The revision context a validated results tree records: its history and its changes, if any. */
    static RevisionContext fromJson(JsonNode results) {
        List<RevisionEntry> history = ResultsJson.history(results);
        JsonNode n = results.path("study").path("changes");
        if (!n.isObject() || history.isEmpty()) {
            return new RevisionContext(history, Optional.empty(), null);
        }
        List<List<Change>> groups = new ArrayList<>();
        for (String group : GROUPS) {
            List<Change> changes = new ArrayList<>();
            n.get(group).forEach(c -> changes.add(new Change(c.get("what").asText(), text(c.get("before")),
                    text(c.get("after")))));
            groups.add(changes);
        }
        String since = n.get("since").asText();
        RevisionDiff diff = new RevisionDiff(since, "this revision", groups.get(0), groups.get(1), groups.get(2),
                groups.get(3));
        return new RevisionContext(history, Optional.of(diff), since);
    }

    private static String text(JsonNode n) {
        return n == null || n.isNull() ? null : n.asText();
    }
}
