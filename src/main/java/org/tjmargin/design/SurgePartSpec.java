package org.tjmargin.design;

import java.util.List;
import java.util.Optional;

import org.tjmargin.surge.SurgeRating;
import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterPulse;

/**
 * A part's surge data as read from the library, before a position completes it: when the part gives or fits its
 * own transient thermal impedance the network is here; otherwise each position sizes the semi-infinite-die
 * estimate against its own steady path ({@link SurgeMapping}).
 *
 * @param ratedPeakPowerW  rated peak pulse power (W)
 * @param ratedPulse       the rating's pulse
 * @param clampingVoltageV clamping voltage (V)
 * @param clampingCurrentA its peak pulse current (A)
 * @param pulseTjMaxK      temperature at which the pulse rating reaches zero (K)
 * @param network          the part's own network, if it gives or fits one
 * @param source           where that network comes from (ignored when empty)
 * @param notes            notes for every output
 */
public record SurgePartSpec(double ratedPeakPowerW, FosterPulse ratedPulse, double clampingVoltageV, double clampingCurrentA,
        double pulseTjMaxK, Optional<FosterNetwork> network, SurgeRating.NetworkSource source, List<String> notes) {

    public SurgePartSpec {
        notes = List.copyOf(notes);
    }
}
