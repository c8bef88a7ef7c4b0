package org.tjmargin.surge;

import java.util.Arrays;
import java.util.List;

/**
 * A user's waveform table (already parsed): times strictly increasing from {@code t ≥ 0}, finite values, linear
 * interpolation between rows, zero outside the table (a pulse, not a level). Every row time is a breakpoint. The
 * front is taken from the first row to the row of the largest absolute value.
 *
 * @param timeS    row times (s)
 * @param values   row values (A or V)
 * @param quantity current or voltage
 * @throws WaveformTableException naming the row and the defect if the table is unusable
 */
public record TabulatedWaveform(double[] timeS, double[] values, SurgeQuantity quantity) implements Waveform {

    public TabulatedWaveform {
        if (quantity == null) {
            throw new IllegalArgumentException("waveform table needs a quantity");
        }
        int n = Math.min(timeS.length, values.length);
        if (timeS.length != values.length) {
            throw new WaveformTableException(n, WaveformTableException.Defect.COLUMN_LENGTHS_DIFFER, Math.max(timeS.length, values.length));
        }
        if (n < 2) {
            throw new WaveformTableException(n, WaveformTableException.Defect.TOO_FEW_ROWS, n);
        }
        timeS = timeS.clone();
        values = values.clone();
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(timeS[i])) {
                throw new WaveformTableException(i, WaveformTableException.Defect.TIME_NOT_FINITE, timeS[i]);
            }
            if (timeS[i] < 0) {
                throw new WaveformTableException(i, WaveformTableException.Defect.TIME_NEGATIVE, timeS[i]);
            }
            if (i > 0 && !(timeS[i] > timeS[i - 1])) {
                throw new WaveformTableException(i, WaveformTableException.Defect.TIME_NOT_INCREASING, timeS[i]);
            }
            if (!Double.isFinite(values[i])) {
                throw new WaveformTableException(i, WaveformTableException.Defect.VALUE_NOT_FINITE, values[i]);
            }
        }
    }

    @Override
    public double[] timeS() {
        return timeS.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    @Override
    public double valueAt(double tS) {
        int n = timeS.length;
        if (tS < timeS[0] || tS > timeS[n - 1]) {
            return 0;
        }
        int i = Arrays.binarySearch(timeS, tS);
        if (i >= 0) {
            return values[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double w = (tS - timeS[lo]) / (timeS[hi] - timeS[lo]);
        return values[lo] + w * (values[hi] - values[lo]);
    }

    @Override
    public double[] breakpointsS() {
        if (timeS[0] == 0) {
            return timeS.clone();
        }
        double[] b = new double[timeS.length + 1];
        System.arraycopy(timeS, 0, b, 1, timeS.length);
        return b;
    }

    @Override
    public List<Front> fronts() {
        int peak = 0;
        for (int i = 1; i < values.length; i++) {
            if (Math.abs(values[i]) > Math.abs(values[peak])) {
                peak = i;
            }
        }
        return peak == 0 ? List.of() : List.of(new Front(timeS[0], timeS[peak]));
    }

    @Override
    public double durationS() {
        return timeS[timeS.length - 1];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TabulatedWaveform other && quantity == other.quantity && Arrays.equals(timeS, other.timeS)
                && Arrays.equals(values, other.values);
    }

    @Override
    public int hashCode() {
        return (31 * Arrays.hashCode(timeS) + Arrays.hashCode(values)) * 31 + quantity.hashCode();
    }

    @Override
    public String toString() {
        return "TabulatedWaveform[" + quantity + ", " + timeS.length + " rows over " + durationS() + " s]";
    }
}
