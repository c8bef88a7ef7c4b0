package org.tjmargin.solve;

import java.util.List;

/**
 * The whole board at one ambient.
 *
 * @param ambientK        room temperature (K)
 * @param enclosureRiseK  rise of the enclosure air above the room (K)
 * @param boardHeatW      heat of all positions used for the rise (each at its corner of greatest heat) (W)
 * @param positions       each position, in board order
 * @param couplingEvaluations evaluations of the board-level air balance
 * @param status          the worst status of all positions and of the air balance
 */
public record BoardAtAmbient(double ambientK, double enclosureRiseK, double boardHeatW,
                             List<PositionAtAmbient> positions, int couplingEvaluations, PointStatus status) {

    public BoardAtAmbient {
        positions = List.copyOf(positions);
    }

    /** The board with each position keeping only its reported corners ({@link PositionAtAmbient#reportedOnly()}). */
    public BoardAtAmbient reportedOnly() {
        return new BoardAtAmbient(ambientK, enclosureRiseK, boardHeatW,
                positions.stream().map(PositionAtAmbient::reportedOnly).toList(), couplingEvaluations, status);
    }
}
