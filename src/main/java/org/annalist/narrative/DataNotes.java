package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.annalist.series.Frequency;
import org.annalist.series.Period;

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

    /**
     * A reader's warning as a sentence for a printed page: its message, capitalised, then where in
     * the file it arose ({@code Dates read day first (DD/MM/YYYY), because '13/01/2023' is no date the
     * other way round (glassworks-daily-visitors.csv, line 14, column 1).}), rather than the
     * {@code FILE:LINE:COLUMN: message} form of the command line's messages.
     *
     * @param where the place as a sentence names it ({@code line 14, column 1}, {@code cell C12}, or
     *              {@code the file})
     */
    public static String readerWarning(String file, String where, String message) {
        String text = message.isEmpty() ? message : Character.toUpperCase(message.charAt(0)) + message.substring(1);
        String place = where.isEmpty() || where.equals("the file") ? file : file + ", " + where;
        String body = text.endsWith(".") ? text.substring(0, text.length() - 1) : text;
        return body + " (" + place + ").";
    }

    /**
     * That the brief stops at a latest period the job named, before the file's end, so that its
     * outlook for periods the file already holds is not taken for a forecast made in ignorance of
     * them by mistake: {@code Data cut at April 2025 on request: 18 later months in the file (May
     * 2025 to October 2026) left out.} Only later periods with a value are counted.
     */
    static String cut(SourceFacts.Cut c, Frequency frequency, Formats f) {
        String periods = Terms.periodName(frequency, c.laterValues() != 1);
        Period first = c.at().plus(1);
        String span = first.equals(c.lastInFile()) ? f.period(first) : f.period(first) + " to " + f.period(c.lastInFile());
        String later = c.laterValues() == 1 ? "the one later " + periods : f.count(c.laterValues()) + " later " + periods;
        return "Data cut at " + f.period(c.at()) + " on request: " + later + " in the file (" + span + ") left out.";
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
