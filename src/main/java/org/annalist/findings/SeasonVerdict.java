package org.annalist.findings;

/** What may be said of a seasonal pattern. */
public enum SeasonVerdict {
    /** A pattern worth stating: significant, strong enough and large enough. */
    PRESENT,
    /** Detectable, but too weak or too small to matter. */
    NEGLIGIBLE,
    /** The seasons do not differ beyond chance. */
    ABSENT,
    /** Too few complete years to tell. */
    TOO_SHORT,
    /** Annual data have no seasons. */
    NOT_APPLICABLE
}
