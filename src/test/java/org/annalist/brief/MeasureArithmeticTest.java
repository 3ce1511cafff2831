package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Pattern;
import org.annalist.findings.Analyst;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.Findings;
import org.annalist.findings.Form;
import org.annalist.findings.Measure;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.narrative.AnalystNotes;
import org.annalist.narrative.BriefViews;
import org.annalist.narrative.Masthead;
import org.annalist.narrative.SourceFacts;
import org.annalist.narrative.TemplateEngine;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The arithmetic of a brief follows the measure: a temperature (R's {@code datasets::nottem},
 * monthly mean air temperature at Nottingham in °F, 1920–1939) is averaged and compared in °F,
 * never in % and never as a total; an occupancy rate in % (a planted synthetic series) changes in
 * percentage points in the lead, the key figures, the year to date and the trend. The brief is
 * rendered to its XHTML (the PDF step adds nothing to the words, and costs seconds) and read up to
 * its reading guide.
 */
class MeasureArithmeticTest {

    /** A signed number followed by a per cent sign: a % change, which neither series may carry. */
    private static final Pattern SIGNED_PERCENT = Pattern.compile("[+\u2212-]\\d[\\d,.]*\\s?%");

    @TempDir
    static Path folder;

    static Series nottem;
    static Findings nottemFindings;
    static String nottemText;
    static Series occupancy;
    static Findings occupancyFindings;
    static String occupancyText;

    @BeforeAll
    static void analyseAndWord() throws IOException {
        // the reference file has no unit; the header gives it as a user's file would
        Path file = folder.resolve("nottem.csv");
        List<String> lines = Files.readAllLines(Path.of("src/test/resources/reference/nottem.csv"));
        lines.set(0, "period,Nottingham air temperature (\u00B0F)");
        Files.write(file, lines);
        nottem = new SeriesFileReader(ReadOptions.defaults()).read(file).require("Nottingham air temperature");
        nottemFindings = new Analyst().analyse(nottem);
        nottemText = text(nottem, nottemFindings);

        occupancy = occupancy();
        occupancyFindings = new Analyst().analyse(occupancy);
        occupancyText = text(occupancy, occupancyFindings);
    }

    /**
     * Planted: 62 % + 0.8 percentage points a year, a seasonal swing of ±20 points peaking in July,
     * a small repeating wobble, and 1.5 points more in every month of 2026 (values 40–90 %).
     */
    static Series occupancy() {
        double[] x = new double[9 * 12 + 10];
        for (int t = 0; t < x.length; t++) {
            int year = t / 12;
            double v = 62 + 0.8 * t / 12.0 + 20 * Math.sin(2 * Math.PI * (t % 12 - 3) / 12) + ((t * 7) % 5 - 2) * 0.4;
            x[t] = Math.round(10 * (v + (year == 9 ? 1.5 : 0))) / 10.0;
        }
        return Series.builder("BedOccupancy", Frequency.MONTHLY).unit("%").append(Period.month(2017, 1), x).snapshot();
    }

    static String text(Series s, Findings f) {
        Masthead masthead = new Masthead("", "", Locale.ENGLISH, Masthead.Paper.A4,
                Instant.parse("2026-11-20T08:00:00Z"), "Annalist (test)", Optional.empty());
        SourceFacts source = new SourceFacts("test.csv", "0".repeat(64), s.size(), new SourceFacts.Reading("UTF-8",
                "comma", "wide", "YYYY-MM", Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty()),
                List.of(), "", Optional.empty());
        String xhtml = new TemplateEngine(Optional.empty()).render(TemplateEngine.BRIEF_TEMPLATE,
                BriefViews.of(s, f, FigurePlan.of(s, f), source, masthead), Locale.ENGLISH);
        // up to the reading guide: the appendix states the rules' thresholds (a collapse is −10 %), no changes
        String body = xhtml.substring(xhtml.indexOf("<body"), xhtml.indexOf("id=\"guide\""));
        return body.replaceAll("<[^>]+>", " ").replace("&#160;", " ").replace('\u00A0', ' ')
                .replace("&#177;", "\u00B1").replaceAll("\\s+", " ");
    }

    @Test
    void aTemperatureIsTakenForAnIntervalScaleAndDecomposedAdditively() {
        assertThat(nottemFindings.series().measure()).isEqualTo(Measure.INTERVAL);
        assertThat(nottemFindings.form().form()).isEqualTo(Form.ADDITIVE);
        assertThat(nottemText).contains("Each value is on a scale whose zero is arbitrary, like a temperature");
    }

