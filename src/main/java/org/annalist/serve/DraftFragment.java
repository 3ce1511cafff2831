package org.annalist.serve;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.brief.BriefPipeline;

/**
 * The brief's own page, as its template words it, made a part of a web page: the body of the
 * brief's XHTML without the print-only running title and footer, each chart placeholder replaced by
 * the chart as inline SVG with the template's alternative text. The words are the brief's; nothing
 * here writes any. The template escaped every value it placed, and the charts' SVG is written by a
 * DOM serialiser, so the fragment can be placed as it is.
 */
final class DraftFragment {

    private static final Pattern BODY = Pattern.compile("(?s)<body[^>]*>(.*)</body>");
    private static final Pattern PRINT_ONLY = Pattern.compile("(?s)<div id=\"(?:running-title|footer)\">.*?</div>");
    private static final Pattern CHART = Pattern.compile("(?s)<object\\b([^>]*)>\\s*</object>");
    private static final Pattern CHART_ID = Pattern.compile("data-chart=\"([a-z0-9-]+)\"");
    private static final Pattern ALT = Pattern.compile("\\balt=\"([^\"]*)\"");
    private static final Pattern XML_DECLARATION = Pattern.compile("^<\\?xml[^>]*\\?>\\s*");
    /** The brief's ids are given a prefix, so that they cannot clash with the page's own. */
    private static final Pattern ID = Pattern.compile("\\b(id|href)=\"(#?)([A-Za-z][\\w-]*)\"");
    /** A picture the brief takes from a file (the logo): a web page may not, and must not learn the server's folders. */
    private static final Pattern FILE_IMAGE = Pattern.compile("<img\\b[^>]*\\bsrc=\"file:[^\"]*\"[^>]*>");

    private DraftFragment() {
    }

    /**
     * The fragment; the logo, when the brief has one, is placed as a {@code data:} picture (the page's
     * policy allows no other source), so that the page names no file of the server's.
     */
    static String of(BriefPipeline.Preview preview, Optional<Path> logo) {
        Matcher body = BODY.matcher(preview.xhtml());
        String html = body.find() ? body.group(1) : "";
        if (logo.isPresent()) {
            html = html.replace("src=\"" + logo.get().toAbsolutePath().toUri() + "\"", "src=\"" + dataUri(logo.get()) + "\"");
        }
        html = FILE_IMAGE.matcher(html).replaceAll("");
        html = PRINT_ONLY.matcher(html).replaceAll("");
        html = ID.matcher(html).replaceAll(m -> m.group(1).equals("href") && m.group(2).isEmpty()
                ? Matcher.quoteReplacement(m.group()) : m.group(1) + "=\"" + m.group(2) + "brief-" + m.group(3) + "\"");
        Matcher chart = CHART.matcher(html);
        StringBuilder out = new StringBuilder();
        int charts = 0;
        while (chart.find()) {
            Matcher id = CHART_ID.matcher(chart.group(1));
            Matcher alt = ALT.matcher(chart.group(1));
            String svg = id.find() ? preview.charts().getOrDefault(id.group(1), "") : "";
            svg = ownIds(XML_DECLARATION.matcher(svg).replaceFirst(""), "chart" + (++charts) + "-");
            chart.appendReplacement(out, Matcher.quoteReplacement("<div class=\"chart\" role=\"img\" aria-label=\""
                    + (alt.find() ? alt.group(1) : "") + "\">" + svg + "</div>"));
        }
        chart.appendTail(out);
        return out.toString();
    }

    /** The logo as a {@code data:} address, its type from its first bytes (it passed the brief's check). */
    private static String dataUri(Path logo) {
        try {
            byte[] bytes = Files.readAllBytes(logo);
            String type = bytes.length > 3 && (bytes[0] & 0xFF) == 0x89 && bytes[1] == 'P' ? "image/png"
                    : bytes.length > 3 && (bytes[0] & 0xFF) == 0xFF && (bytes[1] & 0xFF) == 0xD8 ? "image/jpeg"
                    : bytes.length > 3 && bytes[0] == 'G' && bytes[1] == 'I' && bytes[2] == 'F' ? "image/gif"
                    : "application/octet-stream";
            return "data:" + type + ";base64," + Base64.getEncoder().encodeToString(bytes);
        } catch (IOException e) {
            return "";   // deleted meanwhile: no picture rather than a broken page
        }
    }

    private static final Pattern SVG_ID = Pattern.compile("\\bid=\"([^\"]+)\"");
    private static final Pattern SVG_REF = Pattern.compile("(url\\(#|href=\"#)([^)\"]+)");

    /** Each chart's ids (its clip paths) made its own, so that two charts on one page do not share them. */
    static String ownIds(String svg, String prefix) {
        String renamed = SVG_ID.matcher(svg).replaceAll(m -> Matcher.quoteReplacement("id=\"" + prefix + m.group(1) + "\""));
        return SVG_REF.matcher(renamed).replaceAll(m -> Matcher.quoteReplacement(m.group(1) + prefix + m.group(2)));
    }
}
