package org.tjmargin.design;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.tjmargin.solve.Board;

/**
 * A design file loaded and validated: the board to analyse, the policy it names, and the files it was read from.
 *
 * @param board      the board, every position mapped into the domain
 * @param policy     the design's {@code policy} (a profile name or a file path, relative to the design file), as
 *                   written; empty when the design names none
 * @param inputs     every file read, the design file first, then the parts library, each with its SHA-256
 * @param designName the design's {@code design} name
 */
public record LoadedDesign(Board board, Optional<String> policy, List<InputFile> inputs, String designName) {
    public LoadedDesign {
        Objects.requireNonNull(board, "board");
        Objects.requireNonNull(policy, "policy");
        inputs = List.copyOf(inputs);
        Objects.requireNonNull(designName, "designName");
    }

    /** The design file itself (the first input), against which a relative policy path resolves. */
    public InputFile designFile() {
        return inputs.get(0);
    }
}
