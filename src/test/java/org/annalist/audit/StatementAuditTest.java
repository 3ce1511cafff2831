package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.annalist.audit.PlantedSeries.Planted;
import org.annalist.audit.PlantedSeries.Scenario;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The statement audit: the whole pipeline, from series to the brief's words, over every reference
 * dataset, the demo data and {@value #PLANTED} invented series with a planted truth
 * ({@link PlantedSeries}). Each test is one invariant, named after the class of mistake it rules
 * out; a failure lists the series (with its seed) and the offending words.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class StatementAuditTest {

    static final int PLANTED = 216;

    private final List<Planted> planted = PlantedSeries.generate(PLANTED);
    private final List<AuditedBrief> briefs = new ArrayList<>();
    private final List<AuditedBrief> plantedBriefs = new ArrayList<>();

    @BeforeAll
    void runThePipeline() throws IOException {
        for (Planted p : planted) {
            plantedBriefs.add(AuditedBrief.of(p.toString(), p.series()));
        }
        briefs.addAll(plantedBriefs);
        for (Path file : published()) {
            for (Series s : new SeriesFileReader(ReadOptions.defaults()).read(file).series()) {
                briefs.add(AuditedBrief.of(file.getFileName() + " " + s.name(), s));
            }
        }
    }

    /** The reference datasets (R's datasets package, see src/test/resources/reference/README.md) and the demo data. */
    private static List<Path> published() throws IOException {
        List<Path> files = new ArrayList<>();
        for (String name : List.of("AirPassengers", "UKgas", "co2", "nottem", "Nile", "sunspot.year")) {
            files.add(Path.of("src/test/resources/reference", name + ".csv"));
        }
        try (Stream<Path> demo = Files.list(Path.of("demo-data"))) {
            demo.filter(f -> f.toString().endsWith(".csv")).sorted().forEach(files::add);
        }
        return files;
    }

    // ---- 1. structural changes described as something else ------------------------------------

    @Test
    void aPlantedStepIsFoundWithItsSign() {
        List<String> wrong = new ArrayList<>();
        int steps = 0;
        int found = 0;
        for (int i = 0; i < planted.size(); i++) {
            Planted p = planted.get(i);
            if (p.scenario() != Scenario.LEVEL_STEP) {
                continue;
            }
            steps++;
            JsonNode near = breakNear(plantedBriefs.get(i).json(), p.series(), p.stepAt().orElseThrow(), 6);
            if (near == null) {
                continue;
            }
            found++;
            if (Math.signum(near.get("change_pct").asDouble()) != Math.signum(p.stepPct())) {
                wrong.add(p + ": planted " + p.stepPct() + " %, described " + near.get("change_pct"));
            }
        }
        assertThat(wrong).as("steps described with the wrong sign").isEmpty();
        assertThat(found).as("planted steps of 15–35 % found within six months, of " + steps).isGreaterThanOrEqualTo(steps * 9 / 10);
    }

    @Test
    void anIntervalOfOnePeriodReadsAsOnePeriod() {
        Pattern sameEnds = Pattern.compile("\\b((?:January|February|March|April|May|June|July|August|September|October"
                + "|November|December|Q[1-4])?[ \\u00a0]?\\d{4}) to \\1\\b");
        assertNone(b -> matches(sameEnds, b.text()), "an interval from a period to itself");
    }

    // ---- 2. arithmetic that does not fit the measure ------------------------------------------

    /** A change or a level written as a percentage: "+1.0 %", "1.0 % more", "% a year", "% on the same". */
    private static final Pattern PERCENT_CHANGE = Pattern.compile(
            "[+\\u2212-]\\d[\\d,.]*[ \\u00a0]?%|\\d[ \\u00a0]?% (?:more|less|a year|on |of its average|higher|lower|up|down)");

    @Test
    void aTemperatureGetsNoPercentChangeAndNoTotal() {
        assertNone(b -> b.series().unit().contains("°") ? matches(PERCENT_CHANGE, b.body()) : List.of(),
                "a percentage change of an interval-scale quantity");
        assertNone(b -> b.series().unit().contains("°") ? matches(Pattern.compile("(?i)\\btotal\\b"), b.body()) : List.of(),
                "a total of an interval-scale quantity");
    }

    @Test
    void aRateInPercentChangesInPercentagePoints() {
        assertNone(b -> b.series().unit().equals("%") ? matches(PERCENT_CHANGE, b.body()) : List.of(),
                "a percentage change of a rate");
    }

    // ---- 4. value-laden words where the direction's meaning is unknown -------------------------

    @Test
    void noWordJudgesADirectionWhoseMeaningIsUnknown() {
        Pattern judging = Pattern.compile("(?i)\\b(collapse[ds]?|recover(?:y|ed|ies)|regained|crash(?:ed)?|slump(?:ed)?|boom)\\b");
        assertNone(b -> matches(judging, b.text() + " " + b.notes()), "a value-laden word");
    }

    // ---- 5. one-offs that are calendar effects ------------------------------------------------

    @Test
    void anEasterMonthIsNotAOneOff() {
        List<String> flagged = new ArrayList<>();
        for (int i = 0; i < planted.size(); i++) {
            if (planted.get(i).scenario() != Scenario.EASTER) {
                continue;
            }
            for (JsonNode o : plantedBriefs.get(i).json().path("outliers")) {
                String period = o.get("period").asText();
                if (period.endsWith("-03") || period.endsWith("-04")) {
                    flagged.add(planted.get(i) + ": " + period);
                }
            }
        }
        assertThat(flagged).as("March or April flagged where only Easter moved it").isEmpty();
    }

    // ---- 6. outlook sentences that mislead on paper -------------------------------------------

    @Test
    void thePrintedBriefPointsToNoFileItsReaderLacks() {
        assertNone(b -> matches(Pattern.compile("(?i)findings file|side output|JSON"), b.body()),
                "a reference to a file the printed brief's reader does not have");
    }

    // ---- 9. typography a proof-reader would mark ----------------------------------------------

    @ParameterizedTest
    @EnumSource(ProofMarks.class)
    void noProofMarks(ProofMarks mark) {
        // the appendix quotes the rules in their own notation; the body is what a reader quotes
        assertNone(b -> mark.in(mark == ProofMarks.HYPHEN_AS_MINUS || mark == ProofMarks.NEGATIVE_ZERO ? b.body() : b.text()),
                mark.mistake);
    }

    // ---- 3. a headline that the evidence does not carry ---------------------------------------

    @Test
    void everyNumberOfTheLeadAndKeyFiguresIsInTheFindings() {
        assertNone(b -> unfounded(b.section("lead") + " " + b.section("keys"), b.json()),
                "a number on page 1 that the findings JSON does not hold");
    }

    /** Numbers in {@code text} that no number of the findings gives at its printed precision. */
    static List<String> unfounded(String text, JsonNode json) {
        List<Double> known = new ArrayList<>();
        collect(json, known);
        List<String> missing = new ArrayList<>();
        Matcher m = Pattern.compile("(?<![\\d.,])(\\d{1,3}(?:,\\d{3})+|\\d+)(\\.\\d+)?(?![\\d])").matcher(text);
        while (m.find()) {
            String token = m.group();
            double n = Double.parseDouble(token.replace(",", ""));
            int decimals = m.group(2) == null ? 0 : m.group(2).length() - 1;
            boolean year = decimals == 0 && !token.contains(",") && n >= 1700 && n <= 2100;
            boolean intervalLevel = (n == 95 || n == 80) && text.startsWith("%", m.end() + 1);
            if (year || intervalLevel || known.stream().anyMatch(v -> printsAs(Math.abs(v), n, decimals))) {
                continue;
            }
            missing.add(text.substring(Math.max(0, m.start() - 30), Math.min(text.length(), m.end() + 15)));
        }
        return missing;
    }

    private static boolean printsAs(double v, double printed, int decimals) {
        double scale = Math.pow(10, decimals);
        if (Math.abs(Math.round(v * scale) / scale - printed) < 0.5 / scale) {
            return true;
        }
        for (int digits = 2; digits <= 4 && decimals == 0; digits++) {   // "about 2,120 a year"
            java.math.BigDecimal rounded = new java.math.BigDecimal(v).round(new java.math.MathContext(digits));
            if (rounded.doubleValue() == printed) {
                return true;
            }
        }
        return false;
    }

    private static void collect(JsonNode node, List<Double> into) {
        if (node.isNumber()) {
            into.add(node.asDouble());
        } else if (node.isArray()) {
            into.add((double) node.size());   // "3 breaks, 2 one-offs"
            node.forEach(child -> collect(child, into));
        } else if (node.isContainerNode()) {
            node.forEach(child -> collect(child, into));
        }
    }

    // ---- helpers -----------------------------------------------------------------------------

    private void assertNone(Function<AuditedBrief, List<String>> offences, String what) {
        List<String> found = new ArrayList<>();
        for (AuditedBrief b : briefs) {
            for (String o : offences.apply(b)) {
                found.add(b + ": «" + o + "»");
            }
        }
        assertThat(found).as(what + " (" + found.size() + " in all; first ones listed)")
                .satisfies(list -> assertThat(list.subList(0, Math.min(12, list.size()))).isEmpty());
    }

    private static List<String> matches(Pattern pattern, String text) {
        return ProofMarks.matches(pattern, text);
    }

    /** The reported break nearest a planted one within {@code tolerance} periods, or null. */
    private static JsonNode breakNear(JsonNode json, Series series, Period planted, int tolerance) {
        int at = series.indexOf(planted);
        JsonNode best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (JsonNode b : json.path("breaks")) {
            int distance = Math.abs(series.periodLabelled(b.get("period").asText()).map(series::indexOf).orElse(-1000) - at);
            if (distance <= tolerance && distance < bestDistance) {
                best = b;
                bestDistance = distance;
            }
        }
        return best;
    }
}
