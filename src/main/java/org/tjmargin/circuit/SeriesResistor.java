package org.tjmargin.circuit;

import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.variation.Range;

/**
 * The regulator's series resistor: its value with tolerance and its power rating against its ambient (or terminal)
 * temperature.
 *
 * @param ohm    resistance (Ω), all values > 0
 * @param rating power rating curve (for film resistors typically full power to 70 °C, zero at the upper category
 *               temperature: IEC 60115-1)
 */
public record SeriesResistor(Range ohm, PowerRatingCurve rating) {
    public SeriesResistor {
        if (!(ohm.lo() > 0)) {
            throw new IllegalArgumentException("series resistance must be > 0 at every corner, got " + ohm.lo() + " Ω");
        }
        if (rating == null) {
            throw new IllegalArgumentException("a series resistor needs a power rating");
        }
    }
}
