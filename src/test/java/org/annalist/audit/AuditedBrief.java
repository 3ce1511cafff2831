package org.annalist.audit;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.findings.Analyst;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.Findings;
import org.annalist.findings.FindingsJson;
import org.annalist.narrative.AnalystNotes;
import org.annalist.narrative.BriefViews;
import org.annalist.narrative.JsonTerms;
import org.annalist.narrative.Masthead;
import org.annalist.narrative.SourceFacts;
import org.annalist.narrative.TemplateEngine;
import org.annalist.series.Series;

/**
 * One series taken through the whole pipeline up to the brief's text: its findings, the findings
 * JSON, {@code analyze}'s notes, and the brief as the template writes it (the XHTML the PDF is laid
 * out from, its tags removed). Every statement the audit checks is read from these.
 *
 * @param html the brief's XHTML, for the parts a check finds by their class (the lead, the key figures)
 * @param text the brief's words, tags removed, entities decoded, white space collapsed (no-break spaces kept)
 */
record AuditedBrief(String label, Series series, Findings findings, JsonNode json, String notes, String html,
                    String text) {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final TemplateEngine TEMPLATES = new TemplateEngine(Optional.empty());
    private static final Instant MADE = Instant.parse("2026-11-20T08:00:00Z");

    static AuditedBrief of(String label, Series series) {
        return of(label, series, new Analyst().analyse(series));
    }

    static AuditedBrief of(String label, Series series, Findings findings) {
        try {
            JsonNode json = JSON.readTree(FindingsJson.write(findings, JsonTerms.ENGLISH));
            SourceFacts source = new SourceFacts("planted.csv", "0".repeat(64), series.size() + 1,
                    new SourceFacts.Reading("UTF-8", "comma", "wide", "YYYY-MM", Optional.empty(), Optional.empty(),
                            Optional.empty(), Optional.empty()), List.of(), "", Optional.empty());
            Masthead masthead = new Masthead("", "", Locale.UK, Masthead.Paper.A4, MADE, "Annalist", Optional.empty());
            String html = TEMPLATES.render(TemplateEngine.BRIEF_TEMPLATE,
                    BriefViews.of(series, findings, FigurePlan.of(series, findings), source, masthead), Locale.UK);
            return new AuditedBrief(label, series, findings, json, AnalystNotes.of(findings), html, words(html));
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** The words of the element with this class (the first one), or empty. */
    String section(String cssClass) {
        Matcher m = Pattern.compile("<(\\w+) [^>]*class=\"" + Pattern.quote(cssClass) + "\"[^>]*>(.*?)</\\1>",
                Pattern.DOTALL).matcher(html);
        return m.find() ? words(m.group(2)) : "";
    }

    /** The brief's words before its appendix of methods and rules (which quotes thresholds in %). */
    String body() {
        int appendix = html.indexOf("id=\"appendix\"");
        return appendix < 0 ? text : words(html.substring(0, appendix));
    }

    static String words(String html) {
        String noStyle = html.replaceAll("(?s)<style.*?</style>", " ").replaceAll("(?s)<head>.*?</head>", " ");
        String text = noStyle.replaceAll("(?s)<[^>]+>", " ")
                .replace("&#160;", "\u00a0").replace("&nbsp;", "\u00a0").replace("&#8722;", "\u2212")
                .replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"").replace("&#39;", "'").replace("&apos;", "'")
                .replace("&amp;", "&");
        return text.replaceAll("[ \\t\\r\\n]+", " ").trim();
    }

    @Override
    public String toString() {
        return label;
    }
}
