package org.tjmargin.derating;

/** Whether a rule's limit is a ceiling or a floor. */
public enum Bound {
    /** The quantity must not exceed the limit. */
    MAX,
    /** The quantity must not fall below the limit. */
    MIN
}
