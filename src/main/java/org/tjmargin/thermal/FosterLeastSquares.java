package org.tjmargin.thermal;

import java.util.Optional;

import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * Levenberg–Marquardt fit of a Foster network in log parameters ({@code ln R_i}, {@code ln τ_i}), which keeps every
 * parameter positive without constraints. Shared by {@link ZthFit}, {@link PulseRatingFit} and
 * {@link SemiInfiniteDie}. Parameters are clamped into a box (time constants within a stated range, resistances
 * within 1e-20…1e10 times the start's total) so an excursion cannot overflow {@code exp}.
 */
final class FosterLeastSquares {

    /** Residuals and their Jacobian for given stage parameters. */
    interface Model {
        int residualCount();

        /**
         * @param r        stage resistances (K/W)
         * @param tau      stage time constants (s)
         * @param residual filled with {@code ln(model/target)} per point
         * @param jacobian filled with {@code ∂residual_j/∂ln R_i} at column {@code 2i} and {@code ∂/∂ln τ_i} at
         *                 column {@code 2i+1}
         */
        void evaluate(double[] r, double[] tau, double[] residual, double[][] jacobian);
    }

    /** Thrown by a model whose peak search did not converge. */
    static final class PeakSearchFailure extends RuntimeException {
        PeakSearchFailure(String message) {
            super(message);
        }
    }

    /** Lower bound of a resistance relative to the start's total: far below any stage worth reporting. */
    private static final double R_FLOOR_FACTOR = 1e-20;
    /** Upper bound of a resistance relative to the start's total: far above any plausible fit. */
    private static final double R_CEILING_FACTOR = 1e10;

    private FosterLeastSquares() {
    }

    /**
     * Two passes: first the resistances alone with the start's time constants held (a well-conditioned problem
     * that cannot wander off), then all parameters from there. A start far from the data otherwise lets a fast
     * stage run to its time-constant bound, where the clamped steps stall the optimizer. The better of the two
     * passes (lower RMS) is returned; evaluations and iterations are the totals.
     */
    static FosterFitOutcome fit(Model model, double[] startR, double[] startTau, double tauMinS, double tauMaxS,
            FosterFitSettings settings, FosterFitOutcome.Basis basis) {
        Tracker tracker = new Tracker(startR.length);
        try {
            Pass first = optimise(model, startR, startTau, false, tauMinS, tauMaxS, settings, tracker);
            Pass second = optimise(model, first.r, first.tau, true, tauMinS, tauMaxS, settings, tracker);
            Pass best = second.rms <= first.rms ? second : first;
            return new FosterFitOutcome.Fitted(FosterNetwork.of(best.r, best.tau).sortedByTimeConstant(), basis, best.rms,
                    best.maxAbs, tracker.iterations, tracker.evaluations);
        } catch (TooManyEvaluationsException | TooManyIterationsException e) {
            return tracker.failure(basis, FosterFitOutcome.Reason.BUDGET_EXHAUSTED, e.getMessage());
        } catch (ConvergenceException e) {
            return tracker.failure(basis, FosterFitOutcome.Reason.NOT_CONVERGED, e.getMessage());
        } catch (PeakSearchFailure e) {
            return tracker.failure(basis, FosterFitOutcome.Reason.PEAK_SEARCH_NOT_CONVERGED, e.getMessage());
        }
    }

    /** The end of one optimizer pass. */
    private record Pass(double[] r, double[] tau, double rms, double maxAbs) {
    }

    private static Pass optimise(Model model, double[] startR, double[] startTau, boolean freeTau, double tauMinS,
            double tauMaxS, FosterFitSettings settings, Tracker tracker) {
        int n = startR.length;
        int width = freeTau ? 2 * n : n;
        double sumR = 0;
        for (double r : startR) {
            sumR += r;
        }
        double lnRMin = Math.log(sumR * R_FLOOR_FACTOR);
        double lnRMax = Math.log(sumR * R_CEILING_FACTOR);
        double lnTauMin = Math.log(tauMinS);
        double lnTauMax = Math.log(tauMaxS);
        double[] start = new double[width];
        for (int i = 0; i < n; i++) {
            start[freeTau ? 2 * i : i] = Math.log(startR[i]);
            if (freeTau) {
                start[2 * i + 1] = Math.log(startTau[i]);
            }
        }
        int m = model.residualCount();
        LeastSquaresBuilder builder = new LeastSquaresBuilder()
                .start(start)
                .target(new double[m])
                .maxEvaluations(settings.maxEvaluations() - tracker.evaluations)
                .maxIterations(settings.maxIterations() - tracker.iterations)
                .lazyEvaluation(false)
                .parameterValidator(p -> {
                    RealVector q = p.copy();
                    for (int i = 0; i < n; i++) {
                        int ir = freeTau ? 2 * i : i;
                        q.setEntry(ir, clamp(q.getEntry(ir), lnRMin, lnRMax));
                        if (freeTau) {
                            q.setEntry(2 * i + 1, clamp(q.getEntry(2 * i + 1), lnTauMin, lnTauMax));
                        }
                    }
                    return q;
                })
                .model(p -> {
                    double[] r = new double[n];
                    double[] tau = new double[n];
                    for (int i = 0; i < n; i++) {
                        r[i] = Math.exp(p.getEntry(freeTau ? 2 * i : i));
                        tau[i] = freeTau ? Math.exp(p.getEntry(2 * i + 1)) : startTau[i];
                    }
                    double[] residual = new double[m];
                    double[][] full = new double[m][2 * n];
                    model.evaluate(r, tau, residual, full);
                    tracker.offer(r, tau, residual);
                    double[][] jacobian = full;
                    if (!freeTau) {
                        jacobian = new double[m][n];
                        for (int j = 0; j < m; j++) {
                            for (int i = 0; i < n; i++) {
                                jacobian[j][i] = full[j][2 * i];
                            }
                        }
                    }
                    return new Pair<>(new ArrayRealVector(residual, false), new Array2DRowRealMatrix(jacobian, false));
                });
        LevenbergMarquardtOptimizer optimizer = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(settings.costRelativeTolerance())
                .withParameterRelativeTolerance(settings.parameterRelativeTolerance())
                .withOrthoTolerance(settings.orthoTolerance());
        LeastSquaresOptimizer.Optimum optimum = optimizer.optimize(builder.build());
        tracker.iterations += optimum.getIterations();
        RealVector p = optimum.getPoint();
        double[] r = new double[n];
        double[] tau = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = Math.exp(p.getEntry(freeTau ? 2 * i : i));
            tau[i] = freeTau ? Math.exp(p.getEntry(2 * i + 1)) : startTau[i];
        }
        double maxAbs = 0;
        for (double v : optimum.getResiduals().toArray()) {
            maxAbs = Math.max(maxAbs, Math.abs(v));
        }
        return new Pass(r, tau, optimum.getRMS(), maxAbs);
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }

    /** Keeps the best point evaluated, so a failure can carry its last useful iterate. */
    private static final class Tracker {
        private final int n;
        private int evaluations;
        private int iterations;
        private double bestRms = Double.POSITIVE_INFINITY;
        private double[] bestR;
        private double[] bestTau;

        Tracker(int n) {
            this.n = n;
        }

        void offer(double[] r, double[] tau, double[] residual) {
            evaluations++;
            double ss = 0;
            for (double v : residual) {
                ss += v * v;
            }
            double rms = Math.sqrt(ss / residual.length);
            if (rms < bestRms) {
                bestRms = rms;
                bestR = r.clone();
                bestTau = tau.clone();
            }
        }

        FosterFitOutcome.Failed failure(FosterFitOutcome.Basis basis, FosterFitOutcome.Reason reason, String detail) {
            Optional<FosterNetwork> last = bestR == null || bestR.length != n ? Optional.empty()
                    : Optional.of(FosterNetwork.of(bestR, bestTau).sortedByTimeConstant());
            return new FosterFitOutcome.Failed(basis, reason, detail, evaluations, last, bestRms);
        }
    }
}
