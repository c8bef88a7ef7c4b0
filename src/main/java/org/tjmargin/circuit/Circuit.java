package org.tjmargin.circuit;

import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.PreparedDiode;

/**
 * A circuit around one breakdown diode. Implementations are immutable values; {@link #at} is a pure function.
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
    CircuitPoint at(PreparedDiode diode, double tjK);

}
