package org.tjmargin.variation.statistical;

import org.tjmargin.variation.Axis;

/**
 * One input swung over its range, the others nominal (one bar of a tornado chart).
 *
 * @param axis     the input
 * @param lowValue its low end (axis unit)
 * @param highValue its high end (axis unit)
 * @param atLow    the point with the input at its low end
 * @param atHigh   the point with the input at its high end
 * @param swing    spread of the limiting margin over {nominal, low, high}: {@code max − min} (1), the ranking key
 */
public record TornadoBar(Axis axis, double lowValue, double highValue, Evaluation atLow, Evaluation atHigh,
                         double swing) {
}
