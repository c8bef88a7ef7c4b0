package org.tjmargin.derating;

import java.util.ArrayList;
import java.util.List;

/**
 * Each rule's worst check over a position's corners, gathered corner by corner: what {@link Policy#check} gives for
 * every corner, reduced to the least margin per rule (the first corner wins a tie), without a {@link RuleCheck} per
 * rule per corner: a check is made only when it is the rule's worst so far. A sweep of a thousand positions holds
 * the policy at two million corners; the checks it would make and drop were a gigabyte of garbage per run.
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
    private final RuleCheck[] worst;
    private final int[] corner;
    private final int[] order;
    private int applied;

    /** An empty gathering for {@code policy}'s rules. */
    public WorstChecks(Policy policy) {
        this.rules = policy.rules();
        this.worst = new RuleCheck[rules.size()];
        this.corner = new int[rules.size()];
        this.order = new int[rules.size()];
    }

    /** Holds every rule against {@code context}, the point of corner {@code cornerIndex}. */
    public void add(RuleContext context, int cornerIndex) {
        for (int i = 0; i < worst.length; i++) {
            Rule r = rules.get(i);
            double actual = context.valueOrNaN(r.measure());
            if (Double.isNaN(actual)) {
                continue;
            }
            double lim = r.limit().valueFor(context);
            if (worst[i] == null) {
                order[applied++] = i;
            } else if (!(r.marginOf(actual, lim) < worst[i].margin())) {
                continue;
            }
            worst[i] = r.checkOf(actual, lim);
            corner[i] = cornerIndex;
        }
    }

    /** Every rule that applied, its worst check, in the order the rules first applied. */
    public List<Worst> worst() {
        List<Worst> out = new ArrayList<>(applied);
        for (int k = 0; k < applied; k++) {
            out.add(new Worst(worst[order[k]], corner[order[k]]));
        }
        return out;
    }
}
