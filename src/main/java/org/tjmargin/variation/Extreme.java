package org.tjmargin.variation;

/** Which value of a range a corner takes. */
public enum Extreme {
    LOW, NOMINAL, HIGH
}
