package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Set;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;
import org.junit.jupiter.api.Test;

/**
 * SDMX-CSV 1.0 and 2.0, the tab-separated bulk layout and JSON-stat 2.0, on files written for these
 * tests to the published specifications: the SDMX-CSV field guides of the SDMX Technical Working
 * Group (github.com/sdmx-twg/sdmx-csv; 1.0 for SDMX 2.1, 2.0 for SDMX 3.0, "data message"), the
 * JSON-stat 2.0 format (json-stat.org/format), and for the bulk layout Eurostat's description of its TSV
 * format. The section each check rests on is named beside it; the SDMX-CSV 2.0 sections ("Design
 * principles", "Columns", "Column headers (first row)", "Column content", "optional parameters") were
 * checked in the field guide (docs/data_message_field_guide.md) on 2026-12-03, the others where said.
 * Values are invented, set in Quennelmark.
 */
class PublishedFormatsTest {

    private static final String SDMX1 = """
            DATAFLOW,FREQ,UNIT,MARKET,TIME_PERIOD,OBS_VALUE,OBS_STATUS,CONF_STATUS,UNIT_MULT
            QM:NIGHTS(1.0),M,NR,DOM,2024-01,1200,A,F,0
            QM:NIGHTS(1.0),M,NR,DOM,2024-02,1310,P,F,0
            QM:NIGHTS(1.0),M,NR,DOM,2024-03,1405,E,F,0
            QM:NIGHTS(1.0),M,NR,BRE,2024-01,300,,,0
            QM:NIGHTS(1.0),M,NR,BRE,2024-02,,M,,0
            QM:NIGHTS(1.0),M,NR,BRE,2024-03,320,,C,0
            """;

    @Test
    void sdmxCsv1SeriesAreTheCombinationsOfTheDimensionsThatVary() {
        ReadResult read = Files.read("nights.csv", SDMX1);
        // SDMX-CSV 1.0, "Columns": DATAFLOW first, then the dimensions, TIME_PERIOD, OBS_VALUE, then attributes
        assertThat(read.layout()).isEqualTo("SDMX-CSV 1.0");
        assertThat(read.series()).extracting(Series::name).containsExactly("DOM", "BRE");
        // the series key: the dimensions' codes joined by dots (SDMX-CSV 2.0, "Optional parameters", keys=series)
        assertThat(read.keys().keys()).extracting(SeriesKeys.Key::key).containsExactly("M.NR.DOM", "M.NR.BRE");
        assertThat(read.keys().description()).isEqualTo("DATAFLOW: QM:NIGHTS(1.0); FREQ: M; UNIT: NR");
        assertThat(read.find("M.NR.BRE")).map(Series::name).hasValue("BRE");
        assertThat(read.find("bre")).map(Series::name).hasValue("BRE");
        assertThat(read.names()).isEqualTo("'DOM' (M.NR.DOM), 'BRE' (M.NR.BRE)");
    }

    @Test
    void sdmxStatusColumnsBecomeFlagsAndAMissingStatusAMissingValue() {
        ReadResult read = Files.read("nights.csv", SDMX1);
        Series dom = read.find("DOM").orElseThrow();
        Series bre = read.find("BRE").orElseThrow();
        // CL_OBS_STATUS (checked in SDMX's "Possible Ways of Implementing the Observation Status Concept" 2.0, 2019):
        // A normal, P provisional, E estimated, M missing
        assertThat(dom.flags(0)).isEmpty();
        assertThat(dom.flags(1)).containsExactly(ValueFlag.PROVISIONAL);
        assertThat(dom.flags(2)).containsExactly(ValueFlag.ESTIMATED);
        assertThat(bre.isMissing(1)).isTrue();
        // CL_CONF_STATUS (from memory): F free, C confidential
        assertThat(bre.flags(2)).containsExactly(ValueFlag.CONFIDENTIAL);
        // UNIT_MULT after OBS_VALUE is an attribute, not a dimension (SDMX-CSV 1.0, "Columns")
        assertThat(read.keys().keys()).hasSize(2);
    }

