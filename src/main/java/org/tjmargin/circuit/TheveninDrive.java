package org.tjmargin.circuit;

import org.tjmargin.device.PreparedDiode;

/**
 * The diode driven by a Thevenin source {@code (Vth, Rth)}: the one place where the breakdown characteristic meets
 * Kirchhoff's current law, shared by the shunt regulator and the clamp.
 *
 * <p>On the straight line the intersection is closed-form, {@code I = (Vth − Vz0(Tj))/(Rth + Rz)} (Sedra and
 * Smith, 5th ed., §3.5, Example 3.8 is this equation with a 0.5 kΩ resistor). On a current-dependent knee and below
 * the knee the characteristic is nonlinear but monotone, so the intersection is unique and found by safeguarded
 * bisection: 200 halvings at most, stopping at a relative width of 1e-15, which is the double-precision floor.
 */
final class TheveninDrive {

    /** Bisection budget: the bracket shrinks by 2^-200, far below double resolution before the budget ends. */
    private static final int MAX_HALVINGS = 200;
    /** Fixed-point tries below the knee before falling back to bisection. */
    private static final int FIXED_POINT_TRIES = 12;

    private TheveninDrive() {
    }

    /**
     * Diode voltage and current against the source, written into {@code out}'s voltage, current and region (the
     * circuit adds its own share).
     */
    static void solve(PreparedDiode d, double tjK, double vthV, double rthOhm, CircuitState out) {
        double g = d.excessLeakageConductanceS(tjK);
        if (rthOhm == 0) {
            double v = Math.max(0.0, vthV);
            out.drive(v, d.reverseCurrentA(v, tjK), regionAt(d, tjK, v));
            return;
        }
        if (g > 0) {
            // Excess leakage is a conductance across the diode: fold it into the source (Norton–Thevenin), solve
            // the remaining characteristic, and add its current back.
            double vth2 = vthV / (1 + g * rthOhm);
            double rth2 = rthOhm / (1 + g * rthOhm);
            solveCharacteristic(d, tjK, vth2, rth2, out);
            out.drive(out.voltageV(), out.diodeCurrentA() + g * out.voltageV(), out.region());
            return;
        }
        solveCharacteristic(d, tjK, vthV, rthOhm, out);
    }

    private static Region regionAt(PreparedDiode d, double tjK, double v) {
        if (v < d.kneeVoltageV(tjK)) {
            return Region.BELOW_KNEE;
        }
        return (v - d.vz0V(tjK)) / d.rzOhm() >= d.lineStartA() ? Region.BREAKDOWN : Region.KNEE;
    }

    private static void solveCharacteristic(PreparedDiode d, double tjK, double vthV, double rthOhm,
                                            CircuitState out) {
        double vz0 = d.vz0V(tjK);
        double lineI = (vthV - vz0) / (rthOhm + d.rzOhm());
        if (lineI >= d.lineStartA()) {
            out.drive(vz0 + d.rzOhm() * lineI, lineI, Region.BREAKDOWN);
            return;
        }
        double izk = d.izkA();
        if (vthV - d.kneeVoltageV(tjK) - rthOhm * izk >= 0) {
            // On the knee: h(I) = Vth − V(I) − Rth·I = 0 for I in [Izk, Izt], decreasing in I, with
            // h'(I) = −(Zz(I) + Rth). Newton's method safeguarded by the bracket (a step leaving it bisects).
            double lo = izk;
            double hi = d.iztA();
            // Start where the tangent at Izt (the straight line's slope) meets the source line: on a convex knee
            // this lands close to the root, and Newton needs two or three steps.
            double i = Math.min(hi, Math.max(lo, lineI));
            double v = d.breakdownVoltageV(i, tjK);
            // h is convex and decreasing on the knee (V is concave there), and h(lineI) ≥ 0 because the knee lies
            // below the straight line: Newton then climbs monotonically onto the root. A relative step of 1e-13
            // is far below any physical resolution of the current.
            for (int n = 0; n < MAX_HALVINGS && hi - lo > 1e-13 * hi; n++) {
                double h = vthV - v - rthOhm * i;
                if (h >= 0) {
                    lo = i;
                } else {
                    hi = i;
                }
                double zz = d.dynamicImpedanceOhm(i);
                double step = h / (zz + rthOhm);
                if (Math.abs(step) <= 1e-13 * hi) {
                    // Converged (h may be exactly 0). Tested before the bracket: a zero step lands on the bracket's
                    // end and would otherwise be taken for a step out of it and bisect away from the root. One more
                    // evaluation would change V by Zz·Δ only (the second-order term is ~1e-26 V).
                    v += zz * step;
                    i += step;
                    break;
                }
                double next = i + step;
                if (!(next > lo && next < hi)) {
                    next = 0.5 * (lo + hi);
                }
                i = next;
                v = d.breakdownVoltageV(i, tjK);
            }
            out.drive(v, i, Region.KNEE);
            return;
        }
        if (vthV <= 0) {
            out.drive(0.0, 0.0, Region.BELOW_KNEE);
            return;
        }
        // Below the knee: (Vth − V)/Rth − I_sub(V) = 0 for V in [0, min(Vth, Vzk)], decreasing in V.
        double hi = Math.min(vthV, d.kneeVoltageV(tjK));
        // Blocking clamps and collapsed regulators draw little current, so V = Vth − Rth·I_sub(V) contracts fast
        // (its derivative Rth·dI/dV is tiny): try it first, fall back to bisection if it does not settle.
        double v = hi;
        for (int i = 0; i < FIXED_POINT_TRIES; i++) {
            double next = vthV - rthOhm * d.subKneeCurrentA(v, tjK);
            if (!(next >= 0 && next <= hi)) {
                break;
            }
            if (Math.abs(next - v) <= 1e-15 * hi) {
                out.drive(next, d.subKneeCurrentA(next, tjK), Region.BELOW_KNEE);
                return;
            }
            v = next;
        }
        double lo = 0;
        for (int i = 0; i < MAX_HALVINGS && hi - lo > 1e-15 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if ((vthV - mid) / rthOhm - d.subKneeCurrentA(mid, tjK) >= 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        v = 0.5 * (lo + hi);
        out.drive(v, d.subKneeCurrentA(v, tjK), Region.BELOW_KNEE);
    }
}
