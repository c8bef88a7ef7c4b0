package org.tjmargin.surge;

/**
 * The ranges of the ISO 16750-2 load-dump tests (clause 4.6.4) for 12 V and 24 V systems (reference 4.4: values
 * from a journal table and a test-instrument manual, sourced; {@code U_A} from ISO 16750-1). The standard pairs a
 * high {@code Us} with a high {@code Ri} and {@code td} unless agreed otherwise.
 */
public enum LoadDumpSystem {
    /** 12 V: U_A = 14 V, Us 79–101 V, Ri 0.5–4 Ω, td 40–400 ms, tr 10 ms (−5 ms), test B Us* = 35 V */
    TWELVE_VOLT(14, 79, 101, 0.5, 4, 0.040, 0.400, 0.010, 35),
    /**
     * 24 V: U_A = 28 V, Us 151–202 V, Ri 1–8 Ω, td 100–350 ms; tr 10 ms as for 12 V (from memory, verify);
     * test B Us* "as specified by the customer", typically 58 V.
     */
    TWENTY_FOUR_VOLT(28, 151, 202, 1, 8, 0.100, 0.350, 0.010, 58);

    private final double batteryVoltageV;
    private final double minAmplitudeV;
    private final double maxAmplitudeV;
    private final double minResistanceOhm;
    private final double maxResistanceOhm;
    private final double minDurationS;
    private final double maxDurationS;
    private final double riseTimeS;
    private final double typicalSuppressedVoltageV;

    LoadDumpSystem(double batteryVoltageV, double minAmplitudeV, double maxAmplitudeV, double minResistanceOhm,
            double maxResistanceOhm, double minDurationS, double maxDurationS, double riseTimeS, double typicalSuppressedVoltageV) {
        this.batteryVoltageV = batteryVoltageV;
        this.minAmplitudeV = minAmplitudeV;
        this.maxAmplitudeV = maxAmplitudeV;
        this.minResistanceOhm = minResistanceOhm;
        this.maxResistanceOhm = maxResistanceOhm;
        this.minDurationS = minDurationS;
        this.maxDurationS = maxDurationS;
        this.riseTimeS = riseTimeS;
        this.typicalSuppressedVoltageV = typicalSuppressedVoltageV;
    }

    /** @return {@code U_A}, the supply voltage with the generator running (V) */
    public double batteryVoltageV() {
        return batteryVoltageV;
    }

    /** @return the rise time {@code tr} (s) */
    public double riseTimeS() {
        return riseTimeS;
    }

    /** @return the test B suppressed voltage {@code Us*} (V): 35 V for 12 V; for 24 V the typical 58 V */
    public double typicalSuppressedVoltageV() {
        return typicalSuppressedVoltageV;
    }

    void checkRanges(double amplitudeV, double resistanceOhm, double durationS) {
        check("Us", amplitudeV, minAmplitudeV, maxAmplitudeV, "V");
        check("Ri", resistanceOhm, minResistanceOhm, maxResistanceOhm, "Ω");
        check("td", durationS, minDurationS, maxDurationS, "s");
    }

    private void check(String name, double value, double lo, double hi, String unit) {
        if (!(value >= lo && value <= hi)) {
            throw new IllegalArgumentException("ISO 16750-2 load dump, " + this + ": " + name + " = " + value + " " + unit
                    + " is outside the standard's range " + lo + "…" + hi + " " + unit);
        }
    }
}
