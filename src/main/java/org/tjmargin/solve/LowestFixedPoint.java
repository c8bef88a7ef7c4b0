package org.tjmargin.solve;

import java.util.function.DoubleUnaryOperator;

/**
 * The lowest fixed point {@code x* = F(x*)} at or above a start {@code x0} with {@code F(x0) ≥ x0}: the state a
 * heated body reaches when it warms from the start, e.g. {@code F(Tj) = T_local + Rθ·P(Tj)} (design 2.3).
 *
 * <p>Method. With {@code g(x) = x − F(x)}, {@code g(x0) ≤ 0}. Secant steps are taken upward from points with
 * {@code g < 0}, the first step being the plain fixed-point step {@code x1 = F(x0)}. Two facts make the search
 * safe for the usual shapes of {@code P(Tj)}:
 * <ul>
 *   <li>If {@code P} is convex in {@code Tj} (leakage growing exponentially), {@code g} is concave, and a chord
 *   through two points left of the lowest root crosses zero at or before that root (a concave function lies below
 *   its chords' extensions). The steps then climb monotonically onto the lowest root and never jump past a pair of
 *   roots to a higher one.</li>
 *   <li>If a step lands where {@code g ≥ 0}, the lowest root is bracketed and the Pegasus method finishes it
 *   (M. Dowell and P. Jarratt, "The 'Pegasus' method for computing the root of an equation", BIT 12 (1972)
 *   503–508): a bracketing secant method that keeps the bracket, converges superlinearly, and stops on the
 *   residual, which is what the heat balance is held to. Brent's method, which stops only when the bracket itself
 *   has shrunk to the tolerance, spent about twice the evaluations here. The iteration is the one of the Commons
 *   Math {@code PegasusSolver} (3.6.1, {@code BaseSecantSolver.doSolve}, any side), step for step, but it starts
 *   from the values of {@code g} at the bracket's ends that the search already has: the library evaluates both
 *   ends twice more (once to verify the bracket) and the returned root once more, five evaluations of the
 *   circuit per bracketed solve that change nothing. {@code LowestFixedPointTest} holds the two equal.</li>
 * </ul>
 * Every step is capped at {@link SolverSettings#maxStepK()}, because when {@code P} first falls and later rises
 * with temperature (a regulator whose clamp-like leakage takes over when hot) one long step could land beyond a
 * pair of roots. If {@code g} stops increasing while still negative (loop gain at or above 1), the steps expand
 * geometrically (within the cap on each step) up to the search cap; no sign change below the cap means no fixed point there: runaway. Every search has an evaluation budget
 * and ends with a typed outcome.
 *
 * <p>Stateless and thread-safe.
 */
public final class LowestFixedPoint {

    /** Step for the central-difference loop gain (same unit as x): small against any thermal scale, large against
     * the 1e-10 tolerance, so the difference quotient keeps about six significant digits. */
    private static final double GAIN_STEP = 1e-4;

    /** Largest residual accepted from a bracketed solve (same unit as x): anything larger means a jump of F. */
    static final double ACCEPTED_RESIDUAL = 1e-6;

    private LowestFixedPoint() {
    }

