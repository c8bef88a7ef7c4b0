package org.tjmargin.thermal;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

/**
 * A rating pulse of unit peak power, with its exact per-stage response through a Foster network. Datasheet
 * peak-pulse-power curves state their pulse as one of these shapes (reference 4.3: {@code td} is the time for
 * the current to decay to 50 %; reference 4.5 for rectangular and half-sine surge ratings).
 *
 * <ul>
 *   <li>{@link Shape#RECTANGULAR}: {@code p(t) = 1} for {@code 0 ≤ t < width}; every stage peaks at the end of
 *       the pulse, so the peak rise is {@code Zth(width)}.</li>
 *   <li>{@link Shape#EXPONENTIAL_DECAY}: {@code p(t) = e^(−t/τp)}, {@code τp = width/ln 2}, {@code width} the time
 *       to 50 % (an instantaneous front: the 10 µs front of a 10/1000 pulse is neglected, common practice for
 *       rating curves). A stage {@code (R, τ)} responds with
 *       {@code x(t) = R·τp/(τp − τ)·(e^(−t/τp) − e^(−t/τ))}, computed as
 *       {@code R·(t/τ)·e^(−t/max(τ,τp))·φ(|1/τ − 1/τp|·t)} with {@code φ(w) = (1 − e^(−w))/w}, which is exact, has
 *       the limit {@code R·(t/τ)·e^(−t/τ)} at {@code τ = τp}, and cannot overflow (derived). The stage peaks at
 *       {@code t* = τ·ρ·ln ρ/(ρ − 1)}, {@code ρ = τp/τ}; the sum peaks between the smallest and largest stage peak
 *       time, where the search brackets it.</li>
 * </ul>
 *
 * @param shape  the pulse shape
 * @param widthS rectangular width, or time to 50 % of an exponential decay (s), positive and finite
 */
public record FosterPulse(Shape shape, double widthS) {

    /** Rating pulse shapes. */
    public enum Shape {
        /** constant power for the width */
        RECTANGULAR,
        /** exponential decay from the peak, the width being the time to 50 % */
        EXPONENTIAL_DECAY
    }

    /** Below this argument {@code φ(w) = (1 − e^(−w))/w} is taken as {@code 1 − w/2} (error below w²/6 < 2e-17). */
    private static final double PHI_SERIES_LIMIT = 1e-8;
    /** Step in {@code ln τ} of the central difference for {@code ∂x/∂ln τ}: truncation and rounding both near 1e-11. */
    private static final double LOG_TAU_STEP = 1e-5;

    public FosterPulse {
        if (shape == null) {
            throw new IllegalArgumentException("rating pulse needs a shape");
        }
        if (!(widthS > 0) || !Double.isFinite(widthS)) {
            throw new IllegalArgumentException("rating pulse width must be positive and finite: widthS = " + widthS);
        }
    }

    /** @return a rectangular pulse of the given width (s) */
    public static FosterPulse rectangular(double widthS) {
        return new FosterPulse(Shape.RECTANGULAR, widthS);
    }

    /** @return an exponentially decaying pulse with the given time to 50 % (s) */
    public static FosterPulse exponentialDecay(double timeToHalfS) {
        return new FosterPulse(Shape.EXPONENTIAL_DECAY, timeToHalfS);
    }

    /** @return the decay time constant {@code τp = width/ln 2} of an exponential pulse (s); for a rectangle, its width (so that both give the energy per watt) */
    public double decayTimeConstantS() {
        return shape == Shape.EXPONENTIAL_DECAY ? widthS / Math.log(2) : widthS;
    }

    /** @return the power at time {@code tS} per watt of peak power (dimensionless) */
    public double powerPerPeakAt(double tS) {
        if (tS < 0) {
            return 0;
        }
        return switch (shape) {
            case RECTANGULAR -> tS < widthS ? 1 : 0;
            case EXPONENTIAL_DECAY -> Math.exp(-tS / decayTimeConstantS());
        };
    }

    /** @return the energy per watt of peak power (J/W): the width, or {@code τp} for the exponential */
    public double energyPerPeakPowerJPerW() {
        return decayTimeConstantS();
    }

    /**
     * @param tS     time since the start of the pulse (s)
     * @param rKPerW stage resistance (K/W)
     * @param tauS   stage time constant (s)
     * @return the stage's rise per watt of peak power (K/W)
     */
    public double stageRiseKPerW(double tS, double rKPerW, double tauS) {
        if (tS <= 0) {
            return 0;
        }
        if (shape == Shape.RECTANGULAR) {
            if (tS <= widthS) {
                return -rKPerW * Math.expm1(-tS / tauS);
            }
            return -rKPerW * Math.expm1(-widthS / tauS) * Math.exp(-(tS - widthS) / tauS);
        }
        double tauP = decayTimeConstantS();
        double w = Math.abs(1 / tauS - 1 / tauP) * tS;
        double phi = w < PHI_SERIES_LIMIT ? 1 - 0.5 * w : -Math.expm1(-w) / w;
        return rKPerW * (tS / tauS) * Math.exp(-tS / Math.max(tauS, tauP)) * phi;
    }

