package org.annalist.ingest;

import java.util.Objects;
import org.annalist.series.Frequency;

/**
 * Aggregate a series to a coarser calendar ({@code daily → monthly}) by summing (flows: nights,
 * visitors) or averaging (levels and rates: occupancy, prices).
 */
public record Aggregation(Frequency target, Method method) {

    public enum Method {
        SUM("sum"), MEAN("mean");

        private final String label;

        Method(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    public Aggregation {
        Objects.requireNonNull(target, "target");
        Objects.requireNonNull(method, "method");
    }
}
