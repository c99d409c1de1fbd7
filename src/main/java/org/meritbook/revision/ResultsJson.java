package org.meritbook.revision;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Setting;
import org.meritbook.criteria.AcceptanceProfile;
import org.meritbook.criteria.Rule;
import org.meritbook.analysis.Verdict;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.FrontMatter;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;
import org.meritbook.pipeline.InputFile;

/**
 * Writes results.json, the stable machine-readable record of a run (schema in docs/results.md).
 * Numbers are written at full double precision (shortest round-trip form); key order is fixed,
 * so the same results give the same bytes.
 */
public final class ResultsJson {
    /** Bumped only when a field is renamed or removed; additions keep the version. */
    public static final String SCHEMA = "meritbook-results/1";

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ResultsJson() {
    }

    public static byte[] toBytes(StudyResults results) {
        return toBytes(results, List.of());
    }

    /** With the earlier revisions' history, so each revision's results carry the whole chain. */
    public static byte[] toBytes(StudyResults results, List<RevisionEntry> earlier) {
        return toBytes(results, new RevisionContext(earlier, java.util.Optional.empty(), null));
    }

    /**
     * With the earlier revisions' history and the changes since the latest of them, exactly as the
     * dossier shows them (so that the dossier can be rendered again from its attachments).
     */
    public static byte[] toBytes(StudyResults results, RevisionContext revisions) {
        ObjectNode tree = toTree(results);
        ArrayNode history = MAPPER.createArrayNode();
        for (RevisionEntry e : revisions.earlier()) {
            history.addObject().put("revision", e.revision()).put("date", e.date()).put("reason", e.reason())
                    .put("prepared_by", e.preparedBy());
        }
        ((ObjectNode) tree.get("study")).set("history", history);
        ((ObjectNode) tree.get("study")).set("changes", RecordedChanges.toJson(revisions));
        try {
            String text = MAPPER.writeValueAsString(tree) + "\n";
            return text.getBytes(StandardCharsets.UTF_8);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("results tree could not be serialised", e);
        }
    }

    public static ObjectNode toTree(StudyResults results) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("schema", SCHEMA);
        root.set("study", study(results));
        ArrayNode inputs = root.putArray("inputs");
        for (InputFile f : results.inputs()) {
            ObjectNode n = inputs.addObject();
            n.put("alias", f.alias());
            n.put("path", f.path());
            n.put("sha256", f.sha256());
            n.put("bytes", f.bytes());
            ArrayNode ranges = n.putArray("ranges");
            f.ranges().forEach(ranges::add);
            n.put("saved_on", f.savedOn());
        }
        ArrayNode sections = root.putArray("sections");
        for (SectionResult s : results.sections()) {
            sections.add(section(s, results.supporting(s)));
        }
        ArrayNode trail = root.putArray("trail");
        for (SectionResult s : results.sections()) {
            for (Step step : s.steps()) {
                trail.add(step(s.id(), step));
            }
        }
        ArrayNode software = root.putArray("software");
        results.software().forEach(c -> software.addObject().put("name", c.name()).put("version", c.version()));
        return root;
    }

    /** The earlier revisions a results tree records, oldest first (none for results without history). */
    static List<RevisionEntry> history(JsonNode results) {
        List<RevisionEntry> out = new java.util.ArrayList<>();
        for (JsonNode h : results.path("study").path("history")) {
            out.add(new RevisionEntry(h.get("revision").asInt(), text(h.get("date")), text(h.get("reason")),
                    text(h.get("prepared_by"))));
        }
        return out;
    }

    /** The revision a results tree itself records. */
    static RevisionEntry entry(JsonNode results) {
        JsonNode fm = results.get("study").get("front_matter");
        return new RevisionEntry(results.get("study").get("revision").asInt(), text(fm.get("date")),
                text(fm.get("revision-reason")), text(fm.get("prepared-by")));
    }

    private static String text(JsonNode n) {
        return n == null || n.isNull() ? null : n.asText();
    }

    private static ObjectNode study(StudyResults results) {
        FrontMatter fm = results.study().frontMatter();
        ObjectNode n = MAPPER.createObjectNode();
        n.put("file", results.study().file().getFileName().toString());
        n.put("title", fm.title());
        n.put("revision", fm.revision());
        n.set("front_matter", MAPPER.valueToTree(fm.all()));
        AcceptanceProfile profile = results.acceptance();
        if (profile != null) {
            ObjectNode a = n.putObject("acceptance");
            a.put("name", profile.name()).put("origin", profile.origin()).put("description", profile.description())
                    .put("compare", profile.comparison().word());
            ArrayNode rules = a.putArray("rules");
            for (Rule rule : profile.rules()) {
                rules.addObject().put("rule", rule.text()).put("source", rule.source());
            }
        }
        ArrayNode warnings = n.putArray("warnings");
        results.warnings().forEach(warnings::add);
        return n;
    }

    private static ObjectNode section(SectionResult s, boolean supporting) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("id", s.id());
        n.put("kind", s.kind().keyword());
        n.put("title", s.title());
        // supporting: judged, but its verdicts do not count towards the study's outcome.
        n.put("role", supporting ? AnalysisCell.SUPPORTING : AnalysisCell.REPORTING);
        ObjectNode settings = n.putObject("settings");
        for (Setting setting : s.settings()) {
            settings.put(setting.label(), setting.value());
        }
        ObjectNode quantities = n.putObject("quantities");
        for (Quantity q : s.quantities()) {
            ObjectNode qn = quantities.putObject(q.name());
            qn.put("value", q.value());
            qn.put("unit", q.unit());
            qn.put("label", q.label());
            qn.put("step", q.stepId());
            qn.put("summary", q.summary());
            if (q.interval() != null) {
                qn.putObject("ci").put("low", q.interval().low()).put("high", q.interval().high())
                        .put("level", q.interval().level());
            }
        }
        ArrayNode verdicts = n.putArray("verdicts");
        for (Verdict v : s.verdicts()) {
            verdicts.addObject().put("characteristic", v.characteristic()).put("quantity", v.quantity())
                    .put("rule", v.rule()).put("outcome", v.outcome().name().toLowerCase(java.util.Locale.ROOT))
                    .put("reason", v.reason());
        }
        ArrayNode warnings = n.putArray("warnings");
        s.warnings().forEach(warnings::add);
        return n;
    }

    private static ObjectNode step(String sectionId, Step step) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("id", step.id());
        n.put("section", sectionId);
        n.put("label", step.label());
        n.put("formula", step.formula());
        ArrayNode inputs = n.putArray("inputs");
        for (StepInput in : step.inputs()) {
            ObjectNode i = inputs.addObject();
            i.put("name", in.name());
            if (in.text() != null) {
                i.put("text", in.text());
            } else {
                i.put("value", in.value());
            }
            i.put("unit", in.unit());
            i.put("source", in.source());
        }
        n.put("value", step.value());
        n.put("unit", step.unit());
        n.put("method", step.method());
        return n;
    }
}
