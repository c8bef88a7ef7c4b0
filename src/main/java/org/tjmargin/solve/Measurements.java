package org.tjmargin.solve;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.circuit.StandoffClamp;
import org.tjmargin.derating.Measure;
import org.tjmargin.derating.RuleContext;
import org.tjmargin.surge.SurgeResult;

/**
 * The quantities derating rules see, read off an operating point: the one place that maps solver results to
 * {@link Measure}s.
 */
final class Measurements {

    /** Stand-in ratio (1) when a rating has fallen to zero at the point's temperature while power flows: any
     * policy fails it, and it stays finite for the outputs. */
    static final double RATIO_AT_ZERO_RATING = 1e9;

    private Measurements() {
    }

    static RuleContext of(PositionSpec spec, PositionInstance inst, OperatingPoint p, double allowedW,
                          double resistorAllowedW) {
        return of(spec, inst, p, allowedW, resistorAllowedW, List.of());
    }

    /**
     * As above, with the position's surges at this point: each surge quantity is the worst over the surges (the
     * largest), since a rule holds for the position only if it holds for every surge.
     */
    static RuleContext of(PositionSpec spec, PositionInstance inst, OperatingPoint p, double allowedW,
                          double resistorAllowedW, List<SurgeResult> surges) {
        Map<Measure, Double> v = new EnumMap<>(Measure.class);
        v.put(Measure.JUNCTION_TEMPERATURE, p.tjK());
        v.put(Measure.POWER_RATIO, ratio(p.diodePowerW(), allowedW));
        double iz = p.circuit().diodeCurrentA();
        if (spec.circuit().regulates()) {
            v.put(Measure.KNEE_CURRENT_RATIO, iz / inst.diode().izkA());
        }
        v.put(Measure.MAX_CURRENT_RATIO, iz / spec.part().ratings().izmA());
        if (spec.circuit() instanceof ShuntRegulatorSpec) {
            v.put(Measure.RESISTOR_POWER_RATIO, ratio(p.circuit().resistorPowerW(), resistorAllowedW));
        }
        if (inst.circuit() instanceof StandoffClamp c && spec.part().standoffV() > 0) {
            v.put(Measure.STANDOFF_RATIO, c.lineV() / spec.part().standoffV());
        }
        for (SurgeResult s : surges) {
            v.merge(Measure.SURGE_JUNCTION_TEMPERATURE, s.peakJunctionTemperatureK(), Math::max);
            v.merge(Measure.SURGE_POWER_RATIO, s.powerRatio(), Math::max);
            s.clampVoltageRatio().ifPresent(r -> v.merge(Measure.CLAMP_VOLTAGE_RATIO, r, Math::max));
        }
        return new RuleContext(v, spec.part().ratings().tjMaxK(), p.referenceK(), p.tLocalK());
    }

    /** What rules see of a corner without an operating point: the junction at the last temperature reached. */
    static RuleContext unresolved(PositionSpec spec, double tjK, double tLocalK) {
        return new RuleContext(Map.of(Measure.JUNCTION_TEMPERATURE, tjK), spec.part().ratings().tjMaxK(), tjK,
                tLocalK);
    }

    private static double ratio(double actual, double allowed) {
        if (allowed > 0) {
            return actual / allowed;
        }
        return actual > 0 ? RATIO_AT_ZERO_RATING : 0.0;
    }
}
