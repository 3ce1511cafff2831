package org.annalist.narrative;

import java.time.Instant;
import java.util.Locale;
import java.util.Objects;

/**
 * What the person ordering the brief says about it: its title and organisation, its language,
 * paper, and when it counts as made.
 *
 * @param title        empty to use the series name
 * @param organisation empty when none is named
 * @param logoUri      the organisation's logo as a file URI, printed in the masthead
 */
public record Masthead(String title, String organisation, Locale language, Paper paper, Instant generatedAt,
                       String software, java.util.Optional<String> logoUri) {

    /** Paper sizes, by their CSS names. */
    public enum Paper {
        A4("A4"), LETTER("letter");

        private final String css;

        Paper(String css) {
            this.css = css;
        }

        public String css() {
            return css;
        }
    }

    public Masthead {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(organisation, "organisation");
        Objects.requireNonNull(language, "language");
        Objects.requireNonNull(paper, "paper");
        Objects.requireNonNull(generatedAt, "generatedAt");
        Objects.requireNonNull(software, "software");
    }
}
