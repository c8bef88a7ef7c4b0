package org.tjmargin.surge;

import java.util.Arrays;
import java.util.List;

import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterState;
import org.tjmargin.thermal.FosterStep;

/**
 * The coupled electro-thermal transient of a breakdown-diode clamp driven by a {@link SurgeSource}.
 *
 * <p>Model (design §2.6): the clamp follows {@code V = Vbr(Tj) + Rd·I} ({@link ClampLine}); the current is the
 * source's ({@link SurgeSource#clampCurrentA}); the junction temperature is
 * {@code Tj(t) = Tj_start + Σ x_i(t)} with the Foster stages {@code x_i} driven by {@code P = V·I}. Power is
 * taken as linear over each step, for which the Foster stages are integrated exactly ({@link FosterStep}).
 *
 * <p>Grid: the waveform's breakpoints and the ends of its fronts are grid points; every front gets at least
 * {@code pointsPerFront} steps; no step exceeds the waveform's duration over {@code pointsPerFront}. Elsewhere the
 * step adapts: a step is accepted when, at its midpoint, the power and the current differ from their chords by
 * at most {@code relativeTolerance} of the step's largest value, or of 1e-4 of the peak where the values are
 * smaller (the peak is estimated before stepping from the source at every grid point, at the start temperature,
 * and updated as the solve runs). The chord error of a smooth function is {@code h²·f''/8}, so the next step is scaled by
 * {@code 0.9/√(error/tolerance)}, at most {@code maxStepGrowth} (common practice in step-size control, e.g.
 * Hairer, Nørsett and Wanner, <i>Solving Ordinary Differential Equations I</i>, §II.4, adapted here to a
 * second-order interpolation error; no single source). Where the source jumps (at a breakpoint) the step before it
 * ends on the left limit and the next starts on the right one.
 *
 * <p>Coupling: within a step, {@code Tj_end = Tj_start + A + B·P(Tj_end)} where {@code A} holds the decay and the
 * start power and {@code B = Σ R_i(1 − g_i)} is small for a short step; it is solved by fixed-point iteration
 * from the previous temperature. If the iteration contracts by less than half per iteration or exceeds its
 * budget, the step is halved (the loop gain {@code B·dP/dTj} falls with the step).
 *
 * <p>Stateless and thread-safe: each call works on its own state.
 */
public final class ClampTransient {

    /**
     * Junction temperature (K) above which a surge is stopped as thermal runaway within the pulse. Deliberately far
     * above destruction (a diode is gone well below 1000 °C; the surge rules fail such pulses from their peak Tj):
     * the cap only ends integrations that would otherwise chase an unbounded rise to overflow, while closed-form
     * checks of linear models with large but bounded rises still complete. 1e5 K, a modelling choice.
     */
    public static final double RUNAWAY_CAP_K = 1e5;


    /**
     * Below this fraction of the peak, values are error-controlled absolutely (to the tolerance times this
     * fraction of the peak) rather than relative to themselves: a power law from zero ({@code t³} of the 8/20
     * current) or the kink where conduction starts has a chord error that is a fixed fraction of the local value
     * however short the step, so a purely relative control could never accept it.
     */
    private static final double ABSOLUTE_FLOOR_FRACTION_OF_PEAK = 1e-4;
    /** The smallest step, as a fraction of the waveform's duration: far below any physical time scale. */
    private static final double MIN_STEP_FRACTION = 1e-12;
    /** A step this close (relative) to the next grid point lands on it rather than leave a sliver. */
    private static final double LANDING_TOLERANCE = 1e-9;
    /** The fixed point must shrink its correction at least this much per iteration, else the step is halved. */
    private static final double CONTRACTION_LIMIT = 0.5;
    /** Safety factor of the step-size update. */
    private static final double SAFETY = 0.9;
    /** The strongest cut of a rejected step. */
    private static final double MAX_SHRINK = 0.1;

    private ClampTransient() {
    }

    /** The transient from a network at rest at {@code startTjK}. */
    public static ClampTransientOutcome solve(SurgeSource source, ClampLine clamp, FosterNetwork network, double startTjK,
            TransientSettings settings) {
        return solve(source, clamp, network, startTjK, network.rest(), settings);
    }

