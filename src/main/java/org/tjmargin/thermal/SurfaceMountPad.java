package org.tjmargin.thermal;

import java.util.ArrayList;
import java.util.List;

/**
 * A surface-mount part whose {@code Rθja} depends on the copper area it is soldered to (design 2.2).
 *
 * <p>With two or more datasheet points (area, {@code Rθja}) the resistance is interpolated linearly in
 * {@code log A – log Rθja} (a power law between neighbouring points, the usual shape of such plots); outside
 * the table the end segment's power law is extended and the result is noted as an extrapolation. With a single
 * point it is scaled as {@code Rθja ∝ A^(−1/2)}, the spreading-limited trend of a pad in still air (common
 * practice, no single source), noted as a rule of thumb.
 *
 * @param table          (copper area m², Rθja K/W) points, area strictly increasing
 * @param copperAreaM2   the user's copper area (m²)
 * @param rThetaJrKPerW  junction → the rating's reference point (case/tab for a case-referenced rating,
 *                       {@code NaN} meaning "the local air", i.e. equal to Rθja)
 */
public record SurfaceMountPad(List<AreaPoint> table, double copperAreaM2, double rThetaJrKPerW)
        implements SteadyThermalPath {

    /** Exponent of the single-point rule of thumb, {@code Rθja ∝ A^(−1/2)} (common practice, no single source). */
    public static final double SINGLE_POINT_EXPONENT = -0.5;

    /**
     * One datasheet point.
     *
     * @param areaM2        copper area (m²), > 0
     * @param rThetaJaKPerW junction → air at that area (K/W), > 0
     */
    public record AreaPoint(double areaM2, double rThetaJaKPerW) {
        public AreaPoint {
            if (!(areaM2 > 0) || !(rThetaJaKPerW > 0) || !Double.isFinite(areaM2) || !Double.isFinite(rThetaJaKPerW)) {
                throw new IllegalArgumentException("copper-area point needs area > 0 and Rθja > 0, got " + areaM2
                        + " m², " + rThetaJaKPerW + " K/W");
            }
        }
    }

    public SurfaceMountPad {
        table = List.copyOf(table);
        if (table.isEmpty()) {
            throw new IllegalArgumentException("a surface-mount path needs at least one (area, Rθja) point");
        }
        for (int i = 1; i < table.size(); i++) {
            if (!(table.get(i).areaM2() > table.get(i - 1).areaM2())) {
                throw new IllegalArgumentException("copper areas must increase: " + table.get(i - 1).areaM2()
                        + " m² then " + table.get(i).areaM2() + " m²");
            }
        }
        if (!(copperAreaM2 > 0) || !Double.isFinite(copperAreaM2)) {
            throw new IllegalArgumentException("copper area must be > 0, got " + copperAreaM2 + " m²");
        }
    }

    @Override
    public double rThetaJaKPerW() {
        if (table.size() == 1) {
            AreaPoint p = table.get(0);
            return p.rThetaJaKPerW() * Math.pow(copperAreaM2 / p.areaM2(), SINGLE_POINT_EXPONENT);
        }
        int i = 1;
        while (i < table.size() - 1 && table.get(i).areaM2() < copperAreaM2) {
            i++;
        }
        AreaPoint a = table.get(i - 1);
        AreaPoint b = table.get(i);
        double slope = Math.log(b.rThetaJaKPerW() / a.rThetaJaKPerW()) / Math.log(b.areaM2() / a.areaM2());
        return a.rThetaJaKPerW() * Math.pow(copperAreaM2 / a.areaM2(), slope);
    }

    @Override
    public double rThetaJrKPerW() {
        double ja = rThetaJaKPerW();
        return Double.isNaN(rThetaJrKPerW) ? ja : Math.min(rThetaJrKPerW, ja);
    }

    @Override
    public List<String> notes() {
        List<String> notes = new ArrayList<>();
        if (table.size() == 1) {
            notes.add("Rθja scaled from a single copper-area point as A^(−1/2) (rule of thumb)");
        } else if (copperAreaM2 < table.get(0).areaM2() || copperAreaM2 > table.get(table.size() - 1).areaM2()) {
            notes.add("Rθja extrapolated beyond the part's copper-area table");
        }
        return notes;
    }
}
