package org.tjmargin.solve;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Where the sealed box's air itself runs away: above this ambient no air temperature balances the board's heat
 * against what the box sheds, so the air, and every junction in it, heats without bound ({@link RunawayOnset}).
 *
 * @param ambientK  the lowest onset of the positions whose runaway is the air's (K)
 * @param atOrBelow true when that onset is only known to lie at or below {@code ambientK}
 * @param drivers   the positions whose own runaway drives the air's, in board order; empty when the board's heat as
 *                  a whole outgrows what the box sheds
 */
public record EnclosureRunaway(double ambientK, boolean atOrBelow, List<String> drivers) {

    public EnclosureRunaway {
        drivers = List.copyOf(drivers);
    }

    /** The air's runaway read off the positions' onsets; empty when no position runs away with the air. */
    public static Optional<EnclosureRunaway> of(List<PositionResult> positions) {
        RunawayOnset lowest = null;
        List<String> drivers = new ArrayList<>();
        for (PositionResult p : positions) {
            if (p.runaway().isEmpty() || !p.runaway().get().cause().enclosure()) {
                continue;
            }
            RunawayOnset o = p.runaway().get();
            if (lowest == null || o.ambientK() < lowest.ambientK()) {
                lowest = o;
            }
            if (o.cause() == RunawayOnset.Cause.DRIVES_ENCLOSURE) {
                drivers.add(p.id());
            }
        }
        return lowest == null ? Optional.empty()
                : Optional.of(new EnclosureRunaway(lowest.ambientK(), lowest.atOrBelowSearch(), drivers));
    }
}
