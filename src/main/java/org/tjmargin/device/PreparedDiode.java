package org.tjmargin.device;

/**
 * A {@link BreakdownDiode} with the parts of its characteristic that do not depend on the junction temperature
 * computed once: what a solver that evaluates one diode at many temperatures works with.
 *
 * <p>The knee voltage at any temperature is the breakdown line's intercept plus a constant drop (the knee law's
 * logarithm at {@code Izk} does not depend on temperature), the leakage voltage point scales with the knee voltage
 * at 25 °C, and the temperature below which no leakage exceeds the split is a binary exponent: all computed here
 * once instead of at every evaluation. This class is the one implementation of the characteristic whose equations
 * and reasons {@link BreakdownDiode} documents; the diode's methods of the same names delegate here (preparing
 * per call), so a solver that prepares once per solve and a caller that asks the diode get the same values.
 *
 * <p>Immutable and thread-safe.
 */
public final class PreparedDiode {

    private final BreakdownDiode diode;
    private final double vz0At25V;
    private final double alphaVPerK;
    private final double rzOhm;
    private final double iztA;
    private final double izkA;
    private final boolean linearKnee;
    private final double kneeAVolts;
    private final double kneeBOhm;
    /** {@code Rz·Izt} (V). */
    private final double rzIztV;
    /** {@code Izk} on a linear knee, {@code Izt} on a current-dependent one (A). */
    private final double lineStartA;
    /** The knee law's drop from the line's value at {@code Izt} to {@code Izk}: {@code a·ln(Izt/Izk)} (V). */
    private final double kneeLogDropV;
    /** The constant part of that drop: {@code b·(Izt − Izk)} (V). */
    private final double kneeLinearDropV;
    /** {@code Vzk(25 °C)} (V). */
    private final double kneeAt25V;
    private final boolean leakageKnown;
    private final double irA;
    private final double vrV;
    private final double doublingK;
    /** Half the knee current, where the soft knee's leakage ends and the excess conductance starts (A). */
    private final double leakageSplitA;
    /** Binary exponent of {@code split/Ir}: doublings below it cannot reach the split. */
    private final int splitExponent;

    private PreparedDiode(BreakdownDiode d) {
        diode = d;
        vz0At25V = d.vz0At25V();
        alphaVPerK = d.tc().alphaVPerK();
        rzOhm = d.rzOhm();
        iztA = d.iztA();
        izkA = d.izkA();
        linearKnee = d.knee() instanceof KneeModel.Linear;
        if (d.knee() instanceof KneeModel.CurrentDependent k) {
            kneeAVolts = k.aVolts();
            kneeBOhm = k.bOhm();
        } else {
            kneeAVolts = 0.0;
            kneeBOhm = 0.0;
        }
        rzIztV = rzOhm * iztA;
        lineStartA = d.lineStartA();
        kneeLogDropV = kneeAVolts * Math.log(iztA / izkA);
        kneeLinearDropV = kneeBOhm * (iztA - izkA);
        Leakage leak = d.leakage();
        leakageKnown = leak.isKnown();
        irA = leak.irA();
        vrV = leak.vrV();
        doublingK = leak.doublingK();
        leakageSplitA = 0.5 * izkA;
        splitExponent = leakageKnown ? Math.getExponent(leakageSplitA / irA) : Integer.MAX_VALUE;
        kneeAt25V = kneeVoltageV(Celsius.T25_K);
    }

    /** The diode with its constants computed. */
    public static PreparedDiode of(BreakdownDiode diode) {
        return new PreparedDiode(diode);
    }

    /** The diode this was prepared from. */
    public BreakdownDiode diode() {
        return diode;
    }

    /** As {@link BreakdownDiode#izkA()} (A). */
    public double izkA() {
        return izkA;
    }

    /** As {@link BreakdownDiode#iztA()} (A). */
    public double iztA() {
        return iztA;
    }

    /** As {@link BreakdownDiode#rzOhm()} (Ω). */
    public double rzOhm() {
        return rzOhm;
    }

    /** As {@link BreakdownDiode#lineStartA()} (A). */
    public double lineStartA() {
        return lineStartA;
    }

    /** As {@link BreakdownDiode#vz0V(double)} (V). */
    public double vz0V(double tjK) {
        return vz0At25V + alphaVPerK * (tjK - Celsius.T25_K);
    }

    /** As {@link BreakdownDiode#breakdownVoltageV(double, double)} (V). */
    public double breakdownVoltageV(double currentA, double tjK) {
        double vz0 = vz0V(tjK);
        if (currentA >= iztA || linearKnee) {
            return vz0 + rzOhm * currentA;
        }
        return kneeLawVoltageV(vz0, rzIztV, kneeAVolts, kneeBOhm, iztA, currentA);
    }

