package org.tjmargin.device;

/**
 * Electrical model of a breakdown (Zener or avalanche) diode in reverse bias, all temperatures in kelvin.
 *
 * <p>Breakdown region, {@code I ≥ Izk} (design 2.1; Sedra and Smith, <i>Microelectronic Circuits</i>, 5th ed.,
 * §3.5, eq. 3.20): {@code V = Vz0(Tj) + Rz·I} above the knee segment, with
 * {@code Vz0(Tj) = Vz0(25 °C) + αV·(Tj − 25 °C)}; between {@code Izk} and {@code Izt} the {@link KneeModel}.
 * Below {@code Izk} the part is out of regulation: from {@code Vr} (where the leakage {@code Ir(Tj)} is
 * specified) up to the knee voltage the current rises exponentially, interpolated log-linearly between
 * {@code (Vr, Ir(Tj))} and {@code (Vzk(Tj), Izk)} (a soft knee, monotone and continuous; common practice, no
 * single source); below {@code Vr} the leakage is taken proportional to voltage. Without leakage data the part
 * conducts nothing below {@link #KNEE_CLOSURE}{@code ·Vzk} and the knee closes linearly above it. The leakage voltage point moves with the knee voltage, in proportion, so the
 * ordering {@code Vr < Vzk} holds at every temperature.
 *
 * @param vz0At25V   zero-current intercept of the breakdown line at {@code Tj = 25 °C} (V)
 * @param rzOhm      dynamic impedance of the breakdown line, {@code Zzt} (Ω), > 0
 * @param iztA       test current of {@code Vz_nom} (A), > 0
 * @param izkA       knee current, the lowest current of the breakdown region (A), 0 < Izk < Izt
 * @param knee       shape between {@code Izk} and {@code Izt}
 * @param tc         temperature coefficient {@code αV}
 * @param leakage    leakage below breakdown
 */
