package org.annalist.ingest;

/** The character that separates the integer part of a number from its fraction. */
public enum DecimalMark {
    /** {@code 1,234.5} */
    POINT('.'),
    /** {@code 1.234,5} */
    COMMA(',');

    private final char symbol;

    DecimalMark(char symbol) {
        this.symbol = symbol;
    }

    public char symbol() {
        return symbol;
    }

    DecimalMark other() {
        return this == POINT ? COMMA : POINT;
    }
}