    /**
     * The knee law's voltage: {@code V(I) = V(Izt) − ∫_I^Izt (a/x + b) dx}, continuous with the line in value and
     * slope at {@code Izt} (see {@link KneeModel.CurrentDependent}); also what the diode's constructor checks its
     * data with.
     */
    static double kneeLawVoltageV(double vz0V, double rzIztV, double aVolts, double bOhm, double iztA,
                                  double currentA) {
        return vz0V + rzIztV - aVolts * Math.log(iztA / currentA) - bOhm * (iztA - currentA);
    }

    /** As {@link BreakdownDiode#dynamicImpedanceOhm(double)} (Ω). */
    public double dynamicImpedanceOhm(double currentA) {
        if (currentA >= iztA || linearKnee) {
            return rzOhm;
        }
        return kneeAVolts / currentA + kneeBOhm;
    }

    /**
     * As {@link BreakdownDiode#kneeVoltageV(double)} (V): {@code breakdownVoltageV(Izk, Tj)} with its logarithm
     * hoisted (the same subexpressions in the same order, so bit for bit the same).
     */
    public double kneeVoltageV(double tjK) {
        double vz0 = vz0V(tjK);
        if (linearKnee) {
            return vz0 + rzOhm * izkA;
        }
        return vz0 + rzIztV - kneeLogDropV - kneeLinearDropV;
    }

    /** As {@link BreakdownDiode#subKneeCurrentA(double, double)} (A). */
    public double subKneeCurrentA(double voltageV, double tjK) {
        if (voltageV <= 0) {
            return 0.0;
        }
        double vzk = kneeVoltageV(tjK);
        if (!leakageKnown) {
            // No leakage data: the knee closes along a straight segment from zero current at
            // KNEE_CLOSURE·Vzk to Izk at Vzk, so that current and dissipation stay continuous in voltage and
            // temperature (a vertical edge would leave the heat balance without a root at the edge).
            double v0 = BreakdownDiode.KNEE_CLOSURE * vzk;
            return voltageV <= v0 ? 0.0 : izkA * Math.min(1.0, (voltageV - v0) / (vzk - v0));
        }
        double vrT = leakageVoltageV(vzk);
        double irT = Math.min(leakageAtTestVoltageA(tjK), leakageSplitA);
        if (voltageV <= vrT) {
            return irT * voltageV / vrT;
        }
        if (voltageV >= vzk) {
            return izkA;
        }
        double f = (voltageV - vrT) / (vzk - vrT);
        return irT * Math.pow(izkA / irT, f);
    }

    /** As {@link BreakdownDiode#excessLeakageConductanceS(double)} (S). */
    public double excessLeakageConductanceS(double tjK) {
        // Cheap exit: the leakage reaches the split only after log2(split/Ir) doublings, and the binary exponent of
        // that ratio is a lower bound of its log2 (no power function needed below it).
        if (!leakageKnown || (tjK - Celsius.T25_K) / doublingK < splitExponent) {
            return 0.0;
        }
        double excess = leakageAtTestVoltageA(tjK) - leakageSplitA;
        return excess > 0 ? excess / leakageVoltageV(kneeVoltageV(tjK)) : 0.0;
    }

    /** As {@link BreakdownDiode#reverseCurrentA(double, double)} (A). */
    public double reverseCurrentA(double voltageV, double tjK) {
        double excess = excessLeakageConductanceS(tjK) * Math.max(0.0, voltageV);
        if (voltageV < kneeVoltageV(tjK)) {
            return subKneeCurrentA(voltageV, tjK) + excess;
        }
        double lineI = (voltageV - vz0V(tjK)) / rzOhm;
        if (lineI >= lineStartA) {
            return lineI + excess;
        }
        // On the current-dependent knee: invert V(I) by bisection (monotone; 200 halvings reach double resolution).
        double lo = izkA;
        double hi = iztA;
        for (int i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (breakdownVoltageV(mid, tjK) < voltageV) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi) + excess;
    }

    /** {@code Ir(Tj)} at the leakage test voltage, as {@link Leakage#currentAtTestVoltageA(double)} (A). */
    private double leakageAtTestVoltageA(double tjK) {
        return irA * Math.pow(2.0, (tjK - Celsius.T25_K) / doublingK);
    }

    private double leakageVoltageV(double kneeAtTjV) {
        return vrV * kneeAtTjV / kneeAt25V;
    }
}
