package org.annalist.narrative;

import java.util.ArrayList;
import java.util.List;
import org.annalist.findings.PartsCheck;

/**
 * The words of the add-up check of a multi-series brief: what was checked, where the parts miss
 * the total and by how much, and which periods could not be checked because a value was missing.
 */
final class PartsWords {

    /** How many periods or spans a list names before it gives the rest as a count. */
    private static final int LISTED = 6;
    private static final String[] COUNT = {"no", "one", "two", "three", "four", "five", "six", "seven", "eight",
        "nine", "ten", "eleven", "twelve"};

    private PartsWords() {
    }

    static MultiBriefView.Consistency consistency(PartsCheck c, Formats f) {
        List<String> gaps = new ArrayList<>();
        for (PartsCheck.Gap g : c.gaps().subList(0, Math.min(LISTED, c.gaps().size()))) {
            gaps.add(f.period(g.period()) + " (parts " + f.value(g.sum()) + " against " + f.value(g.total()) + ", "
                    + f.signedValue(g.gap()) + (Double.isNaN(g.gapPct()) ? "" : ", " + f.signedPercent(g.gapPct()))
                    + ")");
        }
        String gapWords = String.join("; ", gaps)
                + (c.gaps().size() > LISTED ? "; and " + (c.gaps().size() - LISTED) + " more" : "");
        List<String> runs = new ArrayList<>();
        for (PartsCheck.Unchecked u : c.unchecked().subList(0, Math.min(LISTED, c.unchecked().size()))) {
            String span = u.from().equals(u.to()) ? f.period(u.from()) : f.period(u.from()) + " to " + f.period(u.to());
            runs.add(span + " (" + Terms.listed(u.missing()) + " missing)");
        }
        String uncheckedWords = String.join(", ", runs)
                + (c.unchecked().size() > LISTED ? " and " + (c.unchecked().size() - LISTED) + " more spans" : "");
        int series = c.parts().size() + 1;
        String allPresent = (series == 2 ? "both" : "all " + (series < COUNT.length ? COUNT[series] : f.count(series)))
                + " have a value";
        return new MultiBriefView.Consistency(true, c.consistent(), c.total(), String.join(", ", c.parts()),
                BriefViews.listPeriods(c.periods(), f), f.percent(c.largestGapPct()),
                f.percent(PartsCheck.TOLERANCE_PCT), c.checked() > 0, c.complete(), f.count(c.checked()), allPresent,
                gapWords, f.count(c.periods().size()), uncheckedWords);
    }

}
