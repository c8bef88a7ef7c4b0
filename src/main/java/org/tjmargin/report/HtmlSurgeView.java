package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.tjmargin.derating.RuleCheck;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.CornerPoint;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.Verdict;
import org.tjmargin.solve.WorstCheck;
import org.tjmargin.surge.PositionSurges;
import org.tjmargin.surge.SurgeCase;
import org.tjmargin.surge.SurgeRating;
import org.tjmargin.surge.SurgeResult;
import org.tjmargin.units.Dimension;

/**
 * The surge block of a position's section: chooses each surge's worst corner at the design's highest ambient and
 * formats its result. Computes nothing.
 */
final class HtmlSurgeView {

    private HtmlSurgeView() {
    }

    static Optional<HtmlView.Surges> of(AnalysisResult result, PositionSpec spec, PositionAtAmbient atMax) {
        if (spec.surges().isEmpty()) {
            return Optional.empty();
        }
        PositionSurges ps = spec.surges().get();
        SurgeRating rating = ps.rating();
        double tjMaxK = spec.part().ratings().tjMaxK();
        List<HtmlView.Surge> out = new ArrayList<>();
        for (SurgeCase c : ps.cases()) {
            List<HtmlView.Fact> f = new ArrayList<>();
            f.add(new HtmlView.Fact("Pulses", c.pulseCount() == 1 ? "one" : c.pulseCount() + " at "
                    + HtmlFormat.si(c.periodS(), Dimension.TIME) + " intervals"));
            f.add(new HtmlView.Fact("Protected input limit", c.protectedLimitV().isPresent()
                    ? HtmlFormat.si(c.protectedLimitV().getAsDouble(), Dimension.VOLTAGE) : HtmlFormat.NONE));
            Optional<CornerPoint> worst = atMax.worstCornerForSurge(c.id(), tjMaxK);
            if (worst.isEmpty()) {
                f.add(new HtmlView.Fact("Result", "not evaluated: no corner converged at this ambient"));
            } else {
                SurgeResult r = worst.get().surge(c.id()).orElseThrow();
                f.add(new HtmlView.Fact("Worst corner", worst.get().corner().label()));
                f.add(new HtmlView.Fact("Start (steady state)", HtmlFormat.temperature(r.startTjK())));
                f.add(new HtmlView.Fact("Peak junction", HtmlFormat.temperature(r.peakJunctionTemperatureK()) + " at "
                        + HtmlFormat.si(r.pulse().peakJunctionTimeS(), Dimension.TIME) + " (Tj max "
                        + HtmlFormat.temperature(tjMaxK) + ")"));
                f.add(new HtmlView.Fact("Peak current", HtmlFormat.si(r.peakCurrentA(), Dimension.CURRENT)));
                f.add(new HtmlView.Fact("Peak clamp voltage", HtmlFormat.si(r.peakClampVoltageV(), Dimension.VOLTAGE)
                        + r.clampVoltageRatio().stream().mapToObj(x -> " (" + HtmlFormat.margin(x) + " of the limit)")
                                .findFirst().orElse("")));
                f.add(new HtmlView.Fact("Peak power, energy", HtmlFormat.si(r.peakPowerW(), Dimension.POWER) + ", "
                        + HtmlFormat.si(r.energyJ(), Dimension.ENERGY) + " per pulse; I²t "
                        + HtmlFormat.si(r.pulse().actionIntegralA2s(), Dimension.ACTION_INTEGRAL)));
                f.add(new HtmlView.Fact("Pulse rating", HtmlFormat.si(rating.ratedPeakPowerW(), Dimension.POWER) + " at its "
                        + "rating pulse (half value " + HtmlFormat.si(rating.ratedPulse().widthS(), Dimension.TIME)
                        + ") → " + HtmlFormat.si(r.rating().peakPowerW(), Dimension.POWER) + " for this pulse ("
                        + method(r) + ") × " + HtmlFormat.plain(r.deratingFactor()) + " derating at the start = "
                        + HtmlFormat.si(r.allowedPeakPowerW(), Dimension.POWER)));
                f.add(new HtmlView.Fact("Peak power / derated rating", HtmlFormat.margin(r.powerRatio())));
                f.add(new HtmlView.Fact("Transient thermal impedance", network(rating)));
                if (r.stopped().isPresent()) {
                    f.add(new HtmlView.Fact("Transient", "STOPPED early (" + r.stopped().get()
                            + "): values are of the partial transient and must not be trusted"));
                }
            }
            out.add(new HtmlView.Surge(c.id(), c.description(), f));
        }
        boolean holds = true;
        List<String> parts = new ArrayList<>();
        for (WorstCheck w : atMax.worst()) {
            RuleCheck rc = w.check();
            if (rc.measure().isSurge()) {
                holds &= rc.holds();
                parts.add(rc.ruleId() + " " + HtmlFormat.margin(rc.margin()));
            }
        }
        String text = parts.isEmpty() ? "No surge rule could be checked at " + HtmlFormat.temperature(atMax.ambientK())
                + " (no converged corner)." : "Surge rules at " + HtmlFormat.temperature(atMax.ambientK())
                + " ambient, each at its worst corner: " + String.join("; ", parts) + ".";
        Verdict v = parts.isEmpty() ? Verdict.UNRESOLVED : holds ? Verdict.PASS : Verdict.FAIL;
        return Optional.of(new HtmlView.Surges(HtmlPositionView.badge(v), text, SurgeResult.THERMAL_MODEL_CAUTION, out));
    }

    private static String method(SurgeResult r) {
        String m = switch (r.rating().method()) {
            case EQUAL_ENERGY -> "equal energy";
            case EQUIVALENT_RECTANGLE_SQRT_T -> "equivalent rectangle, √t regime";
            case FOSTER_NETWORK -> "equal peak rise through the Foster network";
        };
        return m + (r.rating().estimated() ? ", an estimate" : "");
    }

    private static String network(SurgeRating rating) {
        return switch (rating.networkSource()) {
            case GIVEN_FOSTER -> "Foster stages given by the part";
            case ZTH_POINTS -> "Foster network fitted to the part's Zth(t) points";
            case RATING_CURVE -> "Foster network fitted to the part's peak-pulse-power curve";
            case SEMI_INFINITE_DIE_ESTIMATE -> "estimated: semi-infinite silicon die sized to the pulse rating, capped by "
                    + "the steady path";
        } + ", " + rating.network().stageCount() + " stages";
    }
}
