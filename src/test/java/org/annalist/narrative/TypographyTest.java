package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * Sentences built with {@code String.format} (the calendar notes, the plain-text notes of
 * {@code analyze}) follow the brief's sign convention (see {@link Formats}).
 */
// Inputs are invented sentences in the notes' form; the expected strings are the same sentences set by
// hand under the project's convention (true minus, no signed zero, a no-break space before %).
class TypographyTest {

    @Test
    void aNegativeNumberGetsTheTrueMinusButAPeriodLabelKeepsItsHyphen() {
        assertThat(AnalystNotes.typeset("2021-01 (95% interval 2020-11 to 2021-03): level 120.5 → 41.2, -65.7 %"))
                .isEqualTo("2021-01 (95% interval 2020-11 to 2021-03): level 120.5 → 41.2, \u221265.7 %");
        assertThat(AnalystNotes.typeset("Sen slope -2.5e-05 per year (95% CI -3.1 to -1.9), lag-12"))
                .isEqualTo("Sen slope \u22122.5e-05 per year (95% CI \u22123.1 to \u22121.9), lag-12");
    }

    @Test
    void aSignedValueThatRoundsToZeroLosesItsSign() {
        assertThat(AnalystNotes.typeset("year to date -0.0 %; rolling year +0.0 %; Jan +0.05 %, Feb -0.0012, x +0."))
                .isEqualTo("year to date 0.0 %; rolling year 0.0 %; Jan +0.05 %, Feb \u22120.0012, x 0.");
    }

    /**
     * The scan that sets minus signs does what the pattern it replaced did,
     * {@code (?<![\p{L}\p{N}_\-])-(?=\d)} replaced by the true minus, on random sentences of the
     * characters that matter to it (letters and digits of other scripts, a letter outside the basic
     * plane, underscores, points, signs); the pattern is the reference, kept here.
     */
    @Test
    void theMinusSignScanAgreesWithThePatternItReplaced() {
        java.util.regex.Pattern reference = java.util.regex.Pattern.compile("(?<![\\p{L}\\p{N}_\\-])-(?=\\d)");
        String[] pieces = {"-", "-", "-", "0", "7", "a", "Z", "é", "\u0663", "\u2163", "\u00B2", "_", ".", " ", "(", "e",
            "\u2212", "+", "%", "\uD835\uDC00", "2024-03", "x-1"};
        java.util.Random random = new java.util.Random(5);
        for (int trial = 0; trial < 20_000; trial++) {
            StringBuilder text = new StringBuilder();
            for (int i = random.nextInt(12); i > 0; i--) {
                text.append(pieces[random.nextInt(pieces.length)]);
            }
            String sentence = text.toString();
            assertThat(Typography.minusSigns(sentence)).as(sentence)
                    .isEqualTo(reference.matcher(sentence).replaceAll("\u2212"));
        }
    }

    @Test
    void printedTextAlsoJoinsANumberToItsPercentSign() {
        assertThat(Typography.printed("March and April together: -4.0 % on a year earlier; 95 % of days; +0.0 %."))
                .isEqualTo("March and April together: \u22124.0\u00A0% on a year earlier; 95\u00A0% of days; 0.0\u00A0%.");
    }
}
