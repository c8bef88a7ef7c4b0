package org.tjmargin.circuit;

import org.tjmargin.device.PreparedDiode;

/**
 * The shunt regulator: supply {@code Vs} through a series resistor {@code Rs} into the diode, the load across the
 * diode (Sedra and Smith, <i>Microelectronic Circuits</i>, 5th ed., §3.5.1). Kirchhoff's current law at the
 * output node, {@code (Vs − V)/Rs = Iz + IL}, against the breakdown characteristic, solved through the load's
 * Thevenin equivalent: a current load {@code IL} gives {@code (Vs − IL·Rs, Rs)}, a resistive load {@code RL}
 * gives {@code (Vs·RL/(Rs + RL), Rs∥RL)}. Below the knee the output follows the divider, not the breakdown line.
 *
 * @param supplyV   supply voltage (V), ≥ 0
 * @param seriesOhm series resistor (Ω), > 0
 * @param load      the load
 */
public record ShuntRegulator(double supplyV, double seriesOhm, Load load) implements Circuit {

    public ShuntRegulator {
        if (!(supplyV >= 0) || !Double.isFinite(supplyV)) {
            throw new IllegalArgumentException("supply must be ≥ 0 and finite, got " + supplyV + " V");
        }
        if (!(seriesOhm > 0) || !Double.isFinite(seriesOhm)) {
            throw new IllegalArgumentException("series resistor must be > 0 and finite, got " + seriesOhm + " Ω");
        }
        if (load == null) {
            throw new IllegalArgumentException("a load is required (use a 0 A current load for none)");
        }
    }

    @Override
    public void solve(PreparedDiode diode, double tjK, CircuitState out) {
        double vth;
        double rth;
        if (load instanceof Load.Resistive r) {
            vth = supplyV * r.resistanceOhm() / (seriesOhm + r.resistanceOhm());
            rth = seriesOhm * r.resistanceOhm() / (seriesOhm + r.resistanceOhm());
        } else {
            vth = supplyV - ((Load.Current) load).currentA() * seriesOhm;
            rth = seriesOhm;
        }
        TheveninDrive.solve(diode, tjK, vth, rth, out);
        double v = out.voltageV();
        double iz = out.diodeCurrentA();
        double drop = supplyV - v;
        double il = load instanceof Load.Resistive r ? v / r.resistanceOhm() : Math.max(0.0, drop / seriesOhm - iz);
        out.set(v, iz, v * iz, drop * drop / seriesOhm, il, out.region());
    }


    /** The same regulator with another supply voltage. */
    public ShuntRegulator withSupplyV(double v) {
        return new ShuntRegulator(v, seriesOhm, load);
    }

    /** The same regulator with another series resistor. */
    public ShuntRegulator withSeriesOhm(double ohm) {
        return new ShuntRegulator(supplyV, ohm, load);
    }

    /** The same regulator with another load. */
    public ShuntRegulator withLoad(Load l) {
        return new ShuntRegulator(supplyV, seriesOhm, l);
    }
}
