package org.annalist.serve;

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

    private DraftFragment() {
    }

    static String of(BriefPipeline.Preview preview) {
        Matcher body = BODY.matcher(preview.xhtml());
        String html = body.find() ? body.group(1) : "";
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

    private static final Pattern SVG_ID = Pattern.compile("\\bid=\"([^\"]+)\"");
    private static final Pattern SVG_REF = Pattern.compile("(url\\(#|href=\"#)([^)\"]+)");

    /** Each chart's ids (its clip paths) made its own, so that two charts on one page do not share them. */
    static String ownIds(String svg, String prefix) {
        String renamed = SVG_ID.matcher(svg).replaceAll(m -> Matcher.quoteReplacement("id=\"" + prefix + m.group(1) + "\""));
        return SVG_REF.matcher(renamed).replaceAll(m -> Matcher.quoteReplacement(m.group(1) + prefix + m.group(2)));
    }
}
