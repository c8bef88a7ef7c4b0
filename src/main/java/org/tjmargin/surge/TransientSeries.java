package org.tjmargin.surge;

import java.util.Arrays;

/**
 * The time history of a clamp transient, one row per grid point. Times are non-decreasing: where the source
 * jumps (a breakpoint), two rows share the time, the left limit first. Between rows every quantity is taken as
 * linear (that is what the thermal model saw).
 *
 * @param timeS                time (s)
 * @param currentA             clamp current (A)
 * @param clampVoltageV        voltage across the clamp (V): on its line while it conducts, the source's idle
 *                             voltage otherwise
 * @param powerW               clamp dissipation {@code V·I} (W)
 * @param junctionTemperatureK junction temperature (K)
 */
public record TransientSeries(double[] timeS, double[] currentA, double[] clampVoltageV, double[] powerW,
        double[] junctionTemperatureK) {

    public TransientSeries {
        int n = timeS.length;
        if (currentA.length != n || clampVoltageV.length != n || powerW.length != n || junctionTemperatureK.length != n) {
            throw new IllegalArgumentException("transient series columns differ in length: " + n + ", " + currentA.length + ", "
                    + clampVoltageV.length + ", " + powerW.length + ", " + junctionTemperatureK.length);
        }
        timeS = timeS.clone();
        currentA = currentA.clone();
        clampVoltageV = clampVoltageV.clone();
        powerW = powerW.clone();
        junctionTemperatureK = junctionTemperatureK.clone();
    }

    private static final TransientSeries EMPTY = new TransientSeries(new double[0], new double[0], new double[0],
            new double[0], new double[0]);

    /** A series of no rows: what a transient solved without keeping its history reports. */
    public static TransientSeries empty() {
        return EMPTY;
    }

    @Override
    public double[] timeS() {
        return timeS.clone();
    }

    @Override
    public double[] currentA() {
        return currentA.clone();
    }

    @Override
    public double[] clampVoltageV() {
        return clampVoltageV.clone();
    }

    @Override
    public double[] powerW() {
        return powerW.clone();
    }

    @Override
    public double[] junctionTemperatureK() {
        return junctionTemperatureK.clone();
    }

    /** @return number of rows */
    public int size() {
        return timeS.length;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TransientSeries s && Arrays.equals(timeS, s.timeS) && Arrays.equals(currentA, s.currentA)
                && Arrays.equals(clampVoltageV, s.clampVoltageV) && Arrays.equals(powerW, s.powerW)
                && Arrays.equals(junctionTemperatureK, s.junctionTemperatureK);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(timeS) * 31 + Arrays.hashCode(junctionTemperatureK);
    }

    @Override
    public String toString() {
        return "TransientSeries[" + timeS.length + " rows]";
    }
}
