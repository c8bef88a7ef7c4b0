package org.tjmargin.solve;

import java.util.ArrayList;
import java.util.List;

/**
 * A board with every position's corner instances built once, so that a sweep does not rebuild them per ambient.
 *
 * @param board     the board
 * @param instances for each position (board order), its instances in corner order
 */
public record PreparedBoard(Board board, List<List<PositionInstance>> instances) {

    public PreparedBoard {
        List<List<PositionInstance>> copy = new ArrayList<>();
        for (List<PositionInstance> l : instances) {
            copy.add(List.copyOf(l));
        }
        instances = List.copyOf(copy);
    }

    /** Builds every corner instance of every position. */
    public static PreparedBoard of(Board board) {
        List<List<PositionInstance>> all = new ArrayList<>();
        for (PositionSpec p : board.positions()) {
            all.add(p.corners().stream().map(p::at).toList());
        }
        return new PreparedBoard(board, all);
    }
}
