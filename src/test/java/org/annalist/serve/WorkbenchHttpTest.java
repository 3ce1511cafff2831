package org.annalist.serve;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.InetAddress;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.cli.Main;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The workbench over plain HTTP: the brief it serves is the command line's to the byte, and each
 * safety rule holds (foreign Host, missing or wrong token, foreign Origin, oversized upload, names
 * that try to leave their folder in every parameter that takes one).
 */
class WorkbenchHttpTest {

    private static final String SECRET = "SECRET-OUTSIDE-THE-SERVED-FOLDER";
    private static final Path DEMO = Path.of("demo-data/quennelmark-guest-nights.csv").toAbsolutePath();
    private static final String TIME = "2026-11-20T08:00:00Z";
    /** Small enough to test, larger than the demo file (6 kB). */
    private static final long LIMIT = 64 * 1024;

    @TempDir
    static Path temp;

    private static Workbench workbench;
    private static RawHttp http;
    private static String cookie;
    private static String token;

    @BeforeAll
    static void start() throws IOException {
        Path served = Files.createDirectories(temp.resolve("served"));
        Files.copy(DEMO, served.resolve(DEMO.getFileName()));
        Files.writeString(served.resolve("routine.yaml"), "briefs:\n  - data: " + DEMO.getFileName() + "\n    series: Brevania\n"
                + "    output: market-{series}-{period}.pdf\n    generated_at: " + TIME + "\n");
        Path outside = Files.createDirectories(temp.resolve("outside"));
        Files.writeString(outside.resolve("secret.yaml"), "# " + SECRET + "\nbriefs: []\n");
        Files.writeString(outside.resolve("secret.txt"), SECRET);
        Files.createSymbolicLink(served.resolve("linked.yaml"), outside.resolve("secret.yaml"));
        workbench = Workbench.start(new Settings(InetAddress.getLoopbackAddress(), 0, served, LIMIT,
                Optional.of(Instant.parse(TIME)), Duration.ofHours(1)));
        http = new RawHttp(workbench.port());
        RawHttp.Answer home = http.get("/", null);
        cookie = home.session().orElseThrow();
        token = home.token();
    }

    @AfterAll
    static void stop() {
        workbench.close();
    }

