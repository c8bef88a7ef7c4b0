package org.tjmargin.circuit;

import org.tjmargin.device.PreparedDiode;

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
    public void solve(PreparedDiode diode, double tjK, CircuitState out) {
        // The total reverse current rises monotonically with voltage: bisection for the voltage that carries the
        // feed current, between 0 and the voltage the breakdown branch alone would need (200 halvings reach
        // double resolution).
        if (diode.excessLeakageConductanceS(tjK) == 0 && currentA >= diode.izkA()) {
            // The usual case, on the breakdown characteristic itself: closed form or the knee law, no search.
            double v = diode.breakdownVoltageV(currentA, tjK);
            Region region = currentA >= diode.lineStartA() ? Region.BREAKDOWN : Region.KNEE;
            out.set(v, currentA, v * currentA, 0.0, 0.0, region);
            return;
        }
        double lo = 0;
        double hi = Math.max(diode.breakdownVoltageV(Math.max(currentA, diode.izkA()), tjK), 1e-9);
        if (diode.reverseCurrentA(hi, tjK) < currentA) {
            hi = diode.vz0V(tjK) + diode.rzOhm() * currentA;
        }
        for (int i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (diode.reverseCurrentA(mid, tjK) < currentA) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double v = 0.5 * (lo + hi);
        Region region;
        if (v < diode.kneeVoltageV(tjK)) {
            region = Region.BELOW_KNEE;
        } else {
            region = (v - diode.vz0V(tjK)) / diode.rzOhm() >= diode.lineStartA() ? Region.BREAKDOWN : Region.KNEE;
        }
        out.set(v, currentA, v * currentA, 0.0, 0.0, region);
    }
}
