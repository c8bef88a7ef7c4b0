package org.tjmargin.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Steady thermal paths against handbook conduction and datasheet conventions. */
class SteadyPathTest {

    @Test
    void leadConductionMatchesFourierLaw() {
        // R = L/(k·A): copper k = 401 W/(m·K) (Incropera, 6th ed., Table A.1), d 0.8 mm, L 9.5 mm → 47.13 K/W;
        // d 0.5 mm → 120.7 K/W (reference.md 2.2, derived). Design 5: 10 mm at k ≈ 390 → about 51 K/W.
        assertEquals(47.13, LeadConduction.resistanceKPerW(9.5e-3, 0.8e-3, 401), 0.005);
        assertEquals(120.7, LeadConduction.resistanceKPerW(9.5e-3, 0.5e-3, 401), 0.05);
        assertEquals(51.0, LeadConduction.resistanceKPerW(10e-3, 0.8e-3, 390), 0.05);
    }

    @Test
    void axialMountCalibratedFromRatingReproducesItAtTheReferenceLength() {
        // 150 K/W at 9.5 mm (1 W axial convention, reference.md 2.6); copper 0.8 mm leads: internal 150 − 47.13/2.
        AxialLeadMount m = AxialLeadMount.calibrated(150, 9.5e-3, 0.8e-3, 401, 9.5e-3, 0, List.of());
        assertEquals(150 - 47.13 / 2, m.internalKPerW(), 0.003);
        assertEquals(150, m.rThetaJaKPerW(), 1e-9);
        assertEquals(150, m.rThetaJrKPerW(), 1e-9);
        // Longer leads add conduction in parallel pairs; the tie point adds in series (θLA 30–40 K/W for common
        // clips and wiring, reference.md 2.1).
        AxialLeadMount longer = AxialLeadMount.calibrated(150, 9.5e-3, 0.8e-3, 401, 20e-3, 35, List.of());
        double extra = LeadConduction.resistanceKPerW(20e-3 - 9.5e-3, 0.8e-3, 401) / 2;
        assertEquals(150 + extra + 35, longer.rThetaJaKPerW(), 1e-9);
        assertEquals(150, longer.rThetaJrKPerW(), 1e-9);
    }

    @Test
    void leadsThatConductWorseThanTheRatingAreRejected() {
        // 0.2 mm steel-like leads at 9.5 mm alone exceed 150 K/W: the data contradict the rating.
        assertThrows(IllegalArgumentException.class,
                () -> AxialLeadMount.calibrated(150, 9.5e-3, 0.2e-3, 60, 9.5e-3, 0, List.of()));
    }

    @Test
    void surfaceMountInterpolatesLogLog() {
        // Between (25 mm², 200 K/W) and (100 mm², 100 K/W) the power law has exponent −1/2, so 50 mm² gives
        // 200/√2 = 141.4 K/W (log-log interpolation, design 2.2).
        SurfaceMountPad p = new SurfaceMountPad(List.of(new SurfaceMountPad.AreaPoint(25e-6, 200),
                new SurfaceMountPad.AreaPoint(100e-6, 100)), 50e-6, Double.NaN);
        assertEquals(200 / Math.sqrt(2), p.rThetaJaKPerW(), 1e-9);
        assertTrue(p.notes().isEmpty());
        SurfaceMountPad outside = new SurfaceMountPad(p.table(), 400e-6, Double.NaN);
        assertEquals(50, outside.rThetaJaKPerW(), 1e-9);
        assertEquals(1, outside.notes().size());
    }

    @Test
    void sealedBoxRiseIsPowerOverConductance() {
        // ΔT = P/(h·A): 3 W in a 0.1 m² box at 6 W/(m²·K) → 5 K (design 2.2).
        Enclosure.SealedBox box = new Enclosure.SealedBox(0.1, 6, 1);
        assertEquals(5.0, box.riseK(2.0), 1e-12);
        assertTrue(box.couplesPositions());
    }
}
