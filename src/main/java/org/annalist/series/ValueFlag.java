package org.annalist.series;

import java.util.Collections;
import java.util.EnumSet;
import java.util.Optional;
import java.util.Set;

/**
 * A note a statistical office attaches to a published value, written as a letter after the number
 * ({@code 123p}). The letters are those in common use in official statistics (common practice, as
 * in the flag lists of European statistical releases; from memory).
 */
public enum ValueFlag {
    PROVISIONAL('p', "provisional"),
    ESTIMATED('e', "estimated"),
    REVISED('r', "revised"),
    BREAK_IN_SERIES('b', "break in series"),
    DEFINITION_DIFFERS('d', "definition differs"),
    FORECAST('f', "forecast"),
    LOW_RELIABILITY('u', "low reliability"),
    CONFIDENTIAL('c', "confidential"),
    NOT_SIGNIFICANT('n', "not significant"),
    NOT_APPLICABLE('z', "not applicable");

    private final char code;
    private final String description;

    ValueFlag(char code, String description) {
        this.code = code;
        this.description = description;
    }

    public char code() {
        return code;
    }

    public String description() {
        return description;
    }

    /** The flag written as {@code code} (either case), if it is one we know. */
    public static Optional<ValueFlag> fromCode(char code) {
        char lower = Character.toLowerCase(code);
        for (ValueFlag flag : values()) {
            if (flag.code == lower) {
                return Optional.of(flag);
            }
        }
        return Optional.empty();
    }

    /** The letters that {@link #fromCode} accepts, for messages. */
    public static String knownCodes() {
        StringBuilder codes = new StringBuilder();
        for (ValueFlag flag : values()) {
            codes.append(codes.length() == 0 ? "" : ", ").append(flag.code).append(" (").append(flag.description).append(')');
        }
        return codes.toString();
    }

    static int toBits(Set<ValueFlag> flags) {
        int bits = 0;
        for (ValueFlag flag : flags) {
            bits |= 1 << flag.ordinal();
        }
        return bits;
    }

    static Set<ValueFlag> fromBits(int bits) {
        if (bits == 0) {
            return Set.of();
        }
        EnumSet<ValueFlag> flags = EnumSet.noneOf(ValueFlag.class);
        for (ValueFlag flag : values()) {
            if ((bits & (1 << flag.ordinal())) != 0) {
                flags.add(flag);
            }
        }
        return Collections.unmodifiableSet(flags);
    }
}
