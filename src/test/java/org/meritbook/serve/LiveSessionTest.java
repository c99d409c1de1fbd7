package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.net.InetSocketAddress;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.dossier.DossierRenderer;

/** {@code meritbook serve} in-process on a temporary copy of the demo study, on a free loopback port. */
class LiveSessionTest {
    private static final String NAME = "hmf-honey-validation";
    private static final ObjectMapper JSON = new ObjectMapper();
    /**
     * Every wait is bounded: a condition not met by then fails the test. Generous, since the demo (every
     * kind, an 80-page dossier) runs cold in a few seconds but far slower on a loaded machine.
     */
    private static final Duration WAIT = Duration.ofSeconds(90);

    @TempDir
    Path dir;
    private Path notebook;
    private LiveSession session;
    private HttpClient client;

    @BeforeEach
    void start() throws IOException {
        notebook = dir.resolve(NAME + ".md");
        Files.copy(Path.of("demo-data", NAME + ".md"), notebook);
        Files.copy(Path.of("demo-data", NAME + ".xlsx"), dir.resolve(NAME + ".xlsx"));
        session = LiveSession.start(notebook, 0, new DossierRenderer(Optional.empty()), s -> { });
        client = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
    }

    @AfterEach
    void stop() throws IOException {
        int port = session.server().address().getPort();
        session.close();
        List<String> left = Thread.getAllStackTraces().keySet().stream()
                .filter(Thread::isAlive).map(Thread::getName).filter(n -> n.startsWith("meritbook-live")).toList();
        assertEquals(List.of(), left, "threads left running");
        // The port is free again.
        try (ServerSocket again = new ServerSocket()) {
            again.bind(new InetSocketAddress(session.server().address().getAddress(), port));
        }
    }

    @Test
    void theFirstRunIsServedAsPageStatusDossierAndResults() throws Exception {
        JsonNode status = awaitStatus(s -> s.get("state").asText().equals("ok"));
        assertEquals(1, status.get("run").asInt());
        assertEquals(1, status.get("revision").asInt());
        assertEquals(0, status.get("problems").size());
        assertTrue(status.get("elapsed_ms").isIntegralNumber());

        HttpResponse<String> page = get("/");
        assertEquals(200, page.statusCode());
        assertTrue(page.headers().firstValue("Content-Type").orElse("").startsWith("text/html"));
        assertTrue(page.body().contains("src=\"/live.js\""), "the page loads its script");
        // The page is static: user text reaches it only through /status, as text.
        assertFalse(page.body().contains("HMF"), "no notebook text inside the page's HTML");

        HttpResponse<String> dossier = get("/dossier");
        assertEquals(200, dossier.statusCode());
        assertTrue(dossier.body().contains("Validation of 5-hydroxymethylfurfural (HMF) in honey by HPLC-DAD"), "title");

        JsonNode results = JSON.readTree(get("/results.json").body());
        assertTrue(results.get("sections").size() >= 1, "sections");
        assertEquals("1/y^2 (chosen by auto)", results.get("sections").get(0).get("settings").get("Weighting").asText());
    }

    @Test
    void anEditedNotebookIsRunAgain() throws Exception {
        int first = awaitStatus(s -> s.get("state").asText().equals("ok")).get("run").asInt();
        String text = Files.readString(notebook);
        save(text.replaceFirst("\nweighting: auto\n", "\nweighting: none\n"));

        JsonNode status = awaitStatus(s -> s.get("state").asText().equals("ok") && s.get("run").asInt() > first
                && weighting().equals("none"));
        assertTrue(status.get("dossier_run").asInt() > first);
        assertEquals("none", weighting());
    }