    @Test
    void aCsvWithSdmxColumnsButNoDataflowColumnIsReadByItsDimensions() {
        // lower-case SDMX column ids, semicolons and the time first, as some portals write them (common practice, no source)
        String text = "time_period;market;freq;obs_value;obs_status\n2024;DOM;A;5;\n2025;DOM;A;6;p\n2024;LH;A;1;\n";
        ReadResult read = Files.read("yearly.csv", text);
        assertThat(read.series()).extracting(Series::name).containsExactly("DOM", "LH");
        assertThat(read.find("DOM.A").orElseThrow().flags(1)).containsExactly(ValueFlag.PROVISIONAL);
    }

    @Test
    void sdmxCsv1LabelsBothGiveTheSeriesAndTheDescriptionTheirNames() {
        // SDMX-CSV 1.0 and 2.0, labels=both: "ID: Name" in the header and "CODE: Name" in the cells
        String text = """
                DATAFLOW,FREQ: Frequency,MARKET: Market of origin,TIME_PERIOD: Time,OBS_VALUE: Value
                QM:NIGHTS(1.0): Guest nights,M: Monthly,DOM: Domestic,2024-01,1200
                QM:NIGHTS(1.0): Guest nights,M: Monthly,BRE: Brevania,2024-01,300
                QM:NIGHTS(1.0): Guest nights,M: Monthly,DOM: Domestic,2024-02,1250
                """;
        ReadResult read = Files.read("labels.csv", text);
        assertThat(read.series()).extracting(Series::name).containsExactly("Domestic", "Brevania");
        assertThat(read.keys().description()).isEqualTo("DATAFLOW: Guest nights; Frequency: Monthly");
        assertThat(read.find("M.BRE")).map(Series::name).hasValue("Brevania");
    }

    @Test
    void sdmxCsv2StructureAndActionColumnsAreReadAndDeletionsLeftOut() {
        // SDMX-CSV 2.0, "Column headers": STRUCTURE (with a sub-field separator in brackets), STRUCTURE_ID, ACTION;
        // "Column content": action D deletes, it carries no value; I, A, R carry values
        String text = """
                STRUCTURE[;],STRUCTURE_ID,ACTION,FREQ,MARKET,TIME_PERIOD,OBS_VALUE,OBS_FLAG
                dataflow,QM:ARRIVALS(2.0.0),I,Q,LH,2023-Q1,81,
                dataflow,QM:ARRIVALS(2.0.0),A,Q,LH,2023-Q2,95,p
                dataflow,QM:ARRIVALS(2.0.0),D,Q,LH,2023-Q3,-,
                dataflow,QM:ARRIVALS(2.0.0),R,Q,LH,2023-Q4,70,
                """;
        ReadResult read = Files.read("arrivals.csv", text);
        assertThat(read.layout()).isEqualTo("SDMX-CSV 2.0");
        Series s = read.series().get(0);
        assertThat(s.name()).isEqualTo("arrivals");   // one series: named as a lone value column of a CSV, by the file
        assertThat(s.frequency()).isEqualTo(Frequency.QUARTERLY);
        assertThat(s.start()).isEqualTo(Period.quarter(2023, 1));
        assertThat(s.end()).isEqualTo(Period.quarter(2023, 4));
        assertThat(s.isMissing(2)).isTrue();
        assertThat(s.flags(1)).containsExactly(ValueFlag.PROVISIONAL);
        assertThat(read.warnings()).anySatisfy(w -> assertThat(w.toString()).contains("arrivals.csv:4:").contains("ACTION D"));
        assertThat(read.find("Q.LH")).isPresent();
    }

    @Test
    void sdmxCsv2LabelsNameColumnsAndTheLocaleSeparatorsAreRead() {
        // SDMX-CSV 2.0, "Optional parameters", labels=name: a name column right after each id column;
        // "Design principles": the separator (here ';') and the decimal mark (here ',') may follow the locale
        String text = """
                STRUCTURE;STRUCTURE_ID;STRUCTURE_NAME;ACTION;MARKET;Market of origin;TIME_PERIOD;Time;OBS_VALUE;Observation value
                dataflow;QM:OCC(1.0);Room occupancy;I;DOM;Domestic;2024-M01;2024-M01;61,5;
                dataflow;QM:OCC(1.0);Room occupancy;I;DOM;Domestic;2024-M02;2024-M02;64,25;
                dataflow;QM:OCC(1.0);Room occupancy;I;BRE;Brevania;2024-M01;2024-M01;12;
                """;
        ReadResult read = Files.read("occupancy.csv", text);
        assertThat(read.delimiterName()).isEqualTo("semicolon");
        assertThat(read.series()).extracting(Series::name).containsExactly("Domestic", "Brevania");
        Series dom = read.series().get(0);
        assertThat(dom.values()).containsExactly(61.5, 64.25);
        assertThat(dom.start()).isEqualTo(Period.month(2024, 1));
    }

