package org.tjmargin.variation.statistical;

import org.tjmargin.variation.Axis;
import org.tjmargin.variation.Toleranced;

/**
 * One axis a statistical analysis varies, with its range and distribution.
 *
 * @param axis       the axis
 * @param toleranced its range (in the axis's unit, see {@link org.tjmargin.variation.AxisValues}) and distribution
 */
public record SampledAxis(Axis axis, Toleranced toleranced) {

    public SampledAxis {
        if (axis == null || toleranced == null) {
            throw new IllegalArgumentException("a sampled axis needs an axis and a toleranced value");
        }
    }
}
