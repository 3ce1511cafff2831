package org.annalist.brief;

import org.annalist.findings.Findings;
import org.annalist.findings.FindingsJson;
import org.annalist.narrative.AnalystNotes;
import org.annalist.narrative.JsonTerms;

/** The findings as text: the findings JSON, and the analyst's notes of {@code analyze}. */
public final class Reports {

    private Reports() {
    }

    /** The findings JSON of one series' findings, a list of them, or the series blocks of {@code check}. */
    public static String json(Object value) {
        return FindingsJson.write(value, JsonTerms.ENGLISH);
    }

    /** One series' notes: one line per finding with its evidence ({@code analyze} joins them series after series). */
    public static String notes(Findings findings) {
        return AnalystNotes.of(findings);
    }
}
