package org.trundle.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.logging.Level;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.Keys;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.logging.LogEntry;
import org.openqa.selenium.logging.LogType;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * Opens run reports in a real browser (headless Chromium driven by Selenium through the system's
 * chromedriver; no browser or driver is ever downloaded): the page loads with no console error,
 * the 3-D canvas draws (a share of its pixels differ from the background), moving the time slider
 * moves the ball, and a screenshot is saved under {@code target/report-screenshots}. Runs on the
 * demo, a funnel and a helical chute scenario (invented data, {@code benchmarks/scenarios}); and the
 * sweep report of a 3 × 3 grid, whose points open their run's row.
 *
 * <p>Without Chromium the test is skipped with a message saying how to install it
 * ({@code apt-get install -y chromium chromium-driver}); {@code .ci/run} installs it when missing.
 * The paths can be set with the environment variables {@code TRUNDLE_CHROMIUM} and
 * {@code TRUNDLE_CHROMEDRIVER}.
 */
class ReportInBrowserTest {
    private static final Path OUT = Path.of("target", "report-browser");
    private static final Path SHOTS = Path.of("target", "report-screenshots");
    /** The scene's background colour (renderer clear colour in view.js). */
    private static final int BACKGROUND = 0xf4f5f8;

    private static ChromeDriver driver;

