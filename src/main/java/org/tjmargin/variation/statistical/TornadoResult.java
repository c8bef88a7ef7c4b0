package org.tjmargin.variation.statistical;

import java.util.List;

/**
 * Sensitivity ranking of one position's limiting margin: the nominal and one bar per varying input, the input
 * with the largest swing first.
 *
 * @param positionId the position
 * @param tLocalK    local air temperature (K)
 * @param nominal    the all-nominal point
 * @param bars       the bars, by decreasing swing (ties in axis order)
 */
public record TornadoResult(String positionId, double tLocalK, Evaluation nominal, List<TornadoBar> bars) {

    public TornadoResult {
        bars = List.copyOf(bars);
    }
}
