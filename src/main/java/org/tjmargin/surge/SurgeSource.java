package org.tjmargin.surge;

/**
 * What drives the clamp during a surge, so that the transient solver treats every waveform alike: an
 * {@link IdealCurrentSource} (the clamp takes the waveform's current whatever its voltage), or a
 * {@link TheveninSource} (an open-circuit voltage behind a resistance; the clamp current follows from the
 * clamp's line).
 *
 * <p>Only the clamp's breakdown polarity is modelled: negative source values (forward conduction of the diode)
 * give no clamp current.
 */
public sealed interface SurgeSource permits IdealCurrentSource, TheveninSource {

    /** @return the waveform: current (A) for a current source, open-circuit voltage (V) for a Thevenin source */
    Waveform waveform();

    /**
     * @param sourceValue          the waveform's value at the instant (A or V)
     * @param breakdownVoltageV    the clamp's breakdown voltage at the instant's junction temperature (V)
     * @param dynamicResistanceOhm the clamp's dynamic resistance (Ω)
     * @return the clamp current (A), not negative
     */
    double clampCurrentA(double sourceValue, double breakdownVoltageV, double dynamicResistanceOhm);

    /**
     * @param sourceValue the waveform's value at an instant when the clamp does not conduct
     * @return the voltage across the idle clamp (V): the open-circuit voltage, or zero for a current source
     */
    double idleClampVoltageV(double sourceValue);
}
