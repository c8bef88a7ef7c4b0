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
 */
final class SurgeChecks {

    /**
     * Transient settings of every surge: the surge package's defaults (50 points per front) with a local tolerance of
     * 1e-3 instead of 1e-4: on the demo's surges the peak junction temperature moves by under 0.1 K and the rating
     * ratio by under 1e-4 relative, while the steps halve (margins are shown to 0.1 %, and a surge runs at every
     * corner of every ambient).
     */
    static final TransientSettings TRANSIENT = TransientSettings.defaults().withRelativeTolerance(1e-3);
    /** Peak search of the rating conversion: the thermal package's defaults. */
    static final FosterPeakSearch PEAK_SEARCH = FosterPeakSearch.defaults();

    private SurgeChecks() {
    }

    static List<SurgeResult> at(PositionSpec spec, PositionInstance inst, OperatingPoint p) {
        if (spec.surges().isEmpty()) {
            return List.of();
        }
        PositionSurges s = spec.surges().get();
        double rd = s.rating().dynamicResistanceOhm(spec.part().model().vz0At25V());
        LinearClampLine line = LinearClampLine.of(inst.diode(), rd);
        List<SurgeResult> out = new ArrayList<>(s.cases().size());
        for (SurgeCase c : s.cases()) {
            out.add(SurgeEvaluation.evaluate(c, s.rating(), line, p.tjK(), TRANSIENT, PEAK_SEARCH));
        }
        return out;
    }
}