public record BreakdownDiode(double vz0At25V, double rzOhm, double iztA, double izkA, KneeModel knee,
                             TemperatureCoefficient tc, Leakage leakage) {

    /**
     * Without leakage data, the fraction of the knee voltage at which the reverse current is taken to start (1):
     * 2 % below the knee, steep enough that no divider result changes visibly, yet continuous (modelling choice).
     */
    public static final double KNEE_CLOSURE = 0.98;

    /**
     * Lowest knee voltage accepted, as a fraction of the voltage at the test current (1). Real knees drop a few
     * per cent (low-voltage parts a few tens of per cent); half the voltage means inconsistent data.
     */
    public static final double MIN_KNEE_FRACTION = 0.5;

    public BreakdownDiode {
        if (!(vz0At25V > 0) || !Double.isFinite(vz0At25V)) {
            throw new IllegalArgumentException("breakdown intercept Vz0(25 °C) must be > 0, got " + vz0At25V + " V");
        }
        if (!(rzOhm > 0) || !Double.isFinite(rzOhm)) {
            throw new IllegalArgumentException("dynamic impedance must be > 0, got " + rzOhm + " Ω");
        }
        if (!(izkA > 0) || !(iztA > izkA) || !Double.isFinite(iztA)) {
            throw new IllegalArgumentException("need 0 < Izk < Izt, got Izk " + izkA + " A, Izt " + iztA + " A");
        }
        if (knee == null || tc == null || leakage == null) {
            throw new IllegalArgumentException("knee model, temperature coefficient and leakage are required");
        }
        double kneeAt25V = voltageOnCharacteristic(vz0At25V, rzOhm, iztA, knee, izkA);
        double testAt25V = vz0At25V + rzOhm * iztA;
        if (!(kneeAt25V >= MIN_KNEE_FRACTION * testAt25V)) {
            throw new IllegalArgumentException("the knee voltage " + kneeAt25V + " V lies more than "
                    + Math.round(100 * (1 - MIN_KNEE_FRACTION)) + " % below the test-current voltage " + testAt25V
                    + " V: knee impedance and knee current do not describe a breakdown diode");
        }
        if (leakage.isKnown() && !(leakage.vrV() < kneeAt25V)) {
            throw new IllegalArgumentException("leakage test voltage " + leakage.vrV()
                    + " V must lie below the knee voltage " + kneeAt25V + " V");
        }
    }

    /**
     * Builds the model from datasheet numbers (design 2.1): {@code Rz = Zzt} and
     * {@code Vz0(25 °C) = Vz_nom − Rz·Izt − αV·(Tj_test − 25 °C)}, where {@code Tj_test} follows from how
     * {@code Vz_nom} was measured.
     *
     * @param vzNomV nominal breakdown voltage at {@code Izt} (V)
     * @param iztA   test current (A)
     * @param zztOhm dynamic impedance at {@code Izt} (Ω)
     * @param izkA   knee current (A)
     * @param zzkOhm knee impedance (Ω), or {@code Double.NaN} when the datasheet gives none
     * @param tc     temperature coefficient
     * @param test   the measurement condition of {@code Vz_nom}
     * @param leak   leakage below breakdown
     */
    public static BreakdownDiode fromDatasheet(double vzNomV, double iztA, double zztOhm, double izkA, double zzkOhm,
                                               TemperatureCoefficient tc, VzTestCondition test, Leakage leak) {
        double tjTestK = test.junctionTemperatureK(vzNomV, iztA);
        double vz0 = vzNomV - zztOhm * iztA - tc.alphaVPerK() * (tjTestK - Celsius.T25_K);
        KneeModel knee = Double.isNaN(zzkOhm) ? new KneeModel.Linear()
                : KneeModel.CurrentDependent.through(zztOhm, iztA, zzkOhm, izkA);
        return new BreakdownDiode(vz0, zztOhm, iztA, izkA, knee, tc, leak);
    }

    /** Zero-current intercept of the breakdown line at {@code tjK} (V). */
    public double vz0V(double tjK) {
        return vz0At25V + tc.alphaVPerK() * (tjK - Celsius.T25_K);
    }

    /** The current above which the straight breakdown line holds (A): {@code Izk} or {@code Izt}. */
    public double lineStartA() {
        return knee instanceof KneeModel.Linear ? izkA : iztA;
    }

    /**
     * Voltage across the diode at a current in the breakdown region.
     *
     * @param currentA reverse current (A), ≥ {@code Izk}
     * @param tjK      junction temperature (K)
     * @return reverse voltage (V)
     */
    public double breakdownVoltageV(double currentA, double tjK) {
        return PreparedDiode.of(this).breakdownVoltageV(currentA, tjK);
    }

    private static double voltageOnCharacteristic(double vz0V, double rzOhm, double iztA, KneeModel knee,
                                                  double currentA) {
        if (currentA >= iztA || knee instanceof KneeModel.Linear) {
            return vz0V + rzOhm * currentA;
        }
        KneeModel.CurrentDependent k = (KneeModel.CurrentDependent) knee;
        return PreparedDiode.kneeLawVoltageV(vz0V, rzOhm * iztA, k.aVolts(), k.bOhm(), iztA, currentA);
    }

    /** Dynamic impedance {@code dV/dI} of the breakdown characteristic at {@code currentA} ≥ {@code Izk} (Ω). */
    public double dynamicImpedanceOhm(double currentA) {
        return PreparedDiode.of(this).dynamicImpedanceOhm(currentA);
    }

    /** Voltage at the knee current {@code Izk}, the lower end of regulation (V). */
    public double kneeVoltageV(double tjK) {
        return PreparedDiode.of(this).kneeVoltageV(tjK);
    }

    /**
     * Current below the knee (out of regulation) at a reverse voltage under the knee voltage, without the excess
     * leakage of {@link #excessLeakageConductanceS}.
     *
     * @param voltageV reverse voltage (V), {@code 0 ≤ V ≤ Vzk(Tj)}
     * @param tjK      junction temperature (K)
     * @return reverse current (A), ≤ {@code Izk}
     */
    public double subKneeCurrentA(double voltageV, double tjK) {
        return PreparedDiode.of(this).subKneeCurrentA(voltageV, tjK);
    }

    /**
     * Leakage beyond half the knee current, as a conductance in parallel with the whole characteristic (S).
     *
     * <p>Leakage is never capped: it keeps doubling with temperature, which is what lets a hot clamp run away. The
     * soft-knee interpolation needs {@code Ir < Izk}, so the leakage up to {@code Izk/2} shapes the knee and any
     * excess flows through this parallel, ohmic conductance {@code (Ir(Tj) − Izk/2)/Vr(Tj)}. The split keeps the
     * characteristic continuous in temperature and monotone in voltage at every temperature.
     */
    public double excessLeakageConductanceS(double tjK) {
        return PreparedDiode.of(this).excessLeakageConductanceS(tjK);
    }

    /**
     * Total reverse current at a voltage: the breakdown characteristic (or the sub-knee leakage below it) plus the
     * excess leakage. Monotone in voltage.
     */
    public double reverseCurrentA(double voltageV, double tjK) {
        return PreparedDiode.of(this).reverseCurrentA(voltageV, tjK);
    }

    /** Copy with the breakdown line shifted by {@code deltaV} (a tolerance corner of {@code Vz}). */
    public BreakdownDiode withVoltageShift(double deltaV) {
        return new BreakdownDiode(vz0At25V + deltaV, rzOhm, iztA, izkA, knee, tc, leakage);
    }

    /** Copy with another nominal temperature coefficient (a tolerance corner of {@code αV}). */
    public BreakdownDiode withAlpha(double alphaVPerK) {
        return new BreakdownDiode(vz0At25V, rzOhm, iztA, izkA, knee, tc.withNominal(alphaVPerK), leakage);
    }
}
