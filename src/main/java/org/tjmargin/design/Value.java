package org.tjmargin.design;

import org.tjmargin.units.Dimension;

/**
 * A quantity read from a file, in SI (temperatures in kelvin), with where it was written, so that a later check
 * against another field can still point at it.
 *
 * @param si        the value in the dimension's SI unit
 * @param dimension what it was read as
 * @param node      the scalar it was read from
 * @param path      its field path
 */
record Value(double si, Dimension dimension, Node node, String path) {

    /** The text as written, for messages ("150 Ω"). */
    String text() {
        return node instanceof Node.Scalar s ? s.text() : node.describe();
    }
}
