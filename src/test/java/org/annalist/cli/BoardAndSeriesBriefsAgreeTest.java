package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.narrative.Formats;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The board's brief of the demo ({@link DemoBoardBrief}) beside each series' own brief, made from
 * the same file with {@code annalist brief --series}: the board's account of a series carries the
 * level finding its own brief gives (where the level stands against the path it was on before a
 * fall), calls a next-year change a fall or a rise by the same rule, names the base of every
 * percentage it prints, and says in each chart's caption what each mark means.
 */
class BoardAndSeriesBriefsAgreeTest {

    @TempDir
    static Path folder;

    private static final List<String> SERIES = List.of("Total", "Domestic", "Brevania", "Long-haul");
    private static final String TIME = "2026-11-20T08:00:00Z";

    private static String board;
    private static final Map<String, String> OWN = new LinkedHashMap<>();

    @BeforeAll
    static void makeTheBoardAndEachSeriesBrief() throws IOException {
        board = words(DemoBoardBrief.makeIn(folder));
        for (String series : SERIES) {
            Path pdf = folder.resolve("own-" + series + ".pdf");
            Run run = Run.of("brief", "demo-data/quennelmark-guest-nights.csv", "--series", series, "-o", pdf.toString(),
                    "--generated-at", TIME);
            assertThat(run.exitCode()).as(run.out() + run.err()).isZero();
            OWN.put(series, words(pdf));
        }
    }

    /** The text as read, no-break spaces as spaces, one space between words, a hyphen split at a line's end rejoined. */
    private static String words(Path pdf) throws IOException {
        return PdfFacts.of(pdf).text().replace('\u00A0', ' ').replaceAll("\\s+", " ").replaceAll("(\\p{L})- (\\p{L})", "$1-$2");
    }

    private static JsonNode findings(String series) throws IOException {
        return new ObjectMapper().readTree(folder.resolve("board-2026-10-" + series.toLowerCase(Locale.ROOT)
                + ".findings.json").toFile());
    }

    /** The board's section of one series: from its heading's first sentence to the next section or the guide. */
    private static String section(String series) {
        int from = board.indexOf(series + " In October 2026 " + series + " stood at");
        assertThat(from).as("the section of " + series).isNotNegative();
        int to = board.length();
        for (String other : SERIES) {
            int next = board.indexOf(other + " In October 2026 " + other + " stood at", from + 1);
            to = next > from ? Math.min(to, next) : to;
        }
        int guide = board.indexOf("Reading guide", from);
        return board.substring(from, Math.min(to, guide < 0 ? to : guide));
    }

    /**
     * The demo's home market fell in January 2021 and climbed back to about its old level, which is
     * still below the path it was on: its own brief says so ("5.1 % below that"), and the board's
     * section of it must too, in the same words, as must every series' section whose brief says it.
     * The check values are the own briefs' sentences, made in the test.
     */
    @Test
    void eachSeriesSectionOfTheBoardCarriesTheOldPathFindingOfItsOwnBrief() {
        Pattern oldPath = Pattern.compile("Had the level gone on as before the (?:fall|rise) .*? is [0-9.]+ % (?:below|above) that\\.");
        int told = 0;
        for (String series : SERIES) {
            Matcher m = oldPath.matcher(OWN.get(series));
            if (m.find()) {
                told++;
                assertThat(section(series)).as(series).contains(m.group());
            }
        }
        assertThat(told).as("the demo's series that fell in January 2021 and rose back").isEqualTo(4);
        assertThat(section("Domestic")).contains("is 5.1 % below that.");
    }

