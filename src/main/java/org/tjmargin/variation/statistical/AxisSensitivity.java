package org.tjmargin.variation.statistical;

import org.tjmargin.variation.Axis;

/**
 * One input's share of a root-sum-square spread.
 *
 * @param axis               the input
 * @param inputSigma         its standard deviation from its distribution (axis unit)
 * @param stepSize           the central-difference step {@code h} (axis unit)
 * @param tjPerUnit          {@code ∂Tj/∂x} (K per axis unit)
 * @param marginPerUnit      {@code ∂margin/∂x} (1 per axis unit)
 * @param tjSigmaK           {@code |∂Tj/∂x|·σx} (K)
 * @param marginSigma        {@code |∂margin/∂x|·σx} (1)
 */
public record AxisSensitivity(Axis axis, double inputSigma, double stepSize, double tjPerUnit, double marginPerUnit,
                              double tjSigmaK, double marginSigma) {
}
