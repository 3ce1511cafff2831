package org.annalist.brief;

import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.Map;
import java.util.Optional;

/**
 * When a brief counts as made: the time given by the user, else {@code SOURCE_DATE_EPOCH} (seconds
 * since 1970, the reproducible-builds convention, https://reproducible-builds.org/specs/source-date-epoch/),
 * else now. With either of the first two, the same input gives a byte-identical PDF.
 */
public final class GenerationTime {

    public static final String ENVIRONMENT_VARIABLE = "SOURCE_DATE_EPOCH";

    private GenerationTime() {
    }

    /**
     * @param given an ISO-8601 instant such as {@code 2026-11-05T09:00:00Z}, if the user gave one
     * @throws IllegalArgumentException naming the value when it is not a time
     */
    public static Instant resolve(Optional<String> given, Map<String, String> environment, Instant now) {
        if (given.isPresent()) {
            try {
                return Instant.parse(given.get());
            } catch (DateTimeParseException e) {
                throw new IllegalArgumentException("'" + given.get() + "' is not a time; expected an ISO 8601 instant "
                        + "such as 2026-11-05T09:00:00Z");
            }
        }
        String epoch = environment.get(ENVIRONMENT_VARIABLE);
        if (epoch != null && !epoch.isBlank()) {
            try {
                return Instant.ofEpochSecond(Long.parseLong(epoch.trim()));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException(ENVIRONMENT_VARIABLE + "='" + epoch
                        + "' is not a number of seconds since 1970-01-01T00:00:00Z");
            }
        }
        return now;
    }

    /**
     * The time given, else {@code SOURCE_DATE_EPOCH} from this process's environment, else now: for
     * a brief whose time was not resolved when it was asked for (a spec without {@code generated_at}).
     *
     * @throws IllegalArgumentException when {@code SOURCE_DATE_EPOCH} is not a number of seconds
     */
    public static Instant orDefault(Optional<Instant> given) {
        return given.orElseGet(() -> resolve(Optional.empty(), System.getenv(), Instant.now()));
    }
}
