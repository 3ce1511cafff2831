package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The typography a proof-reader would mark, checked on the text of every brief the demo writes
 * (one-series and combined), as PDFBox extracts it. The conventions are those of
 * {@code narrative.Formats} (common practice, no source).
 */
class BriefTypographyTest {

    @TempDir
    static Path folder;

    /** Each demo brief's file name and its text, lines kept, no-break spaces kept. */
    private static final Map<String, String> TEXTS = new LinkedHashMap<>();

    /** Each demo brief's file name and its words as printed, with their boxes and sizes. */
    private static final Map<String, List<PdfFacts.Word>> WORDS = new LinkedHashMap<>();

    /** Each demo brief's file name and the number of words on each of its pages. */
    private static final Map<String, List<Integer>> WORDS_BY_PAGE = new LinkedHashMap<>();

    /** Each demo brief's file name and the text of each of its pages. */
    private static final Map<String, List<String>> PAGES = new LinkedHashMap<>();

    @BeforeAll
    static void writeTheDemo() throws IOException {
        Run run = Run.of("demo", "--data", "demo-data", "--out", folder.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        try (Stream<Path> pdfs = Files.list(folder)) {
            for (Path pdf : pdfs.filter(p -> p.toString().endsWith(".pdf")).sorted().toList()) {
                TEXTS.put(pdf.getFileName().toString(), PdfFacts.of(pdf).text());
                WORDS.put(pdf.getFileName().toString(), PdfFacts.words(pdf));
                List<String> pages = PdfFacts.pageTexts(pdf);
                PAGES.put(pdf.getFileName().toString(), pages);
                WORDS_BY_PAGE.put(pdf.getFileName().toString(), pages.stream()
                        .map(page -> page.isBlank() ? 0 : page.trim().split("\\s+").length).toList());
            }
        }
        assertThat(TEXTS).hasSize(10);
    }

    /** Every place in any brief where {@code pattern} matches, with its file and a little context. */
    private static List<String> found(Pattern pattern) {
        List<String> hits = new ArrayList<>();
        TEXTS.forEach((file, text) -> {
            Matcher m = pattern.matcher(text);
            while (m.find()) {
                hits.add(file + ": \"" + text.substring(Math.max(0, m.start() - 30), Math.min(text.length(), m.end() + 10))
                        .replace('\n', '⏎') + "\"");
            }
        });
        return hits;
    }

    /**
     * Every word of every demo brief prints at 6.5 pt or more (our floor for paper,
     * {@code ChartStyle.MIN_PRINTED_LABEL_PT}), the labels of the charts included: a chart is drawn in
     * CSS pixels of 0.75 pt, so its 8-unit labels printed at 6 pt, the structural changes' dates
     * among them. Sizes read from the PDF (PDFBox, the text's scaling with the drawing's).
     */
    @Test
    void everyWordOfTheChartsAndTheTextPrintsAtALegibleSize() {
        List<String> small = new ArrayList<>();
        WORDS.forEach((file, words) -> words.stream().filter(w -> w.sizePt() < 6.5).forEach(w -> small.add(file
                + " page " + w.page() + ": \"" + w.text() + "\" at " + String.format(java.util.Locale.ROOT, "%.2f", w.sizePt()) + " pt")));
        assertThat(small).isEmpty();
    }

    /**
     * No two words of a page overlap: the dates of structural changes close together, and an
     * arrow's date beside them, are set in rows that clear each other (boxes read from the PDF).
     */
    @Test
    void noTwoWordsOfAPageOverlapTheChartsLabelsIncluded() {
        List<String> overlaps = new ArrayList<>();
        WORDS.forEach((file, words) -> {
            for (int i = 0; i < words.size(); i++) {
                for (int j = i + 1; j < words.size(); j++) {
                    if (words.get(i).overlaps(words.get(j))) {
                        overlaps.add(file + " page " + words.get(i).page() + ": \"" + words.get(i).text() + "\" and \""
                                + words.get(j).text() + "\"");
                    }
                }
            }
        });
        assertThat(overlaps).isEmpty();
    }

    @Test
    void noPageHoldsLittleMoreThanItsRunningHeadAndFoot() {
        // head and foot are about 20 words; a page the layout pushed a heading or a block onto alone
        // (a table kept whole though taller than a page once left one blank and one with a heading)
        // holds little more
        List<String> bare = new ArrayList<>();
        WORDS_BY_PAGE.forEach((file, words) -> {
            for (int k = 0; k < words.size(); k++) {
                if (words.get(k) < 40) {
                    bare.add(file + " page " + (k + 1) + ": " + words.get(k) + " words");
                }
            }
        });
        assertThat(bare).isEmpty();
    }

    @Test
    void theIrregularSectionsWordsShareThePageOfTheChartTheyIntroduce() {
        // the heading is a line of its own; the chart's caption, kept with the chart, opens with the same words
        Pattern heading = Pattern.compile("(?m)^\\s*Irregular fluctuation\\s*$");
        List<String> apart = new ArrayList<>();
        int sections = 0;
        for (Map.Entry<String, List<String>> brief : PAGES.entrySet()) {
            List<String> pages = brief.getValue();
            int words = -1;
            int chart = -1;
            for (int k = 0; k < pages.size(); k++) {
                words = words < 0 && heading.matcher(pages.get(k)).find() ? k : words;
                chart = chart < 0 && pages.get(k).contains("Irregular fluctuation: each period") ? k : chart;
            }
            if (words >= 0 && chart >= 0) {
                sections++;
                if (words != chart) {
                    apart.add(brief.getKey() + ": words on page " + (words + 1) + ", chart on page " + (chart + 1));
                }
            }
        }
        assertThat(apart).isEmpty();
        assertThat(sections).as("demo briefs with an irregular section and its chart").isGreaterThanOrEqualTo(7);
    }

    @Test
    void theGapToTheOldPathRecomputesFromTheTwoFiguresPrinted() {
        // "it would have reached about 48,600 by October 2026; the fitted level there, 45,171, is 7.1 % below
        // that": a reader divides the two printed figures (the rounding is Formats', common practice)
        Pattern gap = Pattern.compile("would have reached about ([\\d,]+)[^;]*; the fitted level\\s+there,\\s+([\\d,]+),"
                + "\\s+is\\s+([\\d.]+)\\s?%\\s+(below|above)");
        List<String> wrong = new ArrayList<>();
        int seen = 0;
        for (Map.Entry<String, String> brief : TEXTS.entrySet()) {
            Matcher m = gap.matcher(brief.getValue().replace('\u00A0', ' ').replace('\n', ' '));
            while (m.find()) {
                seen++;
                double path = Double.parseDouble(m.group(1).replace(",", ""));
                double level = Double.parseDouble(m.group(2).replace(",", ""));
                String recomputed = String.format(java.util.Locale.ROOT, "%.1f", Math.abs(100 * (level / path - 1)));
                if (!recomputed.equals(m.group(3)) || (level < path) != m.group(4).equals("below")) {
                    wrong.add(brief.getKey() + ": " + m.group() + " (recomputed " + recomputed + ")");
                }
            }
        }
        assertThat(seen).as("the demo's falls and returns state their old paths (demo-data/README.md)").isPositive();
        assertThat(wrong).isEmpty();
    }

    @Test
    void negativeNumbersCarryTheTrueMinusInTextTablesAndChartAxes() {
        // a hyphen-minus opening a number; one between digits (2024-03) or after a letter or hyphen
        // (a file name, a period label, a hash wrapped across lines) is not a minus sign
        assertThat(found(Pattern.compile("(?<![\\p{L}\\p{N}\\-_])-(?=\\d)"))).isEmpty();
        // the axes of the seasonal profile do show negative ticks, so the rule is exercised
        assertThat(TEXTS.get("guest-nights-total.pdf")).contains("\u221220");
    }

    @Test
    void noValueThatRoundsToZeroCarriesASign() {
        assertThat(found(Pattern.compile("(?<![\\p{L}\\p{N}.])[\\u2212+\\u00B1-]0(?:\\.0+)?(?!\\d|\\.\\d)"))).isEmpty();
    }

    @Test
    void noSpaceOrLineBreakComesBeforeThePunctuationAfterABracket() {
        assertThat(found(Pattern.compile("\\)\\s+[.,;]"))).isEmpty();
        assertThat(found(Pattern.compile("(?m)^[.,;]"))).isEmpty();
    }

    @Test
    void aChangeIsGivenByADirectionWordOrBySignButNotByBoth() {
        assertThat(found(Pattern.compile("\\b(?:up|down|rose|fell|higher|lower)\\s+(?:by\\s+)?[+\\u2212\\-]\\d"))).isEmpty();
        assertThat(found(Pattern.compile("[+\\u2212]\\d[\\d,.]*\\s?%?\\s(?:more|less|higher|lower)\\b"))).isEmpty();
        // the breaks of the demo are written with a word and a size
        assertThat(TEXTS.get("guest-nights-total.pdf").replaceAll("\\s+", " ")).containsPattern("\\b(?:up|down) \\d");
    }

    @Test
    void aNumberAndItsPercentSignAreJoinedByANoBreakSpace() {
        // on one line, or broken at the line's end (the ordinary space stays there); a page number at
        // a line's end followed by a chart's "% against …" axis title on the next is no such pair
        assertThat(found(Pattern.compile("\\d[ \\t]+\\n?%"))).isEmpty();
        assertThat(TEXTS.get("guest-nights-total.pdf")).containsPattern("\\d\\u00A0%");
    }

    @Test
    void theSoftwareVersionIsTheBuildsWithoutASnapshotQualifier() {
        assertThat(found(Pattern.compile("SNAPSHOT"))).isEmpty();
        assertThat(TEXTS.get("guest-nights-total.pdf")).contains("Annalist ");
    }
}
