package org.tjmargin.thermal;

import java.util.List;

/**
 * A path whose resistances are given directly: {@code Rθja} from the datasheet (in the user's mounting) and the
 * resistance from the junction to the rating's reference point.
 *
 * @param rThetaJaKPerW junction → local air (K/W), > 0
 * @param rThetaJrKPerW junction → rating reference (K/W), within {@code [0, Rθja]}
 * @param notes         estimate notes
 */
public record GivenPath(double rThetaJaKPerW, double rThetaJrKPerW, List<String> notes) implements SteadyThermalPath {

    public GivenPath {
        notes = List.copyOf(notes);
        if (!(rThetaJaKPerW > 0) || !Double.isFinite(rThetaJaKPerW)) {
            throw new IllegalArgumentException("Rθja must be > 0 and finite, got " + rThetaJaKPerW + " K/W");
        }
        if (!(rThetaJrKPerW >= 0) || rThetaJrKPerW > rThetaJaKPerW) {
            throw new IllegalArgumentException("junction-to-reference resistance " + rThetaJrKPerW
                    + " K/W must lie within [0, Rθja = " + rThetaJaKPerW + " K/W]");
        }
    }
}
