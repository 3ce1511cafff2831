package org.annalist.chart;

import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.text.FieldPosition;
import java.text.NumberFormat;
import java.text.ParsePosition;
import java.util.Locale;

/**
 * Axis number formats that do not change with the machine's locale, in the brief's typography
 * (see {@code narrative.Formats}): the true minus sign U+2212 on negative ticks, as in the text and
 * the bar labels, and no sign on a tick that rounds to zero (a tick computed as −1e−17 prints
 * {@code 0}, never {@code −0}).
 */
final class NumberFormats {

    private NumberFormats() {
    }

    /** Grouped thousands, up to two decimals: 12,500, 0.25 or −20. */
    static NumberFormat axis() {
        DecimalFormatSymbols symbols = DecimalFormatSymbols.getInstance(Locale.ENGLISH);
        symbols.setMinusSign('\u2212');
        return new NoNegativeZero(new DecimalFormat("#,##0.##", symbols));
    }

    /**
     * Signed labels, grouped, with exactly {@code decimals} decimals, so that labels side by side
     * share them: {@code +14}, {@code −3.5}, {@code +12.0}; a value that rounds to zero has no sign.
     */
    static NumberFormat signed(int decimals) {
        DecimalFormatSymbols symbols = DecimalFormatSymbols.getInstance(Locale.ENGLISH);
        symbols.setMinusSign('\u2212');
        String digits = decimals == 0 ? "#,##0" : "#,##0." + "0".repeat(decimals);
        return new NoNegativeZero(new DecimalFormat("+" + digits + ";\u2212" + digits, symbols));
    }

    /** Formats through {@code format} after turning a value that would print as zero into zero. */
    private static final class NoNegativeZero extends NumberFormat {

        private static final long serialVersionUID = 1L;
        private final DecimalFormat format;

        NoNegativeZero(DecimalFormat format) {
            this.format = format;
        }

        @Override
        public StringBuffer format(double number, StringBuffer toAppendTo, FieldPosition pos) {
            String magnitude = format.format(Math.abs(number));
            if (magnitude.chars().filter(Character::isDigit).allMatch(c -> c == '0')) {
                return toAppendTo.append(magnitude.replace("+", ""));
            }
            return format.format(number, toAppendTo, pos);
        }

        @Override
        public StringBuffer format(long number, StringBuffer toAppendTo, FieldPosition pos) {
            return format.format(number, toAppendTo, pos);
        }

        @Override
        public Number parse(String source, ParsePosition parsePosition) {
            return format.parse(source, parsePosition);
        }

        @Override
        public boolean equals(Object other) {
            return other instanceof NoNegativeZero n && n.format.equals(format);
        }

        @Override
        public int hashCode() {
            return format.hashCode();
        }
    }
}
