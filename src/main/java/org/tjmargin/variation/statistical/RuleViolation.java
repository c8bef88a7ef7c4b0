package org.tjmargin.variation.statistical;

import org.tjmargin.variation.WilsonInterval;

/**
 * How often one rule failed in a Monte Carlo run.
 *
 * @param ruleId      the rule
 * @param probability the violating fraction with its 95 % Wilson score interval
 */
public record RuleViolation(String ruleId, WilsonInterval probability) {
}
