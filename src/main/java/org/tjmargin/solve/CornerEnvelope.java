package org.tjmargin.solve;

import java.util.List;

/**
 * What a position's corners span at one ambient, over its converged corners: the junction temperatures, the output
 * voltage, the series resistor's dissipation and the heat (diode plus resistor) of the corner of greatest heat. Kept
 * beside the reported corners so that a sweep need not keep every corner at every ambient
 * ({@link PositionAtAmbient#reportedOnly()}). Each value is {@code NaN} when no corner converged.
 *
 * @param tjMinK       coolest junction (K)
 * @param tjMaxK       hottest junction (K)
 * @param outputMinV   lowest diode (output) voltage (V)
 * @param outputMaxV   highest diode (output) voltage (V)
 * @param resistorMaxW largest series-resistor dissipation (W); 0 without a resistor
 * @param heatMaxW     largest heat, diode plus series resistor (W)
 */
public record CornerEnvelope(double tjMinK, double tjMaxK, double outputMinV, double outputMaxV, double resistorMaxW,
                             double heatMaxW) {

    /** The envelope of {@code corners}' converged points. */
    public static CornerEnvelope of(List<CornerPoint> corners) {
        Accumulator a = new Accumulator();
        for (CornerPoint c : corners) {
            a.add(c.outcome());
        }
        return a.envelope();
    }

    /** Gathers the envelope outcome by outcome, for a caller that keeps no list of its corners. Not thread-safe. */
    static final class Accumulator {
        private double tjLo = Double.POSITIVE_INFINITY;
        private double tjHi = Double.NEGATIVE_INFINITY;
        private double vLo = Double.POSITIVE_INFINITY;
        private double vHi = Double.NEGATIVE_INFINITY;
        private double rMax = Double.NEGATIVE_INFINITY;
        private double hMax = Double.NEGATIVE_INFINITY;

        /** Takes in one corner's outcome (only a converged one counts). */
        void add(ThermalOutcome outcome) {
            if (outcome instanceof ThermalOutcome.Converged cv) {
                OperatingPoint p = cv.point();
                tjLo = Math.min(tjLo, p.tjK());
                tjHi = Math.max(tjHi, p.tjK());
                double v = p.circuit().voltageV();
                vLo = Math.min(vLo, v);
                vHi = Math.max(vHi, v);
                rMax = Math.max(rMax, p.circuit().resistorPowerW());
                hMax = Math.max(hMax, p.heatW());
            }
        }

        /** The envelope of the outcomes taken in so far. */
        CornerEnvelope envelope() {
            if (tjHi == Double.NEGATIVE_INFINITY) {
                return new CornerEnvelope(Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
            }
            return new CornerEnvelope(tjLo, tjHi, vLo, vHi, rMax, hMax);
        }
    }

    /** True when at least one corner converged. */
    public boolean any() {
        return !Double.isNaN(tjMaxK);
    }
}
