package org.tjmargin.design;

import org.tjmargin.device.PowerRatingCurve;

/**
 * A resistor type of the parts library: its power rating against its ambient temperature. The value and tolerance
 * belong to the design's position, not to the library.
 *
 * @param id     identifier in the library
 * @param rating power rating curve, referenced to the resistor's ambient
 */
public record ResistorPart(String id, PowerRatingCurve rating) {
    public ResistorPart {
        if (id == null || id.isBlank() || rating == null) {
            throw new IllegalArgumentException("a resistor part needs an id and a rating");
        }
    }
}
