package org.tjmargin.solve;

import java.util.List;

/**
 * The whole board at one ambient.
 *
 * @param ambientK        room temperature (K)
 * @param enclosureRiseK  rise of the enclosure air above the room (K); where the air has no balance
 *                        ({@code airStatus} not converged), the rise at which its search stopped, which is not a
 *                        temperature the air settles at: writers show none
 * @param boardHeatW      heat of all positions used for the rise (each at its corner of greatest heat) (W), in the
 *                        air of {@code enclosureRiseK}; NaN where the air runs away (it has no steady heat)
 * @param positions       each position, in board order; where the air runs away, every position runs away with it
 *                        (every corner a {@link ThermalOutcome.Runaway})
 * @param couplingEvaluations evaluations of the board-level air balance
 * @param airStatus       the status of the enclosure air's balance: {@link PointStatus#RUNAWAY} when no air
 *                        temperature below the search's cap balances the board's heat against what the box sheds
 * @param status          the worst status of all positions and of the air balance
 */
public record BoardAtAmbient(double ambientK, double enclosureRiseK, double boardHeatW,
                             List<PositionAtAmbient> positions, int couplingEvaluations, PointStatus airStatus,
                             PointStatus status) {

    public BoardAtAmbient {
        positions = List.copyOf(positions);
    }

    /** True when the enclosure air is in balance, so that its temperature and rise are real values. */
    public boolean airBalanced() {
        return airStatus == PointStatus.CONVERGED;
    }

    /** The board with each position keeping only its reported corners ({@link PositionAtAmbient#reportedOnly()}). */
    public BoardAtAmbient reportedOnly() {
        return new BoardAtAmbient(ambientK, enclosureRiseK, boardHeatW,
                positions.stream().map(PositionAtAmbient::reportedOnly).toList(), couplingEvaluations, airStatus,
                status);
    }
}
