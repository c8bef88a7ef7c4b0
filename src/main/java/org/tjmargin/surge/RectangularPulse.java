package org.tjmargin.surge;

import java.util.List;

/**
 * A rectangular pulse: {@code amplitude} for {@code 0 ≤ t < width}, zero otherwise (datasheet square-wave surge
 * ratings, e.g. 1/120 s for Zener {@code IZSM}; reference 4.5). A rectangle has no rise to resolve; its whole width
 * counts as one front so the solver samples the coupled response during it.
 *
 * @param amplitude value during the pulse (A or V), positive
 * @param widthS    width (s), positive
 * @param quantity  current or voltage
 */
public record RectangularPulse(double amplitude, double widthS, SurgeQuantity quantity) implements Waveform {

    public RectangularPulse {
        if (!(amplitude > 0) || !Double.isFinite(amplitude)) {
            throw new IllegalArgumentException("rectangular pulse amplitude must be positive and finite: " + amplitude);
        }
        if (!(widthS > 0) || !Double.isFinite(widthS)) {
            throw new IllegalArgumentException("rectangular pulse width must be positive and finite: widthS = " + widthS);
        }
        if (quantity == null) {
            throw new IllegalArgumentException("rectangular pulse needs a quantity");
        }
    }

    @Override
    public double valueAt(double tS) {
        return tS >= 0 && tS < widthS ? amplitude : 0;
    }

    @Override
    public double[] breakpointsS() {
        return new double[] {0, widthS};
    }

    @Override
    public List<Front> fronts() {
        return List.of(new Front(0, widthS));
    }

    @Override
    public double durationS() {
        return widthS;
    }
}
