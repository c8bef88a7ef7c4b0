package org.tjmargin.variation.statistical;

import java.util.List;
import org.tjmargin.solve.PointStatus;
import org.tjmargin.variation.Axis;

/** Outcome of a root-sum-square spread: the spread, or the point whose solve the tool cannot stand behind. */
public sealed interface RssOutcome permits RssOutcome.Spread, RssOutcome.Unresolved {

    /** The method's name, as reports show it. */
    String METHOD = "root-sum-square of central-difference sensitivities (first-order, inputs independent)";

    /**
     * The spread.
     *
     * @param method          {@link #METHOD}
     * @param nominalTjK      junction temperature at the nominal (K)
     * @param tjSigmaK        {@code √Σ(∂Tj/∂xi·σi)²} (K)
     * @param nominalMargin   limiting margin at the nominal (1)
     * @param marginSigma     {@code √Σ(∂m/∂xi·σi)²} (1)
     * @param limitingRuleId  the rule limiting at the nominal
     * @param axes            each input's share, in axis order
     */
    record Spread(String method, double nominalTjK, double tjSigmaK, double nominalMargin, double marginSigma,
                  String limitingRuleId, List<AxisSensitivity> axes) implements RssOutcome {
        public Spread {
            axes = List.copyOf(axes);
        }
    }

    /**
     * A point of the differences did not converge, so no derivative exists there.
     *
     * @param axis   the axis being stepped, or {@code null} for the nominal point
     * @param status what happened there
     */
    record Unresolved(Axis axis, PointStatus status) implements RssOutcome {
    }
}
