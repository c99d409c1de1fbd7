package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.dossier.DossierRenderer;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The interactive live notebook in a real browser (Debian's chromium through chromedriver): a number
 * clicked opens its trail step in place, a point excluded from the page with a reason is written into
 * the notebook and moves the slope, and a revision issued from the page is written as run writes it,
 * but not while a problem is open. Screenshots of each state go to /tmp/live-shots/.
 */
class LiveNotebookBrowserTest {
    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    private static final Path CHROMEDRIVER = Path.of("/usr/bin/chromedriver");
    private static final String NAME = "hmf-honey-validation";
    private static final Path SHOTS = Path.of("/tmp/live-shots");

    @TempDir
    Path dir;
    private Path notebook;
    private LiveSession session;
    private WebDriver browser;

    @BeforeEach
    void start() throws Exception {
        assumeTrue(Files.isExecutable(CHROMIUM) && Files.isExecutable(CHROMEDRIVER),
                "needs Debian's chromium and chromium-driver (.ci/run installs them)");
        notebook = dir.resolve(NAME + ".md");
        Files.copy(Path.of("demo-data", NAME + ".md"), notebook);
        Files.copy(Path.of("demo-data", NAME + ".xlsx"), dir.resolve(NAME + ".xlsx"));
        session = LiveSession.start(notebook, 0, new DossierRenderer(Optional.empty()), s -> { });
        ChromeOptions options = new ChromeOptions().setBinary(CHROMIUM.toFile()).addArguments("--headless",
                "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--user-data-dir=" + dir.resolve("profile"));
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(CHROMEDRIVER.toFile())
                .usingAnyFreePort().build();
        browser = new ChromeDriver(service, options);
        browser.manage().window().setSize(new Dimension(1360, 900));
        Files.createDirectories(SHOTS);
    }

    @AfterEach
    void stop() {
        if (browser != null) {
            browser.quit();
        }
        if (session != null) {
            session.close();
        }
    }

    private void waitFor(String what, Function<WebDriver, Boolean> condition) {
        new WebDriverWait(browser, Duration.ofSeconds(120)).withMessage(what).until(condition);
    }

    private void shot(String name) throws Exception {
        Files.write(SHOTS.resolve(name + ".png"), ((TakesScreenshot) browser).getScreenshotAs(OutputType.BYTES));
    }

    private <T> T inDossier(Function<WebDriver, T> f) {
        browser.switchTo().frame(browser.findElement(By.id("dossier")));
        try {
            return f.apply(browser);
        } finally {
            browser.switchTo().defaultContent();
        }
    }

    /** The slope as the linearity section's results table shows it. */
    private String shownSlope() {
        return inDossier(b -> {
            Object v = ((JavascriptExecutor) b).executeScript("for (const n of document.querySelectorAll("
                    + "'#' + CSS.escape(arguments[0]) + ' table.results .sub.mono')) {"
                    + " if (n.textContent.trim() === 'slope') { return n.closest('tr').querySelector('td.value').textContent.trim(); } }"
                    + " return null;", linearityAnchor(b));
            return v == null ? "" : v.toString();
        });
    }

    private static String linearityAnchor(WebDriver b) {
        return (String) ((JavascriptExecutor) b).executeScript("for (const s of document.querySelectorAll('.section')) {"
                + " const m = s.querySelectorAll('.section-id .mono'); if (m.length > 1 && m[m.length - 1].textContent.trim()"
                + " === 'linearity') { return s.id; } } return null;");
    }

    private void openFirstRun() {
        browser.get(session.server().base().toString());
        assertTrue(browser.findElements(By.id("state")).isEmpty(), "without the token the page is refused");
        assertTrue(browser.getPageSource().contains("access token"), browser.getPageSource());
        browser.get(session.uri().toString());
        waitFor("the first run is shown", b -> b.findElement(By.id("state")).getText().equals("up to date"));
        waitFor("the dossier is decorated", b -> inDossier(d -> !d.findElements(By.cssSelector("td.mb-click")).isEmpty()));
    }

    @Test
    void aClickedNumberShowsItsTrailStepAndAnExcludedPointMovesTheSlope() throws Exception {
        openFirstRun();
        shot("1-first-run");
        String slope = shownSlope();
        assertFalse(slope.isEmpty(), "the slope is shown");

        // Clicking the slope's value opens its trail step in place: formula, inputs, method.
        inDossier(b -> {
            WebElement value = (WebElement) ((JavascriptExecutor) b).executeScript("for (const n of document.querySelectorAll("
                    + "'#' + CSS.escape(arguments[0]) + ' table.results .sub.mono')) { if (n.textContent.trim() === 'slope') {"
                    + " const v = n.closest('tr').querySelector('td.value'); v.scrollIntoView({block: 'center'}); return v; } }",
                    linearityAnchor(b));
            value.click();
            WebElement pop = b.findElement(By.id("mb-pop"));
            String text = pop.getText();
            assertTrue(text.contains("Slope (sensitivity)") && text.contains("Sxx") && text.contains("Method: weighted least squares"),
                    text);
            assertTrue(text.contains("linearity.sxx"), "the inputs name the steps they come from: " + text);
            return null;
        });
        shot("2-trail-step");
        // A plot point names its cell, values and residual on hover (an SVG title the browser shows).
        String note = inDossier(b -> (String) ((JavascriptExecutor) b).executeScript("for (const t of document.querySelectorAll("
                + "'svg .point-notes circle title')) { if (t.textContent.startsWith('Calibration!D10:')) { return t.textContent; } }"
                + " return null;"));
        assertTrue(note != null && note.contains("Nominal 0.1 mg/L") && note.contains("Peak area 4.44") && note.contains("residual "),
                String.valueOf(note));
        // Following an input goes to the step it came from, in the same place.
        inDossier(b -> {
            b.findElement(By.cssSelector("#mb-pop a[data-mb-step]")).click();
            assertTrue(b.findElement(By.id("mb-pop")).getText().contains("back to"), b.findElement(By.id("mb-pop")).getText());
            return null;
        });

        // A workbook value shows its row as read, and offers to exclude the point.
        inDossier(b -> {
            WebElement cell = b.findElement(By.cssSelector("td[title='Calibration!D9']"));
            ((JavascriptExecutor) b).executeScript("arguments[0].scrollIntoView({block: 'center'});", cell);
            cell.click();
            String text = b.findElement(By.id("mb-pop")).getText();
            assertTrue(text.contains("Value as read: 4.60") && text.contains("Calibration!C9") && text.contains("Peak area"), text);
            return null;
        });
        shot("3-cell-row");
        inDossier(b -> {
            b.findElement(By.cssSelector("#mb-pop button[data-mb-action='exclude']")).click();
            return null;
        });
        WebElement dialog = browser.findElement(By.id("exclude-dialog"));
        waitFor("the dialog asks for the reason", b -> dialog.isDisplayed());
        browser.findElement(By.id("exclude-submit")).click();
        assertEquals("A reason is required.", browser.findElement(By.id("exclude-error")).getText());
        browser.findElement(By.id("exclude-reason")).sendKeys("Peak integrated from the wrong baseline");
        browser.findElement(By.id("exclude-by")).sendKeys("A. Analyst");
        shot("4-exclude-dialog");
        browser.findElement(By.id("exclude-submit")).click();
        waitFor("the notebook is written", b -> read().contains("- cell: \"Calibration!D9\""));
        assertTrue(read().contains("    reason: \"Peak integrated from the wrong baseline\"\n    by: \"A. Analyst\"\n"), read());
        assertTrue(Files.exists(dir.resolve(NAME + ".md.~1~")), "the previous notebook is kept");
        waitFor("the slope on the page changes", b -> !shownSlope().isEmpty() && !shownSlope().equals(slope));
        waitFor("the change is listed", b -> b.findElement(By.id("change-list")).getText().contains("slope"));
        shot("5-excluded");
    }

    @Test
    void aRevisionIsIssuedFromThePageButNotWhileAProblemIsOpen() throws Exception {
        openFirstRun();
        waitFor("the page says nothing is issued yet", b -> b.findElement(By.id("issue-text")).getText()
                .contains("No revision of this study is issued yet"));
        String good = read();
        Files.writeString(notebook, good.replaceFirst("weighting: auto\n", "weighting: auto\nsmoothing: yes\n"));
        waitFor("the problem is shown", b -> b.findElement(By.id("state")).getText().equals("input needs attention"));
        waitFor("the kept dossier is marked stale", b -> b.findElement(By.id("stale")).isDisplayed());
        assertTrue(browser.findElement(By.id("stale")).getText().startsWith("Stale: this dossier is from run 1 of "));
        assertTrue(!browser.findElement(By.id("issue-open")).isEnabled(), "the button is disabled while a problem is open");
        shot("6-problem-stale");
        // Even asked directly, the server refuses.
        Object refused = ((JavascriptExecutor) browser).executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "fetch('/issue', {method: 'POST', headers: {'Content-Type': 'application/json'},"
                + " body: JSON.stringify({reason: 'try'})}).then(r => r.json().then(j => done({status: r.status, message: j.message})));");
        @SuppressWarnings("unchecked")
        Map<String, Object> reply = (Map<String, Object>) refused;
        assertEquals(409L, reply.get("status"));
        assertTrue(reply.get("message").toString().contains("1 open problem"), reply.toString());
        assertFalse(Files.exists(dir.resolve("out")), "nothing issued");

        Files.writeString(notebook, good);
        waitFor("the fix is run", b -> b.findElement(By.id("state")).getText().equals("up to date"));
        waitFor("issuing is offered", b -> b.findElement(By.id("issue-open")).isEnabled());
        browser.findElement(By.id("issue-open")).click();
        browser.findElement(By.id("issue-reason")).sendKeys("First issue after review of the exclusions");
        shot("7-issue-dialog");
        browser.findElement(By.id("issue-submit")).click();
        waitFor("the revision is issued", b -> b.findElement(By.id("notice")).getText().startsWith("Issued revision 1"));
        // Nothing was issued before, so the notebook's own revision 1 is issued, with the reason given.
        Path rev = dir.resolve("out").resolve(NAME).resolve("rev1");
        assertTrue(Files.isRegularFile(rev.resolve(NAME + "-rev1.pdf")) && Files.isRegularFile(rev.resolve("results.json")),
                "the dossier is written as run writes it");
        assertTrue(read().contains("revision: 1\n") && read().contains("revision-reason: \"First issue after review of the exclusions\""),
                read());
        waitFor("the page says the preview is the issued revision",
                b -> b.findElement(By.id("issue-text")).getText().contains("same as issued revision 1"));
        shot("8-issued");
    }

    @Test
    void aPostFromAPageOfAnotherOriginIsRefusedEvenWithTheCookie() throws Exception {
        browser.get(session.uri().toString()); // the cookie is set
        waitFor("the page is shown", b -> !b.findElements(By.id("state")).isEmpty());
        int port = session.server().address().getPort();
        // Another origin on the same machine (same site, so even a SameSite=Strict cookie goes along).
        com.sun.net.httpserver.HttpServer other = com.sun.net.httpserver.HttpServer.create(
                new java.net.InetSocketAddress(java.net.InetAddress.getLoopbackAddress(), 0), 0);
        byte[] page = "<!DOCTYPE html><html><head><title>elsewhere</title></head><body>elsewhere</body></html>"
                .getBytes(java.nio.charset.StandardCharsets.UTF_8);
        other.createContext("/", x -> {
            x.sendResponseHeaders(200, page.length);
            try (var out = x.getResponseBody()) {
                out.write(page);
            }
        });
        other.start();
        try {
            byte[] before = Files.readAllBytes(notebook);
            browser.get("http://127.0.0.1:" + other.getAddress().getPort() + "/");
            Object sent = ((JavascriptExecutor) browser).executeAsyncScript("const done = arguments[arguments.length - 1];"
                    + "fetch('http://127.0.0.1:' + arguments[0] + '/exclude', {method: 'POST', mode: 'no-cors', credentials: 'include',"
                    + " headers: {'Content-Type': 'text/plain'}, body: JSON.stringify({run: 1, section: 'linearity',"
                    + " address: 'Calibration!D9', reason: 'forged'})}).then(() => done('sent'), e => done('failed: ' + e));", port);
            assertEquals("sent", sent);
            assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(notebook)), "the notebook is unchanged");
            try (var files = Files.list(dir)) {
                assertFalse(files.anyMatch(p -> p.getFileName().toString().contains(".~")), "no backup: nothing was written");
            }
            assertEquals(1, session.server().refusedChanges(),
                    "the request arrived and was refused (its origin, or the token if the cookie stayed behind)");
        } finally {
            other.stop(0);
        }
    }

    private String read() {
        try {
            return Files.readString(notebook);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
