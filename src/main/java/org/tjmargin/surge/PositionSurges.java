package org.tjmargin.surge;

import java.util.HashSet;
import java.util.List;

/**
 * The surges one clamp position must withstand, with the part's surge data they are judged against.
 *
 * @param rating the part's surge data (rating, clamping voltage, transient thermal impedance)
 * @param cases  the surges, at least one, identifiers unique
 */
public record PositionSurges(SurgeRating rating, List<SurgeCase> cases) {

    public PositionSurges {
        cases = List.copyOf(cases);
        if (rating == null || cases.isEmpty()) {
            throw new IllegalArgumentException("position surges need the part's surge data and at least one surge");
        }
        if (new HashSet<>(cases.stream().map(SurgeCase::id).toList()).size() != cases.size()) {
            throw new IllegalArgumentException("surge ids must be unique at a position");
        }
    }
}
