package org.tjmargin.surge;


/**
 * The double exponential pulse {@code a·(e^(−t/τ1) − e^(−t/τ2))}, {@code τ1 > τ2}, the classic surge model
 * (reference 4.3; IEC 61000-4-5 and IEC 60060-1 waveforms are usually modelled this way).
 *
 * <p>{@link #fromTimings} finds {@code τ1}, {@code τ2} from a front time {@code T1} and time to half value
 * {@code T2} exactly as the standards define them ({@link SurgeQuantity}: 10 %/90 % and 1.25 for current, 30 %/90 %
 * and 1.67 for voltage, both from the virtual origin), by nested one-dimensional solves
 * ({@code DoubleExponentialTiming}), and scales {@code a} so the peak is the requested value. Under these definitions
 * the ratio {@code T1/T2} cannot exceed about 0.263 (current) or 0.289 (voltage): 8/20 µs current is unreachable
 * ({@link PulseTimingException}); use {@link CubicExponentialPulse} for it.
 *
 * <p>Presets: 10/1000 µs and 5/320 µs current, 1.2/50 µs and 10/700 µs voltage (IEC 61000-4-5 and its telecom
 * annex, ITU-T style; reference 4.2, 4.3). They are solved on each call (well under a millisecond).
 *
 * @param amplitude the coefficient {@code a} (A or V), positive; the peak is somewhat below it
 * @param tau1S     the slow (tail) time constant (s)
 * @param tau2S     the fast (front) time constant (s), below {@code tau1S}
 * @param quantity  current or voltage, which also fixes the timing definition
 */
public record DoubleExponentialPulse(double amplitude, double tau1S, double tau2S, SurgeQuantity quantity) implements SinglePeakPulse {

    public DoubleExponentialPulse {
        if (!(amplitude > 0) || !Double.isFinite(amplitude)) {
            throw new IllegalArgumentException("double exponential amplitude must be positive and finite: " + amplitude);
        }
        if (!(tau2S > 0) || !(tau1S > tau2S) || !Double.isFinite(tau1S)) {
            throw new IllegalArgumentException("double exponential needs 0 < tau2S < tau1S < ∞: tau1S = " + tau1S
                    + ", tau2S = " + tau2S);
        }
        if (quantity == null) {
            throw new IllegalArgumentException("double exponential needs a quantity");
        }
    }

    /**
     * @param peak     the peak value (A or V)
     * @param tau1S    slow time constant (s)
     * @param tau2S    fast time constant (s)
     * @param quantity current or voltage
     * @return the pulse scaled so its peak is {@code peak}
     */
    public static DoubleExponentialPulse withPeak(double peak, double tau1S, double tau2S, SurgeQuantity quantity) {
        double r = tau2S / tau1S;
        double unitPeak = DoubleExponentialTiming.shape(DoubleExponentialTiming.peakTime(r), r);
        return new DoubleExponentialPulse(peak / unitPeak, tau1S, tau2S, quantity);
    }

    /**
     * @param frontTimeS  {@code T1} (s), positive
     * @param timeToHalfS {@code T2} (s), above {@code T1}
     * @param peak        peak value (A or V), positive
     * @param quantity    current or voltage (fixes the timing definition)
     * @param budget      solve budget
     * @throws PulseTimingException if the double exponential cannot reach {@code T1/T2}, or a solve ran out of budget
     */
    public static DoubleExponentialPulse fromTimings(double frontTimeS, double timeToHalfS, double peak, SurgeQuantity quantity,
            TimingSolveBudget budget) {
        if (!(frontTimeS > 0) || !(timeToHalfS > frontTimeS) || !Double.isFinite(timeToHalfS)) {
            throw new IllegalArgumentException("pulse timing needs 0 < T1 < T2 < ∞: T1 = " + frontTimeS + " s, T2 = "
                    + timeToHalfS + " s");
        }
        double[] tau = new DoubleExponentialTiming(quantity, budget).timeConstants(frontTimeS, timeToHalfS);
        return withPeak(peak, tau[0], tau[1], quantity);
    }

    /** 10/1000 µs current (telecom and TVS peak-pulse ratings, reference 4.3). */
    public static DoubleExponentialPulse current10x1000(double peakA) {
        return fromTimings(10e-6, 1000e-6, peakA, SurgeQuantity.CURRENT, TimingSolveBudget.defaults());
    }

    /** 5/320 µs current, the short-circuit current paired with 10/700 µs voltage (reference 4.3). */
    public static DoubleExponentialPulse current5x320(double peakA) {
        return fromTimings(5e-6, 320e-6, peakA, SurgeQuantity.CURRENT, TimingSolveBudget.defaults());
    }

    /** 1.2/50 µs voltage, the combination wave's open-circuit voltage (IEC 61000-4-5, reference 4.2). */
    public static DoubleExponentialPulse voltage1p2x50(double peakV) {
        return fromTimings(1.2e-6, 50e-6, peakV, SurgeQuantity.VOLTAGE, TimingSolveBudget.defaults());
    }

    /** 10/700 µs voltage, telecom lines (ITU-T style; in IEC 61000-4-5's annex, from memory; reference 4.3). */
    public static DoubleExponentialPulse voltage10x700(double peakV) {
        return fromTimings(10e-6, 700e-6, peakV, SurgeQuantity.VOLTAGE, TimingSolveBudget.defaults());
    }

    /** @return the time of the peak, {@code τ1·τ2·ln(τ1/τ2)/(τ1 − τ2)} (s) */
    public double peakTimeS() {
        return tau1S * DoubleExponentialTiming.peakTime(tau2S / tau1S);
    }

    /** @return the peak value (A or V) */
    public double peakValue() {
        return valueAt(peakTimeS());
    }

    @Override
    public double valueAt(double tS) {
        if (tS < 0) {
            return 0;
        }
        return amplitude * DoubleExponentialTiming.shape(tS / tau1S, tau2S / tau1S);
    }

    /** Beyond the peak the value is below {@code a·e^(−t/τ1)}, so the tail ends at {@code τ1·ln(a/(ε·peak))}. */
    @Override
    public double durationS() {
        return Math.max(2 * peakTimeS(), tau1S * Math.log(amplitude / (NEGLIGIBLE_TAIL_FRACTION * peakValue())));
    }

    /** @return the integral {@code ∫ v dt = a·(τ1 − τ2)} over all time (A·s or V·s; derived) */
    public double integral() {
        return amplitude * (tau1S - tau2S);
    }

    /** @return the integral of the square, {@code a²·(τ1/2 − 2τ1τ2/(τ1 + τ2) + τ2/2)} (A²·s or V²·s; derived) */
    public double integralOfSquare() {
        return amplitude * amplitude * (tau1S / 2 - 2 * tau1S * tau2S / (tau1S + tau2S) + tau2S / 2);
    }
}
