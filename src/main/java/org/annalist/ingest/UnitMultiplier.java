package org.annalist.ingest;

import java.math.BigDecimal;
import java.util.OptionalInt;

/**
 * The SDMX attribute {@code UNIT_MULT}: the observation's value times ten to the power of its code is
 * the value in the unit of measure (SDMX Glossary 2.1, "Unit multiplier", cross-domain concept
 * SDMX:CROSS_DOMAIN_CONCEPTS(2.0).UNIT_MULT, "UNIT_MULT=6 indicates that observations are in millions";
 * its code list CL_UNIT_MULT: 0 for simple units, 3 thousands, 6 millions, 9 billions; both checked; negative
 * exponents for fractions from memory). The multiplier is applied as
 * the file is read, so that series of different multipliers compare, and said in a warning.
 */
final class UnitMultiplier {

    /** The exponents accepted: a wider code is a typo, not a magnitude any statistic has (our rule, no source). */
    static final int LOWEST = -15;
    static final int HIGHEST = 15;

    private UnitMultiplier() {
    }

    /** The exponent of a cell ({@code 3}, or {@code 3: Thousands} as files with labels write it); 0 when empty. */
    static OptionalInt exponent(String cell) {
        String code = PublishedFormat.codeOf(cell).strip();
        if (code.isEmpty()) {
            return OptionalInt.of(0);
        }
        try {
            int exponent = Integer.parseInt(code);
            return exponent < LOWEST || exponent > HIGHEST ? OptionalInt.empty() : OptionalInt.of(exponent);
        } catch (NumberFormatException notAWholeNumber) {
            return OptionalInt.empty();
        }
    }

    /**
     * {@code value × 10^exponent}, shifted in decimal (the value's shortest decimal text moved by the
     * exponent) so that 1.2 with UNIT_MULT 3 is exactly 1200, not 1200.0000000000002.
     */
    static double apply(double value, int exponent) {
        return BigDecimal.valueOf(value).scaleByPowerOfTen(exponent).doubleValue();
    }

    /** The warning that says a multiplier was applied. */
    static String note(int exponent) {
        String name = switch (exponent) {
            case 3 -> " (thousands)";
            case 6 -> " (millions)";
            case 9 -> " (billions)";
            default -> "";
        };
        return "values multiplied by 10^" + exponent + name + ", as their UNIT_MULT " + exponent + " says (first on this line)";
    }
}
