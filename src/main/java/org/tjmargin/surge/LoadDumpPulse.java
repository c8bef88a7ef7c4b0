package org.tjmargin.surge;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * A load-dump pulse on a vehicle supply (ISO 16750-2 clause 4.6.4, reference 4.4): the open-circuit voltage
 * <pre>
 *   v(t) = U_A + Us·t/tr                     0 ≤ t < tr    (linear rise: a modelling choice)
 *   v(t) = U_A + Us·e^(−(t − tr)/τ)          t ≥ tr,       τ = td/ln 10
 * </pre>
 * behind the source resistance {@code Ri} ({@link #source()}). Convention: {@code td} runs from the end of the
 * rise until the excess over {@code U_A} has fallen to 10 % of {@code Us}, hence {@code τ = td/ln 10 = 0.434·td}
 * (common practice; if the edition at hand ends {@code td} at 50 %, use {@code τ = td/ln 2}: check against the
 * standard's figure). Before {@code t = 0} and after the pulse the supply sits at {@code U_A}.
 *
 * <p>Test B (centrally suppressed alternator): the supply's own suppression limits the voltage to {@code Us*}
 * (35 V for 12 V systems, reference 4.4), modelled as {@code min(v(t), Us*)}; its crossings are breakpoints.
 *
 * @param batteryVoltageV     {@code U_A} (V), finite, not negative
 * @param amplitudeV          {@code Us}, the peak excess over {@code U_A} (V), positive
 * @param riseTimeS           {@code tr} (s), not negative; zero gives an instantaneous rise
 * @param durationTdS         {@code td} (s), positive
 * @param sourceResistanceOhm {@code Ri} (Ω), positive
 * @param suppressedVoltageV  {@code Us*} for test B, above {@code U_A}; empty for test A
 */
public record LoadDumpPulse(double batteryVoltageV, double amplitudeV, double riseTimeS, double durationTdS,
        double sourceResistanceOhm, OptionalDouble suppressedVoltageV) implements Waveform {

    public LoadDumpPulse {
        if (!(batteryVoltageV >= 0) || !Double.isFinite(batteryVoltageV)) {
            throw new IllegalArgumentException("load dump U_A must be finite and not negative: " + batteryVoltageV + " V");
        }
        if (!(amplitudeV > 0) || !Double.isFinite(amplitudeV)) {
            throw new IllegalArgumentException("load dump Us must be positive and finite: " + amplitudeV + " V");
        }
        if (!(riseTimeS >= 0) || !Double.isFinite(riseTimeS)) {
            throw new IllegalArgumentException("load dump tr must be finite and not negative: " + riseTimeS + " s");
        }
        if (!(durationTdS > 0) || !Double.isFinite(durationTdS)) {
            throw new IllegalArgumentException("load dump td must be positive and finite: " + durationTdS + " s");
        }
        if (!(sourceResistanceOhm > 0) || !Double.isFinite(sourceResistanceOhm)) {
            throw new IllegalArgumentException("load dump Ri must be positive and finite: " + sourceResistanceOhm + " Ω");
        }
        if (suppressedVoltageV == null) {
            throw new IllegalArgumentException("load dump suppressed voltage must be given or empty, not null");
        }
        if (suppressedVoltageV.isPresent() && !(suppressedVoltageV.getAsDouble() > batteryVoltageV)) {
            throw new IllegalArgumentException("load dump Us* must exceed U_A: Us* = " + suppressedVoltageV.getAsDouble()
                    + " V, U_A = " + batteryVoltageV + " V");
        }
    }

    /** Test A (unsuppressed) with the system's {@code U_A} and {@code tr}; {@code Us}, {@code Ri}, {@code td} within the standard's ranges. */
    public static LoadDumpPulse testA(LoadDumpSystem system, double amplitudeV, double sourceResistanceOhm, double durationTdS) {
        system.checkRanges(amplitudeV, sourceResistanceOhm, durationTdS);
        return new LoadDumpPulse(system.batteryVoltageV(), amplitudeV, system.riseTimeS(), durationTdS, sourceResistanceOhm,
                OptionalDouble.empty());
    }

    /** Test B (centrally suppressed) at the system's typical {@code Us*} (35 V or 58 V). */
    public static LoadDumpPulse testB(LoadDumpSystem system, double amplitudeV, double sourceResistanceOhm, double durationTdS) {
        return testA(system, amplitudeV, sourceResistanceOhm, durationTdS).withSuppressedVoltage(system.typicalSuppressedVoltageV());
    }

    /** @return a copy limited to {@code Us*} (test B) */
    public LoadDumpPulse withSuppressedVoltage(double suppressedV) {
        return new LoadDumpPulse(batteryVoltageV, amplitudeV, riseTimeS, durationTdS, sourceResistanceOhm, OptionalDouble.of(suppressedV));
    }

    /** @return a copy with another rise time (zero for the rise-less closed form) */
    public LoadDumpPulse withRiseTime(double newRiseTimeS) {
        return new LoadDumpPulse(batteryVoltageV, amplitudeV, newRiseTimeS, durationTdS, sourceResistanceOhm, suppressedVoltageV);
    }

    /** @return {@code τ = td/ln 10} (s), see the class comment */
    public double decayTimeConstantS() {
        return durationTdS / Math.log(10);
    }

    /** @return the open-circuit voltage behind {@code Ri} as a surge source */
    public TheveninSource source() {
        return new TheveninSource(this, sourceResistanceOhm);
    }

    @Override
    public SurgeQuantity quantity() {
        return SurgeQuantity.VOLTAGE;
    }

    @Override
    public double valueAt(double tS) {
        double v;
        if (tS < 0) {
            v = batteryVoltageV;
        } else if (tS < riseTimeS) {
            v = batteryVoltageV + amplitudeV * tS / riseTimeS;
        } else {
            v = batteryVoltageV + amplitudeV * Math.exp(-(tS - riseTimeS) / decayTimeConstantS());
        }
        return suppressedVoltageV.isPresent() ? Math.min(v, suppressedVoltageV.getAsDouble()) : v;
    }

    @Override
    public double[] breakpointsS() {
        List<Double> b = new ArrayList<>();
        b.add(0.0);
        if (suppressedVoltageV.isPresent() && suppressedVoltageV.getAsDouble() < batteryVoltageV + amplitudeV) {
            double excess = suppressedVoltageV.getAsDouble() - batteryVoltageV;
            if (riseTimeS > 0) {
                b.add(riseTimeS * excess / amplitudeV);
            }
            if (riseTimeS > 0) {
                b.add(riseTimeS);
            }
            b.add(riseTimeS + decayTimeConstantS() * Math.log(amplitudeV / excess));
        } else if (riseTimeS > 0) {
            b.add(riseTimeS);
        }
        b.add(durationS());
        return b.stream().mapToDouble(Double::doubleValue).distinct().sorted().toArray();
    }

    @Override
    public List<Front> fronts() {
        return riseTimeS > 0 ? List.of(new Front(0, riseTimeS)) : List.of();
    }

    /** The rise plus {@code τ·ln(1/ε)}: the excess over {@code U_A} has fallen below {@code ε·Us}. */
    @Override
    public double durationS() {
        return riseTimeS + decayTimeConstantS() * Math.log(1 / NEGLIGIBLE_TAIL_FRACTION);
    }
}
