package org.tjmargin.solve;

import java.util.List;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.circuit.StandoffClamp;
import org.tjmargin.derating.Measure;
import org.tjmargin.derating.CornerReadings;
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
        return fill(new CornerReadings(), spec, inst, p, allowedW, resistorAllowedW, surges).toContext();
    }

    /** As {@link #of}, into {@code into} (refilled: the policy check of a position reuses one for its corners). */
    static CornerReadings fill(CornerReadings into, PositionSpec spec, PositionInstance inst, OperatingPoint p,
                               double allowedW, double resistorAllowedW, List<SurgeResult> surges) {
        CornerReadings v = into.reset(spec.part().ratings().tjMaxK(), p.referenceK(), p.tLocalK());
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
        // By index: an iterator over the empty list that most corners have is an allocation at every corner.
        for (int k = 0; k < surges.size(); k++) {
            SurgeResult s = surges.get(k);
            v.max(Measure.SURGE_JUNCTION_TEMPERATURE, s.peakJunctionTemperatureK());
            v.max(Measure.SURGE_POWER_RATIO, s.powerRatio());
            if (s.clampVoltageRatio().isPresent()) {
                v.max(Measure.CLAMP_VOLTAGE_RATIO, s.clampVoltageRatio().getAsDouble());
            }
        }
        return v;
    }

    /** What rules see of a corner without an operating point: the junction at the last temperature reached. */
    static RuleContext unresolved(PositionSpec spec, double tjK, double tLocalK) {
        return unresolved(new CornerReadings(), spec, tjK, tLocalK).toContext();
    }

    /** As {@link #unresolved(PositionSpec, double, double)}, into {@code into}. */
    static CornerReadings unresolved(CornerReadings into, PositionSpec spec, double tjK, double tLocalK) {
        return into.reset(spec.part().ratings().tjMaxK(), tjK, tLocalK).put(Measure.JUNCTION_TEMPERATURE, tjK);
    }

    private static double ratio(double actual, double allowed) {
        if (allowed > 0) {
            return actual / allowed;
        }
        return actual > 0 ? RATIO_AT_ZERO_RATING : 0.0;
    }
}