    /**
     * @param source    what drives the clamp
     * @param clamp     the clamp's high-current line
     * @param network   the junction's transient thermal impedance
     * @param startTjK  the steady-state junction temperature the surge starts from (K)
     * @param startRise the network's stage rises above {@code startTjK} at {@code t = 0} (e.g. from earlier pulses)
     * @param settings  grid, budget and tolerances
     * @return the completed transient or the typed stop with its partial result
     */
    public static ClampTransientOutcome solve(SurgeSource source, ClampLine clamp, FosterNetwork network, double startTjK,
            FosterState startRise, TransientSettings settings) {
        if (!(startTjK > 0) || !Double.isFinite(startTjK)) {
            throw new IllegalArgumentException("start junction temperature must be positive and finite: " + startTjK + " K");
        }
        if (startRise.stages() != network.stageCount()) {
            throw new IllegalArgumentException("start state has " + startRise.stages() + " stages, network has " + network.stageCount());
        }
        double rd = clamp.dynamicResistanceOhm();
        if (!(rd >= 0) || !Double.isFinite(rd)) {
            throw new IllegalArgumentException("clamp dynamic resistance must be finite and not negative: " + rd + " Ω");
        }
        if (source instanceof TheveninSource th && th.resistanceOhm() + rd <= 0) {
            throw new IllegalArgumentException("a Thevenin source of 0 Ω needs a clamp with a dynamic resistance above 0 Ω");
        }
        double duration = source.waveform().durationS();
        if (!(duration > 0) || !Double.isFinite(duration)) {
            throw new IllegalArgumentException("waveform duration must be positive and finite: " + duration + " s");
        }
        return new Run(source, clamp, network, startTjK, startRise, settings, duration).run();
    }

    /** The state of one solve. Not shared. */
    private static final class Run {
        private final SurgeSource source;
        private final Waveform waveform;
        private final ClampLine clamp;
        private final FosterNetwork network;
        private final double rd;
        private final double startTjK;
        private final TransientSettings settings;
        private final double duration;
        private final double[] x;
        /** The time history, or null where the settings do not keep it. */
        private final SeriesBuilder series;

        private double opI;
        private double opV;
        private double opP;

        private double energy;
        private double charge;
        private double action;
        private int steps;
        private double peakI;
        private double peakV = Double.NEGATIVE_INFINITY;
        private double peakP;
        /** The largest power recorded, from 0 (the absolute value above serves the error control). */
        private double maxP;
        /** Peaks estimated before stepping, for the error control's absolute floor. */
        private double referenceI;
        private double referenceP;
        private double peakTj = Double.NEGATIVE_INFINITY;
        private double peakTjTime;

        private FosterStep cachedStep;

        Run(SurgeSource source, ClampLine clamp, FosterNetwork network, double startTjK, FosterState startRise,
                TransientSettings settings, double duration) {
            this.source = source;
            this.waveform = source.waveform();
            this.clamp = clamp;
            this.network = network;
            this.rd = clamp.dynamicResistanceOhm();
            this.startTjK = startTjK;
            this.settings = settings;
            this.duration = duration;
            this.x = startRise.stageRiseK();
            this.series = settings.keepsSeries() ? new SeriesBuilder() : null;
        }

        private void operate(double sourceValue, double tjK) {
            double vbr = clamp.breakdownVoltageV(tjK);
            double i = source.clampCurrentA(sourceValue, vbr, rd);
            opI = i;
            opV = i > 0 ? vbr + rd * i : source.idleClampVoltageV(sourceValue);
            opP = i > 0 ? opV * i : 0;
        }

        private FosterStep stepFor(double h) {
            if (cachedStep == null) {
                cachedStep = FosterStep.reusable(network, h);
            } else if (h != cachedStep.lengthS()) {
                // Recomputed in place: the step changes at almost every step, and a new one each time was most of
                // the transient's garbage.
                cachedStep.relength(h);
            }
            return cachedStep;
        }

