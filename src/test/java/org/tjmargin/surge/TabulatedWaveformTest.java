package org.tjmargin.surge;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

class TabulatedWaveformTest {

    private static WaveformTableException.Defect defectOf(double[] t, double[] v, int expectedRow) {
        WaveformTableException e = assertThrows(WaveformTableException.class, () -> new TabulatedWaveform(t, v, SurgeQuantity.CURRENT));
        assertEquals(expectedRow, e.rowIndex());
        return e.defect();
    }

    @Test
    void interpolatesLinearlyAndIsZeroOutside() {
        TabulatedWaveform w = new TabulatedWaveform(new double[] {1e-6, 3e-6, 7e-6}, new double[] {0, 100, 20}, SurgeQuantity.CURRENT);
        assertEquals(50, w.valueAt(2e-6), 1e-12);
        assertEquals(60, w.valueAt(5e-6), 1e-12);
        assertEquals(100, w.valueAt(3e-6), 0);
        assertEquals(0, w.valueAt(0.5e-6), 0);
        assertEquals(0, w.valueAt(8e-6), 0);
        assertArrayEquals(new double[] {0, 1e-6, 3e-6, 7e-6}, w.breakpointsS());
        assertEquals(List.of(new Front(1e-6, 3e-6)), w.fronts());
        assertEquals(7e-6, w.durationS());
    }

    @Test
    void badRowsAreReportedWithTheirIndexAndDefect() {
        assertEquals(WaveformTableException.Defect.TIME_NOT_INCREASING, defectOf(new double[] {0, 2, 2}, new double[] {0, 1, 2}, 2));
        assertEquals(WaveformTableException.Defect.TIME_NEGATIVE, defectOf(new double[] {-1, 2}, new double[] {0, 1}, 0));
        assertEquals(WaveformTableException.Defect.TIME_NOT_FINITE, defectOf(new double[] {0, Double.NaN}, new double[] {0, 1}, 1));
        assertEquals(WaveformTableException.Defect.VALUE_NOT_FINITE,
                defectOf(new double[] {0, 1, 2}, new double[] {0, Double.POSITIVE_INFINITY, 1}, 1));
        assertEquals(WaveformTableException.Defect.TOO_FEW_ROWS, defectOf(new double[] {0}, new double[] {0}, 1));
        assertEquals(WaveformTableException.Defect.COLUMN_LENGTHS_DIFFER, defectOf(new double[] {0, 1, 2}, new double[] {0, 1}, 2));
    }

    @Test
    void tableOfAPresetGivesThePresetsIntegrals() {
        // a 10/1000 pulse sampled into a table: the solver's charge equals the trapezoid of the table exactly,
        // and the preset's closed form to the sampling error (h = 1 µs on τ1 = 1.4 ms: (h/τ)²/12 ≈ 4e-8)
        DoubleExponentialPulse p = DoubleExponentialPulse.current10x1000(1);
        int n = 20001;
        double[] t = new double[n];
        double[] v = new double[n];
        double trapezoid = 0;
        for (int k = 0; k < n; k++) {
            t[k] = k * 1e-6;
            v[k] = p.valueAt(t[k]);
            if (k > 0) {
                trapezoid += 0.5 * (v[k] + v[k - 1]) * 1e-6;
            }
        }
        TabulatedWaveform table = new TabulatedWaveform(t, v, SurgeQuantity.CURRENT);
        ClampTransientResult r = ClampTransient.solve(new IdealCurrentSource(table), new LinearClampLine(30, 0, 0),
                org.tjmargin.thermal.FosterNetwork.of(new double[] {1}, new double[] {1e-3}), 298.15, TransientSettings.defaults())
                .resultOrThrow();
        assertEquals(trapezoid, r.chargeC(), 1e-12 * trapezoid);
        assertEquals(p.integral(), r.chargeC(), 1e-4 * p.integral()); // the table stops at 20 ms: e^(−14) of the tail is cut
    }
}
