package org.tjmargin.variation.statistical;

import java.util.List;
import org.tjmargin.derating.Policy;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.PointStatus;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.variation.VariationModel;

/**
 * Yield against ambient: the Monte Carlo probability of passing at each ambient of a sweep, the position's air
 * taken from the sweep's board balance (the air at its worst case). Every ambient uses the same seed, so the
 * same parts are drawn at every temperature (common random numbers): the curve is smooth and, for a response that
 * worsens with temperature, does not rise by sampling noise alone.
 *
 * <p>Stateless and thread-safe.
 */
public final class YieldCurve {

    private YieldCurve() {
    }

    /**
     * The yield at each ambient of {@code sweep}.
     *
     * @param sweep         the board at each ambient (e.g. {@code AnalysisResult.sweep()})
     * @param positionIndex the position's index on the board
     * @param spec          that position (its id must match the sweep's)
     */
    public static List<YieldPoint> of(List<BoardAtAmbient> sweep, int positionIndex, PositionSpec spec, Policy policy,
                                      VariationModel model, MonteCarloSettings settings, SolverSettings solver) {
        return sweep.stream().map(b -> at(b, positionIndex, spec, policy, model, settings, solver, false)).toList();
    }

    /**
     * The yield at one ambient of the sweep, the position's air from the board balance: the steady-state rules, or
     * with {@code withSurges} every rule with each of the position's surges run on every sample.
     */
    static YieldPoint at(BoardAtAmbient b, int positionIndex, PositionSpec spec, Policy policy, VariationModel model,
                         MonteCarloSettings settings, SolverSettings solver, boolean withSurges) {
        var p = b.positions().get(positionIndex);
        if (!p.positionId().equals(spec.id())) {
            throw new IllegalArgumentException("position " + positionIndex + " of the sweep is " + p.positionId()
                    + ", not " + spec.id());
        }
        MonteCarloResult r = MonteCarlo.run(new PointEvaluator(spec, policy, p.tLocalK(), solver, withSurges,
                b.airStatus() == PointStatus.RUNAWAY), model, settings);
        return YieldPoint.of(b.ambientK(), b.airBalanced() ? p.tLocalK() : Double.NaN, r);
    }
}