        private void record(double t, double i, double v, double p, double tj) {
            if (series != null) {
                series.add(t, i, v, p, tj);
            }
            peakI = Math.max(peakI, i);
            peakV = Math.max(peakV, v);
            peakP = Math.max(peakP, Math.abs(p));
            maxP = Math.max(maxP, p);
            if (tj > peakTj) {
                peakTj = tj;
                peakTjTime = t;
            }
        }

        ClampTransientOutcome run() {
            double[] grid = grid();
            double[] caps = frontCaps(grid);
            int n = settings.pointsPerFront();
            double hMin = MIN_STEP_FRACTION * duration;
            double tol = settings.relativeTolerance();

            double tj = startTjK + sum(x);
            for (double g : grid) {
                for (double tg : new double[] {g, Math.max(0, Math.nextDown(g))}) {
                    operate(waveform.valueAt(tg), tj);
                    referenceI = Math.max(referenceI, opI);
                    referenceP = Math.max(referenceP, Math.abs(opP));
                }
            }
            double t = 0;
            operate(waveform.valueAt(0), tj);
            double i0 = opI;
            double v0 = opV;
            double p0 = opP;
            record(0, i0, v0, p0, tj);
            double h = Math.min(caps[0], (grid[1] - grid[0]) / n);

            for (int s = 0; s + 1 < grid.length; s++) {
                double a = grid[s];
                double b = grid[s + 1];
                double cap = caps[s];
                if (s > 0) {
                    operate(waveform.valueAt(a), tj);
                    if (opI != i0 || opV != v0 || opP != p0) {
                        i0 = opI;
                        v0 = opV;
                        p0 = opP;
                        record(a, i0, v0, p0, tj);
                    }
                }
                h = Math.min(h, cap);
                while (t < b) {
                    double remaining = b - t;
                    boolean land = h >= remaining * (1 - LANDING_TOLERANCE);
                    double hh = land ? remaining : h;
                    double tEnd = land ? b : t + hh;
                    double tEval = land ? Math.max(t, Math.nextDown(b)) : tEnd;
                    double value1 = waveform.valueAt(tEval);
                    FosterStep step = stepFor(hh);
                    double freeRise = step.riseWithoutEndPowerK(x, p0);
                    double gain = step.endPowerGainKPerW();

                    double tjIt = tj;
                    double delta = Double.POSITIVE_INFINITY;
                    double previousDelta = Double.POSITIVE_INFINITY;
                    boolean converged = false;
                    for (int it = 1; it <= settings.maxCouplingIterations(); it++) {
                        operate(value1, tjIt);
                        double next = startTjK + freeRise + gain * opP;
                        delta = Math.abs(next - tjIt);
                        tjIt = next;
                        if (delta <= settings.couplingToleranceK()) {
                            converged = true;
                            break;
                        }
                        if (it >= 3 && delta > CONTRACTION_LIMIT * previousDelta) {
                            break;
                        }
                        previousDelta = delta;
                    }
                    if (!converged) {
                        if (hh <= hMin) {
                            return stopped(ClampTransientOutcome.Reason.COUPLING_NOT_CONVERGED, t, hh, tjIt, delta);
                        }
                        h = 0.5 * hh;
                        continue;
                    }
                    operate(value1, tjIt);
                    double i1 = opI;
                    double v1 = opV;
                    double p1 = opP;

                    operate(waveform.valueAt(t + 0.5 * hh), 0.5 * (tj + tjIt));
                    double err = Math.max(chordError(opP, p0, p1, Math.max(peakP, referenceP)),
                            chordError(opI, i0, i1, Math.max(peakI, referenceI))) / tol;
                    if (err > 1) {
                        if (hh <= hMin) {
                            return stopped(ClampTransientOutcome.Reason.STEP_TOO_SMALL, t, hh, tjIt, 0);
                        }
                        h = hh * Math.max(MAX_SHRINK, SAFETY / Math.sqrt(err));
                        continue;
                    }

                    step.advanceInPlace(x, p0, p1);
                    energy += 0.5 * (p0 + p1) * hh;
                    charge += 0.5 * (i0 + i1) * hh;
                    action += 0.5 * (i0 * i0 + i1 * i1) * hh;
                    t = tEnd;
                    tj = tjIt;
                    i0 = i1;
                    v0 = v1;
                    p0 = p1;
                    record(t, i1, v1, p1, tj);
                    steps++;
                    if (tj > RUNAWAY_CAP_K) {
                        // The junction heats without bound during the pulse: the part is destroyed long before.
                        return stopped(ClampTransientOutcome.Reason.JUNCTION_RUNAWAY, t, hh, tj, 0);
                    }
                    if (steps >= settings.maxSteps() && t < duration) {
                        return stopped(ClampTransientOutcome.Reason.STEP_BUDGET_EXHAUSTED, t, hh, tj, 0);
                    }
                    if (!land) {
                        double factor = err > 0 ? Math.min(settings.maxStepGrowth(), SAFETY / Math.sqrt(err))
                                : settings.maxStepGrowth();
                        h = Math.min(cap, hh * factor);
                    }
                }
            }
            return new ClampTransientOutcome.Completed(result(t));
        }

