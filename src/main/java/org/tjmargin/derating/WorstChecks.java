package org.tjmargin.derating;

import java.util.ArrayList;
import java.util.List;

/**
 * Each rule's worst check over a position's corners, gathered corner by corner: what {@link Policy#check} gives for
 * every corner, reduced to the least margin per rule (the first corner wins a tie), without a {@link RuleCheck} per
 * rule per corner: each rule's worst actual value and limit so far are kept as numbers, and its check is made once,
 * when asked for ({@link Rule#checkOf} gives the same margin from them). A sweep of a thousand positions holds the
 * policy at two million corners; the checks it would make and drop were a gigabyte of garbage per run.
 *
 * <p>Rules come out in the order they first applied (for the first corner, the policy's order; a rule that applies
 * only at a later corner, such as a surge rule, after those), the order a map keyed by rule in insertion order gives.
 * Not thread-safe: one per position and ambient.
 */
public final class WorstChecks {

    /** A rule's worst check and the index of the corner it came from. */
    public record Worst(RuleCheck check, int cornerIndex) {
    }

    private final List<Rule> rules;
    private final boolean[] seen;
    private final double[] actual;
    private final double[] limit;
    private final double[] margin;
    private final int[] corner;
    private final int[] order;
    private int applied;

    /** An empty gathering for {@code policy}'s rules. */
    public WorstChecks(Policy policy) {
        this.rules = policy.rules();
        int n = rules.size();
        this.seen = new boolean[n];
        this.actual = new double[n];
        this.limit = new double[n];
        this.margin = new double[n];
        this.corner = new int[n];
        this.order = new int[n];
    }

    /**
     * Holds every rule that applies to {@code context} (its measure present) against it.
     *
     * @param context     one corner's values (a {@link CornerReadings} refilled per corner, or a {@link RuleContext})
     * @param cornerIndex that corner's index, reported with the rule's worst check
     */
    public void add(RuleInputs context, int cornerIndex) {
        for (int i = 0; i < seen.length; i++) {
            Rule r = rules.get(i);
            double a = context.valueOrNaN(r.measure());
            if (Double.isNaN(a)) {
                continue;
            }
            double lim = r.limit().valueFor(context);
            double m = r.marginOf(a, lim);
            if (!seen[i]) {
                seen[i] = true;
                order[applied++] = i;
            } else if (!(m < margin[i])) {
                continue;
            }
            actual[i] = a;
            limit[i] = lim;
            margin[i] = m;
            corner[i] = cornerIndex;
        }
    }

    /** Each rule that applied, with its worst check and corner, in the order the rules first applied. */
    public List<Worst> worst() {
        List<Worst> out = new ArrayList<>(applied);
        for (int k = 0; k < applied; k++) {
            int i = order[k];
            out.add(new Worst(rules.get(i).checkOf(actual[i], limit[i]), corner[i]));
        }
        return out;
    }
}
