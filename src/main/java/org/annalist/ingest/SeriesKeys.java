package org.annalist.ingest;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * How the series of a statistics portal's file are identified: each series' key (the codes of its
 * dimensions joined by dots, as SDMX writes a series key: {@code M.NR.AT}) and the codes of only the
 * dimensions that vary between the file's series ({@code AT}), and the dimensions that all series
 * share, as a description of the data set. Empty for a file of plain columns.
 *
 * @param description the shared dimensions ({@code Frequency: Monthly; Unit: Number}), empty when none
 * @param keys        one per series of the file, in its order
 */
public record SeriesKeys(String description, List<Key> keys) {

    /**
     * @param series  the series' name in the file
     * @param key     every dimension's code, joined by dots
     * @param varying the codes of the dimensions that vary between the file's series, joined by dots
     *                (empty when the file holds one series)
     */
    public record Key(String series, String key, String varying) {
        public Key {
            Objects.requireNonNull(series, "series");
            Objects.requireNonNull(key, "key");
            Objects.requireNonNull(varying, "varying");
        }
    }

    public SeriesKeys {
        Objects.requireNonNull(description, "description");
        keys = List.copyOf(keys);
    }

    /** No keys: a file of plain columns. */
    public static SeriesKeys none() {
        return new SeriesKeys("", List.of());
    }

    /** The key of the series named {@code series}, if it has one. */
    public Optional<Key> of(String series) {
        return keys.stream().filter(k -> k.series().equals(series)).findFirst();
    }

    /**
     * The value a map keyed by series gives the series named {@code series}: under its name, else under
     * its key (whole, or the codes of the dimensions that vary), as {@link #seriesWithKey} reads a key.
     */
    public <V> Optional<V> lookUp(Map<String, V> byNameOrKey, String series) {
        V byName = byNameOrKey.get(series);
        if (byName != null) {
            return Optional.of(byName);
        }
        for (Map.Entry<String, V> e : byNameOrKey.entrySet()) {
            if (seriesWithKey(e.getKey()).filter(series::equals).isPresent()) {
                return Optional.of(e.getValue());
            }
        }
        return Optional.empty();
    }

    /** The name of the series whose key (whole, or of the varying dimensions) is {@code asked}, exact and then in any case. */
    public Optional<String> seriesWithKey(String asked) {
        String wanted = asked.strip();
        return keys.stream().filter(k -> k.key().equals(wanted) || (!k.varying().isEmpty() && k.varying().equals(wanted)))
                .findFirst()
                .or(() -> keys.stream().filter(k -> k.key().equalsIgnoreCase(wanted)
                        || (!k.varying().isEmpty() && k.varying().equalsIgnoreCase(wanted))).findFirst())
                .map(Key::series);
    }
}
