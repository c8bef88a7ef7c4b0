package org.tjmargin.derating;

/**
 * What a rule reads of one operating point: the measured quantities that apply, the part's maximum junction
 * temperature and the temperatures a temperature-dependent limit is read at. {@link RuleContext} is the immutable
 * form every single check uses; {@link CornerReadings} the reusable one a policy check over thousands of corners
 * refills corner after corner.
 */
public interface RuleInputs {

    /** The value of {@code m}, or {@code NaN} where it does not apply (values held are always finite). */
    double valueOrNaN(Measure m);

    /** @return the part's maximum junction temperature (K) */
    double tjMaxK();

    /** @return temperature of the part's rating reference point (K) */
    double referenceK();

    /** @return temperature of the air around the part (K) */
    double tLocalK();

    /**
     * The temperature a temperature-dependent limit is read at: the junction's (the reference point's where the
     * junction temperature is not measured), the reference point's or the local air's.
     */
    default double temperatureK(Limit.Basis basis) {
        return switch (basis) {
            case JUNCTION -> {
                double tj = valueOrNaN(Measure.JUNCTION_TEMPERATURE);
                yield Double.isNaN(tj) ? referenceK() : tj;
            }
            case REFERENCE -> referenceK();
            case LOCAL_AIR -> tLocalK();
        };
    }
}
