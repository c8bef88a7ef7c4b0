package org.tjmargin.surge;

/**
 * What a waveform's value is, and the front-time definition the standards attach to it (reference 4.1: JEDEC
 * dictionary JESD77/JESD210; IEC 60060-1 and IEC 61000-4-5 use the same definitions): the virtual front time
 * {@code T1} is a factor times the time between a low point and the 90 % point on the front, the virtual origin
 * {@code O1} is where the line through those two points crosses zero, and the time to half value {@code T2} runs
 * from {@code O1} to the 50 % point on the tail.
 */
public enum SurgeQuantity {
    /** current (A): 10 % and 90 % points, {@code T1 = 1.25·t(10 %→90 %)} */
    CURRENT("A", 0.1, 1.25),
    /** voltage (V): 30 % and 90 % points, {@code T1 = 1.67·t(30 %→90 %)} */
    VOLTAGE("V", 0.3, 1.67);

    /** The upper point of the front definition, 90 % of peak, for both quantities. */
    public static final double FRONT_HIGH_FRACTION = 0.9;
    /** The tail point of the time to half value, 50 % of peak. */
    public static final double HALF_VALUE_FRACTION = 0.5;

    private final String unit;
    private final double frontLowFraction;
    private final double frontTimeFactor;

    SurgeQuantity(String unit, double frontLowFraction, double frontTimeFactor) {
        this.unit = unit;
        this.frontLowFraction = frontLowFraction;
        this.frontTimeFactor = frontTimeFactor;
    }

    /** @return the SI unit symbol of the value */
    public String unit() {
        return unit;
    }

    /** @return the lower point of the front definition, as a fraction of peak (0.1 or 0.3) */
    public double frontLowFraction() {
        return frontLowFraction;
    }

    /** @return the factor from the low-to-90 % interval to {@code T1} (1.25 or 1.67, as the standards print it) */
    public double frontTimeFactor() {
        return frontTimeFactor;
    }
}
