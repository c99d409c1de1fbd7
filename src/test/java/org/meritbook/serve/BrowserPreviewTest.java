package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Optional;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.dossier.DossierRenderer;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The live notebook in a real browser (Debian's chromium through chromedriver, which CI installs):
 * the page's script polls the status, shows located problems, and reloads the dossier after a fix.
 */
class BrowserPreviewTest {
    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    private static final Path CHROMEDRIVER = Path.of("/usr/bin/chromedriver");
    private static final String NAME = "hmf-honey-validation";

    @TempDir
    Path dir;
    private LiveSession session;
    private WebDriver browser;

    @BeforeEach
    void start() throws Exception {
        assumeTrue(Files.isExecutable(CHROMIUM) && Files.isExecutable(CHROMEDRIVER),
                "needs Debian's chromium and chromium-driver (.ci/run installs them)");
        Files.copy(Path.of("demo-data", NAME + ".md"), dir.resolve(NAME + ".md"));
        Files.copy(Path.of("demo-data", NAME + ".xlsx"), dir.resolve(NAME + ".xlsx"));
        session = LiveSession.start(dir.resolve(NAME + ".md"), 0, new DossierRenderer(Optional.empty()), s -> { });
        ChromeOptions options = new ChromeOptions().setBinary(CHROMIUM.toFile()).addArguments("--headless",
                "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--user-data-dir=" + dir.resolve("profile"));
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(CHROMEDRIVER.toFile())
                .usingAnyFreePort().build();
        browser = new ChromeDriver(service, options);
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

    private void waitFor(String what, java.util.function.Function<WebDriver, Boolean> condition) {
        new WebDriverWait(browser, Duration.ofSeconds(90)).withMessage(what).until(condition);
    }

    private String dossierText() {
        browser.switchTo().frame(browser.findElement(By.id("dossier")));
        try {
            return browser.findElement(By.tagName("body")).getText();
        } finally {
            browser.switchTo().defaultContent();
        }
    }

    @Test
    void aBrokenNotebookIsShownWithItsLineAndAFixReloadsTheDossier() throws Exception {
        browser.get(session.server().base().toString());
        assertTrue(browser.findElements(By.id("state")).isEmpty(), "without the token the page is refused");
        browser.get(session.uri().toString());
        waitFor("the first run is shown", b -> b.findElement(By.id("state")).getText().equals("up to date"));
        assertTrue(!browser.getCurrentUrl().contains("token="), "the token leaves the address bar: " + browser.getCurrentUrl());
        waitFor("the dossier is shown", b -> dossierText().contains("Validation of 5-hydroxymethylfurfural"));

        Path notebook = dir.resolve(NAME + ".md");
        String good = Files.readString(notebook);
        Files.writeString(notebook, good.replaceFirst("weighting: auto\n", "weighting: auto\nsmoothing: yes\n"));
        waitFor("the problem is shown", b -> b.findElement(By.id("state")).getText().equals("input needs attention"));
        String problems = browser.findElement(By.id("problem-list")).getText();
        assertTrue(problems.contains(NAME + ".md line") && problems.contains("UNKNOWN_OPTION")
                && problems.contains("'smoothing'"), problems);

        Files.writeString(notebook, good.replaceFirst("weighting: auto\n", "weighting: none\n"));
        waitFor("the fix is run", b -> b.findElement(By.id("state")).getText().equals("up to date"));
        waitFor("the dossier is reloaded with the new weighting",
                b -> dossierText().contains("Weighting none") || dossierText().contains("Weighting\nnone"));
        assertTrue(browser.findElement(By.id("problems")).getDomAttribute("hidden") != null, "problems hidden again");
        waitFor("the changed values are listed", b -> b.findElement(By.id("changes")).getDomAttribute("hidden") == null);
        assertTrue(browser.findElement(By.id("change-list")).getText().contains("slope"),
                browser.findElement(By.id("change-list")).getText());
        Files.createDirectories(Path.of("target", "screenshots"));
        Files.write(Path.of("target", "screenshots", "live-changed.png"), ((TakesScreenshot) browser).getScreenshotAs(OutputType.BYTES));
    }

    @Test
    void aFailingCriterionTurnsTheBarRedAndIsAnnounced() throws Exception {
        browser.get(session.uri().toString());
        waitFor("the first run is shown", b -> b.findElement(By.id("state")).getText().equals("up to date"));
        waitFor("the outcome is shown", b -> !b.findElement(By.id("bar")).getDomAttribute("class").contains("level-none"));
        assertFalse(browser.findElement(By.id("bar")).getDomAttribute("class").contains("level-fail"),
                "the demo fails no criterion");
        // r² is below 1 for real data: this profile must fail.
        Files.writeString(dir.resolve("impossible.yaml"), "name: impossible linearity\nrules:\n"
                + "  - quantity: r_squared\n    at-least: 1\n    characteristic: Linearity\n");
        Path notebook = dir.resolve(NAME + ".md");
        Files.writeString(notebook, Files.readString(notebook).replaceFirst("criteria: linearity-basic\n", "criteria: impossible.yaml\n"));
        waitFor("the bar turns to the failed state", b -> b.findElement(By.id("bar")).getDomAttribute("class").contains("level-fail"));
        assertEquals("criteria failed", browser.findElement(By.id("verdict-word")).getText());
        assertTrue(Integer.parseInt(browser.findElement(By.id("n-failed")).getText()) > 0);
        WebElement announce = browser.findElement(By.id("announce"));
        assertEquals("polite", announce.getDomAttribute("aria-live"));
        assertTrue(announce.getDomProperty("textContent").contains("criteria failed"), announce.getDomProperty("textContent"));
        Files.createDirectories(Path.of("target", "screenshots"));
        Files.write(Path.of("target", "screenshots", "live-failed.png"), ((TakesScreenshot) browser).getScreenshotAs(OutputType.BYTES));
    }
}
