package org.annalist.cli;

import java.util.Locale;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Lets enum options be written with dashes on the command line ({@code day-first}). */
final class DashEnum {

    private DashEnum() {
    }

    static final class DateOrderConverter implements ITypeConverter<InputMixin.DateOrderChoice> {
        @Override
        public InputMixin.DateOrderChoice convert(String value) {
            try {
                return InputMixin.DateOrderChoice.valueOf(value.trim().toLowerCase(Locale.ROOT).replace('-', '_'));
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException("'" + value + "' is not a date order; expected auto, day-first or month-first");
            }
        }
    }
}
