package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.Optional;
import org.annalist.analysis.forecast.ArimaOrder;
import org.annalist.ingest.Aggregation;
import org.annalist.ingest.DateOrder;
import org.annalist.ingest.DecimalMark;
import org.annalist.ingest.ReadOptions;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.junit.jupiter.api.Test;

/**
 * The records whose equals and hashCode are written out (to keep the method-handle linking of a
 * record's own off a cold brief's start-up) compare as a record does, component by component, and
 * hash as a record of the same components does (each shape below is a plain record, whose methods
 * Java makes: the rule of java.lang.runtime.ObjectMethods).
 */
class WrittenOutEqualityTest {

    private record PeriodShape(Frequency frequency, long index) {
    }

    private record OrderShape(int p, int d, int q, int seasonalP, int seasonalD, int seasonalQ, int period,
                              boolean constant) {
    }

    private record OptionsShape(DateOrder dateOrder, Optional<DecimalMark> decimalMark,
                                Optional<Aggregation> aggregation, long maxInputBytes, Optional<String> sheet) {
    }

    private record InputShape(Path file, ReadOptions readOptions) {
    }

    @Test
    void aPeriodEqualsOneOfTheSameFrequencyAndIndexAndHashesAsARecord() {
        Period march = Period.month(2024, 3);
        assertThat(march).isEqualTo(Period.month(2024, 3)).isNotEqualTo(Period.month(2024, 4))
                .isNotEqualTo(new Period(Frequency.QUARTERLY, march.index())).isNotEqualTo(null);
        assertThat(march.hashCode()).isEqualTo(new PeriodShape(march.frequency(), march.index()).hashCode());
    }

    @Test
    void anArimaOrderDiffersInEachComponentAndHashesAsARecord() {
        ArimaOrder order = ArimaOrder.of(1, 1, 2, 0, 1, 1, 12, false);
        assertThat(order).isEqualTo(ArimaOrder.of(1, 1, 2, 0, 1, 1, 12, false))
                .isNotEqualTo(ArimaOrder.of(2, 1, 2, 0, 1, 1, 12, false))
                .isNotEqualTo(ArimaOrder.of(1, 0, 2, 0, 1, 1, 12, false))
                .isNotEqualTo(ArimaOrder.of(1, 1, 1, 0, 1, 1, 12, false))
                .isNotEqualTo(ArimaOrder.of(1, 1, 2, 1, 1, 1, 12, false))
                .isNotEqualTo(ArimaOrder.of(1, 1, 2, 0, 0, 1, 12, false))
                .isNotEqualTo(ArimaOrder.of(1, 1, 2, 0, 1, 0, 12, false))
                .isNotEqualTo(ArimaOrder.of(1, 1, 2, 0, 1, 1, 4, false))
                .isNotEqualTo(ArimaOrder.of(1, 1, 2, 0, 1, 1, 12, true));
        assertThat(order.hashCode()).isEqualTo(new OrderShape(1, 1, 2, 0, 1, 1, 12, false).hashCode());
        assertThat(ArimaOrder.of(0, 1, 1, true).hashCode()).isEqualTo(new OrderShape(0, 1, 1, 0, 0, 0, 1, true).hashCode());
    }

    @Test
    void readOptionsAndAnInputDifferInEachComponentAndHashAsRecords() {
        ReadOptions options = new ReadOptions(DateOrder.DAY_FIRST, Optional.of(DecimalMark.COMMA),
                Optional.of(new Aggregation(Frequency.MONTHLY, Aggregation.Method.SUM)), 1000, Optional.of("2"));
        assertThat(options).isEqualTo(new ReadOptions(DateOrder.DAY_FIRST, Optional.of(DecimalMark.COMMA),
                Optional.of(new Aggregation(Frequency.MONTHLY, Aggregation.Method.SUM)), 1000, Optional.of("2")))
                .isNotEqualTo(options.withDateOrder(DateOrder.AUTO))
                .isNotEqualTo(new ReadOptions(DateOrder.DAY_FIRST, Optional.empty(), options.aggregation(), 1000, Optional.of("2")))
                .isNotEqualTo(new ReadOptions(DateOrder.DAY_FIRST, options.decimalMark(), Optional.empty(), 1000, Optional.of("2")))
                .isNotEqualTo(new ReadOptions(DateOrder.DAY_FIRST, options.decimalMark(), options.aggregation(), 999, Optional.of("2")))
                .isNotEqualTo(new ReadOptions(DateOrder.DAY_FIRST, options.decimalMark(), options.aggregation(), 1000, Optional.empty()));
        assertThat(options.hashCode()).isEqualTo(new OptionsShape(options.dateOrder(), options.decimalMark(),
                options.aggregation(), options.maxInputBytes(), options.sheet()).hashCode());

        Job.Input input = new Job.Input(Path.of("nights.csv"), ReadOptions.defaults());
        assertThat(input).isEqualTo(new Job.Input(Path.of("nights.csv"), ReadOptions.defaults()))
                .isNotEqualTo(new Job.Input(Path.of("days.csv"), ReadOptions.defaults()))
                .isNotEqualTo(new Job.Input(Path.of("nights.csv"), options));
        assertThat(input.hashCode()).isEqualTo(new InputShape(input.file(), input.readOptions()).hashCode());
    }
}