    /**
     * @return {@code ∂x/∂ln τ} of {@link #stageRiseKPerW} at fixed time (K/W): closed form for the rectangle,
     *         central difference in {@code ln τ} for the exponential
     */
    public double stageRiseLogTauDerivativeKPerW(double tS, double rKPerW, double tauS) {
        if (tS <= 0) {
            return 0;
        }
        if (shape == Shape.RECTANGULAR) {
            double tOn = Math.min(tS, widthS);
            double on = -Math.expm1(-tOn / tauS);
            double dOn = -(tOn / tauS) * Math.exp(-tOn / tauS);
            if (tS <= widthS) {
                return rKPerW * dOn;
            }
            double off = Math.exp(-(tS - widthS) / tauS);
            double dOff = off * (tS - widthS) / tauS;
            return rKPerW * (dOn * off + on * dOff);
        }
        double up = stageRiseKPerW(tS, rKPerW, tauS * Math.exp(LOG_TAU_STEP));
        double down = stageRiseKPerW(tS, rKPerW, tauS * Math.exp(-LOG_TAU_STEP));
        return (up - down) / (2 * LOG_TAU_STEP);
    }

    /** @return the time (s) at which a single stage of time constant {@code tauS} peaks */
    public double stagePeakTimeS(double tauS) {
        if (shape == Shape.RECTANGULAR) {
            return widthS;
        }
        double rho = decayTimeConstantS() / tauS;
        double d = rho - 1;
        // ln(ρ)/(ρ − 1) → 1 as ρ → 1; log1p keeps it exact nearby
        double ratio = Math.abs(d) < 1e-12 ? 1 : Math.log1p(d) / d;
        return tauS * rho * ratio;
    }

    /** @return the junction rise at {@code tS} per watt of peak power through the network (K/W) */
    public double riseKPerW(FosterNetwork network, double tS) {
        double sum = 0;
        for (FosterStage s : network.stages()) {
            sum += stageRiseKPerW(tS, s.rKPerW(), s.tauS());
        }
        return sum;
    }

    /**
     * The peak junction rise per watt of peak power and its time: exact for the rectangle; for the exponential, a
     * bracketed search between the earliest and latest stage peak times (see class comment): the derivative
     * {@code Σ (R_i·p(t) − x_i(t))/τ_i} is sampled across the bracket and each change of sign from positive to
     * negative is solved with Brent's method.
     *
     * @param network the network
     * @param search  budget and tolerances
     * @return the peak, {@code riseK} being in K per W of peak power
     */
    public FosterPeak peakRiseKPerW(FosterNetwork network, FosterPeakSearch search) {
        if (shape == Shape.RECTANGULAR) {
            return new FosterPeak(riseKPerW(network, widthS), widthS, 1, true);
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (FosterStage s : network.stages()) {
            double t = stagePeakTimeS(s.tauS());
            lo = Math.min(lo, t);
            hi = Math.max(hi, t);
        }
        if (hi <= lo * (1 + search.relativeTimeTolerance())) {
            return new FosterPeak(riseKPerW(network, lo), lo, 1, true);
        }
        int samples = search.derivativeSamples();
        double ratio = Math.pow(hi / lo, 1.0 / (samples - 1));
        double bestRise = riseKPerW(network, lo);
        double bestTime = lo;
        int evaluations = 1;
        boolean converged = true;
        double tPrev = lo;
        double dPrev = riseDerivative(network, lo);
        for (int k = 1; k < samples; k++) {
            double t = k == samples - 1 ? hi : lo * Math.pow(ratio, k);
            double d = riseDerivative(network, t);
            evaluations++;
            if (dPrev > 0 && d <= 0) {
                BrentSolver solver = new BrentSolver(search.relativeTimeTolerance() * (t - tPrev));
                double root;
                try {
                    root = solver.solve(search.maxEvaluationsPerRoot(), x -> riseDerivative(network, x), tPrev, t);
                } catch (TooManyEvaluationsException e) {
                    converged = false;
                    root = d == 0 ? t : tPrev;
                }
                evaluations += solver.getEvaluations();
                double rise = riseKPerW(network, root);
                if (rise > bestRise) {
                    bestRise = rise;
                    bestTime = root;
                }
            }
            tPrev = t;
            dPrev = d;
        }
        double endRise = riseKPerW(network, hi);
        if (endRise > bestRise) {
            bestRise = endRise;
            bestTime = hi;
        }
        return new FosterPeak(bestRise, bestTime, evaluations, converged);
    }

    private double riseDerivative(FosterNetwork network, double tS) {
        double p = powerPerPeakAt(tS);
        double d = 0;
        for (FosterStage s : network.stages()) {
            d += (s.rKPerW() * p - stageRiseKPerW(tS, s.rKPerW(), s.tauS())) / s.tauS();
        }
        return d;
    }
}
