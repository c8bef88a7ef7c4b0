package org.tjmargin.circuit;

import org.tjmargin.device.PreparedDiode;

/**
 * A clamp across a DC line at its working (standoff) voltage: normally blocking, dissipating only its leakage,
 * which doubles every few kelvin and can run away thermally. If the line rises into breakdown the clamp conducts
 * through the line's source resistance (0 Ω: a stiff line, and then the dissipation is limited only by the
 * breakdown line's impedance).
 *
 * @param lineV     line voltage across the clamp (V), ≥ 0
 * @param sourceOhm source resistance of the line (Ω), ≥ 0
 */
public record StandoffClamp(double lineV, double sourceOhm) implements Circuit {

    public StandoffClamp {
        if (!(lineV >= 0) || !Double.isFinite(lineV)) {
            throw new IllegalArgumentException("line voltage must be ≥ 0 and finite, got " + lineV + " V");
        }
        if (!(sourceOhm >= 0) || !Double.isFinite(sourceOhm)) {
            throw new IllegalArgumentException("source resistance must be ≥ 0 and finite, got " + sourceOhm + " Ω");
        }
    }

    @Override
    public void solve(PreparedDiode diode, double tjK, CircuitState out) {
        TheveninDrive.solve(diode, tjK, lineV, sourceOhm, out);
        double v = out.voltageV();
        double i = out.diodeCurrentA();
        out.set(v, i, v * i, i * i * sourceOhm, 0.0, out.region());
    }

}
