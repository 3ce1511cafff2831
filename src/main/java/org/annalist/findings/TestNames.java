package org.annalist.findings;

import org.annalist.analysis.TestResult;

/** The tests' names as the findings JSON writes them. */
final class TestNames {

    private TestNames() {
    }

    static String of(TestResult.Method method) {
        return switch (method) {
            case MANN_KENDALL -> "Mann-Kendall";
            case MANN_KENDALL_HAMED_RAO -> "Mann-Kendall (Hamed-Rao corrected)";
            case MANN_KENDALL_AR1 -> "Mann-Kendall (variance corrected for AR(1) serial correlation)";
            case SEASONAL_KENDALL -> "seasonal Kendall";
            case KRUSKAL_WALLIS -> "Kruskal-Wallis";
            case SUP_F_MONTE_CARLO -> "sup-F (Monte Carlo p, AR(1) noise)";
        };
    }
}
