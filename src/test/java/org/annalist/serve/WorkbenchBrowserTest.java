package org.annalist.serve;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.net.InetAddress;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The whole routine in a real browser (headless Chromium through chromedriver): open a broken file
 * and see its problem with its line; open the demo file and see its check; look at a series, change
 * the latest period and the measure and see the findings change; make the brief and save a valid
 * PDF with the right title; open the demo spec, run it, save a result. One server and one browser
 * for the class. Without Chromium and chromedriver the test is skipped and says so. Screenshots of
 * each page go to {@code target/workbench-screenshots/}.
 */
class WorkbenchBrowserTest {

    private static final Path DRIVER = Path.of(System.getProperty("annalist.chromedriver", "/usr/bin/chromedriver"));
    private static final List<Path> BROWSERS = List.of(Path.of("/usr/bin/chromium"), Path.of("/usr/bin/chromium-browser"),
            Path.of("/usr/bin/google-chrome"));
    private static final Path SHOTS = Path.of("target/workbench-screenshots");
    private static final String TIME = "2026-11-20T08:00:00Z";

    @TempDir
    static Path temp;

    private static Workbench workbench;
    private static WebDriver browser;
    private static String base;

    @BeforeAll
    static void start() throws IOException {
        Optional<Path> chromium = BROWSERS.stream().filter(Files::isExecutable).findFirst();
        assumeTrue(Files.isExecutable(DRIVER), "skipped: no chromedriver at " + DRIVER
                + " (Debian: apt-get install chromium-driver; or -Dannalist.chromedriver=PATH)");
        assumeTrue(chromium.isPresent(), "skipped: no Chromium at " + BROWSERS + " (Debian: apt-get install chromium)");
        Path served = Files.createDirectories(temp.resolve("served"));
        for (String name : List.of("quennelmark-guest-nights.csv", "monthly-briefs.yaml")) {
            Files.copy(Path.of("demo-data", name), served.resolve(name));
        }
        workbench = Workbench.start(new Settings(InetAddress.getLoopbackAddress(), 0, served, 1024 * 1024,
                Optional.of(Instant.parse(TIME)), Duration.ofHours(1)));
        base = workbench.address();
        ChromeOptions options = new ChromeOptions();
        options.setBinary(chromium.get().toFile());
        options.addArguments("--headless=new", "--no-sandbox", "--disable-dev-shm-usage", "--disable-gpu",
                "--window-size=1280,1000", "--user-data-dir=" + temp.resolve("profile"));
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(DRIVER.toFile())
                .usingAnyFreePort().build();
        browser = new ChromeDriver(service, options);
        browser.manage().timeouts().pageLoadTimeout(Duration.ofSeconds(90));
        Files.createDirectories(SHOTS);
    }

    @AfterAll
    static void stop() {
        if (browser != null) {
            browser.quit();
        }
        if (workbench != null) {
            workbench.close();
        }
    }

    @Test
    void theMonthlyRoutineWorksInABrowser() throws Exception {
        // a broken file: the problem, with its line
        Path broken = temp.resolve("broken.csv");
        Files.writeString(broken, "period,value\n2024-01,1\n2024-02,12x\n2024-03,3\n");
        browser.get(base);
        shot("1-start");
        browser.findElement(By.id("data")).sendKeys(broken.toString());
        browser.findElement(By.cssSelector("form.upload button[type=submit]")).click();
        WebElement alert = waitFor(By.cssSelector("[role=alert]"));
        assertThat(alert.getText()).contains("broken.csv").contains("line 3, column 2").contains("12x");
        shot("2-broken-file");

        // the demo file: what check finds
        browser.findElement(By.id("data")).sendKeys(Path.of("demo-data/quennelmark-guest-nights.csv").toAbsolutePath()
                .toString());
        browser.findElement(By.cssSelector("form.upload button[type=submit]")).click();
        waitFor(By.cssSelector(".series-card"));
        String check = browser.findElement(By.tagName("main")).getText();
        assertThat(check).contains("Total").contains("Brevania").contains("2011-01 to 2026-10").contains("provisional");
        assertThat(browser.findElements(By.cssSelector(".spark svg path"))).hasSize(4);
        shot("3-check");

        // a series: the findings; then another latest period and measure
        browser.findElement(By.linkText("Look at Total")).click();
        WebElement lead = waitFor(By.cssSelector(".draft .lead"));
        String seriesPage = browser.getCurrentUrl();
        String before = lead.getText();
        assertThat(before).contains("October 2026");
        shot("4-series");
        WebElement period = browser.findElement(By.id("period"));
        period.clear();
        period.sendKeys("2025-04");
        new Select(browser.findElement(By.id("measure"))).selectByValue("level");
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> {
            List<WebElement> leads = d.findElements(By.cssSelector(".draft .lead"));
            return !leads.isEmpty() && leads.get(0).getText().contains("April 2025")
                    && d.findElement(By.cssSelector(".draft")).getText().contains("Each value is a level or stock");
        });
        assertThat(browser.findElement(By.id("period")).getAttribute("value")).isEqualTo("2025-04");
        shot("5-series-changed");