    @Test
    void aTemperatureBriefHasNoPercentChangeNoTotalAndNoSum() {
        assertThat(SIGNED_PERCENT.matcher(nottemText).results().map(m -> m.group()).toList()).isEmpty();
        assertThat(nottemText.toLowerCase(Locale.ROOT)).doesNotContain("total", "sum of", "summed over");
        assertThat(nottemText).doesNotContain("% more", "% less", "% a year", "of its average level");
        // the lead: December 1939 37.8 °F against 39.2 °F in December 1938 (the data)
        assertThat(nottemText).contains("stood at 37.80 \u00B0F, 1.40 \u00B0F lower than in December 1938");
        assertThat(nottemText).contains("the average was 49.39 \u00B0F, \u22120.88 \u00B0F on the same months");
        assertThat(nottemText).contains("the average for 1940 would be about");
        assertThat(nottemFindings.outlook().nextYearTotal()).isNull();
        assertThat(nottemFindings.outlook().nextYearAverage()).isNotNull();
    }

    @Test
    void aTemperaturesFindingsCarryNoPercentChanges() throws IOException {
        JsonNode json = new ObjectMapper().readTree(Reports.json(nottemFindings));
        assertThat(json.get("series").get("measure").asText()).isEqualTo("interval");
        assertThat(json.get("indicators").get("measure").asText()).isEqualTo("interval");
        assertThat(json.get("indicators").get("same_period_last_year").get("change_pct").isNull()).isTrue();
        assertThat(json.get("indicators").get("year_to_date").get("change_pct").isNull()).isTrue();
        assertThat(json.get("trend").get("change_pct_per_year").isNull()).isTrue();
        // the year to date of a temperature is the mean of its twelve months of 1939, not their sum
        double mean = 0;
        for (int i = nottem.size() - 12; i < nottem.size(); i++) {
            mean += nottem.value(i) / 12;
        }
        assertThat(nottemFindings.indicators().yearToDate().total()).isCloseTo(mean, within(1e-9));
        String notes = AnalystNotes.of(nottemFindings);
        assertThat(SIGNED_PERCENT.matcher(notes.lines().filter(l -> l.startsWith("latest") || l.startsWith("outlier"))
                .reduce("", String::concat)).find()).isFalse();
        assertThat(notes).contains("a year earlier 39.20, \u22121.40 \u00B0F").doesNotContain("of the level").contains("next year:    1940 average");
    }

    @Test
    void aRateInPercentChangesInPercentagePointsInLeadTilesYearToDateAndTrend() {
        assertThat(occupancyFindings.series().measure()).isEqualTo(Measure.RATE);
        int last = occupancy.size() - 1;
        double change = occupancy.value(last) - occupancy.value(last - 12);   // planted: 0.8 + 1.5 and the wobble
        assertThat(occupancyFindings.indicators().samePeriodLastYear().change()).isCloseTo(change, within(1e-9));
        assertThat(occupancyFindings.indicators().samePeriodLastYear().changePct()).isNull();
        assertThat(occupancyText).contains(String.format(Locale.ROOT, "%.2f percentage points higher than in October 2025",
                change));
        // the key figure tiles: the latest change, the year to date and the trend, all in points
        assertThat(occupancyText).contains(String.format(Locale.ROOT, "+%.2f pp on a year earlier", change));
        // the tiles abbreviate percentage points as pp, which the sentence on the measure defines
        assertThat(occupancyText).containsPattern("Year to date \\+\\d\\.\\d\\d pp January 2026 to October 2026");
        assertThat(occupancyText).containsPattern("Trend \\+0\\.\\d+ pp a year whole period; Sen slope, p");
        assertThat(occupancyText).containsPattern("the average was \\d\\d\\.\\d\\d %, \\+\\d\\.\\d\\d percentage points on the same months");
        assertThat(occupancyText).contains("Each value is a rate, so figures for longer periods are averages, never sums; changes are given in "
                + "percentage points (pp)");
        assertThat(occupancyText).doesNotContain("% more", "% less", "% a year", "of its average level");
        assertThat(SIGNED_PERCENT.matcher(occupancyText).results().map(m -> m.group()).toList()).isEmpty();
        // planted slope 0.8 points a year
        assertThat(occupancyFindings.trend().slopePerYear()).isCloseTo(0.8, within(0.1));
        assertThat(occupancyFindings.trend().changePctPerYear()).isNull();
    }
}