    @Test
    void theServedPdfIsByteIdenticalToTheCommandLines() throws IOException {
        byte[] csv = Files.readAllBytes(DEMO);
        RawHttp.Answer opened = http.upload(cookie, token, DEMO.getFileName().toString(), csv);
        assertThat(opened.status()).isEqualTo(303);
        String file = opened.header("location").orElseThrow().replaceFirst(".*/file/", "");
        RawHttp.Answer made = http.postForm("/file/" + file + "/series/0/brief", cookie, "token=" + token);
        assertThat(made.status()).isEqualTo(303);
        String brief = made.header("location").orElseThrow().replaceFirst(".*/brief/", "");
        RawHttp.Answer page = http.get("/brief/" + brief, cookie);
        Matcher pdfLink = Pattern.compile("href=\"(/brief/" + brief + "/file/[^\"]+\\.pdf)\"").matcher(page.text());
        assertThat(pdfLink.find()).as(page.text()).isTrue();
        byte[] served = http.get(pdfLink.group(1), cookie).body();

        // the command line on a file of the same name (the brief names the file, not its folder)
        Path copy = Files.createDirectories(temp.resolve("cli")).resolve(DEMO.getFileName());
        Files.copy(DEMO, copy);
        Path out = temp.resolve("cli/total.pdf");
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"brief", copy.toString(), "--series", "Total", "-o", out.toString(),
            "--generated-at", TIME}, new PrintWriter(new StringWriter(), true), new PrintWriter(err, true));
        assertThat(code).as(err.toString()).isZero();
        assertThat(served).startsWith("%PDF".getBytes(StandardCharsets.US_ASCII)).isEqualTo(Files.readAllBytes(out));
    }

    @Test
    void aBriefMadeInTheBrowserNamesTheFileAsTheUserCalledItNotByTheServersFolder() throws IOException {
        // an invented note line below the data: the reader sets it aside with a warning naming file and line
        String csv = Files.readString(DEMO) + "Source: Quennelmark statistics office\n";
        int noteLine = Files.readAllLines(DEMO).size() + 1;
        RawHttp.Answer opened = http.upload(cookie, token, "visitors.csv", csv.getBytes(StandardCharsets.UTF_8));
        assertThat(opened.status()).isEqualTo(303);
        String file = opened.header("location").orElseThrow().replaceFirst(".*/file/", "");
        RawHttp.Answer made = http.postForm("/file/" + file + "/series/0/brief", cookie, "token=" + token);
        String brief = made.header("location").orElseThrow().replaceFirst(".*/brief/", "");
        String page = http.get("/brief/" + brief, cookie).text();
        Matcher links = Pattern.compile("href=\"(/brief/" + brief + "/file/[^\"]+)\"").matcher(page);
        String server = workbench.temporaryFolder().toString();
        int files = 0;
        while (links.find()) {
            byte[] body = http.get(links.group(1), cookie).body();
            String text = links.group(1).endsWith(".pdf") ? pdfText(body) : new String(body, StandardCharsets.UTF_8);
            assertThat(text).as(links.group(1)).doesNotContain(server).doesNotContain("annalist-serve-");
            if (links.group(1).endsWith(".pdf")) {
                // the page words a reading warning as a sentence that names the file and line
                assertThat(text.replaceAll("\\s+", " ")).contains("Line set aside as a note below the data",
                        "(visitors.csv, line " + noteLine + ")");
            }
            files++;
        }
        assertThat(files).as(page).isGreaterThan(1);
        assertThat(page).contains("visitors.csv:" + noteLine).doesNotContain(server);
    }

    @Test
    void aLogoGivenOnTheSeriesPageIsPrintedInTheBriefAsTheCommandLinePrintsIt() throws IOException {
        // an invented two-colour mark, made here
        java.awt.image.BufferedImage mark = new java.awt.image.BufferedImage(60, 24, java.awt.image.BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g = mark.createGraphics();
        g.setColor(java.awt.Color.WHITE);
        g.fillRect(0, 0, 60, 24);
        g.setColor(new java.awt.Color(20, 60, 120));
        g.fillRect(4, 4, 20, 16);
        g.dispose();
        Path logo = Files.createDirectories(temp.resolve("logo-cli")).resolve("mark.png");
        javax.imageio.ImageIO.write(mark, "png", logo.toFile());

        String file = opened(DEMO.getFileName().toString(), Files.readAllBytes(DEMO));
        RawHttp.Answer given = http.multipart("/file/" + file + "/extras", cookie,
                new java.util.LinkedHashMap<>(Map.of("token", token, "index", "0")), "logo", "mark.png",
                Files.readAllBytes(logo));
        assertThat(given.status()).as(given.text()).isEqualTo(303);
        assertThat(http.get("/file/" + file + "/series/0", cookie).text()).contains("In use: mark.png")
                .contains("src=\"data:image/png;base64,").doesNotContain(workbench.temporaryFolder().toString());
        byte[] served = pdfOf(file);
        try (org.apache.pdfbox.pdmodel.PDDocument document = org.apache.pdfbox.Loader.loadPDF(served)) {
            var resources = document.getPage(0).getResources();
            boolean image = false;
            for (var name : resources.getXObjectNames()) {
                image |= resources.getXObject(name) instanceof org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject;
            }
            assertThat(image).as("an image on page 1").isTrue();
        }

        Path copy = Files.createDirectories(temp.resolve("logo-cli/data")).resolve(DEMO.getFileName());
        Files.copy(DEMO, copy);
        Path out = temp.resolve("logo-cli/total.pdf");
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"brief", copy.toString(), "--series", "Total", "--logo", logo.toString(),
            "-o", out.toString(), "--generated-at", TIME}, new PrintWriter(new StringWriter(), true),
            new PrintWriter(err, true));
        assertThat(code).as(err.toString()).isZero();
        assertThat(served).isEqualTo(Files.readAllBytes(out));

        // a file that is not a picture is refused on the page, and the logo in use stays
        RawHttp.Answer bad = http.multipart("/file/" + file + "/extras", cookie,
                new java.util.LinkedHashMap<>(Map.of("token", token, "index", "0")), "logo", "notes.png",
                "not a picture".getBytes(StandardCharsets.UTF_8));
        assertThat(bad.status()).isEqualTo(422);
        assertThat(bad.text()).contains("notes.png").contains("expected a PNG, JPEG or GIF file")
                .contains("In use: mark.png").doesNotContain("Exception").doesNotContain(workbench.temporaryFolder().toString());
    }

    @Test
    void aBrokenHolidaysFileIsShownWithItsLineAndNotUsed() throws IOException {
        String file = opened(DEMO.getFileName().toString(), Files.readAllBytes(DEMO));
        String holidays = "date,name\n2024-05-14,Lantern festival\n2024-13-40,Harbour days\n";
        RawHttp.Answer given = http.multipart("/file/" + file + "/extras", cookie,
                new java.util.LinkedHashMap<>(Map.of("token", token, "index", "0", "horizon", "6")), "holidays",
                "festivals.csv", holidays.getBytes(StandardCharsets.UTF_8));
        assertThat(given.status()).isEqualTo(422);
        assertThat(given.text()).contains("festivals.csv").contains("line 3").contains("is not a date; expected YYYY-MM-DD")
                .contains("None in use.").contains("value=\"6\"").doesNotContain("Exception")
                .doesNotContain(workbench.temporaryFolder().toString());
        // a file over the upload limit is refused and said so, as a data file is
        byte[] big = new byte[(int) LIMIT * 2];
        java.util.Arrays.fill(big, (byte) '1');
        RawHttp.Answer oversized = http.multipart("/file/" + file + "/extras", cookie,
                new java.util.LinkedHashMap<>(Map.of("token", token, "index", "0")), "holidays", "big.csv", big);
        assertThat(oversized.status()).isEqualTo(413);
        assertThat(oversized.text()).contains("too large");
        // without its token the same request changes nothing
        assertThat(http.multipart("/file/" + file + "/extras", cookie, new java.util.LinkedHashMap<>(Map.of("index", "0")),
                "holidays", "festivals.csv", holidays.getBytes(StandardCharsets.UTF_8)).status()).isEqualTo(403);
        // a good file is used: the page names it, and the brief is made with it
        String good = "date,name\n2024-05-14,Lantern festival\n2025-05-13,Lantern festival\n";
        RawHttp.Answer used = http.multipart("/file/" + file + "/extras", cookie,
                new java.util.LinkedHashMap<>(Map.of("token", token, "index", "0")), "holidays", "festivals.csv",
                good.getBytes(StandardCharsets.UTF_8));
        assertThat(used.status()).as(used.text()).isEqualTo(303);
        assertThat(http.get("/file/" + file + "/series/0", cookie).text()).contains("In use: festivals.csv");
        assertThat(pdfOf(file)).startsWith("%PDF".getBytes(StandardCharsets.US_ASCII));
    }

    private static String opened(String name, byte[] content) throws IOException {
        RawHttp.Answer opened = http.upload(cookie, token, name, content);
        assertThat(opened.status()).isEqualTo(303);
        return opened.header("location").orElseThrow().replaceFirst(".*/file/", "");
    }

    /** The PDF of the file's first series made with the default settings. */
    private static byte[] pdfOf(String file) throws IOException {
        RawHttp.Answer made = http.postForm("/file/" + file + "/series/0/brief", cookie, "token=" + token);
        assertThat(made.status()).isEqualTo(303);
        String brief = made.header("location").orElseThrow().replaceFirst(".*/brief/", "");
        Matcher pdfLink = Pattern.compile("href=\"(/brief/" + brief + "/file/[^\"]+\\.pdf)\"")
                .matcher(http.get("/brief/" + brief, cookie).text());
        assertThat(pdfLink.find()).isTrue();
        return http.get(pdfLink.group(1), cookie).body();
    }

    private static String pdfText(byte[] pdf) throws IOException {
        try (org.apache.pdfbox.pdmodel.PDDocument document = org.apache.pdfbox.Loader.loadPDF(pdf)) {
            return new org.apache.pdfbox.text.PDFTextStripper().getText(document).replace('\n', ' ');
        }
    }

    @Test
    void aForeignHostHeaderIsRefusedBeforeAnythingElse() throws IOException {
        for (String host : List.of("rebound.example:" + workbench.port(), "127.0.0.1:1", "127.0.0.1", "localhost.example")) {
            RawHttp.Answer answer = http.send("GET", "/", host, null, Map.of(), new byte[0]);
            assertThat(answer.status()).as(host).isEqualTo(403);
            assertThat(answer.session()).as("no session for " + host).isEmpty();
        }
        assertThat(http.send("GET", "/", null, null, Map.of(), new byte[0]).status()).isIn(400, 403);
        assertThat(http.send("GET", "/", "localhost:" + workbench.port(), null, Map.of(), new byte[0]).status())
                .isEqualTo(200);
    }

    @Test
    void aStateChangingRequestWithoutTheTokenIsRefused() throws IOException {
        String[] posts = {"/end", "/routine/run", "/file/f1/close"};
        for (String target : posts) {
            assertThat(http.postForm(target, cookie, "name=routine.yaml").status()).as(target).isEqualTo(403);
            assertThat(http.postForm(target, cookie, "name=routine.yaml&token=0000").status()).as(target).isEqualTo(403);
            assertThat(http.postForm(target, null, "name=routine.yaml&token=" + token).status()).as(target)
                    .isEqualTo(403);
        }
        assertThat(http.upload(cookie, null, "a.csv", "period,value\n2024-01,1\n".getBytes(StandardCharsets.UTF_8))
                .status()).isEqualTo(403);
        assertThat(http.upload(cookie, "0123", "a.csv", "period,value\n2024-01,1\n".getBytes(StandardCharsets.UTF_8))
                .status()).isEqualTo(403);
        // a page of another site that holds the token still names itself in Origin
        RawHttp.Answer foreign = http.send("POST", "/routine/run", http.host(), cookie,
                Map.of("Content-Type", "application/x-www-form-urlencoded", "Origin", "http://elsewhere.example"),
                ("name=routine.yaml&token=" + token).getBytes(StandardCharsets.UTF_8));
        assertThat(foreign.status()).isEqualTo(403);
        // the session is still there: none of these ended it
        assertThat(http.get("/", cookie).session()).isEmpty();
    }

    @Test
    void anOversizedUploadIsRefusedAndSaidSo() throws IOException {
        byte[] big = new byte[(int) LIMIT * 3];
        java.util.Arrays.fill(big, (byte) '1');
        RawHttp.Answer answer = http.upload(cookie, token, "big.csv", big);
        assertThat(answer.status()).isEqualTo(413);
        assertThat(answer.text()).contains("too large").contains("up to 0 MB".equals("") ? "" : "MB");
        assertThat(http.get("/", cookie).text()).contains("up to").doesNotContain("big.csv");
    }

    @Test
    void noNameFromTheBrowserLeavesItsFolder() throws IOException {
        List<String> names = List.of("../outside/secret.yaml", "..%2Foutside%2Fsecret.yaml", "%2E%2E/outside/secret.yaml",
                temp.resolve("outside/secret.yaml").toString(), "linked.yaml", "./routine.yaml/../../outside/secret.yaml",
                "..\\outside\\secret.yaml", "routine.yaml%00.txt");
        for (String name : names) {
            String encoded = java.net.URLEncoder.encode(name, StandardCharsets.UTF_8);
            RawHttp.Answer spec = http.get("/routine/spec?name=" + encoded, cookie);
            assertThat(spec.status()).as(name).isEqualTo(404);
            assertThat(spec.text()).doesNotContain(SECRET);
            RawHttp.Answer run = http.postForm("/routine/run", cookie, "token=" + token + "&name=" + encoded);
            assertThat(run.status()).as(name).isEqualTo(404);
        }
        assertThat(http.get("/routine", cookie).text()).contains("routine.yaml").doesNotContain("linked.yaml");
        assertThat(http.get("/routine/spec?name=routine.yaml", cookie).status()).isEqualTo(200);
        List<String> targets = List.of("/brief/b1/file/..%2F..%2F..%2Foutside%2Fsecret.txt",
                "/brief/b1/file/%2E%2E%2Fsecret.txt", "/brief/b1/page/..%2F1.png", "/run/r1/file/..%2Fsecret.txt",
                "/file/..%2Ff1", "/file/f1/series/..%2F0", "/static/..%2Fhome.ftlh", "/static/..%2F..%2Fjetty-logging.properties",
                "/" + temp.resolve("outside/secret.txt"), "/routine/spec/..%2F..%2Fsecret.txt");
        for (String target : targets) {
            RawHttp.Answer answer = http.get(target, cookie);
            assertThat(answer.status()).as(target).isIn(400, 404);
            assertThat(answer.text()).as(target).doesNotContain(SECRET);
        }
        RawHttp.Answer raw = http.send("GET", "/static/../../../outside/secret.txt", http.host(), cookie, Map.of(),
                new byte[0]);
        assertThat(raw.status()).isIn(400, 404);
        assertThat(raw.text()).doesNotContain(SECRET);
    }

    @Test
    void everyPageCarriesTheTokenAndForbidsOtherSitesScripts() throws IOException {
        RawHttp.Answer home = http.get("/", cookie);
        assertThat(home.token()).isEqualTo(token);
        assertThat(home.header("content-security-policy").orElseThrow()).contains("default-src 'none'")
                .contains("frame-ancestors 'self'");
        assertThat(home.header("x-content-type-options")).contains("nosniff");
    }
}
