package org.annalist.narrative;

import java.time.Instant;
import java.util.Locale;
import java.util.Objects;

/**
 * What the person ordering the brief says about it: its title and organisation, its language and
 * when it counts as made.
 *
 * @param title        empty to use the series name
 * @param organisation empty when none is named
 */
public record Masthead(String title, String organisation, Locale language, Instant generatedAt, String software) {

    public Masthead {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(organisation, "organisation");
        Objects.requireNonNull(language, "language");
        Objects.requireNonNull(generatedAt, "generatedAt");
        Objects.requireNonNull(software, "software");
    }
}
