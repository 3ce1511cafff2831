package org.annalist.narrative;

import java.util.List;
import java.util.Optional;
import org.annalist.series.Period;

/**
 * Where the data came from, as the brief's data appendix states it.
 *
 * @param reading       how the file was read
 * @param notes         the reader's warnings, each with file and line
 * @param missingGlyphs characters of the brief's own text that its font cannot draw (empty when none)
 * @param cut           where the job cut the series short of the file's end, when it did
 */
public record SourceFacts(String file, String sha256, int rowsRead, Reading reading, List<String> notes,
                          String missingGlyphs, Optional<Cut> cut) {

    /**
     * The series cut at a latest period the job named, before the file's end.
     *
     * @param at          the latest period kept
     * @param laterValues how many later periods of the file had a value, all left out
     * @param lastInFile  the file's last period of the series with a value
     */
    public record Cut(Period at, int laterValues, Period lastInFile) {
    }

    public SourceFacts {
        notes = List.copyOf(notes);
    }

    /**
     * How the file was read, in the reader's own terms.
     *
     * @param delimiter    {@code comma}, {@code semicolon} or {@code tab}
     * @param layout       {@code wide}, {@code long}, …
     * @param periodFormat e.g. {@code YYYY-MM}
     * @param dateOrder    {@code day-first} or {@code month-first}, for dates such as 03/04/2024
     * @param decimalMark  {@code point} or {@code comma}, when it had to be decided
     * @param aggregatedTo the calendar the values were aggregated to, with {@code aggregatedBy} ({@code sum}, {@code mean})
     * @param sheet        the workbook's sheet read ({@code sheet 2 'Nights' of an xlsx workbook}), in place of the
     *                     charset and delimiter, when the file is a workbook
     */
    public record Reading(String charset, String delimiter, String layout, String periodFormat,
                          Optional<String> dateOrder, Optional<String> decimalMark, Optional<String> aggregatedTo,
                          Optional<String> aggregatedBy, Optional<String> sheet) {

        public Reading(String charset, String delimiter, String layout, String periodFormat, Optional<String> dateOrder,
                       Optional<String> decimalMark, Optional<String> aggregatedTo, Optional<String> aggregatedBy) {
            this(charset, delimiter, layout, periodFormat, dateOrder, decimalMark, aggregatedTo, aggregatedBy,
                    Optional.empty());
        }
    }

    /** The same facts with the characters the font cannot draw. */
    public SourceFacts withMissingGlyphs(String characters) {
        return new SourceFacts(file, sha256, rowsRead, reading, notes, characters, cut);
    }

    /** The same facts with where the series was cut, if it was. */
    public SourceFacts withCut(Optional<Cut> at) {
        return new SourceFacts(file, sha256, rowsRead, reading, notes, missingGlyphs, at);
    }
}
