package org.annalist.cli;

import java.time.Instant;
import java.util.Optional;
import org.annalist.brief.GenerationTime;
import org.annalist.narrative.Masthead;
import picocli.CommandLine.Option;

/** The options of every command that writes briefs. */
final class BriefOptions {

    enum PaperChoice { a4, letter }

    @Option(names = "--paper", paramLabel = "SIZE", description = "a4 or letter. Default: a4.")
    PaperChoice paper = PaperChoice.a4;

    @Option(names = "--generated-at", paramLabel = "TIME",
            description = "The time the brief states as made, ISO 8601 (2026-11-05T09:00:00Z). Default: "
                    + "SOURCE_DATE_EPOCH if set, else now. Either makes the PDF byte-for-byte reproducible.")
    String generatedAt;

    @Option(names = "--period", paramLabel = "PERIOD",
            description = "The period to report as latest, as the findings write periods (2025-04, 2025-Q2, 2025). "
                    + "Default: the last in the data.")
    String period;

    Masthead.Paper paper() {
        return paper == PaperChoice.letter ? Masthead.Paper.LETTER : Masthead.Paper.A4;
    }

    Instant generatedAt() {
        try {
            return GenerationTime.resolve(Optional.ofNullable(generatedAt), System.getenv(), Instant.now());
        } catch (IllegalArgumentException e) {
            throw new UserInputException(e.getMessage());
        }
    }
}
