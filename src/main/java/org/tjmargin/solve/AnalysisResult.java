package org.tjmargin.solve;

import java.util.List;
import java.util.Optional;
import org.tjmargin.derating.Policy;

/**
 * Everything an analysis found: the plain record every writer (terminal, JSON, CSV, HTML, charts) reads.
 *
 * @param board     the analysed board
 * @param policy    the policy applied
 * @param sweep     the board at every ambient of the sweep, increasing
 * @param positions each position's result, in board order
 * @param verdict   the design's verdict, the worst of its positions
 */
public record AnalysisResult(Board board, Policy policy, List<BoardAtAmbient> sweep, List<PositionResult> positions,
                             Verdict verdict) {
    public AnalysisResult {
        sweep = List.copyOf(sweep);
        positions = List.copyOf(positions);
    }

    /** Where the enclosure air itself runs away, if it does in the sweep ({@link EnclosureRunaway#of}). */
    public Optional<EnclosureRunaway> enclosureRunaway() {
        return EnclosureRunaway.of(positions);
    }

    /** The board at the design's highest ambient (the last sweep point). */
    public BoardAtAmbient atMaximumAmbient() {
        return sweep.get(sweep.size() - 1);
    }
}
