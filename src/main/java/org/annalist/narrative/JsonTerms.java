package org.annalist.narrative;

import org.annalist.findings.CalendarNote;
import org.annalist.findings.JsonWording;
import org.annalist.findings.OutlookFinding;
import org.annalist.findings.Smoothing;
import org.annalist.findings.TestName;
import org.annalist.findings.TrendFinding;

/** The findings JSON's words, the same the brief uses ({@link Terms}). */
public final class JsonTerms implements JsonWording {

    /** The JSON is written in English, whatever the brief's language. */
    public static final JsonTerms ENGLISH = new JsonTerms();

    private JsonTerms() {
    }

    @Override
    public String test(TestName test) {
        return Terms.test(test);
    }

    @Override
    public String trendTest(TrendFinding.Test test) {
        return Terms.trendTest(test);
    }

    @Override
    public String movingAverage(Smoothing.CentredAverage average) {
        return Terms.movingAverage(average);
    }

    @Override
    public String forecastModel(OutlookFinding.Model model) {
        return Terms.forecastModel(model);
    }

    @Override
    public String choice(OutlookFinding.Choice choice) {
        return Terms.choice(choice);
    }

    @Override
    public String calendarNote(CalendarNote note) {
        return Typography.signs(CalendarSentences.of(note));
    }
}
