package org.tjmargin.device;

import java.util.List;

/**
 * Allowed steady power against the temperature of the rating's reference point: a piecewise-linear, non-increasing
 * curve through its points, flat before the first point and zero after the last.
 *
 * <p>The usual datasheet form is flat at {@code Pmax} to a knee temperature {@code Tk} and linear to zero at
 * {@code Tj max}: {@code P(T) = Pmax·(Tjmax − T)/(Tjmax − Tk)} for {@code T > Tk}, slope
 * {@code Pmax/(Tjmax − Tk)} (design 2.5; the common convention of generic axial and glass Zener datasheets).
 * Its effective resistance {@code (T_zero − Tk)/Pmax} is the junction-to-reference resistance the curve implies;
 * for a 1 W part rated to 50 °C lead temperature with 6.67 mW/K it is 150 K/W, zero at 200 °C.
 *
 * @param reference    where the temperature is read
 * @param referenceLengthM for {@link RatingReference#LEAD}, the distance of the reference point from the body (m);
 *                     0 otherwise
 * @param points       (temperature K, power W) breakpoints, temperature strictly increasing, power non-increasing,
 *                     the last power zero
 */
public record PowerRatingCurve(RatingReference reference, double referenceLengthM, List<Point> points) {

    /**
     * One breakpoint.
     *
     * @param temperatureK temperature of the reference point (K)
     * @param powerW       allowed power (W), ≥ 0
     */
    public record Point(double temperatureK, double powerW) {
        public Point {
            if (!Double.isFinite(temperatureK) || !(powerW >= 0) || !Double.isFinite(powerW)) {
                throw new IllegalArgumentException("rating point must be finite with power ≥ 0, got ("
                        + temperatureK + " K, " + powerW + " W)");
            }
        }
    }

    public PowerRatingCurve {
        points = List.copyOf(points);
        if (reference == null) {
            throw new IllegalArgumentException("rating reference is required");
        }
        if (!(referenceLengthM >= 0) || !Double.isFinite(referenceLengthM)) {
            throw new IllegalArgumentException("reference length must be ≥ 0, got " + referenceLengthM + " m");
        }
        if (points.size() < 2) {
            throw new IllegalArgumentException("a rating curve needs at least two points, got " + points.size());
        }
        for (int i = 1; i < points.size(); i++) {
            Point a = points.get(i - 1);
            Point b = points.get(i);
            if (!(b.temperatureK() > a.temperatureK()) || b.powerW() > a.powerW()) {
                throw new IllegalArgumentException("rating points must rise in temperature and not rise in power: ("
                        + a.temperatureK() + " K, " + a.powerW() + " W) then (" + b.temperatureK() + " K, "
                        + b.powerW() + " W)");
            }
        }
        if (points.get(points.size() - 1).powerW() != 0.0) {
            throw new IllegalArgumentException("the last rating point must be at zero power, got "
                    + points.get(points.size() - 1).powerW() + " W");
        }
    }

    /**
     * Flat to the knee, linear to zero at {@code zeroPowerK}.
     *
     * @param pMaxW      rated power (W)
     * @param kneeK      knee temperature (K)
     * @param zeroPowerK temperature of zero allowed power, usually {@code Tj max} (K)
     */
    public static PowerRatingCurve flatThenLinear(RatingReference reference, double referenceLengthM, double pMaxW,
                                                  double kneeK, double zeroPowerK) {
        return new PowerRatingCurve(reference, referenceLengthM,
                List.of(new Point(kneeK, pMaxW), new Point(zeroPowerK, 0.0)));
    }

    /**
     * Flat to the knee, then falling with the datasheet's slope (W/K) to zero at {@code Tk + Pmax/slope}.
     */
    public static PowerRatingCurve fromSlope(RatingReference reference, double referenceLengthM, double pMaxW,
                                             double kneeK, double slopeWPerK) {
        if (!(slopeWPerK > 0)) {
            throw new IllegalArgumentException("derating slope must be > 0, got " + slopeWPerK + " W/K");
        }
        return flatThenLinear(reference, referenceLengthM, pMaxW, kneeK, kneeK + pMaxW / slopeWPerK);
    }

    /** Power rating at and below the first point (W). */
    public double ratedPowerW() {
        return points.get(0).powerW();
    }

    /** Temperature at which the allowed power reaches zero (K). */
    public double zeroPowerTemperatureK() {
        return points.get(points.size() - 1).temperatureK();
    }

    /**
     * The junction-to-reference resistance the curve implies, {@code (T_zero − T_first)/P_first} (K/W).
     * For a {@link RatingReference#JUNCTION} curve it has no meaning and is 0.
     */
    public double impliedResistanceKPerW() {
        if (reference == RatingReference.JUNCTION) {
            return 0.0;
        }
        Point first = points.get(0);
        return (zeroPowerTemperatureK() - first.temperatureK()) / first.powerW();
    }

    /**
     * Allowed power with the reference point at {@code temperatureK}.
     *
     * @param temperatureK temperature of the reference point (K)
     * @return allowed power (W), ≥ 0
     */
    public double allowedPowerAt(double temperatureK) {
        Point first = points.get(0);
        if (temperatureK <= first.temperatureK()) {
            return first.powerW();
        }
        for (int i = 1; i < points.size(); i++) {
            Point b = points.get(i);
            if (temperatureK <= b.temperatureK()) {
                Point a = points.get(i - 1);
                double f = (temperatureK - a.temperatureK()) / (b.temperatureK() - a.temperatureK());
                return a.powerW() + f * (b.powerW() - a.powerW());
            }
        }
        return 0.0;
    }

    /** The curve's breakpoint temperatures (K), for solvers that must stop exactly there. */
    public double[] breakpointsK() {
        return points.stream().mapToDouble(Point::temperatureK).toArray();
    }
}