    @Test
    void everySdmxPeriodFormReadsAsItsCalendar() {
        // SDMX 2.1 Section 6 "Technical Notes", §4.2 (the subsection number 4.2.4 "Reporting period" from memory;
        // 2001-S1 and the ESCB's 2001-H1 checked in the Fusion Registry knowledge base), and the bulk downloads' compact forms
        assertThat(SdmxPeriods.read("2024").period()).hasValue(Period.year(2024));
        assertThat(SdmxPeriods.read("2024-A1").period()).hasValue(Period.year(2024));
        assertThat(SdmxPeriods.read("2024-Q1").period()).hasValue(Period.quarter(2024, 1));
        assertThat(SdmxPeriods.read("2024Q3").period()).hasValue(Period.quarter(2024, 3));
        assertThat(SdmxPeriods.read("2024-03").period()).hasValue(Period.month(2024, 3));
        assertThat(SdmxPeriods.read("2024-M03").period()).hasValue(Period.month(2024, 3));
        assertThat(SdmxPeriods.read("2024M03 ").period()).hasValue(Period.month(2024, 3));
        assertThat(SdmxPeriods.read("2024-W05").period()).hasValue(Period.isoWeek(2024, 5));
        assertThat(SdmxPeriods.read("2024-01-15").period()).hasValue(Period.day(java.time.LocalDate.of(2024, 1, 15)));
        assertThat(SdmxPeriods.read("2024-D015").period()).hasValue(Period.day(java.time.LocalDate.of(2024, 1, 15)));
        assertThat(SdmxPeriods.read("2024-S1").period()).hasValue(Period.half(2024, 1));
        assertThat(SdmxPeriods.read("2024S2").period()).hasValue(Period.half(2024, 2));
        assertThat(SdmxPeriods.read("2024-H2").period()).hasValue(Period.half(2024, 2));
        assertThat(SdmxPeriods.read("2024-S3").period()).isEmpty();
        assertThat(SdmxPeriods.read("2024-T1").problem()).contains("third of a year");
        assertThat(SdmxPeriods.read("2024-M13").period()).isEmpty();
        assertThat(SdmxPeriods.read("Jan 2024").problem()).contains("expected an SDMX period");
    }

    @Test
    void normalizedDatesAreReadInTheCalendarThatFreqStates() {
        // SDMX-CSV 2.0, "Optional parameters", timeFormat=normalized: periods written as ISO 8601 dates;
        // the FREQ dimension (code list CL_FREQ 2.1: A, S, Q, M checked; W, D, B from memory) says which calendar they stand for
        String text = """
                STRUCTURE,STRUCTURE_ID,ACTION,FREQ,MARKET,TIME_PERIOD,OBS_VALUE
                dataflow,QM:N(1.0),I,M,DOM,2024-01-01,5
                dataflow,QM:N(1.0),I,M,DOM,2024-02-01,6
                dataflow,QM:N(1.0),I,Q,DOM,2024-01-01,15
                dataflow,QM:N(1.0),I,Q,DOM,2024-04-01,16
                """;
        ReadResult read = Files.read("normalized.csv", text);
        assertThat(read.find("M.DOM").orElseThrow().start()).isEqualTo(Period.month(2024, 1));
        assertThat(read.find("Q.DOM").orElseThrow().end()).isEqualTo(Period.quarter(2024, 2));
    }

    @Test
    void dailyPeriodsThatNeverFallOnAWeekendAreBusinessDays() {
        // as the CSV reader reads such dates (README, "Input it reads"); 2024-01-05 is a Friday, 2024-01-08 a Monday
        String text = "DATAFLOW,TIME_PERIOD,OBS_VALUE\nQM:FX(1.0),2024-01-04,1\nQM:FX(1.0),2024-01-05,2\nQM:FX(1.0),2024-01-08,3\n";
        Series s = Files.read("fx.csv", text).series().get(0);
        assertThat(s.frequency()).isEqualTo(Frequency.BUSINESS_DAILY);
        assertThat(s.size()).isEqualTo(3);
    }

