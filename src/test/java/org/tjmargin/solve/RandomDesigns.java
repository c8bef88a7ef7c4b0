package org.tjmargin.solve;

import java.util.List;
import java.util.Random;
import org.tjmargin.circuit.Circuit;
import org.tjmargin.circuit.CurrentFedDiode;
import org.tjmargin.circuit.Load;
import org.tjmargin.circuit.ShuntRegulator;
import org.tjmargin.circuit.StandoffClamp;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.KneeModel;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.thermal.GivenPath;
import org.tjmargin.thermal.SteadyThermalPath;

/**
 * Physically valid random single-position cases for property tests: breakdown voltages 2.4–100 V, impedances
 * 0.5–100 Ω, coefficients within the −0.09…+0.12 %/K span of generic series (reference 1.4), leakage up to 100 µA,
 * thermal resistances 10–600 K/W, and circuits dissipating up to a few watts.
 */
record RandomDesigns(Circuit circuit, BreakdownDiode diode, SteadyThermalPath path) {

    static RandomDesigns draw(Random rnd) {
        double vz = 2.4 + 97.6 * Math.pow(rnd.nextDouble(), 2);
        double izt = 1e-3 + 0.1 * rnd.nextDouble();
        double izk = izt * (0.01 + 0.3 * rnd.nextDouble());
        // Impedance limited so that Rz·Izt stays within 30 % of Vz, as in every real series (reference 1.3).
        double rz = Math.min(0.5 + 99.5 * rnd.nextDouble(), 0.3 * vz / izt);
        KneeModel knee = rnd.nextBoolean() ? new KneeModel.Linear()
                : KneeModel.CurrentDependent.through(rz, izt, rz * (1 + 20 * rnd.nextDouble()), izk);
        double alpha = (-0.09 + 0.21 * rnd.nextDouble()) / 100 * vz;
        double vz0 = vz - rz * izt;
        if (knee instanceof KneeModel.CurrentDependent k
                && k.aVolts() * Math.log(izt / izk) + k.bOhm() * (izt - izk) > 0.3 * vz) {
            return draw(rnd); // a knee dropping more than 30 % of Vz is not a breakdown diode
        }
        BreakdownDiode noLeak = new BreakdownDiode(vz0, rz, izt, izk, knee, TemperatureCoefficient.exact(alpha),
                Leakage.NONE);
        double vzk = noLeak.kneeVoltageV(org.tjmargin.device.Celsius.T25_K);
        if (vzk <= 0.2) {
            return draw(rnd);
        }
        Leakage leak = rnd.nextBoolean() ? Leakage.NONE
                : new Leakage(1e-9 + 1e-4 * rnd.nextDouble(), (0.3 + 0.6 * rnd.nextDouble()) * vzk,
                        5 + 15 * rnd.nextDouble());
        BreakdownDiode d = new BreakdownDiode(vz0, rz, izt, izk, knee, TemperatureCoefficient.exact(alpha), leak);
        double rth = 10 + 590 * rnd.nextDouble();
        Circuit c = switch (rnd.nextInt(3)) {
            case 0 -> {
                double rs = 10 + 5000 * rnd.nextDouble();
                double vs = vz * (0.5 + 2.5 * rnd.nextDouble());
                Load load = rnd.nextBoolean() ? new Load.Current(0.05 * rnd.nextDouble() * vs / rs)
                        : new Load.Resistive(10 + 1e5 * rnd.nextDouble());
                yield new ShuntRegulator(vs, rs, load);
            }
            case 1 -> new CurrentFedDiode(izk * 0.2 + izt * 2 * rnd.nextDouble());
            default -> new StandoffClamp(vz * (0.3 + 0.9 * rnd.nextDouble()), 10 * rnd.nextDouble());
        };
        return new RandomDesigns(c, d, new GivenPath(rth, rth * rnd.nextDouble(), List.of()));
    }
}