        private ClampTransientOutcome stopped(ClampTransientOutcome.Reason reason, double t, double h, double tj, double residual) {
            return new ClampTransientOutcome.Stopped(reason, result(t), t, h, tj, residual);
        }

        private ClampTransientResult result(double endTime) {
            return new ClampTransientResult(series != null ? series.build() : TransientSeries.empty(), startTjK, peakI,
                    peakV, maxP, peakTj, peakTjTime, energy, charge, action, steps, endTime, new FosterState(x));
        }

        private double chordError(double mid, double a, double b, double peak) {
            double scale = Math.max(Math.max(Math.abs(a), Math.abs(b)), Math.max(Math.abs(mid), ABSOLUTE_FLOOR_FRACTION_OF_PEAK * peak));
            return scale > 0 ? Math.abs(mid - 0.5 * (a + b)) / scale : 0;
        }

        private double[] grid() {
            List<Front> fronts = waveform.fronts();
            double[] bp = waveform.breakpointsS();
            double[] all = new double[bp.length + 2 * fronts.size() + 2];
            int k = 0;
            for (double v : bp) {
                all[k++] = v;
            }
            for (Front f : fronts) {
                all[k++] = f.startS();
                all[k++] = f.endS();
            }
            all[k++] = 0;
            all[k] = duration;
            return Arrays.stream(all).filter(v -> v >= 0 && v <= duration).sorted().distinct().toArray();
        }

        private double[] frontCaps(double[] grid) {
            int n = settings.pointsPerFront();
            double[] caps = new double[grid.length - 1];
            Arrays.fill(caps, duration / n);
            for (Front f : waveform.fronts()) {
                double cap = f.lengthS() / n;
                for (int s = 0; s < caps.length; s++) {
                    if (grid[s] >= f.startS() && grid[s + 1] <= f.endS()) {
                        caps[s] = Math.min(caps[s], cap);
                    }
                }
            }
            return caps;
        }

        private static double sum(double[] v) {
            double s = 0;
            for (double d : v) {
                s += d;
            }
            return s;
        }
    }

    /** Growable columns of the time history. */
    private static final class SeriesBuilder {
        private double[] t = new double[256];
        private double[] i = new double[256];
        private double[] v = new double[256];
        private double[] p = new double[256];
        private double[] tj = new double[256];
        private int size;

        void add(double time, double current, double voltage, double power, double temperature) {
            if (size == t.length) {
                int cap = 2 * size;
                t = Arrays.copyOf(t, cap);
                i = Arrays.copyOf(i, cap);
                v = Arrays.copyOf(v, cap);
                p = Arrays.copyOf(p, cap);
                tj = Arrays.copyOf(tj, cap);
            }
            t[size] = time;
            i[size] = current;
            v[size] = voltage;
            p[size] = power;
            tj[size] = temperature;
            size++;
        }

        TransientSeries build() {
            return new TransientSeries(Arrays.copyOf(t, size), Arrays.copyOf(i, size), Arrays.copyOf(v, size),
                    Arrays.copyOf(p, size), Arrays.copyOf(tj, size));
        }
    }
}
