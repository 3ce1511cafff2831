package org.annalist.ingest;

/** How to read a date such as {@code 03/04/2024}: 3 April (day first) or March 4 (month first). */
public enum DateOrder {
    /** Infer from the data; stop with a message when the data cannot tell. */
    AUTO,
    DAY_FIRST,
    MONTH_FIRST
}
