package org.tjmargin.solve;

import org.tjmargin.derating.RuleCheck;

/**
 * A rule's check at the corner where its margin is smallest.
 *
 * @param check       the check
 * @param cornerIndex index of that corner in the position's corner list
 */
public record WorstCheck(RuleCheck check, int cornerIndex) {
}
