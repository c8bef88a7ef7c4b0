package org.tjmargin.solve;

import java.util.ArrayList;
import java.util.List;

import org.tjmargin.surge.LinearClampLine;
import org.tjmargin.surge.PositionSurges;
import org.tjmargin.surge.SurgeCase;
import org.tjmargin.surge.SurgeEvaluation;
import org.tjmargin.surge.SurgeResult;
import org.tjmargin.surge.TransientSettings;
import org.tjmargin.thermal.FosterPeakSearch;

/**
 * A position's surges at one converged corner (design 2.6, items 5 and 6 of the surge work): each starts from that
 * corner's steady-state junction temperature, on the clamp line of that corner's diode (its breakdown voltage
 * shifted within tolerance, its temperature coefficient at the corner's value), with {@code Rd} from the part's
 * clamping voltage at the nominal breakdown line.
 *
 * <p>Which corners: a surge depends on a corner only through its clamp line (breakdown shift and temperature
 * coefficient) and its start temperature; supply, load and thermal-resistance corners change only the start. For a
 * fixed line every surge quantity grows with the start temperature (a hotter start derates the pulse rating and
 * starts the same rise higher; with {@code αV ≥ 0} the clamp voltage rises too), so among the corners sharing a clamp
 * line the hottest is the worst for every surge rule; with {@code αV < 0} the clamp voltage is highest at the
 * coldest, which is evaluated as well (derived from the model of design 2.1 and 2.6). Surges run only at those
 * corners; elsewhere the surge rules do not apply, which leaves every rule's worst value unchanged (to within the
 * transient's numerical tolerance where corners start a few micro-kelvin apart; the tests hold it to 1e-6).
 */
final class SurgeChecks {

    /**
     * Transient settings of every surge: the surge package's defaults (50 points per front) with a local tolerance of
     * 1e-3 instead of 1e-4: on the demo's surges the peak junction temperature moves by under 0.1 K and the rating
     * ratio by under 1e-4 relative, while the steps halve (margins are shown to 0.1 %, and a surge runs at every
     * corner of every ambient). Without the time history: only the design's highest ambient is charted, and its
     * corners get their histories afterwards ({@link #withSeries}), the same transients solved again with recording
     * on.
     */
    static final TransientSettings TRANSIENT = TransientSettings.defaults().withRelativeTolerance(1e-3)
            .withSeries(false);
    /** Peak search of the rating conversion: the thermal package's defaults. */
    static final FosterPeakSearch PEAK_SEARCH = FosterPeakSearch.defaults();

    private SurgeChecks() {
    }

    /** The corners at which to run the position's surges (see the class comment). */
    static boolean[] cornersToEvaluate(PositionSpec spec, List<PositionInstance> instances, List<ThermalOutcome> outcomes) {
        boolean[] at = new boolean[instances.size()];
        if (spec.surges().isEmpty()) {
            return at;
        }
        java.util.Map<List<Double>, int[]> groups = new java.util.HashMap<>();
        for (int k = 0; k < instances.size(); k++) {
            if (!(outcomes.get(k) instanceof ThermalOutcome.Converged c)) {
                continue;
            }
            var d = instances.get(k).diode();
            int[] g = groups.computeIfAbsent(List.of(d.vz0At25V(), d.tc().alphaVPerK()), key -> new int[] {-1, -1});
            double tj = c.point().tjK();
            if (g[0] < 0 || tj > tjOf(outcomes.get(g[0]))) {
                g[0] = k;
            }
            if (g[1] < 0 || tj < tjOf(outcomes.get(g[1]))) {
                g[1] = k;
            }
        }
        for (int[] g : groups.values()) {
            at[g[0]] = true;
            if (instances.get(g[1]).diode().tc().alphaVPerK() < 0) {
                at[g[1]] = true;
            }
        }
        return at;
    }

    private static double tjOf(ThermalOutcome o) {
        return ((ThermalOutcome.Converged) o).point().tjK();
    }

    static List<SurgeResult> at(PositionSpec spec, PositionInstance inst, OperatingPoint p) {
        return at(spec, inst, p, TRANSIENT);
    }

    /**
     * {@code surges}, the results of {@link #at} at {@code p}, with their time histories: the same transients
     * solved again with recording on, which changes none of their numbers (tested), only fills the series the charts
     * draw. {@code surges} itself where it is empty or already has them.
     */
    static List<SurgeResult> withSeries(PositionSpec spec, PositionInstance inst, OperatingPoint p,
                                        List<SurgeResult> surges) {
        if (surges.isEmpty() || surges.get(0).pulse().series().size() > 0) {
            return surges;
        }
        return at(spec, inst, p, TRANSIENT.withSeries(true));
    }

    private static List<SurgeResult> at(PositionSpec spec, PositionInstance inst, OperatingPoint p,
                                        TransientSettings settings) {
        if (spec.surges().isEmpty()) {
            return List.of();
        }
        PositionSurges s = spec.surges().get();
        double rd = s.rating().dynamicResistanceOhm(spec.part().model().vz0At25V());
        LinearClampLine line = LinearClampLine.of(inst.diode(), rd);
        List<SurgeResult> out = new ArrayList<>(s.cases().size());
        for (SurgeCase c : s.cases()) {
            out.add(SurgeEvaluation.evaluate(c, s.rating(), line, p.tjK(), settings, PEAK_SEARCH));
        }
        return List.copyOf(out);
    }
}
