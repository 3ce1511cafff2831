package org.annalist.chart;

import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.Locale;

/** Axis number formats that do not change with the machine's locale. */
final class NumberFormats {

    private NumberFormats() {
    }

    /** Grouped thousands, up to two decimals: 12,500 or 0.25. */
    static DecimalFormat axis() {
        return new DecimalFormat("#,##0.##", DecimalFormatSymbols.getInstance(Locale.ENGLISH));
    }
}
