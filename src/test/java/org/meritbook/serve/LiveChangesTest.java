package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.net.InetSocketAddress;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.dossier.DossierRenderer;

/**
 * The changes the page may ask for, over HTTP as a browser sends them: POST only, the token, the
 * server's own origin; the notebook rewritten with a backup and the workbook untouched; and the
 * server serving nothing but its own routes, whatever path is asked.
 */
class LiveChangesTest {
    private static final String NAME = "hmf-honey-validation";
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Duration WAIT = Duration.ofSeconds(90);

    @TempDir
    Path dir;
    private Path notebook;
    private LiveSession session;
    private HttpClient client;
    private String cookie;

    @BeforeEach
    void start() throws Exception {
        notebook = dir.resolve(NAME + ".md");
        Files.copy(Path.of("demo-data", NAME + ".md"), notebook);
        Files.copy(Path.of("demo-data", NAME + ".xlsx"), dir.resolve(NAME + ".xlsx"));
        session = LiveSession.start(notebook, 0, new DossierRenderer(Optional.empty()), s -> { });
        client = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
        HttpResponse<String> page = client.send(HttpRequest.newBuilder(session.uri()).timeout(WAIT).build(),
                HttpResponse.BodyHandlers.ofString());
        String set = page.headers().firstValue("Set-Cookie").orElseThrow();
        cookie = set.substring(0, set.indexOf(';'));
    }

    @AfterEach
    void stop() {
        session.close();
    }

    private String origin() {
        return "http://127.0.0.1:" + session.server().address().getPort();
    }

