package org.tjmargin.variation.statistical;

import java.util.Optional;
import org.tjmargin.circuit.CircuitPoint;
import org.tjmargin.circuit.CurrentFedDiode;
import org.tjmargin.circuit.Load;
import org.tjmargin.circuit.Region;
import org.tjmargin.circuit.ShuntRegulator;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.Celsius;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PositionInstance;
import org.tjmargin.solve.SolverSettings;

/**
 * The coupled operating point in closed form where the model is linear (design 2.3): a piecewise-linear diode on
 * its straight breakdown line, no excess leakage, a current load (or a current feed) and a constant {@code Rθja}.
 * Then {@code P} is quadratic in {@code u = Tj − 25 °C} and the heat balance {@code a·u² + b·u + c = 0} has the
 * root reached warming from the air {@code u* = −2c/(b + √(b² − 4ac))} (derivation in
 * {@code src/test/resources/reference/electrothermal/README.md}, §1; with {@code a = −Rθ·p2 ≥ 0} and
 * {@code g(ΔTl) = −Rθ·P < 0} the roots straddle the air temperature, so the larger is the lowest root above it,
 * the one {@link org.tjmargin.solve.ElectroThermalSolver} finds). A current-fed diode is the linear case
 * {@code u* = (ΔTl + Rθ·I·(Vz0(25) + Rz·I))/(1 − Rθ·I·αV)}.
 *
 * <p>Used only where its assumptions hold, checked per point: the current on the straight line
 * ({@code I ≥ lineStartA}) both at the air temperature and at the root (the current is linear in {@code u}, so then
 * everywhere between, where the general solver's search runs), no excess leakage at the root (it only grows with
 * temperature), loop gain below one at the air ({@code b > 0}), a real root, and the root below the search cap.
 * Otherwise it answers "not applicable" and the caller uses the general solver. A test holds it against the
 * general solver.
 *
 * <p>Stateless and thread-safe.
 */
public final class LinearFastPath {

    private static final double T25_K = Celsius.T25_K;

    private LinearFastPath() {
    }

    /** The closed-form point of {@code inst} in air at {@code tLocalK}, or empty where the assumptions fail. */
    public static Optional<OperatingPoint> solve(PositionInstance inst, double tLocalK, SolverSettings settings) {
        BreakdownDiode d = inst.diode();
        double rTheta = inst.path().rThetaJaKPerW();
        double alpha = d.tc().alphaVPerK();
        double tj;
        CircuitPoint cp;
        double loopGain;
        if (inst.circuit() instanceof ShuntRegulator s && s.load() instanceof Load.Current l) {
            tj = shuntTjK(s.supplyV(), l.currentA(), s.seriesOhm(), d.vz0At25V(), d.rzOhm(), alpha, rTheta,
                    tLocalK, d.lineStartA(), settings.capK());
            if (Double.isNaN(tj) || d.excessLeakageConductanceS(tj) != 0) {
                return Optional.empty();
            }
            double iz = (s.supplyV() - l.currentA() * s.seriesOhm() - d.vz0V(tj)) / (s.seriesOhm() + d.rzOhm());
            double v = d.vz0V(tj) + d.rzOhm() * iz;
            double drop = s.supplyV() - v;
            cp = new CircuitPoint(v, iz, v * iz, drop * drop / s.seriesOhm(),
                    Math.max(0.0, drop / s.seriesOhm() - iz), Region.BREAKDOWN);
            // dP/dTj = Iz·dV/dTj + V·dIz/dTj with dIz/dTj = −αV/(Rs + Rz), dV/dTj = αV + Rz·dIz/dTj.
            double dI = -alpha / (s.seriesOhm() + d.rzOhm());
            loopGain = rTheta * (iz * (alpha + d.rzOhm() * dI) + v * dI);
        } else if (inst.circuit() instanceof CurrentFedDiode f) {
            tj = currentFedTjK(f.currentA(), d.vz0At25V(), d.rzOhm(), alpha, rTheta, tLocalK, d.lineStartA(),
                    settings.capK());
            if (Double.isNaN(tj) || d.excessLeakageConductanceS(tj) != 0) {
                return Optional.empty();
            }
            double v = d.vz0V(tj) + d.rzOhm() * f.currentA();
            cp = new CircuitPoint(v, f.currentA(), v * f.currentA(), 0.0, 0.0, Region.BREAKDOWN);
            loopGain = rTheta * f.currentA() * alpha;
        } else {
            return Optional.empty();
        }
        double residual = tj - tLocalK - rTheta * cp.diodePowerW();
        double refK = inst.path().referenceTemperatureK(tj, cp.diodePowerW());
        return Optional.of(new OperatingPoint(tj, tLocalK, refK, cp, 1, loopGain, residual));
    }

    /**
     * Junction temperature (K) of a shunt regulator with a current load, or NaN where the closed form does not
     * apply (the caller then solves in general; NaN never leaves this package).
     *
     * @param vs       supply (V)
     * @param il       load current (A)
     * @param rs       series resistor (Ω)
     * @param vz0At25  line intercept at 25 °C, shifted (V)
     * @param rz       line slope (Ω)
     * @param alpha    αV (V/K)
     * @param rTheta   Rθja (K/W)
     * @param tLocalK  air (K)
     * @param lineStartA lowest current of the straight line (A)
     * @param capK     search cap (K)
     */
    static double shuntTjK(double vs, double il, double rs, double vz0At25, double rz, double alpha, double rTheta,
                           double tLocalK, double lineStartA, double capK) {
        double dTl = tLocalK - T25_K;
        double sum = rs + rz;
        double a0 = vs - il * rs - vz0At25;
        double d0 = a0 / sum;
        double d1 = -alpha / sum;
        if (d0 + d1 * dTl < lineStartA) {
            return Double.NaN;
        }
        double c0 = vz0At25 + rz * d0;
        double c1 = alpha * rs / sum;
        double p0 = c0 * d0;
        double p1 = c0 * d1 + c1 * d0;
        double p2 = c1 * d1;
        double qa = -rTheta * p2;
        double qb = 1.0 - rTheta * p1;
        double qc = -(dTl + rTheta * p0);
        double disc = qb * qb - 4.0 * qa * qc;
        if (!(qb > 0) || !(disc >= 0)) {
            return Double.NaN;
        }
        double u = -2.0 * qc / (qb + Math.sqrt(disc));
        double tj = T25_K + u;
        if (!(tj <= capK) || d0 + d1 * u < lineStartA) {
            return Double.NaN;
        }
        return tj;
    }

    /** Junction temperature (K) of a current-fed diode, or NaN where the closed form does not apply. */
    static double currentFedTjK(double i, double vz0At25, double rz, double alpha, double rTheta, double tLocalK,
                                double lineStartA, double capK) {
        if (i < lineStartA) {
            return Double.NaN;
        }
        double den = 1.0 - rTheta * i * alpha;
        if (!(den > 0)) {
            return Double.NaN;
        }
        double tj = T25_K + (tLocalK - T25_K + rTheta * i * (vz0At25 + rz * i)) / den;
        return tj <= capK ? tj : Double.NaN;
    }
}