    @Test
    void sdmxProblemsNameTheirLineAndNothingIsRead() {
        String text = """
                DATAFLOW,MARKET,TIME_PERIOD,OBS_VALUE
                QM:NIGHTS(1.0),DOM,2024-01,1200
                QM:NIGHTS(1.0),DOM,2024-T1,1310
                QM:NIGHTS(1.0),DOM,2024-02,12x
                QM:NIGHTS(1.0),DOM,2024-01,1250
                QM:NIGHTS(1.0),DOM,2024-Q2,1250
                """;
        assertThatThrownBy(() -> Files.read("bad.csv", text)).isInstanceOf(DataProblemException.class)
                .hasMessageContaining("bad.csv:3:3: '2024-T1' is a third of a year")
                .hasMessageContaining("bad.csv:4:4: '12x' is not a number")
                .hasMessageContaining("bad.csv:5: period 2024-01 appears again for series 'bad' (first on line 2)")
                .hasMessageContaining("bad.csv:6:3: period 2024-Q2 is quarterly but series DOM has monthly periods");
    }

    @Test
    void theBulkTabLayoutReadsTheJoinedCodesThePeriodsAcrossAndTheFlagsInTheCells() {
        // bulk layout (common practice): "freq,unit,geo\TIME_PERIOD", periods with trailing spaces, "123 p", ": c", ":"
        String text = "freq,unit,market\\TIME_PERIOD\t2024-01 \t2024-02 \t2024-03 \n"
                + "M,NR,DOM\t1200 \t: c\t1405 p\n"
                + "M,NR,BRE\t300 \t310 e\t: \n";
        ReadResult read = Files.read("bulk.tsv", text);
        assertThat(read.layout()).isEqualTo("tab-separated bulk");
        assertThat(read.series()).extracting(Series::name).containsExactly("DOM", "BRE");
        Series dom = read.find("M.NR.DOM").orElseThrow();
        assertThat(dom.isMissing(1)).isTrue();
        assertThat(dom.flags(1)).containsExactly(ValueFlag.CONFIDENTIAL);
        assertThat(dom.flags(2)).containsExactly(ValueFlag.PROVISIONAL);
        Series bre = read.find("BRE").orElseThrow();
        assertThat(bre.end()).isEqualTo(Period.month(2024, 2));   // ':' at the end: not yet published, trimmed
        assertThat(bre.flags(1)).containsExactly(ValueFlag.ESTIMATED);
        assertThat(read.keys().description()).isEqualTo("freq: M; unit: NR");
    }

    @Test
    void theBulkLayoutReadsCompactPeriodsAndNamesABadCellByLineAndColumn() {
        String good = "unit,market\\time\t2024M01\t2024M02\nNR,DOM\t5\t6\n";
        assertThat(Files.read("old.tsv", good).series().get(0).start()).isEqualTo(Period.month(2024, 1));
        String bad = "unit,market\\time\t2024M01\t2024M02\nNR,DOM\t5\tfive\nNR\t1\t2\n";
        assertThatThrownBy(() -> Files.read("old.tsv", bad))
                .hasMessageContaining("old.tsv:2:3: 'five' is not a value")
                .hasMessageContaining("old.tsv:3:1: 'NR' has 1 codes but the header names 2 dimensions");
    }

    private static final String JSON_STAT = """
            {"version": "2.0", "class": "dataset", "label": "Guest nights in Quennelmark",
             "id": ["unit", "market", "time"], "size": [1, 2, 3],
             "role": {"time": ["time"], "metric": ["unit"]},
             "dimension": {
               "unit": {"label": "Unit", "category": {"label": {"NR": "Number of nights"}}},
               "market": {"label": "Market", "category": {"index": {"DOM": 0, "LH": 1},
                          "label": {"DOM": "Domestic", "LH": "Long-haul"}}},
               "time": {"label": "Month", "category": {"index": ["2024-01", "2024-02", "2024-03"]}}},
             "value": [1200, 1310, null, 80, 95, 70],
             "status": {"1": "p", "5": "e"}}
            """;

