package org.tjmargin.thermal;

import java.util.Arrays;

/**
 * A power history, linear between samples, to drive a {@link FosterNetwork}: one pulse of a train, or the power a
 * clamp transient produced. Before the first sample and after the last the power is zero.
 *
 * <p>Times are non-decreasing; two samples at the same time mark a jump (left value first, right value second),
 * so a rectangle is {@code t = {0, 0, tp, tp}}, {@code P = {0, P, P, 0}}. Powers are finite and not negative: a
 * breakdown diode only dissipates.
 *
 * @param timeS  sample times (s), finite, not negative, non-decreasing; at least two
 * @param powerW powers (W), finite, not negative; same length as {@code timeS}
 */
public record FosterPowerProfile(double[] timeS, double[] powerW) {

    public FosterPowerProfile {
        if (timeS.length != powerW.length) {
            throw new IllegalArgumentException("power profile has " + timeS.length + " times but " + powerW.length + " powers");
        }
        if (timeS.length < 2) {
            throw new IllegalArgumentException("power profile needs at least two samples, has " + timeS.length);
        }
        timeS = timeS.clone();
        powerW = powerW.clone();
        for (int i = 0; i < timeS.length; i++) {
            if (!Double.isFinite(timeS[i]) || timeS[i] < 0) {
                throw new IllegalArgumentException("power profile time " + i + " must be finite and not negative: " + timeS[i]);
            }
            if (i > 0 && timeS[i] < timeS[i - 1]) {
                throw new IllegalArgumentException("power profile times must not decrease: t[" + (i - 1) + "] = " + timeS[i - 1]
                        + " s, t[" + i + "] = " + timeS[i] + " s");
            }
            if (!Double.isFinite(powerW[i]) || powerW[i] < 0) {
                throw new IllegalArgumentException("power profile power " + i + " must be finite and not negative: " + powerW[i]);
            }
        }
    }

    /**
     * A rectangular pulse starting at {@code t = 0}.
     *
     * @param powerW power during the pulse (W)
     * @param widthS pulse width (s), positive
     */
    public static FosterPowerProfile rectangle(double powerW, double widthS) {
        if (!(widthS > 0)) {
            throw new IllegalArgumentException("rectangle width must be positive: widthS = " + widthS);
        }
        return new FosterPowerProfile(new double[] {0, 0, widthS, widthS}, new double[] {0, powerW, powerW, 0});
    }

    @Override
    public double[] timeS() {
        return timeS.clone();
    }

    @Override
    public double[] powerW() {
        return powerW.clone();
    }

    /** @return number of samples */
    public int size() {
        return timeS.length;
    }

    /** @return time of sample {@code i} (s) */
    public double timeS(int i) {
        return timeS[i];
    }

    /** @return power of sample {@code i} (W) */
    public double powerW(int i) {
        return powerW[i];
    }

    /** @return the last sample time (s) */
    public double endS() {
        return timeS[timeS.length - 1];
    }

    /** @return the energy {@code ∫P dt} of the linear interpolation (J) */
    public double energyJ() {
        double e = 0;
        for (int i = 1; i < timeS.length; i++) {
            e += 0.5 * (powerW[i] + powerW[i - 1]) * (timeS[i] - timeS[i - 1]);
        }
        return e;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FosterPowerProfile other && Arrays.equals(timeS, other.timeS) && Arrays.equals(powerW, other.powerW);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(timeS) + Arrays.hashCode(powerW);
    }

    @Override
    public String toString() {
        return "FosterPowerProfile[" + timeS.length + " samples over " + endS() + " s]";
    }
}
