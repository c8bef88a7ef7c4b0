package org.tjmargin.device;

/**
 * Absolute ratings of a breakdown diode.
 *
 * @param tjMaxK     maximum junction temperature (K), above 25 °C
 * @param powerCurve steady power rating against its reference temperature
 * @param izmA       maximum steady Zener current (A), > 0; where the datasheet gives none, {@code Pmax/Vz_nom}
 */
public record DiodeRatings(double tjMaxK, PowerRatingCurve powerCurve, double izmA) {

    public DiodeRatings {
        if (!(tjMaxK > Celsius.T25_K) || !Double.isFinite(tjMaxK)) {
            throw new IllegalArgumentException("Tj max must lie above 25 °C, got " + Celsius.toCelsius(tjMaxK) + " °C");
        }
        if (powerCurve == null) {
            throw new IllegalArgumentException("a power rating curve is required");
        }
        if (!(izmA > 0) || !Double.isFinite(izmA)) {
            throw new IllegalArgumentException("maximum Zener current must be > 0, got " + izmA + " A");
        }
    }

    /** Rated power at and below the curve's knee (W). */
    public double ratedPowerW() {
        return powerCurve.ratedPowerW();
    }
}
