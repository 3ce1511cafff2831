package org.annalist.cli;

import java.util.Locale;
import org.annalist.brief.Words;
import org.annalist.ingest.DateOrder;
import org.annalist.ingest.DecimalMark;
import org.annalist.narrative.Masthead;
import org.annalist.series.Frequency;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * Brings the domain's choices to picocli: an option's words ({@link Words}, the same a spec
 * accepts) become the domain's own values. {@code auto} becomes null, which picocli turns into an
 * empty {@code Optional}: "decide from the data".
 */
final class Converters {

    private Converters() {
    }

    /**
     * Words matched ignoring case, as picocli matches enum values; a word not known is refused as
     * picocli refuses an enum value, so that the message is the one users have always seen.
     */
    abstract static class WordsConverter<T> implements ITypeConverter<T> {
        private final Words<T> words;

        WordsConverter(Words<T> words) {
            this.words = words;
        }

        @Override
        public T convert(String value) {
            if (words.isAuto(value)) {
                return null;
            }
            return words.valueOf(value).orElseThrow(() -> new TypeConversionException(
                    "expected one of " + words.words() + " (case-insensitive) but was '" + value + "'"));
        }
    }

    /** {@code --form}. */
    static final class Form extends WordsConverter<org.annalist.findings.Form> {
        Form() {
            super(Words.FORM);
        }
    }

    /** {@code --measure}. */
    static final class Measure extends WordsConverter<org.annalist.findings.Measure> {
        Measure() {
            super(Words.MEASURE);
        }
    }

    /** {@code --decimal-mark}. */
    static final class Mark extends WordsConverter<DecimalMark> {
        Mark() {
            super(Words.DECIMAL_MARK);
        }
    }

    /** {@code --aggregate}. */
    static final class Aggregate extends WordsConverter<Frequency> {
        Aggregate() {
            super(Words.AGGREGATE);
        }
    }

    /** {@code --paper}. */
    static final class Paper extends WordsConverter<Masthead.Paper> {
        Paper() {
            super(Words.PAPER);
        }
    }

    /**
     * {@code --date-order}: written with a dash ({@code day-first}) or an underscore, in any case,
     * with spaces around it.
     */
    static final class Order implements ITypeConverter<DateOrder> {
        @Override
        public DateOrder convert(String value) {
            return Words.DATE_ORDER.valueOf(value.trim().toLowerCase(Locale.ROOT).replace('_', '-')).orElseThrow(() ->
                    new TypeConversionException("'" + value + "' is not a date order; expected "
                            + Words.DATE_ORDER.listed()));
        }
    }
}
