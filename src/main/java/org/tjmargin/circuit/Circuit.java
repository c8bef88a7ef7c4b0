package org.tjmargin.circuit;

import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.PreparedDiode;

/**
 * A circuit around one breakdown diode. Implementations are immutable values; {@link #at} is a pure function
 * and {@link #solve} its allocation-free form.
 */
public interface Circuit {

    /**
     * Solves the circuit with the diode's junction at {@code tjK}.
     *
     * @param diode the diode's electrical model
     * @param tjK   junction temperature (K)
     * @return the operating point
     */
    default CircuitPoint at(BreakdownDiode diode, double tjK) {
        return at(PreparedDiode.of(diode), tjK);
    }

    /**
     * The same for a diode whose temperature-independent constants were computed once (what a solver evaluating
     * one diode at many temperatures passes); the result equals {@link #at(BreakdownDiode, double)}'s bit for bit.
     *
     * @param diode the diode, prepared
     * @param tjK   junction temperature (K)
     * @return the operating point
     */
    default CircuitPoint at(PreparedDiode diode, double tjK) {
        CircuitState s = new CircuitState();
        solve(diode, tjK, s);
        return s.point();
    }

    /**
     * The same written into {@code out} instead of a new point: what the junction searches call at every
     * evaluation, so that only the point at the root is allocated.
     *
     * @param diode the diode, prepared
     * @param tjK   junction temperature (K)
     * @param out   receives the operating point
     */
    void solve(PreparedDiode diode, double tjK, CircuitState out);

}
