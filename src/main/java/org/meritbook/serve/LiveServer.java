package org.meritbook.serve;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.sun.net.httpserver.Headers;
import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;
import java.io.IOException;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.SecureRandom;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.meritbook.publishing.PublishingSequence;

/**
 * The routes of the live preview, on the JDK's own HTTP server bound to 127.0.0.1 unless another
 * address is given explicitly: {@code /} the page, {@code /status} the state as JSON, {@code /dossier}
 * the latest good HTML dossier, {@code /results.json} its results (GET or HEAD); and the three
 * changes {@code /exclude}, {@code /restore}, {@code /issue} (POST only, JSON body, and only from the
 * server's own origin). Nothing else is served: no path is ever mapped to a file. Every request must
 * carry the session's random token, as {@code ?token=} (the printed address) or as the cookie the
 * first tokened answer sets, so another local user or a page in the browser that guesses the port
 * reads nothing.
 */
public final class LiveServer implements AutoCloseable {
    private static final String HTML = "text/html; charset=utf-8";
    private static final String JSON = "application/json; charset=utf-8";
    /** The page loads only its own script and style, and talks only to this server. */
    private static final String PAGE_POLICY = "default-src 'none'; script-src 'self'; style-src 'self'; connect-src 'self'; "
            + "frame-src 'self'; img-src 'self'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'";
    /** The dossier keeps its inline styles and images, runs no script, and may be framed by the page only. */
    private static final String DOSSIER_POLICY = "script-src 'none'; object-src 'none'; base-uri 'none'; frame-ancestors 'self'";

    /** A change request's body is a few short fields. */
    private static final int MAX_BODY = 16 * 1024;
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private final HttpServer server;
    private final ExecutorService executor;
    private final LiveStudy study;
    private final String token;
    private final InetAddress bound;
    private final PageActions actions;
    private final RevisionIssuer issuer;

    private LiveServer(HttpServer server, ExecutorService executor, LiveStudy study, String token, InetAddress bound,
                       PageActions actions, RevisionIssuer issuer) {
        this.server = server;
        this.executor = executor;
        this.study = study;
        this.token = token;
        this.bound = bound;
        this.actions = actions;
        this.issuer = issuer;
    }

    /** 32 random bytes, URL-safe Base64 without padding (43 characters). */
    static String newToken() {
        byte[] random = new byte[32];
        new SecureRandom().nextBytes(random);
        return Base64.getUrlEncoder().withoutPadding().encodeToString(random);
    }

    /** Binds 127.0.0.1:port (0 for any free port) and starts answering; issues into the notebook's folder's out/. */
    public static LiveServer start(int port, LiveStudy study) throws IOException {
        Path out = study.notebook().toAbsolutePath().getParent().resolve("out");
        return start(null, port, study, out, study.sequence());
    }

