package org.tjmargin.surge;

import java.util.OptionalDouble;

/**
 * One surge a position must withstand: what drives the clamp, how often it repeats, and the voltage the protected
 * input behind the clamp may see.
 *
 * @param id              identifier, unique at the position
 * @param description     a short human description of the test (standard, level, source resistance)
 * @param source          what drives the clamp
 * @param pulseCount      number of surges in the test, at least 1
 * @param periodS         repetition period (s), not shorter than one surge; for one pulse, its duration
 * @param protectedLimitV the highest voltage the protected input tolerates (V), if stated
 */
public record SurgeCase(String id, String description, SurgeSource source, int pulseCount, double periodS,
        OptionalDouble protectedLimitV) {

    public SurgeCase {
        if (id == null || id.isBlank() || source == null) {
            throw new IllegalArgumentException("a surge needs an id and a source");
        }
        description = description == null ? id : description;
        if (pulseCount < 1) {
            throw new IllegalArgumentException("a surge needs at least one pulse: " + pulseCount);
        }
        double duration = source.waveform().durationS();
        if (!(periodS >= duration) || !Double.isFinite(periodS)) {
            throw new IllegalArgumentException("surge " + id + ": period " + periodS + " s is shorter than one surge ("
                    + duration + " s)");
        }
        if (protectedLimitV == null) {
            protectedLimitV = OptionalDouble.empty();
        }
        if (protectedLimitV.isPresent() && !(protectedLimitV.getAsDouble() > 0)) {
            throw new IllegalArgumentException("surge " + id + ": protected limit must be positive: "
                    + protectedLimitV.getAsDouble() + " V");
        }
    }

    /** A single surge. */
    public static SurgeCase single(String id, String description, SurgeSource source, OptionalDouble protectedLimitV) {
        return new SurgeCase(id, description, source, 1, source.waveform().durationS(), protectedLimitV);
    }
}
