package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The words on the data file: how it was read, and the reader's and the font's warnings. */
public final class DataNotes {

    private DataNotes() {
    }

    /**
     * {@code UTF-8, comma-separated, wide layout, periods written YYYY-MM, dates read day-first}; for a workbook
     * {@code sheet 1 'Nights' of an xlsx workbook, wide layout, …}.
     */
    static String reading(SourceFacts.Reading r) {
        StringBuilder reading = new StringBuilder();
        if (r.sheet().isPresent()) {
            reading.append(r.sheet().get()).append(", ");
        } else {
            reading.append(r.charset()).append(", ");
            if (!r.delimiter().equals("none")) {
                reading.append(r.delimiter()).append("-separated, ");   // JSON has no delimiter
            }
        }
        // a workbook's dates are cells of their own type, turned into text by the reader: "read as", not "written"
        reading.append(r.layout()).append(r.sheet().isPresent() ? " layout, periods read as " : " layout, periods written ")
                .append(r.periodFormat());
        r.dateOrder().ifPresent(o -> reading.append(", dates read ").append(o));
        r.decimalMark().ifPresent(m -> reading.append(", decimal ").append(m));
        r.aggregatedTo().ifPresent(a -> reading.append("; aggregated to ").append(a).append(" by ")
                .append(r.aggregatedBy().orElseThrow()));
        return reading.toString();
    }

    /** The appendix's notes: the reader's warnings, then the font's when it lacks a character. */
    static List<String> notes(SourceFacts source) {
        List<String> notes = new ArrayList<>(source.notes());
        if (!source.missingGlyphs().isEmpty()) {
            notes.add("Note: " + missingGlyphs(source.missingGlyphs()) + ".");
        }
        return notes;
    }

    /** The warning for characters the font cannot draw, each with its code point. */
    public static String missingGlyphs(String characters) {
        return "the brief's font has no glyph for " + characters.codePoints().mapToObj(Character::toString)
                .map(c -> "'" + c + "' (U+" + String.format(Locale.ROOT, "%04X", c.codePointAt(0)) + ")")
                .reduce((a, b) -> a + ", " + b).orElse("") + "; they print as # in the text and ? in charts";
    }
}