    /**
     * Binds {@code bind} (null: 127.0.0.1) and starts answering.
     *
     * @param out       where "Issue revision" publishes, as {@code meritbook run -o}
     * @param sequence  the publishing sequence "Issue revision" publishes with, the preview's own
     */
    static LiveServer start(InetAddress bind, int port, LiveStudy study, Path out, PublishingSequence sequence)
            throws IOException {
        InetAddress address = bind != null ? bind : InetAddress.getByAddress("localhost", new byte[] {127, 0, 0, 1});
        HttpServer server = HttpServer.create(new InetSocketAddress(address, port), 0);
        AtomicInteger count = new AtomicInteger();
        ExecutorService executor = Executors.newFixedThreadPool(2, r -> {
            Thread t = new Thread(r, "meritbook-live-http-" + count.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
        NotebookWriter writer = new NotebookWriter(study.notebook());
        RevisionIssuer issuer = new RevisionIssuer(study.notebook(), out, sequence, writer);
        LiveServer live = new LiveServer(server, executor, study, newToken(), bind,
                new PageActions(study, writer, issuer), issuer);
        server.createContext("/", live::handle);
        server.setExecutor(executor);
        server.start();
        return live;
    }

    public InetSocketAddress address() {
        return server.getAddress();
    }

    /** The address to open, token included. */
    public URI uri() {
        return URI.create(base() + "?token=" + token);
    }

    /** The server's root without the token (for messages that must not leak it). */
    public URI base() {
        return URI.create("http://" + (bound == null ? "127.0.0.1" : literal(bound)) + ":" + address().getPort() + "/");
    }

    /** An address as a URL writes it (IPv6 in brackets). */
    private static String literal(InetAddress a) {
        String h = a.getHostAddress();
        int zone = h.indexOf('%');
        h = zone < 0 ? h : h.substring(0, zone);
        return a instanceof java.net.Inet6Address ? "[" + h + "]" : h;
    }

    /** The cookie's name carries the port: cookies are not kept apart by port, two previews would clash. */
    String cookieName() {
        return "meritbook_live_" + address().getPort();
    }

    private void handle(HttpExchange exchange) throws IOException {
        try (exchange) {
            String method = exchange.getRequestMethod();
            boolean change = CHANGES.contains(exchange.getRequestURI().getRawPath());
            if (change ? !method.equals("POST") : !method.equals("GET") && !method.equals("HEAD")) {
                exchange.getResponseHeaders().set("Allow", change ? "POST" : "GET, HEAD");
                send(exchange, 405, "text/plain; charset=utf-8", bytes(change ? "Only POST is answered here.\n"
                        : "Only GET and HEAD are answered.\n"));
                return;
            }
            if (!fromThisMachine(exchange)) {
                // A page elsewhere could point a host name at 127.0.0.1 (DNS rebinding) and read the lab's data.
                send(exchange, 403, "text/plain; charset=utf-8", bytes("Open the preview as " + base() + "\n"));
                return;
            }
            if (queryToken(exchange)) {
                exchange.getResponseHeaders().add("Set-Cookie", cookieName() + "=" + token
                        + "; Path=/; HttpOnly; SameSite=Strict");
            } else if (!cookieToken(exchange)) {
                if (change) {
                    refused.incrementAndGet();
                }
                send(exchange, 403, "text/plain; charset=utf-8",
                        bytes("Open the preview at the address meritbook serve printed (it carries the access token).\n"));
                return;
            }
            if (change) {
                if (!sameOrigin(exchange)) {
                    refused.incrementAndGet();
                    // A page of another origin may send a POST with the cookie attached in older browsers.
                    send(exchange, 403, "text/plain; charset=utf-8", bytes("Changes are accepted only from the preview's own page.\n"));
                    return;
                }
                change(exchange);
                return;
            }
            route(exchange);
        }
    }

    private final AtomicInteger refused = new AtomicInteger();

    /** Change requests refused so far for their origin or a missing token (for tests). */
    int refusedChanges() {
        return refused.get();
    }

    private static final java.util.Set<String> CHANGES = java.util.Set.of("/exclude", "/restore", "/issue");

    /** Origin, or failing that Referer, must be this server as the request's Host names it. */
    private boolean sameOrigin(HttpExchange exchange) {
        String own = "http://" + exchange.getRequestHeaders().getFirst("Host").toLowerCase(Locale.ROOT);
        String origin = exchange.getRequestHeaders().getFirst("Origin");
        if (origin != null) {
            return origin.toLowerCase(Locale.ROOT).equals(own);
        }
        String referer = exchange.getRequestHeaders().getFirst("Referer");
        return referer != null && referer.toLowerCase(Locale.ROOT).startsWith(own + "/");
    }

    private void change(HttpExchange exchange) throws IOException {
        String type = exchange.getRequestHeaders().getFirst("Content-Type");
        if (type == null || !type.toLowerCase(Locale.ROOT).startsWith("application/json")) {
            send(exchange, 415, JSON, reply(false, "Send the change as application/json."));
            return;
        }
        byte[] body = exchange.getRequestBody().readNBytes(MAX_BODY + 1);
        JsonNode request;
        try {
            request = body.length > MAX_BODY ? null : MAPPER.readTree(body);
        } catch (IOException e) {
            request = null;
        }
        if (request == null || !request.isObject()) {
            send(exchange, 400, JSON, reply(false, "The change must be one JSON object of at most " + MAX_BODY + " bytes."));
            return;
        }
        int run = request.path("run").asInt(-1);
        PageActions.Reply r = switch (exchange.getRequestURI().getRawPath()) {
            case "/exclude" -> actions.exclude(run, text(request, "section"), text(request, "address"),
                    text(request, "reason"), text(request, "by"), text(request, "on"));
            case "/restore" -> actions.restore(run, text(request, "section"), text(request, "address"));
            default -> actions.issue(text(request, "reason"));
        };
        send(exchange, r.status(), JSON, reply(r.status() == 200, r.message()));
    }

    private static String text(JsonNode request, String field) {
        JsonNode n = request.get(field);
        return n == null || !n.isTextual() ? null : n.asText();
    }

    private static byte[] reply(boolean ok, String message) {
        ObjectNode o = MAPPER.createObjectNode().put("ok", ok).put("message", message);
        return (o.toString() + "\n").getBytes(StandardCharsets.UTF_8);
    }

    private void route(HttpExchange exchange) throws IOException {
        Snapshot s = study.snapshot();
        Snapshot.Issued issued = s.issued();
        switch (exchange.getRequestURI().getPath()) {
            case "/" -> {
                exchange.getResponseHeaders().set("Content-Security-Policy", PAGE_POLICY);
                send(exchange, 200, HTML, LivePage.HTML);
            }
            case "/live.css" -> send(exchange, 200, "text/css; charset=utf-8", LivePage.CSS);
            case "/live.js" -> send(exchange, 200, "text/javascript; charset=utf-8", LivePage.SCRIPT);
            case "/status" -> send(exchange, 200, JSON, StatusJson.of(s, study.notebook().getFileName().toString(),
                    issued == null ? null : issuer.latest(issued.json()), s.problems().isEmpty() ? List.of() : notebookLines()));
            case "/dossier" -> {
                exchange.getResponseHeaders().set("Content-Security-Policy", DOSSIER_POLICY);
                if (issued == null) {
                    send(exchange, 503, HTML, bytes("<!DOCTYPE html><html lang=\"en\"><head><meta charset=\"utf-8\">"
                            + "<title>No dossier yet</title></head><body><p>No run has succeeded yet.</p></body></html>\n"));
                } else {
                    send(exchange, 200, HTML, issued.html());
                }
            }
            case "/results.json" -> {
                if (issued == null) {
                    send(exchange, 503, JSON, bytes("{\"error\":\"no run has succeeded yet\"}\n"));
                } else {
                    send(exchange, 200, JSON, issued.json());
                }
            }
            default -> send(exchange, 404, "text/plain; charset=utf-8", bytes("Not found.\n"));
        }
    }

    /** The notebook as it is now, to quote a problem's line; none when it cannot be read. */
    private List<String> notebookLines() {
        try {
            return java.nio.file.Files.readAllLines(study.notebook(), StandardCharsets.UTF_8);
        } catch (IOException | java.io.UncheckedIOException e) {
            return List.of(); // the problem itself is still shown, only its line is not quoted
        }
    }

    private boolean queryToken(HttpExchange exchange) {
        String query = exchange.getRequestURI().getRawQuery();
        if (query == null) {
            return false;
        }
        for (String pair : query.split("&")) {
            if (pair.startsWith("token=") && matches(pair.substring("token=".length()))) {
                return true;
            }
        }
        return false;
    }

    private boolean cookieToken(HttpExchange exchange) {
        String prefix = cookieName() + "=";
        for (String header : exchange.getRequestHeaders().getOrDefault("Cookie", List.of())) {
            for (String cookie : header.split(";")) {
                String c = cookie.trim();
                if (c.startsWith(prefix) && matches(c.substring(prefix.length()))) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Compared in constant time, so response timing tells nothing about a guessed prefix. */
    private boolean matches(String offered) {
        return MessageDigest.isEqual(offered.getBytes(StandardCharsets.US_ASCII), token.getBytes(StandardCharsets.US_ASCII));
    }

    /** Requests must name this server by its loopback address or as localhost. */
    private boolean fromThisMachine(HttpExchange exchange) {
        String host = exchange.getRequestHeaders().getFirst("Host");
        if (host == null) {
            return false;
        }
        String port = ":" + address().getPort();
        String h = host.toLowerCase(Locale.ROOT);
        return h.equals("127.0.0.1" + port) || h.equals("localhost" + port)
                || bound != null && h.equals(literal(bound).toLowerCase(Locale.ROOT) + port);
    }

    private static void send(HttpExchange exchange, int status, String type, byte[] body) throws IOException {
        Headers headers = exchange.getResponseHeaders();
        headers.set("Content-Type", type);
        headers.set("Cache-Control", "no-store");
        headers.set("X-Content-Type-Options", "nosniff");
        headers.set("Referrer-Policy", "no-referrer");
        if (exchange.getRequestMethod().equals("HEAD")) {
            exchange.sendResponseHeaders(status, -1);
            return;
        }
        exchange.sendResponseHeaders(status, body.length == 0 ? -1 : body.length);
        try (OutputStream out = exchange.getResponseBody()) {
            out.write(body);
        }
    }

    private static byte[] bytes(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }

    /** Stops answering, closes the port and ends the request threads. */
    @Override
    public void close() {
        server.stop(0);
        executor.shutdown();
        try {
            if (!executor.awaitTermination(5, TimeUnit.SECONDS)) {
                executor.shutdownNow();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
