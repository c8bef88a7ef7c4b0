package org.tjmargin.derating;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A derating policy: named rules held against every operating point.
 *
 * @param name       the policy's name
 * @param provenance where it comes from
 * @param rules      its rules, ids unique
 */
public record Policy(String name, String provenance, List<Rule> rules) {

    public Policy {
        rules = List.copyOf(rules);
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a policy needs a name");
        }
        if (rules.stream().map(Rule::id).distinct().count() != rules.size()) {
            throw new IllegalArgumentException("rule ids must be unique in policy " + name);
        }
    }

    /**
     * The built-in minimum every design must meet whatever its policy: the junction below the part's Tj max, and a
     * regulating diode's current at or above its knee; for surges, the junction below Tj max, the peak pulse power
     * within the derated pulse rating, and the clamp voltage within the protected input's limit. Physics, not
     * policy: above Tj max or its pulse rating the part is outside its absolute rating, below {@code Izk} it no
     * longer regulates (design 2.1), above its limit the protected input is outside its own.
     */
    public static Policy builtInMinimum() {
        return new Policy("built-in minimum", "absolute ratings of the part", List.of(
                new Rule("tj-below-max", "junction below Tj max", Measure.JUNCTION_TEMPERATURE, Bound.MAX,
                        new Limit.BelowTjMax(0), "absolute maximum rating of the part"),
                new Rule("iz-above-knee", "Zener current at or above Izk", Measure.KNEE_CURRENT_RATIO, Bound.MIN,
                        new Limit.Fixed(1.0), "definition of the breakdown region (knee current)"),
                new Rule("surge-tj-below-max", "surge peak junction below Tj max", Measure.SURGE_JUNCTION_TEMPERATURE,
                        Bound.MAX, new Limit.BelowTjMax(0), "absolute maximum rating of the part"),
                new Rule("surge-within-rating", "surge peak power within the derated pulse rating", Measure.SURGE_POWER_RATIO,
                        Bound.MAX, new Limit.Fixed(1.0), "absolute pulse rating of the part, derated linearly to zero at "
                        + "Tj max from 25 °C (reference 4.6, TVS pulse-derating curves)"),
                new Rule("clamp-within-protected-limit", "surge clamp voltage within the protected input's limit",
                        Measure.CLAMP_VOLTAGE_RATIO, Bound.MAX, new Limit.Fixed(1.0),
                        "absolute maximum rating of the protected input, as the design states it")));
    }

    /**
     * A policy that extends {@code base}: the base's rules in their order, each replaced by the override of the same
     * id where there is one, followed by the new rules (design 2.5: a profile can extend another and override
     * rules).
     */
    public static Policy extending(Policy base, String name, String provenance, List<Rule> rules) {
        List<Rule> out = new ArrayList<>();
        List<Rule> fresh = new ArrayList<>(rules);
        for (Rule r : base.rules()) {
            Rule replacement = null;
            for (Rule o : rules) {
                if (o.id().equals(r.id())) {
                    replacement = o;
                }
            }
            out.add(replacement == null ? r : replacement);
            if (replacement != null) {
                fresh.remove(replacement);
            }
        }
        out.addAll(fresh);
        return new Policy(name, provenance, out);
    }

    /**
     * This policy with the {@link #builtInMinimum() built-in minimum} added where it has no rule of the same id:
     * whatever a profile says, a junction above Tj max or a regulator below its knee fails.
     */
    public Policy withBuiltInMinimum() {
        List<Rule> out = new ArrayList<>(rules);
        for (Rule r : builtInMinimum().rules()) {
            if (rule(r.id()).isEmpty()) {
                out.add(r);
            }
        }
        return new Policy(name, provenance, out);
    }

    /** Every rule that applies to {@code context}, checked. */
    public List<RuleCheck> check(RuleContext context) {
        List<RuleCheck> out = new ArrayList<>(rules.size());
        for (Rule r : rules) {
            RuleCheck c = r.checkOrNull(context);
            if (c != null) {
                out.add(c);
            }
        }
        return out;
    }

    /** The rule with identifier {@code id}. */
    public Optional<Rule> rule(String id) {
        return rules.stream().filter(r -> r.id().equals(id)).findFirst();
    }
}
