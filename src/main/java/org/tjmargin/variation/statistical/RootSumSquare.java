package org.tjmargin.variation.statistical;

import java.util.ArrayList;
import java.util.List;
import org.tjmargin.solve.PointStatus;
import org.tjmargin.variation.AxisValues;
import org.tjmargin.variation.VariationModel;

/**
 * The first-order (root-sum-square) spread of the junction temperature and of the limiting margin
 * (design 2.7): {@code σf² ≈ Σ (∂f/∂xi)²·σi²} for independent inputs (the law of propagation of uncertainty, JCGM
 * 100:2008, <i>Guide to the expression of uncertainty in measurement</i>, §5.1.2, eq. 10, without correlation
 * terms). Each derivative is a central difference {@code (f(x0 + h) − f(x0 − h))/2h} about the nominal, the others
 * nominal; {@code σi} comes from the input's distribution.
 *
 * <p>The margin is the position's limiting margin, the minimum over the rules; where the limiting rule changes
 * within {@code ±h} of the nominal the difference mixes two rules' slopes. The centre is the nominal, not the mean:
 * the spread is a linearisation, blind to the mean shift of an asymmetric range or a curved response.
 *
 * <p>Stateless and thread-safe.
 */
public final class RootSumSquare {

    /**
     * Default step as a fraction of each range's width: 1e-3. The solver holds {@code Tj} to 1e-10 K, so for a range
     * that moves {@code Tj} by ≥ 1 K the rounding of the difference is below 1e-7 of it, while the truncation error,
     * of order {@code h²·f'''/6}, stays below 1e-6 of the slope for any response smooth on the scale of its range.
     */
    public static final double DEFAULT_RELATIVE_STEP = 1e-3;

    private RootSumSquare() {
    }

    /**
     * The spread at the evaluator's position and air.
     *
     * @param relativeStep step as a fraction of each range's width, in (0, 0.5]
     */
    public static RssOutcome of(PointEvaluator ev, VariationModel model, double relativeStep) {
        if (!(relativeStep > 0 && relativeStep <= 0.5)) {
            throw new IllegalArgumentException("relative step must lie in (0, 0.5], got " + relativeStep);
        }
        SampleSpace space = new SampleSpace(ev.spec(), model);
        Evaluation nominal = ev.evaluate(AxisValues.nominal());
        if (nominal.status() != PointStatus.CONVERGED) {
            return new RssOutcome.Unresolved(null, nominal.status());
        }
        List<AxisSensitivity> shares = new ArrayList<>();
        double tjVar = 0;
        double mVar = 0;
        for (SampledAxis a : space.axes()) {
            var r = a.toleranced().range();
            double h = relativeStep * (r.hi() - r.lo());
            Evaluation up = ev.evaluate(AxisValues.nominal().with(a.axis(), r.nominal() + h));
            Evaluation down = ev.evaluate(AxisValues.nominal().with(a.axis(), r.nominal() - h));
            if (up.status() != PointStatus.CONVERGED || down.status() != PointStatus.CONVERGED) {
                return new RssOutcome.Unresolved(a.axis(), up.status().worse(down.status()));
            }
            double dTj = (up.tjK() - down.tjK()) / (2 * h);
            double dM = (up.margin() - down.margin()) / (2 * h);
            double sigma = a.toleranced().standardDeviation();
            shares.add(new AxisSensitivity(a.axis(), sigma, h, dTj, dM, Math.abs(dTj) * sigma,
                    Math.abs(dM) * sigma));
            tjVar += dTj * dTj * sigma * sigma;
            mVar += dM * dM * sigma * sigma;
        }
        return new RssOutcome.Spread(RssOutcome.METHOD, nominal.tjK(), Math.sqrt(tjVar), nominal.margin(),
                Math.sqrt(mVar), nominal.limitingRuleId(), shares);
    }
}
