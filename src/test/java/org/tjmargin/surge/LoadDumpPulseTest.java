package org.tjmargin.surge;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class LoadDumpPulseTest {

    @Test
    void shapeFollowsTheDocumentedConvention() {
        // reference 4.4 model (common practice): UA + Us·e^(−t/τ), τ = td/ln 10, after a linear rise over tr
        LoadDumpPulse p = LoadDumpPulse.testA(LoadDumpSystem.TWELVE_VOLT, 87, 1, 0.2);
        assertEquals(14, p.valueAt(-1), 0);
        assertEquals(14 + 87 * 0.5, p.valueAt(0.005), 1e-12);
        assertEquals(101, p.valueAt(0.010), 1e-12);
        assertEquals(14 + 8.7, p.valueAt(0.010 + 0.2), 1e-9); // td ends at 10 % of Us
        assertEquals(0.2 / Math.log(10), p.decayTimeConstantS(), 1e-15);
        assertEquals(0.08686, p.decayTimeConstantS(), 0.00001); // reference 4.4: τ = 0.434·td
    }

    @Test
    void testBIsLimitedToTheSuppressedVoltageWithItsCrossingsAsBreakpoints() {
        // reference 4.4: test B, Us* = 35 V for 12 V systems
        LoadDumpPulse p = LoadDumpPulse.testB(LoadDumpSystem.TWELVE_VOLT, 87, 1, 0.2);
        assertEquals(35, p.valueAt(0.010), 0);
        double rise = 0.010 * (35 - 14) / 87.0;
        double fall = 0.010 + p.decayTimeConstantS() * Math.log(87 / 21.0);
        double[] b = p.breakpointsS();
        assertEquals(rise, b[1], 1e-15);
        assertEquals(0.010, b[2], 0);
        assertEquals(fall, b[3], 1e-15);
        assertEquals(35, p.valueAt(fall - 1e-9), 1e-12);
        assertTrue(p.valueAt(fall + 1e-3) < 35);
    }

    @Test
    void valuesOutsideTheStandardsRangesAreRejectedNamingTheRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LoadDumpPulse.testA(LoadDumpSystem.TWELVE_VOLT, 120, 1, 0.2));
        assertTrue(e.getMessage().contains("79") && e.getMessage().contains("101"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> LoadDumpPulse.testA(LoadDumpSystem.TWENTY_FOUR_VOLT, 180, 0.5, 0.2));
        assertThrows(IllegalArgumentException.class, () -> LoadDumpPulse.testA(LoadDumpSystem.TWENTY_FOUR_VOLT, 180, 4, 0.4));
        assertThrows(IllegalArgumentException.class,
                () -> LoadDumpPulse.testA(LoadDumpSystem.TWELVE_VOLT, 87, 1, 0.2).withSuppressedVoltage(10));
    }

    @Test
    void clampAboveTheSuppressedVoltageNeverConductsInTestB() {
        LoadDumpPulse p = LoadDumpPulse.testB(LoadDumpSystem.TWELVE_VOLT, 87, 1, 0.2);
        ClampTransientResult r = ClampTransient.solve(p.source(), new LinearClampLine(36, 0, 0),
                org.tjmargin.thermal.FosterNetwork.of(new double[] {10}, new double[] {1}), 298.15, TransientSettings.defaults())
                .resultOrThrow();
        assertEquals(0, r.energyJ(), 0);
        assertEquals(35, r.peakClampVoltageV(), 1e-12); // the idle clamp sees the suppressed supply
    }
}