    @BeforeAll
    static void startBrowser() throws IOException {
        Path chromium = Path.of(env("TRUNDLE_CHROMIUM", "/usr/bin/chromium"));
        Path chromedriver = Path.of(env("TRUNDLE_CHROMEDRIVER", "/usr/bin/chromedriver"));
        if (!Files.isExecutable(chromium) || !Files.isExecutable(chromedriver)) {
            String msg = "Browser test of report.html SKIPPED: no Chromium at " + chromium + " or no chromedriver at "
                + chromedriver + ". Install them with: apt-get install -y chromium chromium-driver"
                + " (or set TRUNDLE_CHROMIUM and TRUNDLE_CHROMEDRIVER)";
            System.err.println(msg);
            Assumptions.abort(msg);
        }
        Path profile = Files.createTempDirectory("trundle-chromium-");
        ChromeOptions o = new ChromeOptions();
        o.setBinary(chromium.toFile());
        o.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking",
            "--disable-component-update", "--disable-sync", "--no-first-run", "--enable-unsafe-swiftshader",
            "--window-size=1400,1100", "--user-data-dir=" + profile);
        o.setCapability("goog:loggingPrefs", Map.of(LogType.BROWSER, "ALL"));
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(chromedriver.toFile())
            .usingAnyFreePort().build();
        driver = new ChromeDriver(service, o);
        Files.createDirectories(SHOTS);
    }

    @AfterAll
    static void stopBrowser() {
        if (driver != null) {
            driver.quit();
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"demo", "funnel.json", "helical-chute.json"})
    void reportOpensDrawsAndMovesTheBall(String which) throws IOException {
        String name = which.replace(".json", "");
        Path dir = OUT.resolve(name);
        Cli.Result r = which.equals("demo") ? Cli.run("demo", "--out", dir.toString())
            : Cli.run("run", Path.of("..", "scenarios", which).toString(), "--out", dir.toString(), "--force");
        assertEquals(0, r.code(), r.out() + r.err());
        Path html = dir.resolve("report.html").toAbsolutePath();
        assertTrue(Files.size(html) > 100_000, "report.html holds the view script and the data");

        driver.get(html.toUri().toString());
        new WebDriverWait(driver, Duration.ofSeconds(60)).until(d -> "true".equals(
            ((JavascriptExecutor) d).executeScript("return document.body.dataset.ready")));
        WebElement canvas = driver.findElement(By.cssSelector("#scene canvas"));
        waitFrames();

        double drawn = nonBackgroundShare(canvas);
        assertTrue(drawn > 0.02, "the 3-D canvas draws: share of non-background pixels " + drawn);

        String before = ballAt();
        String readoutBefore = driver.findElement(By.id("readout")).getText();
        WebElement slider = driver.findElement(By.id("time"));
        slider.click();
        slider.sendKeys(Keys.END);
        waitFrames();
        String after = ballAt();
        double moved = distance(before, after);
        assertTrue(moved > 1e-4, "moving the slider to the end moves the ball: " + before + " -> " + after);
        assertTrue(!readoutBefore.equals(driver.findElement(By.id("readout")).getText()), "the time readout follows");
        assertEquals(driver.findElement(By.id("time")).getAttribute("max"), driver.findElement(By.id("time"))
            .getAttribute("value"), "END puts the slider at the last sample");

        Path shot = SHOTS.resolve(name + ".png");
        Files.write(shot, driver.getScreenshotAs(OutputType.BYTES));
        System.out.println("report screenshot: " + shot.toAbsolutePath());

        assertNoConsoleErrors();
    }

    @Test
    void sweepReportPointsOpenTheirRuns() throws IOException {
        Path dir = OUT.resolve("sweep");
        Files.createDirectories(OUT);
        Path f = Cli.write(OUT, "sweep.json", SweepCommandTest.sweepOf("{\"start.speed\": {\"from\": 0.4, \"to\": 1.2,"
            + " \"count\": 3}, \"start.elevation_deg\": {\"from\": -40, \"to\": -10, \"count\": 3}}"));
        Cli.Result r = Cli.run("sweep", f.toString(), "--out", dir.toString(), "--force", "--no-progress");
        assertEquals(0, r.code(), r.out() + r.err());
        driver.get(dir.resolve("sweep-report.html").toAbsolutePath().toUri().toString());
        new WebDriverWait(driver, Duration.ofSeconds(60)).until(d -> "true".equals(
            ((JavascriptExecutor) d).executeScript("return document.body.dataset.ready")));
        assertEquals(9, driver.findElements(By.cssSelector("#map circle.pt")).size(), "one point per run");
        driver.findElement(By.id("first-point")).click();
        String details = driver.findElement(By.id("details")).getText();
        assertTrue(details.contains("end_time (s)") && details.contains("start.speed"), details);
        assertTrue(details.contains("outcome"), details);
        Path shot = SHOTS.resolve("sweep.png");
        Files.write(shot, driver.getScreenshotAs(OutputType.BYTES));
        System.out.println("report screenshot: " + shot.toAbsolutePath());
        assertNoConsoleErrors();
    }

    private static void assertNoConsoleErrors() {
        List<String> errors = new ArrayList<>();
        for (LogEntry e : driver.manage().logs().get(LogType.BROWSER)) {
            if (e.getLevel().intValue() >= Level.SEVERE.intValue()) {
                errors.add(e.getMessage());
            }
        }
        assertTrue(errors.isEmpty(), "console errors: " + errors);
    }

    private static String ballAt() {
        return driver.findElement(By.id("scene")).getAttribute("data-ball");
    }

    private static double distance(String a, String b) {
        String[] p = a.split(",");
        String[] q = b.split(",");
        double s = 0;
        for (int i = 0; i < 3; i++) {
            double d = Double.parseDouble(p[i]) - Double.parseDouble(q[i]);
            s += d * d;
        }
        return Math.sqrt(s);
    }

    /** Lets the page draw a few animation frames. */
    private static void waitFrames() {
        ((JavascriptExecutor) driver).executeAsyncScript("const done = arguments[arguments.length - 1];"
            + "let k = 0; const f = () => (++k < 5 ? requestAnimationFrame(f) : done()); requestAnimationFrame(f);");
    }

    /** Share of the element's pixels that differ clearly from the scene background. */
    private static double nonBackgroundShare(WebElement e) throws IOException {
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(e.getScreenshotAs(OutputType.BYTES)));
        int br = BACKGROUND >> 16 & 0xff;
        int bg = BACKGROUND >> 8 & 0xff;
        int bb = BACKGROUND & 0xff;
        long differ = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int p = img.getRGB(x, y);
                int d = Math.max(Math.abs((p >> 16 & 0xff) - br), Math.max(Math.abs((p >> 8 & 0xff) - bg),
                    Math.abs((p & 0xff) - bb)));
                if (d > 24) {
                    differ++;
                }
            }
        }
        return differ / (double) ((long) img.getWidth() * img.getHeight());
    }

    private static String env(String name, String fallback) {
        String v = System.getenv(name);
        return v == null || v.isBlank() ? fallback : v;
    }
}
