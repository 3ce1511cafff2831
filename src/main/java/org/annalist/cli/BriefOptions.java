package org.annalist.cli;

import java.time.Instant;
import java.util.Optional;
import org.annalist.brief.GenerationTime;
import org.annalist.narrative.Masthead;
import picocli.CommandLine.Option;

/** The options of every command that writes briefs. */
final class BriefOptions {

    @Option(names = "--paper", paramLabel = "SIZE", converter = Converters.Paper.class,
            description = "a4 or letter. Default: a4.")
    Masthead.Paper paper = Masthead.Paper.A4;

    @Option(names = "--generated-at", paramLabel = "TIME",
            description = "The time the brief states as made, ISO 8601 (2026-11-05T09:00:00Z). Default: "
                    + "SOURCE_DATE_EPOCH if set, else now. Either makes the PDF byte-for-byte reproducible.")
    String generatedAt;

    @Option(names = "--period", paramLabel = "PERIOD",
            description = "The period to report as latest, as the findings write periods (2025-04, 2025-Q2, 2025). "
                    + "Default: the last in the data.")
    String period;

    /** The time the briefs state, resolved now: a mistake in it is refused before any work. */
    Instant generatedAt() {
        try {
            return GenerationTime.resolve(Optional.ofNullable(generatedAt), System.getenv(), Instant.now());
        } catch (IllegalArgumentException e) {
            throw new UserInputException(e.getMessage());
        }
    }
}
