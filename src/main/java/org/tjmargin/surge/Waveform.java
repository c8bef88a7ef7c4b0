package org.tjmargin.surge;

import java.util.List;

/**
 * A surge waveform of time, starting at {@code t = 0}: a current (A) or a voltage (V), as {@link #quantity()}
 * says. Values are right-continuous at jumps; jumps and kinks happen only at breakpoints, so a solver that steps
 * onto each breakpoint and evaluates just before it ({@link Math#nextDown(double)}) sees the left limit.
 */
public interface Waveform {

    /**
     * The fraction of its peak below which a smooth tail counts as ended for {@link #durationS()}: 1e-6, so that
     * truncating the charge of the slowest standard pulse (10/1000) changes it by about 1e-6 relative, below the
     * digits the references print.
     */
    double NEGLIGIBLE_TAIL_FRACTION = 1e-6;

    /** @return whether the value is a current (A) or a voltage (V) */
    SurgeQuantity quantity();

    /** @return the value at time {@code tS} (A or V) */
    double valueAt(double tS);

    /**
     * @return the times (s) where the value or its slope is not smooth, where a front starts or ends, or where a
     *         peak is reached: strictly increasing, starting at 0, none beyond {@link #durationS()}; a fresh array
     */
    double[] breakpointsS();

    /** @return the fronts (rises to a peak) to be resolved, in time order */
    List<Front> fronts();

    /**
     * @return the end of the waveform (s): its last sample or edge, or where a smooth tail falls below
     *         {@link #NEGLIGIBLE_TAIL_FRACTION} of its peak (or, for a pulse on a battery voltage, of its amplitude
     *         above it)
     */
    double durationS();
}
