package org.tjmargin.thermal;

/**
 * Fits a Foster network to transient thermal impedance points, e.g. read from a datasheet's {@code Zth(t)} curve.
 *
 * <p>Nonlinear least squares (Levenberg–Marquardt, Commons Math) on the residuals {@code ln(Z_model(t_j)/Z_j)},
 * which weigh every decade of a log-log curve alike; parameters are {@code ln R_i} and {@code ln τ_i}, so they
 * stay positive. Start: time constants spread geometrically from the first to the last point's time, equal
 * resistances summing to the last point's impedance (common practice, no single source). The Jacobian is
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
        return fit(timeS, zthKPerW, stages, settings, FosterFitOutcome.Basis.ZTH_POINTS);
    }

    static FosterFitOutcome fit(double[] timeS, double[] zthKPerW, int stages, FosterFitSettings settings,
            FosterFitOutcome.Basis basis) {
        checkPoints(timeS, zthKPerW, stages);
        double[] t = timeS.clone();
        double[] z = zthKPerW.clone();
        int m = t.length;
        double tFirst = t[0];
        double tLast = t[m - 1];
        double[] startTau = spreadGeometrically(tFirst, tLast, stages);
        double[] startR = new double[stages];
        java.util.Arrays.fill(startR, z[m - 1] / stages);
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

    static double[] spreadGeometrically(double from, double to, int count) {
        double[] v = new double[count];
        for (int i = 0; i < count; i++) {
            v[i] = count == 1 ? Math.sqrt(from * to) : from * Math.pow(to / from, (double) i / (count - 1));
        }
        return v;
    }

    private static void checkPoints(double[] timeS, double[] zthKPerW, int stages) {
        if (stages < 1) {
            throw new IllegalArgumentException("a Foster fit needs at least one stage: " + stages);
        }
        if (timeS.length != zthKPerW.length) {
            throw new IllegalArgumentException("Zth fit has " + timeS.length + " times but " + zthKPerW.length + " impedances");
        }
        if (timeS.length < 2 * stages) {
            throw new IllegalArgumentException("a " + stages + "-stage Foster fit needs at least " + 2 * stages
                    + " points, has " + timeS.length);
        }
        for (int j = 0; j < timeS.length; j++) {
            if (!(timeS[j] > 0) || !Double.isFinite(timeS[j])) {
                throw new IllegalArgumentException("Zth point " + j + ": time must be positive and finite: " + timeS[j] + " s");
            }
            if (j > 0 && !(timeS[j] > timeS[j - 1])) {
                throw new IllegalArgumentException("Zth point " + j + ": times must increase: " + timeS[j - 1] + " s then "
                        + timeS[j] + " s");
            }
            if (!(zthKPerW[j] > 0) || !Double.isFinite(zthKPerW[j])) {
                throw new IllegalArgumentException("Zth point " + j + ": impedance must be positive and finite: "
                        + zthKPerW[j] + " K/W");
            }
        }
    }
}
