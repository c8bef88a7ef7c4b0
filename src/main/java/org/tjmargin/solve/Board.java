package org.tjmargin.solve;

import java.util.List;
import org.tjmargin.thermal.Enclosure;

/**
 * A board of diode positions in one enclosure, with the ambient range it must work in.
 *
 * @param name      the design's name
 * @param positions its positions, ids unique
 * @param enclosure the air around the board
 * @param ambient   the ambient range
 */
public record Board(String name, List<PositionSpec> positions, Enclosure enclosure, AmbientRange ambient) {

    public Board {
        positions = List.copyOf(positions);
        if (positions.isEmpty()) {
            throw new IllegalArgumentException("a board needs at least one position");
        }
        if (positions.stream().map(PositionSpec::id).distinct().count() != positions.size()) {
            throw new IllegalArgumentException("position ids must be unique");
        }
    }
}
