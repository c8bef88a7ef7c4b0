package org.tjmargin.surge;

/**
 * The combination-wave surge generator of IEC 61000-4-5 (Ed. 3, 2014): 1.2/50 µs open-circuit voltage, 8/20 µs
 * short-circuit current, effective source impedance 2 Ω, plus the coupling network's resistance (reference 4.2).
 *
 * <p>The open-circuit voltage is this project's own double exponential fitted to 1.2/50 µs with the voltage timing
 * definitions ({@link DoubleExponentialPulse#voltage1p2x50}: τ1 = 68.224 µs, τ2 = 0.40417 µs, a = 1.03718·Vp); the
 * closed form {@code 1.037·Vp·(1 − e^(−t/0.4074 µs))·e^(−t/68.22 µs)} of reference 4.2 is the same family
 * (τ2 = 0.40498 µs) and is used in the tests as a cross-check.
 *
 * <p>Three models of the generator, which the user chooses ({@link Model}); the real generator is none of them:
 * <ul>
 *   <li>{@link Model#THEVENIN_OPEN_CIRCUIT_VOLTAGE} (default): the 1.2/50 open-circuit voltage behind
 *       {@code 2 Ω + R_coupling}. Simplification: the short-circuit current of this resistive Thevenin has the
 *       1.2/50 shape (about four times the charge of 8/20), not the real generator's 8/20: conservative for a
 *       clamp that conducts hard.</li>
 *   <li>{@link Model#NORTON_SHORT_CIRCUIT_CURRENT}: the 8/20 short-circuit current with peak {@code Voc/Zs}
 *       (a {@link CubicExponentialPulse}) in parallel with {@code Zs}, i.e. a Thevenin voltage of 8/20 shape and
 *       peak {@code Voc} behind {@code Zs}: right short-circuit current, wrong open-circuit voltage shape.</li>
 *   <li>{@link Model#IDEAL_SHORT_CIRCUIT_CURRENT}: the 8/20 current with peak {@code Voc/Zs} forced through the
 *       clamp regardless of its voltage (the clamp voltage does not reduce the current: conservative on
 *       current, right only when {@code Vc ≪ Voc}).</li>
 * </ul>
 *
 * @param peakOpenCircuitVoltageV the set open-circuit peak voltage (V), positive (test levels 1–4: 0.5, 1, 2, 4 kV)
 * @param couplingResistanceOhm   extra resistance of the coupling network (Ω), not negative ({@link Coupling})
 * @param model                   which generator model to use
 */
public record CombinationWaveGenerator(double peakOpenCircuitVoltageV, double couplingResistanceOhm, Model model) {

    /** Effective source impedance of the generator, 2 Ω (IEC 61000-4-5, reference 4.2, sourced). */
    public static final double EFFECTIVE_SOURCE_IMPEDANCE_OHM = 2.0;

    /** Coupling presets: the coupling network's extra series resistance (reference 4.2; from memory, verify). */
    public enum Coupling {
        /** power port, line to line: no extra resistance (2 Ω total) */
        POWER_LINE_TO_LINE(0),
        /** power port, line to earth: +10 Ω (12 Ω total) */
        POWER_LINE_TO_EARTH(10),
        /** signal and other lines: +40 Ω (42 Ω total) */
        OTHER_LINES(40);

        private final double extraResistanceOhm;

        Coupling(double extraResistanceOhm) {
            this.extraResistanceOhm = extraResistanceOhm;
        }

        /** @return the extra series resistance (Ω) */
        public double extraResistanceOhm() {
            return extraResistanceOhm;
        }
    }

    /** Generator models (see the class comment). */
    public enum Model {
        /** 1.2/50 open-circuit voltage behind the source resistance (default) */
        THEVENIN_OPEN_CIRCUIT_VOLTAGE,
        /** 8/20 short-circuit current in parallel with the source resistance */
        NORTON_SHORT_CIRCUIT_CURRENT,
        /** 8/20 short-circuit current forced through the clamp */
        IDEAL_SHORT_CIRCUIT_CURRENT
    }

    public CombinationWaveGenerator {
        if (!(peakOpenCircuitVoltageV > 0) || !Double.isFinite(peakOpenCircuitVoltageV)) {
            throw new IllegalArgumentException("open-circuit peak voltage must be positive and finite: " + peakOpenCircuitVoltageV + " V");
        }
        if (!(couplingResistanceOhm >= 0) || !Double.isFinite(couplingResistanceOhm)) {
            throw new IllegalArgumentException("coupling resistance must be finite and not negative: " + couplingResistanceOhm + " Ω");
        }
        if (model == null) {
            throw new IllegalArgumentException("combination-wave generator needs a model");
        }
    }

    /** @return the default (Thevenin) generator at the given peak voltage and coupling */
    public static CombinationWaveGenerator of(double peakOpenCircuitVoltageV, Coupling coupling) {
        return new CombinationWaveGenerator(peakOpenCircuitVoltageV, coupling.extraResistanceOhm(), Model.THEVENIN_OPEN_CIRCUIT_VOLTAGE);
    }

    /**
     * @param level test level 1 to 4
     * @return its open-circuit peak voltage: 500, 1000, 2000, 4000 V (IEC 61000-4-5, reference 4.2)
     */
    public static double testLevelVoltageV(int level) {
        return switch (level) {
            case 1 -> 500;
            case 2 -> 1000;
            case 3 -> 2000;
            case 4 -> 4000;
            default -> throw new IllegalArgumentException("combination-wave test levels are 1 to 4, got " + level);
        };
    }

    /** @return a copy with another model */
    public CombinationWaveGenerator withModel(Model newModel) {
        return new CombinationWaveGenerator(peakOpenCircuitVoltageV, couplingResistanceOhm, newModel);
    }

    /** @return {@code 2 Ω + R_coupling} (Ω) */
    public double sourceResistanceOhm() {
        return EFFECTIVE_SOURCE_IMPEDANCE_OHM + couplingResistanceOhm;
    }

    /** @return the peak short-circuit current {@code Voc/Zs} (A) */
    public double peakShortCircuitCurrentA() {
        return peakOpenCircuitVoltageV / sourceResistanceOhm();
    }

    /** @return the 1.2/50 µs open-circuit voltage (V) */
    public DoubleExponentialPulse openCircuitVoltage() {
        return DoubleExponentialPulse.voltage1p2x50(peakOpenCircuitVoltageV);
    }

    /** @return the 8/20 µs short-circuit current (A), peak {@code Voc/Zs} */
    public CubicExponentialPulse shortCircuitCurrent() {
        return CubicExponentialPulse.current8x20(peakShortCircuitCurrentA());
    }

    /** @return the source the chosen model presents to the clamp */
    public SurgeSource source() {
        return switch (model) {
            case THEVENIN_OPEN_CIRCUIT_VOLTAGE -> new TheveninSource(openCircuitVoltage(), sourceResistanceOhm());
            case NORTON_SHORT_CIRCUIT_CURRENT -> new TheveninSource(
                    new CubicExponentialPulse(peakOpenCircuitVoltageV, CubicExponentialPulse.EIGHT_TWENTY_TAU_S, SurgeQuantity.VOLTAGE),
                    sourceResistanceOhm());
            case IDEAL_SHORT_CIRCUIT_CURRENT -> new IdealCurrentSource(shortCircuitCurrent());
        };
    }
}