    /**
     * Finds the lowest fixed point of {@code map} in {@code [x0, cap]}.
     *
     * @param map      the map {@code F}
     * @param x0       start, with {@code F(x0) ≥ x0} expected
     * @param settings cap, tolerance, budget
     * @return the outcome; a root returned is always the last point evaluated (callers keep that evaluation's
     *         state instead of evaluating the root again), its loop gain, where wanted, is {@link #loopGain}
     */
    public static FixedPointOutcome find(DoubleUnaryOperator map, double x0, SolverSettings settings) {
        final double cap = settings.capK();
        final double tol = settings.toleranceK();
        final int budget = settings.maxEvaluations();
        int evals = 0;

        double xa = x0;
        double ga = xa - heat(map, xa);
        evals++;
        if (ga >= -tol) {
            return new FixedPointOutcome.Root(xa, ga, evals);
        }
        final double maxStep = settings.maxStepK();
        double xb = Math.min(xa + Math.min(-ga, maxStep), cap);
        double lastSlope = Double.NaN;
        double gb = xb - heat(map, xb);
        evals++;
        while (evals < budget) {
            if (Math.abs(gb) <= tol) {
                return new FixedPointOutcome.Root(xb, gb, evals);
            }
            if (gb > 0) {
                return pegasus(map, xa, ga, xb, gb, evals, settings);
            }
            if (xb >= cap) {
                return new FixedPointOutcome.Runaway(xb, evals);
            }
            double slope = (gb - ga) / (xb - xa);
            // Where two successive chords agree in slope within 10 %, g is nearly linear over the last steps and
            // a longer step (up to four caps) is safe; otherwise one cap.
            double reach = Math.abs(slope - lastSlope) <= 0.1 * Math.abs(slope) ? 4 * maxStep : maxStep;
            lastSlope = slope;
            double next;
            if (slope > 0) {
                next = xb - gb / slope;
                // Secant steps approach from below; keep them from stalling on rounding.
                next = Math.max(next, xb + tol);
            } else {
                next = Math.max(xb - gb, xb + 2.0 * (xb - xa));
            }
            xa = xb;
            ga = gb;
            xb = Math.min(Math.min(next, xb + reach), cap);
            gb = xb - heat(map, xb);
            evals++;
        }
        return new FixedPointOutcome.Exhausted(xb, gb, evals);
    }

    /** {@code F(x)}, with an overflowing or undefined value read as unbounded heating (+∞), never NaN. */
    private static double heat(DoubleUnaryOperator map, double x) {
        double f = map.applyAsDouble(x);
        return f < Double.POSITIVE_INFINITY ? f : Double.POSITIVE_INFINITY;
    }

    /**
     * The Pegasus iteration on the bracket {@code [lo, hi]} of {@code g(x) = x − F(x)}, with {@code g(lo) < 0 < g(hi)}
     * already known. Stops when {@code |g|} is at most a tenth of the tolerance (the residual the balance is held
     * to) or the bracket has shrunk to 1 % of it or to a relative 1e-15 (a few ulps at 300 K-scale values),
     * whichever comes first; the root returned is always the last point evaluated.
     */
    static FixedPointOutcome pegasus(DoubleUnaryOperator map, double lo, double gLo, double hi, double gHi,
                                     int evalsSoFar, SolverSettings settings) {
        final double residualTol = 0.1 * settings.toleranceK();
        final double absoluteTol = 0.01 * settings.toleranceK();
        final double relativeTol = 1e-15;
        double x0 = lo;
        double g0 = gLo;
        double x1 = hi;
        double g1 = gHi;
        int evals = evalsSoFar;
        while (evals < settings.maxEvaluations()) {
            double x = x1 - g1 * (x1 - x0) / (g1 - g0);
            double g = x - map.applyAsDouble(x);
            evals++;
            if (g == 0.0) {
                return accepted(x, g, evals);
            }
            if (g1 * g < 0) {
                x0 = x1;
                g0 = g1;
            } else {
                // Pegasus: scale the retained end's value so that the next secant moves it (Dowell and Jarratt).
                g0 *= g1 / (g1 + g);
            }
            x1 = x;
            g1 = g;
            if (Math.abs(g1) <= residualTol || Math.abs(x1 - x0) < Math.max(relativeTol * Math.abs(x1), absoluteTol)) {
                return accepted(x1, g1, evals);
            }
        }
        return new FixedPointOutcome.Exhausted(x1, g1, evals);
    }

    private static FixedPointOutcome accepted(double x, double g, int evals) {
        if (!(Math.abs(g) <= ACCEPTED_RESIDUAL)) {
            // A sign change without a zero: F jumps across the diagonal. No operating point to stand behind.
            return new FixedPointOutcome.Exhausted(x, g, evals);
        }
        return new FixedPointOutcome.Root(x, g, evals);
    }

    /**
     * The loop gain {@code dF/dx} at {@code x}, a central difference over ±{@value #GAIN_STEP}: two evaluations of
     * {@code map}, the only place it is computed (ElectroThermalSolver asks for it at the roots it reports).
     */
    static double loopGain(DoubleUnaryOperator map, double x) {
        return (map.applyAsDouble(x + GAIN_STEP) - map.applyAsDouble(x - GAIN_STEP)) / (2 * GAIN_STEP);
    }
}
