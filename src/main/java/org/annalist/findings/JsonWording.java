package org.annalist.findings;

/**
 * The words the findings JSON writes for typed facts. The findings hold no words; the narrative
 * supplies them, so that the JSON and the brief name a fact alike.
 */
public interface JsonWording {

    /** A test's name, e.g. {@code Kruskal-Wallis}. */
    String test(TestName test);

    /** The trend test as run, with what it ran on. */
    String trendTest(TrendFinding.Test test);

    /** The smoothing's moving average, e.g. {@code 2×12 centred moving average}. */
    String movingAverage(Smoothing.CentredAverage average);

    /** The outlook's model, e.g. {@code ETS(M,A,M)}. */
    String forecastModel(OutlookFinding.Model model);

    /** How the outlook's method was chosen. */
    String choice(OutlookFinding.Choice choice);

    /** A sentence on the calendar of the latest period. */
    String calendarNote(CalendarNote note);
}
