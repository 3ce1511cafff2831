package org.annalist.ingest;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.annalist.series.ValueFlag;

/**
 * The status and flag codes that portals attach to a value, turned into the project's
 * {@link ValueFlag}s: the SDMX observation status ({@code OBS_STATUS}, code list CL_OBS_STATUS of the
 * SDMX content-oriented guidelines), the confidentiality status ({@code CONF_STATUS}, CL_CONF_STATUS),
 * and the letter flags of bulk downloads and JSON-stat status ({@code OBS_FLAG}: {@code p}, {@code e},
 * {@code c}, …, as {@link ValueFlag#fromCode} knows them). The CL_OBS_STATUS codes below (A normal, B break,
 * D definition differs, E estimated, F forecast, I imputed, N not significant, P provisional, U low reliability;
 * M, L, H, O, Q missing) checked against the list in SDMX's "Possible Ways of Implementing the Observation
 * Status Concept" (version 2.0, May 2019); R (revised) and the CL_CONF_STATUS codes from memory.
 */
final class SdmxFlags {

    /** The kind of column a status code comes from. */
    enum Kind { OBS_STATUS, CONF_STATUS, LETTERS }

    /** Codes read, and the codes that are no flag we know (for a warning). */
    record Read(Set<ValueFlag> flags, boolean missing, String unknown) {
        static final Read NONE = new Read(Set.of(), false, "");
    }

    private SdmxFlags() {
    }

    /** The column kind of a header id, if it holds status codes. */
    static Optional<Kind> kindOf(String columnId) {
        return switch (columnId) {
            case "OBS_STATUS" -> Optional.of(Kind.OBS_STATUS);
            case "CONF_STATUS", "OBS_CONF" -> Optional.of(Kind.CONF_STATUS);
            case "OBS_FLAG", "OBS_FLAGS", "FLAG", "FLAGS" -> Optional.of(Kind.LETTERS);
            default -> Optional.empty();
        };
    }

    /**
     * The flags of a cell ({@code CODE: Label} cells read by their code). {@code missing} is set for
     * the status codes that say the value is missing (M, L, H, O, Q of CL_OBS_STATUS).
     */
    static Read read(String cell, Kind kind) {
        String code = PublishedFormat.codeOf(cell);
        if (code.isEmpty()) {
            return Read.NONE;
        }
        return switch (kind) {
            case OBS_STATUS -> observationStatus(code);
            case CONF_STATUS -> switch (code.toUpperCase(Locale.ROOT)) {
                case "F" -> Read.NONE;                                   // free for publication
                case "C", "D", "N", "S", "A", "O", "M" -> new Read(Set.of(ValueFlag.CONFIDENTIAL), false, "");
                default -> new Read(Set.of(), false, code);
            };
            case LETTERS -> letters(code);
        };
    }

    private static Read observationStatus(String code) {
        return switch (code.toUpperCase(Locale.ROOT)) {
            case "A" -> Read.NONE;                                       // normal value
            case "B" -> new Read(Set.of(ValueFlag.BREAK_IN_SERIES), false, "");
            case "D" -> new Read(Set.of(ValueFlag.DEFINITION_DIFFERS), false, "");
            case "E", "I" -> new Read(Set.of(ValueFlag.ESTIMATED), false, "");   // estimated, imputed
            case "F" -> new Read(Set.of(ValueFlag.FORECAST), false, "");
            case "P" -> new Read(Set.of(ValueFlag.PROVISIONAL), false, "");
            case "R" -> new Read(Set.of(ValueFlag.REVISED), false, "");
            case "U" -> new Read(Set.of(ValueFlag.LOW_RELIABILITY), false, "");
            case "N" -> new Read(Set.of(ValueFlag.NOT_SIGNIFICANT), false, "");
            case "M", "L", "H", "O", "Q" -> new Read(Set.of(), true, "");
            default -> new Read(Set.of(), false, code);
        };
    }

    /** Letter flags, one or several ({@code p}, {@code pe}, {@code b p}). */
    static Read letters(String code) {
        EnumSet<ValueFlag> flags = EnumSet.noneOf(ValueFlag.class);
        StringBuilder unknown = new StringBuilder();
        for (char c : code.toCharArray()) {
            if (Character.isWhitespace(c) || c == ',') {
                continue;
            }
            Optional<ValueFlag> flag = ValueFlag.fromCode(c);
            if (flag.isPresent()) {
                flags.add(flag.get());
            } else {
                unknown.append(c);
            }
        }
        return new Read(flags.isEmpty() ? Set.of() : Set.copyOf(flags), false, unknown.toString());
    }
}