    @Test
    void jsonStatCellsAreReadInRowMajorOrderWithLabelsAndStatus() {
        ReadResult read = Files.read("nights.json", JSON_STAT);
        // JSON-stat 2.0, "value": row-major order, the last dimension of "id" varying fastest; null is no value
        assertThat(read.layout()).isEqualTo("JSON-stat 2.0");
        assertThat(read.series()).extracting(Series::name).containsExactly("Domestic", "Long-haul");
        Series dom = read.series().get(0);
        assertThat(dom.values()).containsExactly(1200.0, 1310.0);
        Series lh = read.find("NR.LH").orElseThrow();
        assertThat(lh.values()).containsExactly(80.0, 95.0, 70.0);
        // "status" as an object of positions (JSON-stat 2.0, "status")
        assertThat(dom.flags(1)).containsExactly(ValueFlag.PROVISIONAL);
        assertThat(lh.flags(2)).containsExactly(ValueFlag.ESTIMATED);
        // "category": with a single category, "index" may be left out and "label" names it
        assertThat(read.keys().description()).isEqualTo("Guest nights in Quennelmark; Unit: Number of nights");
        assertThat(read.delimiterName()).isEqualTo("none");
    }

    @Test
    void jsonStatSparseValuesAndAStatusForEveryValueAreRead() {
        // JSON-stat 2.0, "value": an object of positions for sparse cubes; "status": one string for every value;
        // "role": without role.time a dimension called time is the time dimension
        String text = """
                {"class": "dataset", "version": "2.0", "id": ["time"], "size": [4],
                 "dimension": {"time": {"category": {"index": ["2023-Q1", "2023-Q2", "2023-Q3", "2023-Q4"]}}},
                 "value": {"0": 10.5, "3": 12}, "status": "p"}
                """;
        Series s = Files.read("visitors.json", text).series().get(0);
        assertThat(s.name()).isEqualTo("visitors");
        assertThat(s.frequency()).isEqualTo(Frequency.QUARTERLY);
        assertThat(s.size()).isEqualTo(4);
        assertThat(s.missingCount()).isEqualTo(2);
        assertThat(s.flags(3)).isEqualTo(Set.of(ValueFlag.PROVISIONAL));
    }

    @Test
    void jsonStatWithoutATimeDimensionIsRefusedNamingTheKey() {
        String text = """
                {"version": "2.0", "class": "dataset", "id": ["market"], "size": [2],
                 "dimension": {"market": {"category": {"index": ["DOM", "LH"]}}}, "value": [1, 2]}
                """;
        assertThatThrownBy(() -> Files.read("markets.json", text)).isInstanceOf(DataProblemException.class)
                .hasMessageContaining("markets.json: at key role.time: no time dimension")
                .hasMessageContaining("[market]");
    }

    @Test
    void jsonStatProblemsNameTheirKeyPath() {
        // JSON-stat 2.0, "class": a bundle or collection is no dataset
        assertThatThrownBy(() -> Files.read("b.json", "{\"version\":\"2.0\",\"class\":\"collection\"}"))
                .hasMessageContaining("at key class: \"class\" is \"collection\"");
        // JSON-stat 2.0, "value": one value for each combination of categories
        assertThatThrownBy(() -> Files.read("v.json", JSON_STAT.replace("[1200, 1310, null, 80, 95, 70]", "[1, 2]")))
                .hasMessageContaining("at key value: \"value\" has 2 values but the sizes make 6");
        assertThatThrownBy(() -> Files.read("t.json", JSON_STAT.replace("\"2024-02\"", "\"Feb 2024\"")))
                .hasMessageContaining("at key dimension.time.category.index.Feb 2024: 'Feb 2024' is not a period");
        assertThatThrownBy(() -> Files.read("s.json", JSON_STAT.replace("\"size\": [1, 2, 3]", "\"size\": [1, 3, 3]")))
                .hasMessageContaining("at key dimension.market.category.index: has 2 categories but \"size\" says 3");
        assertThatThrownBy(() -> Files.read("j.json", "{\"version\": \"2.0\", \"class\": "))
                .hasMessageContaining("not valid JSON");
    }

    @Test
    void aPlainCsvIsStillReadAsATable() {
        ReadResult read = Files.read("plain.csv", "period,value\n2024-01,5\n2024-02,6\n");
        assertThat(read.layout()).isNotIn("SDMX-CSV 1.0", "SDMX-CSV 2.0", "JSON-stat 2.0", "tab-separated bulk");
        assertThat(read.keys()).isEqualTo(SeriesKeys.none());
    }
}
