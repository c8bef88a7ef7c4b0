package org.tjmargin.circuit;

import org.tjmargin.device.BreakdownDiode;

/**
 * A diode fed from a current source (a reference biased by a current mirror or a constant-current stage).
 *
 * @param currentA the feed current (A), > 0
 */
public record CurrentFedDiode(double currentA) implements Circuit {

    public CurrentFedDiode {
        if (!(currentA > 0) || !Double.isFinite(currentA)) {
            throw new IllegalArgumentException("feed current must be > 0 and finite, got " + currentA + " A");
        }
    }

    @Override
    public CircuitPoint at(BreakdownDiode diode, double tjK) {
        double v;
        Region region;
        if (currentA >= diode.izkA()) {
            v = diode.breakdownVoltageV(currentA, tjK);
            region = currentA >= diode.lineStartA() ? Region.BREAKDOWN : Region.KNEE;
        } else {
            // Invert the monotone sub-knee characteristic by bisection (see TheveninDrive for the budget).
            double lo = 0;
            double hi = diode.kneeVoltageV(tjK);
            for (int i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
                double mid = 0.5 * (lo + hi);
                if (diode.subKneeCurrentA(mid, tjK) < currentA) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            v = 0.5 * (lo + hi);
            region = Region.BELOW_KNEE;
        }
        return new CircuitPoint(v, currentA, v * currentA, 0.0, 0.0, region);
    }

}
