package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Property: whatever the size of the values (tiny, huge, constant, with zeros, alternating in sign,
 * one spike), {@code analyze --format json} (and the notes, once per size) ends with exit 0 or 2 and
 * never prints NaN or Infinity; values beyond the readers' limits of ±1e100 and, other than zero,
 * nearer zero than ±1e-100 are refused with the file and line. Invented series, seeded.
 */
class ExtremeValuesPropertyTest {

    private static final long SEED = 20261203L;
    private static final double[] SCALES = {1e-300, 1e-120, 2e-100, 1e-10, 1, 1e10, 1e50, 1e99, 1.5e100, 1e200, 1e308};
    private static final String[] SHAPES = {"seasonal", "constant", "zeros", "alternating", "spike", "all-zero"};

    @TempDir
    Path folder;

    @Test
    void noSeriesGivesNaNOrInfinityOrAnExitOtherThanZeroOrTwo() throws IOException {
        Random random = new Random(SEED);
        for (int c = 0; c < 24; c++) {
            double scale = SCALES[c < SCALES.length ? c : random.nextInt(SCALES.length)];
            String shape = SHAPES[c % SHAPES.length];
            int months = 36 + random.nextInt(25);
            StringBuilder csv = new StringBuilder("month,value\n");
            for (int i = 0; i < months; i++) {
                // exact decimal digits: 1.3 × 1e308 is written out in full, beyond what a double holds
                BigDecimal v = new BigDecimal(value(shape, i, random)).multiply(new BigDecimal(scale));
                csv.append(String.format(Locale.ROOT, "%d-%02d,", 2015 + i / 12, i % 12 + 1))
                        .append(v.toPlainString()).append('\n');
            }
            Path file = folder.resolve("case" + c + ".csv");
            Files.writeString(file, csv);
            String label = "case " + c + " (" + shape + " × " + scale + ", seed " + SEED + ")";
            Run run = Run.of("analyze", file.toString(), "--format", "json");
            assertThat(run.exitCode()).as(label + ": " + run.err()).isIn(0, 2);
            assertThat(run.out() + run.err()).as(label).doesNotContain("NaN").doesNotContain("Infinity")
                    .doesNotContain("Exception");
            if (c < SCALES.length) {
                // the analyst's notes too, for each size once
                Run text = Run.of("analyze", file.toString());
                assertThat(text.exitCode()).as(label + ": " + text.err()).isEqualTo(run.exitCode());
                assertThat(text.out() + text.err()).as(label).doesNotContain("NaN").doesNotContain("Infinity")
                        .doesNotContain("\u221E").doesNotContain("Exception");
            }
            boolean allZero = shape.equals("all-zero");
            if (scale > 1e100 && !allZero) {
                assertThat(run.err()).as(label).contains("case" + c + ".csv:").contains("is beyond ±1e100");
            } else if (scale < 1e-100 && !allZero) {
                assertThat(run.err()).as(label).contains("case" + c + ".csv:").contains("nearer zero than ±1e-100");
            } else if (run.exitCode() == 2) {
                assertThat(run.err()).as(label).contains("case" + c + ".csv");
            }
        }
    }

    private static double value(String shape, int i, Random random) {
        double seasonal = 1 + 0.3 * Math.sin(i * Math.PI / 6) + 0.01 * i + 0.02 * random.nextGaussian();
        return switch (shape) {
            case "constant" -> 1;
            case "zeros" -> i % 5 == 0 ? 0 : seasonal;
            case "alternating" -> (i % 2 == 0 ? 1 : -1) * seasonal;
            case "spike" -> i == 20 ? 1 : seasonal * 1e-6;
            case "all-zero" -> 0;
            default -> seasonal;
        };
    }
}
