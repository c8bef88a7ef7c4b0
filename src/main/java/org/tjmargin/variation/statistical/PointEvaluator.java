package org.tjmargin.variation.statistical;

import java.util.List;
import java.util.Optional;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.RuleCheck;
import org.tjmargin.derating.RuleContext;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PointStatus;
import org.tjmargin.solve.PositionInstance;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.solve.ThermalOutcome;
import org.tjmargin.surge.SurgeResult;
import org.tjmargin.variation.AxisValues;

/**
 * Solves one position at any point of its input space in fixed local air and holds it against a policy: the one
 * function that Monte Carlo, the root-sum-square spread and the tornado all evaluate. The closed form of
 * {@link LinearFastPath} is used where its assumptions hold, the general solver elsewhere.
 *
 * @param spec     the position
 * @param policy   the rules (at most 63, for the violation bit mask)
 * @param tLocalK  local air temperature (K), e.g. the position's air at the worst-case board balance
 * @param settings the junction solve's budgets and tolerances
 * @param withSurges true to run the position's surges (if it has any) at every converged point, so that the surge
 *                 rules join the steady-state ones; each surge is a coupled transient (≈ 1 ms), so a run with
 *                 surges costs far more per sample than one without
 * @param airRunsAway true where the air has no balance ({@code tLocalK} is where its search stopped): the air heats
 *                 without bound and every junction with it, so every point is a runaway, as in the corner analysis
 *                 ({@code BoardSolver.inAir})
 */
public record PointEvaluator(PositionSpec spec, Policy policy, double tLocalK, SolverSettings settings,
                             boolean withSurges, boolean airRunsAway) {

    /** An evaluator of the steady-state rules only (surges not run). */
    public PointEvaluator(PositionSpec spec, Policy policy, double tLocalK, SolverSettings settings) {
        this(spec, policy, tLocalK, settings, false);
    }

    /** An evaluator in balanced air. */
    public PointEvaluator(PositionSpec spec, Policy policy, double tLocalK, SolverSettings settings,
                          boolean withSurges) {
        this(spec, policy, tLocalK, settings, withSurges, false);
    }

    /** True when this evaluator runs surges: asked for and the position has some. */
    public boolean runsSurges() {
        return withSurges && spec.surges().isPresent();
    }

    public PointEvaluator {
        if (spec == null || policy == null || settings == null) {
            throw new IllegalArgumentException("a point evaluator needs a position, a policy and solver settings");
        }
        if (!(tLocalK > 0) || !Double.isFinite(tLocalK)) {
            throw new IllegalArgumentException("local air temperature must be > 0 K and finite, got " + tLocalK);
        }
        if (policy.rules().size() > 63) {
            throw new IllegalArgumentException("at most 63 rules per policy, got " + policy.rules().size());
        }
    }

    /** The point at {@code values}. */
    public Evaluation evaluate(AxisValues values) {
        PositionInstance inst = spec.atValues(values);
        Optional<OperatingPoint> fast = airRunsAway ? Optional.empty() : LinearFastPath.solve(inst, tLocalK, settings);
        ThermalOutcome out = airRunsAway ? new ThermalOutcome.Runaway(tLocalK, settings.capK())
                : fast.<ThermalOutcome>map(ThermalOutcome.Converged::new)
                        .orElseGet(() -> inst.solve(tLocalK, settings));
        boolean surgeStopped = false;
        RuleContext ctx;
        if (runsSurges() && out instanceof ThermalOutcome.Converged c) {
            List<SurgeResult> surges = spec.surgesAt(inst, c.point());
            // As in the corner analysis: a numerically stopped transient leaves the sample unresolved.
            surgeStopped = SurgeResult.anyStoppedNumerically(surges);
            ctx = spec.ruleContext(inst, c.point(), tLocalK, surges);
        } else {
            ctx = spec.ruleContext(inst, out, tLocalK);
        }
        List<RuleCheck> checks = policy.check(ctx);
        double margin = 1.0;
        String limiting = "none";
        long violated = 0;
        for (RuleCheck rc : checks) {
            if (rc.margin() < margin || "none".equals(limiting)) {
                margin = rc.margin();
                limiting = rc.ruleId();
            }
            if (!rc.holds()) {
                violated |= 1L << indexOf(rc.ruleId());
            }
        }
        PointStatus status;
        double tj;
        if (out instanceof ThermalOutcome.Converged c) {
            status = surgeStopped ? PointStatus.NOT_CONVERGED : PointStatus.CONVERGED;
            tj = c.point().tjK();
        } else if (out instanceof ThermalOutcome.Runaway r) {
            status = PointStatus.RUNAWAY;
            tj = r.capK();
        } else {
            status = PointStatus.NOT_CONVERGED;
            tj = ((ThermalOutcome.NotConverged) out).lastTjK();
        }
        return new Evaluation(status, tj, margin, limiting, violated, fast.isPresent());
    }

    private int indexOf(String ruleId) {
        List<org.tjmargin.derating.Rule> rules = policy.rules();
        for (int i = 0; i < rules.size(); i++) {
            if (rules.get(i).id().equals(ruleId)) {
                return i;
            }
        }
        throw new IllegalStateException("rule " + ruleId + " is not in policy " + policy.name());
    }
}
