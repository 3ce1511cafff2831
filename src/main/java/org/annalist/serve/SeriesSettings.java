package org.annalist.serve;

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;
import org.annalist.brief.AnalysisChoices;
import org.annalist.brief.BriefOutput;
import org.annalist.brief.Job;
import org.annalist.brief.OutputName;
import org.annalist.brief.SeriesChoice;
import org.annalist.brief.SideOutputs;
import org.annalist.brief.Words;
import org.annalist.findings.Analyst;
import org.annalist.findings.Form;
import org.annalist.findings.Measure;
import org.annalist.narrative.Masthead;

/**
 * The choices a user may change on a series' page, as the browser sends them (query or form
 * fields), in the words the command line and the spec accept ({@link Words}), and the job they
 * make: the same job {@code brief FILE --series NAME …} makes with the same choices.
 *
 * @param mistakes the fields whose value was refused (the page says which; the default is used)
 */
public record SeriesSettings(String period, String measure, String form, String horizon, boolean perDay, String title,
                      String organisation, String paper, List<String> mistakes) {

    /** A title or organisation longer than this is cut: a masthead has one line for it. */
    static final int MAX_TEXT = 200;

    public SeriesSettings {
        mistakes = List.copyOf(mistakes);
    }

    /** The settings in the fields {@code field} returns (absent fields: decided from the data). */
    static SeriesSettings from(Function<String, Optional<String>> field) {
        List<String> mistakes = new ArrayList<>();
        String period = text(field, "period", 20);
        if (!period.isEmpty() && !period.matches("[0-9A-Za-z-]{1,20}")) {
            mistakes.add("period");
            period = "";
        }
        String measure = word(field, "measure", Words.MEASURE, mistakes);
        String form = word(field, "form", Words.FORM, mistakes);
        String paper = word(field, "paper", Words.PAPER, mistakes);
        String horizon = text(field, "horizon", 6);
        if (!horizon.isEmpty()) {
            try {
                int h = Integer.parseInt(horizon);
                if (h < 0 || h > Analyst.MAX_HORIZON) {
                    throw new NumberFormatException();
                }
            } catch (NumberFormatException e) {
                mistakes.add("horizon");
                horizon = "";
            }
        }
        boolean perDay = field.apply("perday").map(v -> v.equals("on") || v.equals("true")).orElse(false);
        return new SeriesSettings(period, measure, form, horizon, perDay, text(field, "title", MAX_TEXT),
                text(field, "organisation", MAX_TEXT), paper.isEmpty() ? "a4" : paper, mistakes);
    }

    private static String text(Function<String, Optional<String>> field, String name, int max) {
        String value = field.apply(name).orElse("").strip().replaceAll("\\p{Cntrl}", " ");
        return value.length() > max ? value.substring(0, max) : value;
    }

    private static <T> String word(Function<String, Optional<String>> field, String name, Words<T> words,
                                   List<String> mistakes) {
        String value = text(field, name, 40).toLowerCase(Locale.ROOT);
        if (value.isEmpty() || words.isAuto(value)) {
            return "";
        }
        if (words.valueOf(value).isEmpty()) {
            mistakes.add(name);
            return "";
        }
        return value;
    }

    /** The settings as a query string, for links and the forms' hidden fields. */
    Map<String, String> fields() {
        Map<String, String> fields = new LinkedHashMap<>();
        fields.put("period", period);
        fields.put("measure", measure);
        fields.put("form", form);
        fields.put("horizon", horizon);
        if (perDay) {
            fields.put("perday", "on");
        }
        fields.put("title", title);
        fields.put("organisation", organisation);
        fields.put("paper", paper);
        return fields;
    }

    String query() {
        StringBuilder query = new StringBuilder();
        fields().forEach((k, v) -> {
            if (!v.isEmpty()) {
                query.append(query.length() == 0 ? "" : "&").append(k).append('=')
                        .append(URLEncoder.encode(v, StandardCharsets.UTF_8));
            }
        });
        return query.toString();
    }

    /**
     * The job of a brief of {@code series} with these settings, written to {@code output} with the
     * side outputs asked for, the logo and holidays file the user gave for the file's briefs; as
     * {@code brief} builds it from its options.
     */
    Job job(OpenFile file, BriefExtras extras, String series, Path output, Optional<Instant> generatedAt,
            Set<SideOutputs.Kind> sides) {
        BriefOutput.MastheadChoices masthead = new BriefOutput.MastheadChoices(title, organisation, extras.logo(),
                Words.PAPER.valueOf(paper).orElse(Masthead.Paper.A4), Locale.ENGLISH, Optional.empty(), generatedAt);
        Optional<Form> chosenForm = form.isEmpty() ? Optional.empty() : Words.FORM.valueOf(form);
        Optional<Measure> chosenMeasure = measure.isEmpty() ? Optional.empty() : Words.MEASURE.valueOf(measure);
        AnalysisChoices choices = new AnalysisChoices(chosenForm, chosenMeasure, Map.of(), extras.holidays(),
                horizon.isEmpty() ? Optional.empty() : Optional.of(Integer.parseInt(horizon)), perDay);
        return new Job(file.input(), SeriesChoice.one(Optional.of(series),
                period.isEmpty() ? Optional.empty() : Optional.of(period)), choices,
                Optional.of(new BriefOutput(new OutputName.AsGiven(output), masthead, sides, Optional.empty())));
    }
}
