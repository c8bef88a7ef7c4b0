package org.tjmargin.surge;

import java.util.List;

/**
 * A smooth pulse that rises from zero at {@code t = 0} to one peak and then decays: its breakpoints are the start,
 * the peak and the end of its significant tail, and its one front runs from the start to the peak.
 */
public interface SinglePeakPulse extends Waveform {

    /** Time of the peak (s). */
    double peakTimeS();

    @Override
    default double[] breakpointsS() {
        return new double[] {0, peakTimeS(), durationS()};
    }

    @Override
    default List<Front> fronts() {
        return List.of(new Front(0, peakTimeS()));
    }
}
