package org.tjmargin.surge;

/**
 * A user waveform table that cannot be used, with the zero-based row at fault and the defect; the caller that read
 * the table adds the file and line.
 */
public final class WaveformTableException extends IllegalArgumentException {

    /** What is wrong with the row. */
    public enum Defect {
        /** fewer than two rows (the row index is the row count) */
        TOO_FEW_ROWS,
        /** the time and value columns differ in length (the row index is the first row missing a partner) */
        COLUMN_LENGTHS_DIFFER,
        /** a time is NaN or infinite */
        TIME_NOT_FINITE,
        /** a time is negative: waveforms start at t = 0 */
        TIME_NEGATIVE,
        /** a time is not greater than the previous one */
        TIME_NOT_INCREASING,
        /** a value is NaN or infinite */
        VALUE_NOT_FINITE
    }

    private final int rowIndex;
    private final Defect defect;
    private final double offendingValue;

    WaveformTableException(int rowIndex, Defect defect, double offendingValue) {
        super("waveform table row " + rowIndex + ": " + defect.name().toLowerCase().replace('_', ' ') + " (" + offendingValue + ")");
        this.rowIndex = rowIndex;
        this.defect = defect;
        this.offendingValue = offendingValue;
    }

    /** @return the zero-based row index at fault */
    public int rowIndex() {
        return rowIndex;
    }

    /** @return the defect */
    public Defect defect() {
        return defect;
    }

    /** @return the number that made the row invalid (the row count or the column length for the first two defects) */
    public double offendingValue() {
        return offendingValue;
    }
}
