package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.Problem;
import org.meritbook.revision.RevisionDiff;

/** /status carries user text as JSON strings, exactly, whatever characters it holds. */
class StatusJsonTest {
    @Test
    void userTextInAProblemRoundTripsAsAStringAndIsNeverRaw() throws Exception {
        String hostile = "</script><img src=x onerror=alert(1)> \"quoted\" \\ \u2028 line";
        Problem p = new Problem(ErrorKey.NOT_A_NUMBER, "runs.xlsx, Cal!B4", "a number", "'" + hostile + "'", "Enter the value.");
        Snapshot s = new Snapshot(3, Snapshot.State.ERROR, List.of(ShownProblem.of(p)), 812, Instant.parse("2026-11-20T10:15:30Z"),
                new Snapshot.Issued(2, "Study <b>", 4, new byte[0], new byte[0], new Outcome(3, 1, 2, 5), 1,
                        List.of(new RevisionDiff.Change("cal.slope", "1.5", "1.625"), new RevisionDiff.Change("cal.lod", null, "0.2 mg/L")),
                        new PointIndex(java.util.Map.of()), Instant.parse("2026-11-20T10:15:29Z")));

        byte[] bytes = StatusJson.of(s, "study.md");
        JsonNode status = new ObjectMapper().readTree(bytes);

        assertEquals(3, status.get("run").asInt());
        assertEquals("error", status.get("state").asText());
        assertEquals(812, status.get("elapsed_ms").asLong());
        assertEquals(4, status.get("revision").asInt());
        assertEquals(2, status.get("dossier_run").asInt());
        assertEquals("2026-11-20T10:15:30Z", status.get("finished_at").asText());
        JsonNode verdicts = status.get("verdicts");
        assertEquals(3, verdicts.get("passed").asInt());
        assertEquals(1, verdicts.get("failed").asInt());
        assertEquals(2, verdicts.get("not_evaluable").asInt());
        assertEquals(5, verdicts.get("warnings").asInt());
        assertEquals("fail", verdicts.get("level").asText());
        assertEquals(1, status.get("changes").get("since_run").asInt());
        JsonNode slope = status.get("changes").get("results").get(0);
        assertEquals("cal", slope.get("section").asText());
        assertEquals("slope", slope.get("name").asText());
        assertEquals("1.5", slope.get("before").asText());
        assertEquals("1.625", slope.get("after").asText());
        assertTrue(status.get("changes").get("results").get(1).get("before").isNull(), "added: no old value");
        JsonNode problem = status.get("problems").get(0);
        assertEquals("NOT_A_NUMBER", problem.get("key").asText());
        assertEquals("runs.xlsx, Cal!B4", problem.get("where").asText());
        assertEquals("'" + hostile + "'", problem.get("found").asText());
        assertEquals(p.message(), problem.get("message").asText());
    }

    @Test
    void beforeTheFirstRunNothingIsClaimed() throws Exception {
        JsonNode status = new ObjectMapper().readTree(StatusJson.of(Snapshot.initial(), "study.md"));
        assertEquals(0, status.get("run").asInt());
        assertEquals("running", status.get("state").asText());
        assertTrue(status.get("elapsed_ms").isNull());
        assertTrue(status.get("revision").isNull());
        assertEquals(0, status.get("dossier_run").asInt());
        assertTrue(status.get("verdicts").isNull(), "no outcome before a run succeeds");
    }

    @Test
    void theLevelIsFailOnAnyFailureThenAttentionOnAnyDoubtElseClear() {
        assertEquals(Outcome.Level.FAIL, new Outcome(9, 1, 0, 0).level());
        assertEquals(Outcome.Level.FAIL, new Outcome(0, 1, 4, 4).level());
        assertEquals(Outcome.Level.ATTENTION, new Outcome(9, 0, 1, 0).level());
        assertEquals(Outcome.Level.ATTENTION, new Outcome(9, 0, 0, 1).level());
        assertEquals(Outcome.Level.CLEAR, new Outcome(9, 0, 0, 0).level());
        assertEquals(Outcome.Level.CLEAR, new Outcome(0, 0, 0, 0).level());
    }
}
