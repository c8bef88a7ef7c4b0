package org.tjmargin.circuit;

import org.tjmargin.device.BreakdownDiode;

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
    CircuitPoint at(BreakdownDiode diode, double tjK);

}
