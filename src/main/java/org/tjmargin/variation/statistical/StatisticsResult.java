package org.tjmargin.variation.statistical;

import java.util.List;

/**
 * A board's statistical results, read by every writer.
 *
 * @param plan      what was run
 * @param positions each position's results, in board order
 */
public record StatisticsResult(StatisticsPlan plan, List<PositionStatistics> positions) {
    public StatisticsResult {
        positions = List.copyOf(positions);
    }

    /** The results of position {@code id}, if it was analysed. */
    public java.util.Optional<PositionStatistics> of(String id) {
        return positions.stream().filter(p -> p.positionId().equals(id)).findFirst();
    }
}
