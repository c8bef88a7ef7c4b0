package org.tjmargin.circuit;

/**
 * A circuit's solution at one junction temperature, written in place: the allocation-free form of
 * {@link CircuitPoint} for a solver that evaluates one circuit at many temperatures and keeps only the point at its
 * root ({@link Circuit#solve}). The same numbers as {@link Circuit#at}, bit for bit, since {@code at} is
 * {@code solve} into a fresh state.
 *
 * <p>Mutable and not thread-safe: each solve owns its states.
 */
public final class CircuitState {

    private double voltageV;
    private double diodeCurrentA;
    private double diodePowerW;
    private double resistorPowerW;
    private double loadCurrentA;
    private Region region;

    /** A state holding nothing yet (its region is null until a circuit is solved into it). */
    public CircuitState() {
    }

    /** Sets every field: what each circuit's {@link Circuit#solve} ends with. */
    void set(double voltageV, double diodeCurrentA, double diodePowerW, double resistorPowerW, double loadCurrentA,
             Region region) {
        this.voltageV = voltageV;
        this.diodeCurrentA = diodeCurrentA;
        this.diodePowerW = diodePowerW;
        this.resistorPowerW = resistorPowerW;
        this.loadCurrentA = loadCurrentA;
        this.region = region;
    }

    /** The diode's voltage, current and region alone: what {@link TheveninDrive} finds, before the circuit's share. */
    void drive(double voltageV, double diodeCurrentA, Region region) {
        this.voltageV = voltageV;
        this.diodeCurrentA = diodeCurrentA;
        this.region = region;
    }

    /** @return voltage across the diode, the output (V) */
    public double voltageV() {
        return voltageV;
    }

    /** @return reverse current through the diode (A) */
    public double diodeCurrentA() {
        return diodeCurrentA;
    }

    /** @return diode dissipation (W) */
    public double diodePowerW() {
        return diodePowerW;
    }

    /** @return dissipation of the series or source resistor (W) */
    public double resistorPowerW() {
        return resistorPowerW;
    }

    /** @return where on the characteristic the diode sits */
    public Region region() {
        return region;
    }

    /** @return the state as an immutable point */
    public CircuitPoint point() {
        if (region == null) {
            throw new IllegalStateException("no circuit has been solved into this state");
        }
        return new CircuitPoint(voltageV, diodeCurrentA, diodePowerW, resistorPowerW, loadCurrentA, region);
    }
}