    @Test
    void theQuantitiesAReRunMovedAreListedWithOldAndNewValue() throws Exception {
        JsonNode first = awaitStatus(s -> s.get("state").asText().equals("ok"));
        assertEquals(0, first.get("changes").get("since_run").asInt());
        assertEquals(0, first.get("changes").get("results").size(), "nothing to compare the first run with");
        Map<String, String> before = values(JSON.readTree(get("/results.json").body()));
        // The first cell's weighting line, whatever the demo chooses there, becomes an unweighted fit.
        save(Files.readString(notebook).replaceFirst("\nweighting: (?!none\n)[^\n]+\n", "\nweighting: none\n"));
        JsonNode status = awaitStatus(s -> s.get("state").asText().equals("ok") && s.get("dossier_run").asInt() > 1);
        Map<String, String> after = values(JSON.readTree(get("/results.json").body()));

        assertEquals(1, status.get("changes").get("since_run").asInt());
        Map<String, String[]> listed = new LinkedHashMap<>();
        for (JsonNode c : status.get("changes").get("results")) {
            listed.put(c.get("section").asText() + "." + c.get("name").asText(), new String[] {
                c.get("before").isNull() ? null : c.get("before").asText(), c.get("after").isNull() ? null : c.get("after").asText()});
        }
        Set<String> moved = new LinkedHashSet<>(before.keySet());
        moved.addAll(after.keySet());
        moved.removeIf(k -> Objects.equals(before.get(k), after.get(k)));
        assertEquals(moved, listed.keySet(), "exactly the quantities whose value changed");
        assertTrue(listed.containsKey("linearity.slope"), "another weighting moves the slope: " + listed.keySet());
        for (Map.Entry<String, String[]> e : listed.entrySet()) {
            assertTrue(e.getValue()[0] == null || e.getValue()[0].startsWith(before.get(e.getKey())), e.getKey());
            assertTrue(e.getValue()[1] == null || e.getValue()[1].startsWith(after.get(e.getKey())), e.getKey());
        }
    }

    /** section.quantity to its value as results.json writes it. */
    private static Map<String, String> values(JsonNode results) {
        Map<String, String> out = new LinkedHashMap<>();
        for (JsonNode section : results.get("sections")) {
            section.get("quantities").fields().forEachRemaining(
                    q -> out.put(section.get("id").asText() + "." + q.getKey(), q.getValue().get("value").asText()));
        }
        return out;
    }

    @Test
    void aBrokenNotebookIsReportedWhileTheLastGoodDossierStaysServed() throws Exception {
        awaitStatus(s -> s.get("state").asText().equals("ok"));
        String good = get("/dossier").body();
        String text = Files.readString(notebook);
        List<String> lines = List.of(text.split("\n", -1));
        int weightingLine = lines.indexOf("weighting: auto") + 1;
        save(text.replaceFirst("weighting: auto\n", "weighting: auto\nsmoothing: yes\n"));

        JsonNode broken = awaitStatus(s -> s.get("state").asText().equals("error"));
        JsonNode problem = broken.get("problems").get(0);
        assertEquals("UNKNOWN_OPTION", problem.get("key").asText());
        assertEquals(NAME + ".md line " + (weightingLine + 1), problem.get("where").asText());
        assertTrue(problem.get("message").asText().contains("smoothing"));
        assertEquals(good, get("/dossier").body(), "the last good dossier is still served");
        assertEquals(1, broken.get("dossier_run").asInt());

        save(text);
        JsonNode fixed = awaitStatus(s -> s.get("state").asText().equals("ok"));
        assertEquals(0, fixed.get("problems").size());
        assertTrue(fixed.get("run").asInt() > broken.get("run").asInt());
    }

