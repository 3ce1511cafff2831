package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.sun.net.httpserver.HttpServer;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.zip.CRC32;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The renderer's sandbox, end to end: a user's template may use files inside its own folder (by
 * real path) and the logo named, nothing else; what it may not use fails the brief with exit 2 and
 * a message naming the template's line and what was refused, and no brief is written.
 */
class TemplateSandboxTest {

    private static final String DATA = "src/test/resources/reference/Nile.csv";
    private static final String HEAD = "<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\"><head><title>T</title></head><body>\n";

    @TempDir
    Path folder;

    private Path templates(String body) throws IOException {
        Path templates = Files.createDirectories(folder.resolve("templates"));
        Files.writeString(templates.resolve("brief.ftlx"), HEAD + "<p>Brief</p>\n" + body + "\n</body></html>\n");
        return templates;
    }

    private Run brief(Path templates, String... more) {
        String[] args = {"brief", DATA, "-o", folder.resolve("out.pdf").toString(), "--templates", templates.toString()};
        String[] all = java.util.Arrays.copyOf(args, args.length + more.length);
        System.arraycopy(more, 0, all, args.length, more.length);
        return Run.of(all);
    }

    private static byte[] png(int width, int height) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ImageIO.write(new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB), "png", out);
        return out.toByteArray();
    }

    /** A 1×1 PNG whose header claims {@code width × height} pixels (the CRC fixed, so readers trust it). */
    private static byte[] pngClaiming(int width, int height) throws IOException {
        byte[] png = png(1, 1);
        ByteBuffer b = ByteBuffer.wrap(png);
        b.putInt(16, width).putInt(20, height);   // IHDR data starts at byte 16 (8 signature + 4 length + 4 type)
        CRC32 crc = new CRC32();
        crc.update(png, 12, 17);                  // type and 13 bytes of data
        b.putInt(29, (int) crc.getValue());
        return png;
    }

    @Test
    void anImageInsideTheTemplateFolderIsUsed() throws IOException {
        Path templates = templates("<img src=\"inside.png\" alt=\"inside\"/>");
        Files.write(templates.resolve("inside.png"), png(8, 8));
        Run run = brief(templates);
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(folder.resolve("out.pdf")).exists();
    }

    @Test
    void aFileOutsideTheTemplateFolderIsRefusedAndNotEmbedded() throws IOException {
        Files.writeString(folder.resolve("secret.css"), "body { color: red } /* SECRET-MARKER */");
        Files.write(folder.resolve("outside.png"), png(8, 8));
        Path templates = templates("<img src=\"../outside.png\" alt=\"outside\"/>");
        Run run = brief(templates);
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains("brief.ftlx:3: it uses " + folder.resolve("outside.png").toRealPath())
                .contains("outside its template folder").doesNotContain("Exception");
        assertThat(folder.resolve("out.pdf")).doesNotExist();

        Path css = templates("<p>x</p>");
        Files.writeString(css.resolve("brief.ftlx"), HEAD.replace("</head>",
                "<link rel=\"stylesheet\" href=\"" + folder.resolve("secret.css").toUri() + "\"/></head>") + "<p>x</p></body></html>");
        Run styled = brief(css);
        assertThat(styled.exitCode()).as(styled.err()).isEqualTo(2);
        assertThat(styled.err()).contains("brief.ftlx:1: it uses").contains("secret.css");
    }

    @Test
    void aSymlinkInsideTheFolderThatLeadsOutsideIsRefused() throws IOException {
        Files.write(folder.resolve("outside.png"), png(8, 8));
        Path templates = templates("<img src=\"logo.png\" alt=\"logo\"/>");
        Files.createSymbolicLink(templates.resolve("logo.png"), folder.resolve("outside.png"));
        Run run = brief(templates);
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains("brief.ftlx:3:").contains("which leads to").contains("outside its template folder");
        assertThat(folder.resolve("out.pdf")).doesNotExist();
    }

    @Test
    void anHttpUrlIsNeverFetched() throws IOException {
        AtomicInteger requests = new AtomicInteger();
        HttpServer server = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), 0), 0);
        server.createContext("/", exchange -> {
            requests.incrementAndGet();
            exchange.sendResponseHeaders(404, -1);
            exchange.close();
        });
        server.start();
        try {
            String base = "http://127.0.0.1:" + server.getAddress().getPort();
            Path templates = templates("<img src=\"" + base + "/logo.png\" alt=\"remote\"/>\n"
                    + "<div style=\"background-image: url('" + base + "/bg.png')\">x</div>");
            Run run = brief(templates);
            assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
            assertThat(run.err()).contains("brief.ftlx:3: it uses " + base + "/logo.png").contains("fetches nothing");
            assertThat(requests.get()).isZero();
        } finally {
            server.stop(0);
        }
    }

    @Test
    void devZeroAndOtherSchemesAreRefusedAtOnce() throws IOException {
        for (String url : new String[] {"file:///dev/zero", "jar:file:/tmp/x.jar!/a.png", "ftp://127.0.0.1/a.png"}) {
            Run run = brief(templates("<img src=\"" + url + "\" alt=\"x\"/>"));
            assertThat(run.exitCode()).as(url + ": " + run.err()).isEqualTo(2);
            assertThat(run.err()).as(url).contains("brief.ftlx:3: it uses");
        }
    }

    @Test
    void anImageDeclaringTooManyPixelsIsRefusedBeforeDecoding() throws IOException {
        Path huge = folder.resolve("huge.png");
        Files.write(huge, pngClaiming(30000, 23000));
        Run logo = Run.of("brief", DATA, "-o", folder.resolve("out.pdf").toString(), "--logo", huge.toString());
        assertThat(logo.exitCode()).as(logo.err()).isEqualTo(2);
        assertThat(logo.err()).contains("--logo: logo huge.png is too large: it declares 30000 × 23000 pixels; the limit is 40 megapixels");

        Path templates = templates("<img src=\"huge.png\" alt=\"huge\"/>");
        Files.copy(huge, templates.resolve("huge.png"));
        Run inTemplate = brief(templates);
        assertThat(inTemplate.exitCode()).as(inTemplate.err()).isEqualTo(2);
        assertThat(inTemplate.err()).contains("brief.ftlx:3:").contains("30000 × 23000 pixels");
    }

    @Test
    void xhtmlThatIsNotWellFormedNamesTheTemplateLine() throws IOException {
        Run run = brief(templates("<p>one</p>\n<p>two <b>unclosed</p>"));
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains("brief.ftlx:4: the XHTML it writes is not well-formed").doesNotContain("at ");
    }

    @Test
    void anEndlessListAndEndlessRecursionAreTemplateProblems() throws IOException {
        // a kilobyte a turn, so that the 8 MB are reached quickly
        Run list = brief(templates("<#list 1.. as i><p>${i} " + "x".repeat(1000) + "</p></#list>"));
        assertThat(list.exitCode()).as(list.err()).isEqualTo(2);
        assertThat(list.err()).contains("brief.ftlx:3: the template wrote more than 8 MB of XHTML");

        Run recursion = brief(templates("<#macro m><@m/></#macro><@m/>"));
        assertThat(recursion.exitCode()).as(recursion.err()).isEqualTo(2);
        assertThat(recursion.err()).contains("the template nested too deeply").doesNotContain("StackOverflowError");
    }
}
