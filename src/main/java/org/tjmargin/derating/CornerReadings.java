package org.tjmargin.derating;

import java.util.Arrays;

/**
 * The {@link RuleInputs} of one corner, refilled in place corner after corner: what a position's policy check
 * holds its rules against at every corner of every ambient without allocating a {@link RuleContext} and its values
 * per corner (on a board of a thousand positions that is two million corners per sweep). The same values and
 * temperatures a {@link RuleContext} would hold; {@link #toContext()} makes that one.
 *
 * <p>Mutable and not thread-safe: one per check, used by one thread.
 */
public final class CornerReadings implements RuleInputs {

    /** {@code NaN} where the measure is absent (a held value is never NaN). */
    private final double[] byOrdinal = new double[Measure.values().length];
    private double tjMaxK = Double.NaN;
    private double referenceK = Double.NaN;
    private double tLocalK = Double.NaN;

    /** Readings holding nothing yet. */
    public CornerReadings() {
        Arrays.fill(byOrdinal, Double.NaN);
    }

    /**
     * Starts a new corner: every measure absent, the part's and the point's temperatures set.
     *
     * @param tjMaxK     the part's maximum junction temperature (K)
     * @param referenceK temperature of the part's rating reference point (K)
     * @param tLocalK    temperature of the air around the part (K)
     * @return this
     */
    public CornerReadings reset(double tjMaxK, double referenceK, double tLocalK) {
        Arrays.fill(byOrdinal, Double.NaN);
        this.tjMaxK = tjMaxK;
        this.referenceK = referenceK;
        this.tLocalK = tLocalK;
        return this;
    }

    /**
     * Sets {@code m} to {@code value}.
     *
     * @throws IllegalArgumentException when {@code value} is not finite
     */
    public CornerReadings put(Measure m, double value) {
        byOrdinal[m.ordinal()] = finite(m, value);
        return this;
    }

    /** Sets {@code m} to the larger of its value so far (if any) and {@code value}, which must be finite. */
    public CornerReadings max(Measure m, double value) {
        double old = byOrdinal[m.ordinal()];
        byOrdinal[m.ordinal()] = Double.isNaN(old) ? finite(m, value) : Math.max(old, finite(m, value));
        return this;
    }

    @Override
    public double valueOrNaN(Measure m) {
        return byOrdinal[m.ordinal()];
    }

    @Override
    public double tjMaxK() {
        return tjMaxK;
    }

    @Override
    public double referenceK() {
        return referenceK;
    }

    @Override
    public double tLocalK() {
        return tLocalK;
    }

    /** The values held now, as an immutable copy. */
    public MeasureValues values() {
        return MeasureValues.wrapping(byOrdinal.clone());
    }

    /** The immutable context holding these readings now. */
    public RuleContext toContext() {
        return new RuleContext(values(), tjMaxK, referenceK, tLocalK);
    }

    private static double finite(Measure m, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(m + " must be finite, got " + value);
        }
        return value;
    }
}