    @Test
    void aChangedWorkbookIsRunAgainAndEveryDeclaredFileIsWatched() throws Exception {
        int first = awaitStatus(s -> s.get("state").asText().equals("ok")).get("run").asInt();
        assertTrue(session.watched().contains(notebook.toAbsolutePath().normalize()));
        Path workbook = dir.resolve(NAME + ".xlsx").toAbsolutePath().normalize();
        assertTrue(session.watched().contains(workbook));

        // Saved the way spreadsheet programs do: a new file renamed over the old one.
        Path temporary = dir.resolve("~$saving.tmp");
        Files.copy(workbook, temporary);
        Files.move(temporary, workbook, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        awaitStatus(s -> s.get("state").asText().equals("ok") && s.get("run").asInt() > first);
    }

    @Test
    void aSourceDeclaredByAnEditIsWatchedToo() throws Exception {
        awaitStatus(s -> s.get("state").asText().equals("ok"));
        Path folder = Files.createDirectories(dir.resolve("more"));
        Path extra = Files.copy(dir.resolve(NAME + ".xlsx"), folder.resolve("second.xlsx"));
        save(Files.readString(notebook).replaceFirst("  lab: " + NAME + ".xlsx\n", "  lab: " + NAME + ".xlsx\n  extra: more/second.xlsx\n"));
        Path expected = extra.toAbsolutePath().normalize();
        awaitStatus(s -> session.watched().contains(expected));
        int before = awaitStatus(s -> s.get("state").asText().equals("ok")).get("run").asInt();

        Files.write(extra, Files.readAllBytes(extra));
        awaitStatus(s -> s.get("run").asInt() > before && s.get("state").asText().equals("ok"));
    }

    @Test
    void theServerAnswersOnTheLoopbackAddressOnly() throws Exception {
        assertTrue(session.server().address().getAddress().isLoopbackAddress());
        assertEquals("127.0.0.1", session.server().address().getAddress().getHostAddress());
        assertEquals("127.0.0.1", session.uri().getHost());
        // A request naming another host (as a rebinding page would) is refused.
        assertEquals(403, rawStatus("/status", "example.invalid"));
        assertEquals(200, rawStatus("/status", "localhost:" + session.server().address().getPort()));
        assertEquals(404, get("/elsewhere").statusCode());
        HttpRequest post = HttpRequest.newBuilder(session.uri().resolve("/status"))
                .POST(HttpRequest.BodyPublishers.ofString("{}")).timeout(WAIT).build();
        assertEquals(405, client.send(post, HttpResponse.BodyHandlers.discarding()).statusCode());
    }

    @Test
    void everyRequestNeedsTheTokenAsQueryOrCookie() throws Exception {
        awaitStatus(s -> s.get("state").asText().equals("ok"));
        String token = session.uri().getRawQuery().substring("token=".length());
        assertTrue(token.matches("[A-Za-z0-9_-]{43}"), "32 random bytes, URL-safe Base64: " + token);
        for (String path : List.of("/", "/status", "/dossier", "/results.json", "/live.js", "/elsewhere")) {
            HttpResponse<String> bare = client.send(HttpRequest.newBuilder(session.uri().resolve(path)).timeout(WAIT).build(),
                    HttpResponse.BodyHandlers.ofString());
            assertEquals(403, bare.statusCode(), path + " without the token");
            assertFalse(bare.body().contains("HMF") || bare.body().contains(token), path + " shows nothing of the study");
            HttpResponse<String> wrong = client.send(HttpRequest.newBuilder(URI.create(session.uri().resolve(path)
                    + "?token=" + token.substring(1) + "x")).timeout(WAIT).build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(403, wrong.statusCode(), path + " with a wrong token");
        }
        assertFalse(get("/dossier").headers().firstValue("Set-Cookie").isEmpty(), "a tokened answer sets the cookie");
        String cookie = get("/").headers().firstValue("Set-Cookie").orElseThrow();
        assertTrue(cookie.contains("HttpOnly") && cookie.contains("SameSite=Strict") && cookie.contains("Path=/"), cookie);
        String pair = cookie.substring(0, cookie.indexOf(';'));
        HttpResponse<String> byCookie = client.send(HttpRequest.newBuilder(session.uri().resolve("/dossier"))
                .header("Cookie", pair).timeout(WAIT).build(), HttpResponse.BodyHandlers.ofString());
        assertEquals(200, byCookie.statusCode());
        assertTrue(byCookie.body().contains("HMF"));
        HttpResponse<String> badCookie = client.send(HttpRequest.newBuilder(session.uri().resolve("/status"))
                .header("Cookie", pair + "x").timeout(WAIT).build(), HttpResponse.BodyHandlers.ofString());
        assertEquals(403, badCookie.statusCode());
    }

    @Test
    void aFailingCriterionIsCountedInTheStatus() throws Exception {
        JsonNode demo = awaitStatus(s -> s.get("state").asText().equals("ok")).get("verdicts");
        int judged = demo.get("passed").asInt() + demo.get("failed").asInt() + demo.get("not_evaluable").asInt();
        assertTrue(judged > 0, "the demo's profile judges something: " + demo);
        // Only reporting cells count, as in the dossier's summary: the demo's unweighted check is supporting.
        int calibrations = 0;
        for (JsonNode section : JSON.readTree(get("/results.json").body()).get("sections")) {
            boolean reporting = section.get("kind").asText().equals("calibration")
                    && section.get("role").asText().equals("reporting");
            calibrations += reporting ? 1 : 0;
        }
        // r² <= 1 always and is below 1 for real data, so 'at least 1' fails and 'at least 0' passes, once per calibration.
        Files.writeString(dir.resolve("impossible.yaml"), "name: impossible linearity\nrules:\n"
                + "  - quantity: r_squared\n    at-least: 1\n    characteristic: Linearity\n"
                + "  - quantity: r_squared\n    at-least: 0\n    characteristic: Linearity floor\n");
        save(Files.readString(notebook).replaceFirst("criteria: linearity-basic\n", "criteria: impossible.yaml\n"));
        JsonNode verdicts = awaitStatus(s -> s.get("state").asText().equals("ok")
                && s.get("verdicts").get("failed").asInt() > 0).get("verdicts");
        assertTrue(calibrations >= 1, "the demo has a calibration");
        assertEquals(calibrations, verdicts.get("failed").asInt(), verdicts.toString());
        assertEquals(calibrations, verdicts.get("passed").asInt(), verdicts.toString());
        assertEquals(0, verdicts.get("not_evaluable").asInt());
        assertEquals("fail", verdicts.get("level").asText());
        assertTrue(verdicts.get("warnings").asInt() >= 0);
    }

    /** Host is a restricted header for HttpClient; a raw socket sends it as a browser page could. */
    private int rawStatus(String path, String host) throws IOException {
        InetSocketAddress address = session.server().address();
        try (java.net.Socket socket = new java.net.Socket(address.getAddress(), address.getPort())) {
            socket.setSoTimeout((int) WAIT.toMillis());
            String head = "GET " + path + "?" + session.uri().getRawQuery() + " HTTP/1.1\r\nHost: " + host + "\r\nConnection: close\r\n\r\n";
            socket.getOutputStream().write(head.getBytes(StandardCharsets.US_ASCII));
            String statusLine = new String(socket.getInputStream().readNBytes(12), StandardCharsets.US_ASCII);
            return Integer.parseInt(statusLine.substring(9, 12));
        }
    }

    private void save(String text) throws IOException {
        // Written to a temporary file and renamed into place, as many editors save.
        Path temporary = dir.resolve("." + NAME + ".md.swp");
        Files.writeString(temporary, text, StandardCharsets.UTF_8);
        Files.move(temporary, notebook, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

    private String weighting() throws Exception {
        HttpResponse<String> r = get("/results.json");
        return r.statusCode() != 200 ? "" : JSON.readTree(r.body()).get("sections").get(0).get("settings").get("Weighting").asText();
    }

    /** A condition on /status that may itself ask the server. */
    private interface Condition {
        boolean test(JsonNode status) throws Exception;
    }

    private JsonNode awaitStatus(Condition condition) throws Exception {
        long deadline = System.nanoTime() + WAIT.toNanos();
        JsonNode last = null;
        while (System.nanoTime() < deadline) {
            last = JSON.readTree(get("/status").body());
            if (condition.test(last)) {
                return last;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("status did not reach the expected state within " + WAIT.toSeconds() + " s; last: " + last);
    }

    private HttpResponse<String> get(String path) throws Exception {
        URI uri = URI.create(session.uri().resolve(path) + "?" + session.uri().getRawQuery());
        return client.send(HttpRequest.newBuilder(uri).timeout(WAIT).build(), HttpResponse.BodyHandlers.ofString());
    }
}
