package org.meritbook.revision;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.dossier.DossierFixtures;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;

/** A received results.json: every field checked, every deviation located by its JSON path. */
class ReceivedResultsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static byte[] written;

    @BeforeAll
    static void writeResults(@TempDir Path dir) {
        written = ResultsJson.toBytes(DossierFixtures.results(dir));
    }

    private static byte[] altered(Consumer<ObjectNode> change) throws Exception {
        ObjectNode tree = (ObjectNode) JSON.readTree(written);
        change.accept(tree);
        return JSON.writeValueAsBytes(tree);
    }

    private static List<Problem> problems(byte[] bytes) {
        InputException e = assertThrows(InputException.class, () -> ReceivedResults.parse(bytes, "results.json"));
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        return e.problems();
    }

    @Test
    void whatMeritbookWroteIsAccepted() {
        assertEquals("meritbook-results/1", ReceivedResults.parse(written, "results.json").get("schema").asText());
    }

    @Test
    void aRemovedFieldIsNamedByItsPath() throws Exception {
        List<Problem> p = problems(altered(t -> ((ObjectNode) t.get("sections").get(0).get("quantities")
                .get("slope")).remove("value")));
        assertEquals(1, p.size(), p.toString());
        assertEquals("results.json, at $.sections[0].quantities.slope.value: expected the field 'value' but found "
                + "nothing (the field is missing). The results were altered or written by another program; use the "
                + "results.json that meritbook run wrote, or the dossier that carries it.", p.get(0).message());
    }

    @Test
    void aWrongTypeIsNamedWithWhatWasFound() throws Exception {
        List<Problem> p = problems(altered(t -> {
            ((ObjectNode) t.get("inputs").get(1)).put("sha256", 12);
            ((ObjectNode) t.get("study")).put("revision", "two");
            ((ObjectNode) t.get("sections").get(0).get("quantities").get("slope")).put("value", "41.7");
            t.put("trail", "none");
        }));
        List<String> where = p.stream().map(x -> x.where() + " | " + x.expected() + " | " + x.found()).toList();
        assertEquals(List.of(
                "results.json, at $.study.revision | a whole number | the text \"two\"",
                "results.json, at $.inputs[1].sha256 | a text | the number 12",
                "results.json, at $.sections[0].quantities.slope.value | a number | the text \"41.7\"",
                "results.json, at $.trail | an array | the text \"none\""), where);
    }

    @Test
    void namesWithColonsAreQuotedInThePath() throws Exception {
        List<Problem> p = problems(altered(t -> {
            ObjectNode q = (ObjectNode) t.get("sections").get(0).get("quantities");
            q.put("back_calculated:C7", true);
        }));
        assertEquals("results.json, at $.sections[0].quantities[\"back_calculated:C7\"]", p.get(0).where());
    }

    @Test
    void aManifestAliasThatIsAPathIsRefused() throws Exception {
        List<Problem> p = problems(altered(t -> ((ObjectNode) t.get("inputs").get(1)).put("alias", "../../escape")));
        assertEquals("results.json, at $.inputs[1].alias", p.get(0).where());
    }

    @Test
    void textThatIsNotJsonOrAnotherSchemaIsOneProblem() throws Exception {
        assertEquals(1, problems("{\"schema\": ".getBytes(java.nio.charset.StandardCharsets.UTF_8)).size());
        List<Problem> p = problems(altered(t -> t.put("schema", "meritbook-results/9")));
        assertEquals("results.json, at $.schema: expected 'meritbook-results/1' but found the text "
                + "\"meritbook-results/9\". Read it with the meritbook version that wrote it.", p.get(0).message());
    }
}
