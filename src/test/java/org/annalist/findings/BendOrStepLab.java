package org.annalist.findings;

import java.util.Optional;
import java.util.function.LongFunction;
import org.annalist.series.Series;

/**
 * Not a test: how often the findings claim a step at a planted bend (false claims) and at a planted
 * step (power), over many seeds, for the figures in the commit message. Run with the test class
 * path: {@code java -cp target/classes:target/test-classes:DEPS org.annalist.findings.BendOrStepLab [seeds]}.
 */
final class BendOrStepLab {

    public static void main(String[] args) {
        int seeds = args.length > 0 ? Integer.parseInt(args[0]) : 100;
        Analyst analyst = PlantedBends.analyst();
        for (double noise : new double[] {0.02, 0.035, 0.05}) {
            report("bend after a recovery, noise " + noise, seeds, analyst,
                    seed -> PlantedBends.collapseAndRecovery(seed, noise, 0), PlantedBends.BEND);
            for (double size : new double[] {-5, -10, -15}) {
                report("step " + size + " % after a recovery, noise " + noise, seeds, analyst,
                        seed -> PlantedBends.collapseAndRecovery(seed, noise, size), PlantedBends.BEND);
                report("step " + size + " % alone, noise " + noise, seeds, analyst,
                        seed -> PlantedBends.step(seed, noise, size, 100), 100);
            }
        }
    }

    private static void report(String what, int seeds, Analyst analyst, LongFunction<Series> make, int at) {
        int found = 0;
        int stepped = 0;
        int falseSteps = 0;
        for (long seed = 1; seed <= seeds; seed++) {
            Findings f = analyst.analyse(make.apply(seed));
            Optional<BreakFinding> b = PlantedBends.near(f, at, 3);
            found += b.isPresent() ? 1 : 0;
            stepped += b.filter(x -> x.kind().step()).isPresent() ? 1 : 0;
            falseSteps += PlantedBends.stepsAway(f, at, 3) > 0 ? 1 : 0;
        }
        System.out.printf("%-42s break within 3 months: %3d / %d, step claimed there: %3d / %d,"
                + " a step claimed elsewhere after the collapse: %3d / %d%n", what, found, seeds, stepped, seeds,
                falseSteps, seeds);
    }
}