    /**
     * A next-year change is called a fall or a rise by one rule in both briefs: clear only where its
     * 80 % interval (from the findings) leaves out no change. The demo's Domestic −1.0 % has an
     * interval from below to above zero: no clear fall in its brief, in its board section, and marked
     * in the board's table; nowhere does it "point down".
     */
    @Test
    void theBoardAndTheSeriesOwnBriefCallANextYearChangeClearByTheSameRule() throws IOException {
        Formats f = Formats.forValues(new double[] {1}, Locale.ENGLISH);
        int unclear = 0;
        for (String series : SERIES) {
            JsonNode change = findings(series).at("/outlook/next_year_change");
            double pct = change.get("pct").asDouble();
            double lo = change.get("pct_lo80").asDouble();
            double hi = change.get("pct_hi80").asDouble();
            String way = pct < 0 ? "fall" : "rise";
            String figure = f.signedPercent(pct).replace('\u00A0', ' ');
            boolean holdsNoChange = lo <= 0 && 0 <= hi;
            String own = OWN.get(series);
            String section = section(series);
            if (holdsNoChange) {
                unclear++;
                assertThat(board).contains(figure + "\u2020");
                for (String text : List.of(own, section)) {
                    assertThat(text).as(series).doesNotContain("Next year's " + figure + " is a clear " + way)
                            .doesNotContain("Next year's " + figure + " points");
                }
                // where the brief sets the change against the trend it says which way, and how clearly
                if (Pattern.compile("Next year's " + Pattern.quote(figure) + " (?:is (?:a|no) clear|points|is a (?:fall|rise))")
                        .matcher(own).find()) {
                    assertThat(own).as(series).contains("Next year's " + figure + " is no clear " + way + " (its 80 % interval, "
                            + f.signedPercent(lo).replace('\u00A0', ' ') + " to " + f.signedPercent(hi).replace('\u00A0', ' ')
                            + ", includes no change)");
                }
            } else {
                assertThat(board).doesNotContain(figure + "\u2020");
                assertThat(own + section).as(series).doesNotContain("is no clear " + way);
            }
        }
        assertThat(unclear).as("the demo's four outlooks all hold no change").isEqualTo(4);
        assertThat(OWN.get("Domestic")).contains("Next year's −1.0 % is no clear fall (its 80 % interval, −4.2 % to +2.2 %,"
                + " includes no change)");
        assertThat(section("Domestic")).contains("Next year's −1.0 % is no clear fall (its 80 % interval includes no change)");
        assertThat(board).contains("so none of them is a clear rise or a clear fall");
    }

    /**
     * Every percentage the board's prose prints names its base in the words beside it (the same
     * sentence or clause): against a year earlier, the yearly average, the level just before
     * a change, what trend and season predict, the outcome, the current year's estimate, an old path,
     * the total. A probability ("80 % interval") is its own base; a rate is "% a year". The base-less
     * forms the board once printed, "(+55 %)", "(step up 9.8 %)", "July 2019 (+26.7 %)", "within
     * ±1.7 %.", fail this.
     */
    @Test
    void everyPercentageInTheBoardsProseNamesItsBase() {
        List<String> bases = List.of("than in", "a year earlier", "against the yearly average", "on the fitted level just before",
                "its level just before", "against what trend", "of the outcome", "on the estimate for", "on its estimate for",
                "on their estimates for", "% interval", "interval of the change", "of the step", "below that", "above that",
                "of it", "of the total", "below Total's", "above Total's", "fell by about", "rose by about",
                "on the current year");
        String prose = board.substring(board.indexOf("Rows in the order"), board.indexOf("Reading guide"));
        List<String> bare = new ArrayList<>();
        // a sentence, or a clause after a semicolon; the base may stand anywhere in it (a list's at its head)
        for (String sentence : prose.split("(?<=[.;])\\s+(?=[A-Za-z(])")) {
            Matcher m = Pattern.compile("[+\u2212±-]?\\d[\\d,.]*\\s?%").matcher(sentence);
            while (m.find()) {
                String before = sentence.substring(0, m.start());
                String after = sentence.substring(m.end());
                boolean named = after.startsWith(" a year") || after.startsWith(" interval")
                        || bases.stream().anyMatch(b -> before.contains(b) || after.contains(b));
                if (!named) {
                    bare.add(m.group() + " in \"" + sentence + "\"");
                }
            }
        }
        assertThat(bare).isEmpty();
    }

    /**
     * Each series' chart on the board says in its caption what each of its marks means, as the one-
     * series brief's does: the trend-cycle line, the structural changes' lines and bands (the series
     * has breaks, from the findings), the arrows to one-offs (it has outliers).
     */
    @Test
    void eachSeriesChartOnTheBoardSaysWhatEachOfItsMarksMeans() throws IOException {
        for (String series : SERIES) {
            JsonNode json = findings(series);
            String section = section(series);
            int caption = section.indexOf(series + " (nights), January 2011 to October 2026.");
            assertThat(caption).as(series + "'s caption").isNotNegative();
            String words = section.substring(caption);
            assertThat(words).contains("The thick dashed line is the trend-cycle, a 2×12 centred moving average");
            assertThat(json.get("breaks").size()).as(series + "'s breaks").isPositive();
            assertThat(words).contains("Thin dashed upright lines, labelled with their date: the first period of each"
                    + " structural change; the grey band around each: the 95 % interval of that date.");
            assertThat(json.get("outliers").size()).as(series + "'s one-offs").isPositive();
            assertThat(words).contains("Arrows, labelled with their date: single periods far from what trend and season predict.");
            // and the one-series brief's chart says the same of the same marks
            assertThat(OWN.get(series)).contains("Thin dashed upright lines, labelled with their date");
        }
    }
}
