package org.tjmargin.thermal;

/**
 * Fits a Foster network to transient thermal impedance points, e.g. read from a datasheet's {@code Zth(t)} curve.
 *
 * <p>Nonlinear least squares (Levenberg–Marquardt, Commons Math) on the residuals {@code ln(Z_model(t_j)/Z_j)},
 * which weigh every decade of a log-log curve alike; parameters are {@code ln R_i} and {@code ln τ_i}, so they
 * stay positive. Start: time constants spread geometrically from the first to the last point's time; each stage's
 * resistance is the rise of the data between the geometric means of its neighbouring time constants (log-log
 * interpolation of the points), so that a fast stage starts small where the curve is small (common practice, no
 * single source). The Jacobian is
 * analytic: {@code ∂Z/∂ln R_i = R_i(1 − e^(−t/τ_i))}, {@code ∂Z/∂ln τ_i = −R_i·(t/τ_i)·e^(−t/τ_i)}.
 * Time constants are kept within a factor 1000 beyond the data's time range.
 */
public final class ZthFit {

    /** How far beyond the data's time range a time constant may go: a stage far outside is not identifiable anyway. */
    private static final double TAU_RANGE_FACTOR = 1e3;

    private ZthFit() {
    }

    /**
     * @param timeS    times (s), positive, finite, strictly increasing
     * @param zthKPerW impedances (K/W), positive, finite, same length
     * @param stages   number of Foster stages, at least 1; needs at least {@code 2·stages} points
     * @param settings budget and tolerances
     * @return the fitted network with its residuals, or the typed failure
     */
    public static FosterFitOutcome fit(double[] timeS, double[] zthKPerW, int stages, FosterFitSettings settings) {
        checkPoints(timeS, zthKPerW, stages);
        return fit(timeS, zthKPerW, stages, settings, FosterFitOutcome.Basis.ZTH_POINTS, timeS[0], timeS[timeS.length - 1]);
    }

    /** As {@link #fit(double[], double[], int, FosterFitSettings)}, with the start's time constants spread over a given range. */
    static FosterFitOutcome fit(double[] timeS, double[] zthKPerW, int stages, FosterFitSettings settings,
            FosterFitOutcome.Basis basis, double startTauFromS, double startTauToS) {
        checkPoints(timeS, zthKPerW, stages);
        double[] t = timeS.clone();
        double[] z = zthKPerW.clone();
        int m = t.length;
        double tFirst = t[0];
        double tLast = t[m - 1];
        double[] startTau = spreadGeometrically(startTauFromS, startTauToS, stages);
        double[] startR = startResistances(t, z, startTau);
        FosterLeastSquares.Model model = new FosterLeastSquares.Model() {
            @Override
            public int residualCount() {
                return m;
            }

            @Override
            public void evaluate(double[] r, double[] tau, double[] residual, double[][] jacobian) {
                for (int j = 0; j < m; j++) {
                    double zModel = 0;
                    for (int i = 0; i < r.length; i++) {
                        double e = Math.exp(-t[j] / tau[i]);
                        double on = -Math.expm1(-t[j] / tau[i]);
                        zModel += r[i] * on;
                        jacobian[j][2 * i] = r[i] * on;
                        jacobian[j][2 * i + 1] = -r[i] * (t[j] / tau[i]) * e;
                    }
                    residual[j] = Math.log(zModel / z[j]);
                    for (int c = 0; c < 2 * r.length; c++) {
                        jacobian[j][c] /= zModel;
                    }
                }
            }
        };
        return FosterLeastSquares.fit(model, startR, startTau, tFirst / TAU_RANGE_FACTOR, tLast * TAU_RANGE_FACTOR,
                settings, basis);
    }

    /**
     * Start resistances: stage {@code i} takes {@code Z(b_(i+1)) − Z(b_i)}, the boundaries {@code b} being the
     * geometric means of neighbouring time constants, {@code b_0 = 0} and the last boundary the last point; any
     * non-positive share (a non-monotonic curve) is replaced by 1e-3 of the total.
     */
    static double[] startResistances(double[] t, double[] z, double[] tau) {
        int n = tau.length;
        double total = z[z.length - 1];
        double[] r = new double[n];
        double below = 0;
        for (int i = 0; i < n; i++) {
            double above = i == n - 1 ? total : interpolateLogLog(t, z, Math.sqrt(tau[i] * tau[i + 1]));
            r[i] = above - below > 0 ? above - below : 1e-3 * total;
            below = Math.max(below, above);
        }
        return r;
    }

    private static double interpolateLogLog(double[] t, double[] z, double at) {
        if (at <= t[0]) {
            // before the first point, extend with the √t law of a die (reference 3.4): small and rising
            return z[0] * Math.sqrt(at / t[0]);
        }
        for (int j = 1; j < t.length; j++) {
            if (at <= t[j]) {
                double w = Math.log(at / t[j - 1]) / Math.log(t[j] / t[j - 1]);
                return Math.exp(Math.log(z[j - 1]) + w * Math.log(z[j] / z[j - 1]));
            }
        }
        return z[z.length - 1];
    }

    static double[] spreadGeometrically(double from, double to, int count) {
        double[] v = new double[count];
        for (int i = 0; i < count; i++) {
            v[i] = count == 1 ? Math.sqrt(from * to) : from * Math.pow(to / from, (double) i / (count - 1));
        }
        return v;
    }

    private static void checkPoints(double[] timeS, double[] zthKPerW, int stages) {
        FitPoints.check("Zth point", "time", timeS, "impedance", "K/W", zthKPerW, stages);
    }
}