    @Test
    void aPostFromAnotherOriginOrWithoutOriginIsRefusedAndWritesNothing() throws Exception {
        JsonNode status = awaitStatus(s -> s.get("state").asText().equals("ok"));
        String body = "{\"run\":" + status.get("dossier_run").asInt()
                + ",\"section\":\"linearity\",\"address\":\"Calibration!D9\",\"reason\":\"test\"}";
        byte[] before = Files.readAllBytes(notebook);
        for (String foreign : List.of("http://evil.example", "http://127.0.0.1:1", "null", "http://localhost.evil.example")) {
            HttpResponse<String> r = post("/exclude", body, foreign, cookie);
            assertEquals(403, r.statusCode(), "Origin " + foreign);
        }
        assertEquals(403, post("/exclude", body, null, cookie).statusCode(), "neither Origin nor Referer");
        assertEquals(403, post("/issue", "{\"reason\":\"x\"}", "http://evil.example", cookie).statusCode());
        assertEquals(403, post("/exclude", body, origin(), null).statusCode(), "the token is required too");
        HttpResponse<String> get = client.send(HttpRequest.newBuilder(URI.create(origin() + "/exclude"))
                .header("Cookie", cookie).timeout(WAIT).build(), HttpResponse.BodyHandlers.ofString());
        assertEquals(405, get.statusCode(), "a change is never a GET");
        assertEquals(415, post("/exclude", "run=1", origin(), cookie, "application/x-www-form-urlencoded").statusCode(),
                "only JSON, which a plain cross-site form cannot send");
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(notebook)), "the notebook is unchanged");
        try (var files = Files.list(dir)) {
            assertFalse(files.anyMatch(p -> p.getFileName().toString().contains(".~")), "no backup made");
        }
    }

    @Test
    void excludingAndRestoringRewriteTheNotebookWithBackupsAndMoveTheSlope() throws Exception {
        JsonNode status = awaitStatus(s -> s.get("state").asText().equals("ok"));
        byte[] workbook = Files.readAllBytes(dir.resolve(NAME + ".xlsx"));
        String original = Files.readString(notebook);
        double slope = slope();
        int run = status.get("dossier_run").asInt();

        HttpResponse<String> refused = post("/exclude", "{\"run\":" + run
                + ",\"section\":\"linearity\",\"address\":\"Calibration!E9\",\"reason\":\"RT\"}", origin(), cookie);
        assertEquals(409, refused.statusCode(), "RT is not read by the calibration");
        assertTrue(refused.body().contains("not a value the statistics of cell 'linearity' use"), refused.body());
        HttpResponse<String> noReason = post("/exclude", "{\"run\":" + run
                + ",\"section\":\"linearity\",\"address\":\"Calibration!D9\",\"reason\":\" \"}", origin(), cookie);
        assertEquals(400, noReason.statusCode());
        HttpResponse<String> stale = post("/exclude", "{\"run\":" + (run + 7)
                + ",\"section\":\"linearity\",\"address\":\"Calibration!D9\",\"reason\":\"x\"}", origin(), cookie);
        assertEquals(409, stale.statusCode(), "a request about another run than the one shown");

        HttpResponse<String> ok = post("/exclude", "{\"run\":" + run + ",\"section\":\"linearity\",\"address\":"
                + "\"Calibration!D9\",\"reason\":\"Integration started late\",\"by\":\"A. Analyst\",\"on\":\"2026-11-20\"}",
                origin(), cookie);
        assertEquals(200, ok.statusCode(), ok.body());
        String excluded = Files.readString(notebook);
        assertTrue(excluded.contains("  - cell: \"Calibration!D9\"\n    reason: \"Integration started late\"\n"
                + "    by: \"A. Analyst\"\n    on: \"2026-11-20\"\n"), excluded);
        assertEquals(original, Files.readString(dir.resolve(NAME + ".md.~1~")), "the previous notebook is kept");
        JsonNode after = awaitStatus(s -> s.get("state").asText().equals("ok") && s.get("dossier_run").asInt() > run);
        assertTrue(slope() != slope, "the slope moved");

        HttpResponse<String> restored = post("/restore", "{\"run\":" + after.get("dossier_run").asInt()
                + ",\"section\":\"linearity\",\"address\":\"Calibration!C9\"}", origin(), cookie);
        assertEquals(200, restored.statusCode(), restored.body());
        assertEquals(original, Files.readString(notebook), "restoring gives back the notebook as it was");
        assertEquals(excluded, Files.readString(dir.resolve(NAME + ".md.~2~")), "and keeps the excluded one");
        assertEquals(original, Files.readString(dir.resolve(NAME + ".md.~1~")), "a backup is never overwritten");
        awaitStatus(s -> s.get("state").asText().equals("ok") && s.get("dossier_run").asInt() > after.get("dossier_run").asInt());
        assertEquals(slope, slope(), 0.0, "the slope is back, bit for bit");
        assertTrue(java.util.Arrays.equals(workbook, Files.readAllBytes(dir.resolve(NAME + ".xlsx"))), "the workbook is never written");
    }

    @Test
    void onlyTheServersOwnRoutesAreServedWhateverPathIsAsked() throws Exception {
        Files.writeString(dir.resolve("secret.txt"), "lab secret");
        Files.createSymbolicLink(dir.resolve("outside"), Path.of("/etc"));
        for (String path : List.of("/../../../../etc/passwd", "/%2e%2e/%2e%2e/%2e%2e/etc/passwd", "/..%2f..%2fetc%2fpasswd",
                "//etc/passwd", "/etc/passwd", "/dossier/../../secret.txt", "/secret.txt", "/outside/passwd",
                "/" + NAME + ".md", "/" + NAME + ".xlsx", "/dossier/..%2f" + NAME + ".md", "/live.js/../secret.txt",
                "http://127.0.0.1/etc/passwd")) {
            String answer = raw("GET " + path + " HTTP/1.1");
            int code = Integer.parseInt(answer.substring(9, 12));
            assertTrue(code == 404 || code == 400, path + " gives " + answer.substring(0, 12));
            assertFalse(answer.contains("root:") || answer.contains("lab secret") || answer.contains("exclude:"), path);
        }
        assertTrue(raw("GET /live.js HTTP/1.1").startsWith("HTTP/1.1 200"), "the page's own assets are served");
    }

    private String raw(String requestLine) throws IOException {
        InetSocketAddress address = session.server().address();
        try (java.net.Socket socket = new java.net.Socket(address.getAddress(), address.getPort())) {
            socket.setSoTimeout((int) WAIT.toMillis());
            String head = requestLine + "\r\nHost: 127.0.0.1:" + address.getPort() + "\r\nCookie: " + cookie
                    + "\r\nConnection: close\r\n\r\n";
            socket.getOutputStream().write(head.getBytes(StandardCharsets.US_ASCII));
            return new String(socket.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private double slope() throws Exception {
        HttpResponse<String> r = client.send(HttpRequest.newBuilder(URI.create(origin() + "/results.json"))
                .header("Cookie", cookie).timeout(WAIT).build(), HttpResponse.BodyHandlers.ofString());
        return JSON.readTree(r.body()).get("sections").get(0).get("quantities").get("slope").get("value").asDouble();
    }

    private HttpResponse<String> post(String path, String body, String origin, String withCookie) throws Exception {
        return post(path, body, origin, withCookie, "application/json");
    }

    private HttpResponse<String> post(String path, String body, String origin, String withCookie, String type) throws Exception {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(origin() + path)).timeout(WAIT)
                .header("Content-Type", type).POST(HttpRequest.BodyPublishers.ofString(body));
        if (origin != null) {
            b.header("Origin", origin);
        }
        if (withCookie != null) {
            b.header("Cookie", withCookie);
        }
        return client.send(b.build(), HttpResponse.BodyHandlers.ofString());
    }

    private interface Condition {
        boolean test(JsonNode status) throws Exception;
    }

    private JsonNode awaitStatus(Condition condition) throws Exception {
        long deadline = System.nanoTime() + WAIT.toNanos();
        JsonNode last = null;
        while (System.nanoTime() < deadline) {
            HttpResponse<String> r = client.send(HttpRequest.newBuilder(URI.create(origin() + "/status"))
                    .header("Cookie", cookie).timeout(WAIT).build(), HttpResponse.BodyHandlers.ofString());
            last = JSON.readTree(r.body());
            if (condition.test(last)) {
                return last;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("status did not reach the expected state within " + WAIT.toSeconds() + " s; last: " + last);
    }
}
