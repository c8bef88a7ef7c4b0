package org.tjmargin.design;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tjmargin.surge.SurgeRating;
import org.tjmargin.thermal.FosterFitOutcome;
import org.tjmargin.thermal.FosterFitSettings;
import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.SemiInfiniteDie;
import org.tjmargin.thermal.SteadyThermalPath;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * Completes a part's surge data at one position: where the part gives no transient thermal impedance, the default
 * estimate is a semi-infinite silicon die ({@link SemiInfiniteDie}) whose area makes the rated pulse take the
 * junction from 25 °C to the pulse Tj max in the √t regime ({@link SurgeRating#dieAreaForRatingM2}), capped by the
 * position's steady junction-to-air resistance, as a Foster network from 1 µs to ten times past the cap's corner
 * (at least 10 s, longer than any load dump). Flagged as estimated in every output.
 */
final class SurgeMapping {

    private static final double ESTIMATE_FROM_S = 1e-6;
    private static final double ESTIMATE_AT_LEAST_TO_S = 10.0;
    /** Six stages over the nine decades of the estimate reproduce the sizing pulse to about 5 % (four: 17 %). */
    private static final int ESTIMATE_STAGES = 6;

    private SurgeMapping() {
    }

    /**
     * The estimates fitted so far while reading one design, by die area and steady resistance: positions with the
     * same part on the same mounting share one fit (a Levenberg–Marquardt fit of six stages each; a board of many
     * identical input clamps would otherwise fit the same network again and again). Not thread-safe: one per read.
     */
    static final class Estimates {
        private record Key(double dieAreaM2, double rssKPerW) {
        }

        private final Map<Key, FosterFitOutcome> fitted = new HashMap<>();

        FosterFitOutcome of(SemiInfiniteDie die, double dieAreaM2, double rss) {
            return fitted.computeIfAbsent(new Key(dieAreaM2, rss), k -> {
                double to = Math.max(ESTIMATE_AT_LEAST_TO_S, 10 * die.capTimeS(rss));
                return die.fosterEstimate(ESTIMATE_FROM_S, to, rss, ESTIMATE_STAGES, FosterFitSettings.defaults());
            });
        }
    }

    static Optional<SurgeRating> rating(Fields position, SurgePartSpec spec, SteadyThermalPath path,
                                        Estimates estimates) {
        List<String> notes = new ArrayList<>(spec.notes());
        FosterNetwork network;
        if (spec.network().isPresent()) {
            network = spec.network().get();
        } else {
            double area = SurgeRating.dieAreaForRatingM2(spec.ratedPeakPowerW(), spec.ratedPulse(), spec.pulseTjMaxK(),
                    SemiInfiniteDie.silicon(1.0).effusivity());
            SemiInfiniteDie die = SemiInfiniteDie.silicon(area);
            double rss = path.rThetaJaKPerW();
            FosterFitOutcome out = estimates.of(die, area, rss);
            if (!(out instanceof FosterFitOutcome.Fitted fitted)) {
                position.report(InputProblem.Kind.NOT_PHYSICAL, "surges", "the default surge thermal estimate could not be "
                        + "fitted: " + ((FosterFitOutcome.Failed) out).reason() + "; give the part's transient data");
                return Optional.empty();
            }
            network = fitted.network();
            notes.add(String.format(java.util.Locale.ROOT, "surge die area estimated at %.3g mm² from the pulse rating; "
                    + "capped by Rθja %s", area * 1e6, Quantities.format(rss, Dimension.THERMAL_RESISTANCE)));
        }
        FosterNetwork n = network;
        return position.build(() -> new SurgeRating(spec.ratedPeakPowerW(), spec.ratedPulse(), spec.clampingVoltageV(),
                spec.clampingCurrentA(), spec.pulseTjMaxK(), n, spec.network().isPresent() ? spec.source()
                        : SurgeRating.NetworkSource.SEMI_INFINITE_DIE_ESTIMATE, notes));
    }
}