        // a holidays file with a date that is not one: refused with its line, the settings kept
        Path festivals = temp.resolve("festivals.csv");
        Files.writeString(festivals, "date,name\n2024-05-14,Lantern festival\n2024-13-40,Harbour days\n");
        browser.findElement(By.id("holidays")).sendKeys(festivals.toString());
        browser.findElement(By.cssSelector("form[action$='/extras'] button[type=submit]")).click();
        WebElement refused = waitFor(By.cssSelector("form[action$='/extras'] [role=alert]"));
        assertThat(refused.getText()).contains("festivals.csv").contains("line 3").contains("is not a date");
        assertThat(browser.findElement(By.id("period")).getAttribute("value")).isEqualTo("2025-04");
        ((org.openqa.selenium.JavascriptExecutor) browser).executeScript("arguments[0].scrollIntoView()", refused);
        shot("5b-holidays-refused");

        // the brief: made, its pages shown, the PDF saved
        browser.findElement(By.cssSelector("form.make button")).click();
        waitFor(By.cssSelector(".pages img"));
        new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> Boolean.TRUE.equals(((org.openqa.selenium
                .JavascriptExecutor) d).executeScript("var i = document.querySelector('.pages img');"
                + " return i.complete && i.naturalWidth > 0;")));
        shot("6-brief");
        String pdfHref = browser.findElement(By.cssSelector(".downloads a.button")).getAttribute("href");
        byte[] pdf = fetch(pdfHref);
        try (PDDocument document = Loader.loadPDF(pdf)) {
            String text = new PDFTextStripper().getText(document);
            assertThat(text).contains("Total").contains("April 2025");
            assertThat(document.getDocumentInformation().getTitle()).isEqualTo("Total");
        }

        // the monthly routine: the demo spec, run, a result saved
        browser.findElement(By.linkText("Monthly routine")).click();
        browser.findElement(By.linkText("monthly-briefs.yaml")).click();
        assertThat(waitFor(By.cssSelector("table.entries")).getText()).contains("Guest nights from Brevania");
        shot("7-spec");
        browser.findElement(By.cssSelector("main form button[type=submit]")).click();
        // the page reloads itself while the run goes on: an element found may be gone a moment later
        new WebDriverWait(browser, Duration.ofSeconds(120)).ignoring(org.openqa.selenium.StaleElementReferenceException.class)
                .until(d -> d.findElement(By.cssSelector(".progress-line")).getText().contains("Finished"));
        shot("8-run");
        assertThat(browser.findElement(By.cssSelector(".progress-line")).getText()).contains("3 of 3 briefs made");
        byte[] result = fetch(browser.findElement(By.cssSelector("table.outcomes a")).getAttribute("href"));
        assertThat(new String(result, 0, 5, StandardCharsets.US_ASCII)).isEqualTo("%PDF-");

        // 200 % zoom: the same page in half the CSS width, looked at in its screenshot
        browser.manage().window().setSize(new org.openqa.selenium.Dimension(640, 1000));
        browser.get(seriesPage);
        waitFor(By.cssSelector(".draft .lead"));
        shot("9-series-at-200-percent");
        Object overflow = ((org.openqa.selenium.JavascriptExecutor) browser).executeScript(
                "return document.documentElement.scrollWidth - document.documentElement.clientWidth;");
        assertThat(((Number) overflow).intValue()).as("no sideways scrolling at 200 %").isLessThanOrEqualTo(0);
    }

    private static WebElement waitFor(By locator) {
        try {
            return new WebDriverWait(browser, Duration.ofSeconds(60)).until(d -> {
                List<WebElement> found = d.findElements(locator);
                return found.isEmpty() ? null : found.get(0);
            });
        } catch (org.openqa.selenium.TimeoutException e) {
            throw new AssertionError("no " + locator + " on " + browser.getCurrentUrl() + ":\n"
                    + browser.findElement(By.tagName("body")).getText(), e);
        }
    }

    /** What a download link gives, fetched with the browser's session cookie. */
    private static byte[] fetch(String href) throws IOException, InterruptedException {
        String cookie = browser.manage().getCookieNamed(Exchange.SESSION_COOKIE).getValue();
        HttpResponse<byte[]> response = HttpClient.newHttpClient().send(HttpRequest.newBuilder(URI.create(href))
                .header("Cookie", Exchange.SESSION_COOKIE + "=" + cookie).build(), HttpResponse.BodyHandlers.ofByteArray());
        assertThat(response.statusCode()).as(href).isEqualTo(200);
        assertThat(response.headers().firstValue("content-disposition")).hasValueSatisfying(v -> assertThat(v)
                .startsWith("attachment"));
        return response.body();
    }

    private static void shot(String name) throws IOException {
        byte[] png = ((org.openqa.selenium.TakesScreenshot) browser).getScreenshotAs(OutputType.BYTES);
        Files.write(SHOTS.resolve(name + ".png"), png);
    }
}
