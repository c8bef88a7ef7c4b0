package org.tjmargin.thermal;

import java.util.Arrays;

/**
 * The state of a Foster network: the temperature rise (K) across each stage, in the network's stage order.
 * The junction rise is their sum. A network at rest has every stage at zero.
 *
 * <p>Immutable: the array is copied in and out.
 *
 * @param stageRiseK rise across each stage (K), finite
 */
public record FosterState(double[] stageRiseK) {

    public FosterState {
        if (stageRiseK.length == 0) {
            throw new IllegalArgumentException("a Foster state needs at least one stage");
        }
        stageRiseK = stageRiseK.clone();
        for (int i = 0; i < stageRiseK.length; i++) {
            if (!Double.isFinite(stageRiseK[i])) {
                throw new IllegalArgumentException("Foster stage " + i + " rise is not finite: " + stageRiseK[i]);
            }
        }
    }

    /** @return a state with {@code stages} stages, all at zero rise */
    public static FosterState rest(int stages) {
        return new FosterState(new double[stages]);
    }

    @Override
    public double[] stageRiseK() {
        return stageRiseK.clone();
    }

    /** @return number of stages */
    public int stages() {
        return stageRiseK.length;
    }

    /** @return rise across stage {@code i} (K) */
    public double stageRiseK(int i) {
        return stageRiseK[i];
    }

    /** @return the junction rise, the sum of the stage rises (K) */
    public double totalRiseK() {
        double sum = 0;
        for (double x : stageRiseK) {
            sum += x;
        }
        return sum;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FosterState other && Arrays.equals(stageRiseK, other.stageRiseK);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(stageRiseK);
    }

    @Override
    public String toString() {
        return "FosterState" + Arrays.toString(stageRiseK);
    }
}
