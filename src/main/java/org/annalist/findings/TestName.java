package org.annalist.findings;

import org.annalist.analysis.TestResult;

/** A hypothesis test behind a finding, as it was run. */
public enum TestName {
    MANN_KENDALL, MANN_KENDALL_HAMED_RAO, MANN_KENDALL_AR1, SEASONAL_KENDALL, KRUSKAL_WALLIS, SUP_F_MONTE_CARLO;

    static TestName of(TestResult.Method method) {
        return switch (method) {
            case MANN_KENDALL -> MANN_KENDALL;
            case MANN_KENDALL_HAMED_RAO -> MANN_KENDALL_HAMED_RAO;
            case MANN_KENDALL_AR1 -> MANN_KENDALL_AR1;
            case SEASONAL_KENDALL -> SEASONAL_KENDALL;
            case KRUSKAL_WALLIS -> KRUSKAL_WALLIS;
            case SUP_F_MONTE_CARLO -> SUP_F_MONTE_CARLO;
        };
    }
}
