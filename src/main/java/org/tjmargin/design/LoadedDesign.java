package org.tjmargin.design;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.tjmargin.solve.Board;
import org.tjmargin.variation.VariationModel;
import org.tjmargin.variation.statistical.MonteCarloSettings;
import org.tjmargin.variation.statistical.StatisticsPlan;

/**
 * A design file loaded and validated: the board to analyse, the policy it names, and the files it was read from.
 *
 * @param board      the board, every position mapped into the domain
 * @param policy     the design's {@code policy} (a profile name or a file path, relative to the design file), as
 *                   written; empty when the design names none
 * @param inputs     every file read, the design file first, then the parts library, each with its SHA-256
 * @param designName the design's {@code design} name
 * @param statistics the design's {@code statistics} block with every position's distributions; empty when the
 *                   design asks for no statistics
 * @param distributions every position's distributions by id, read (and checked) whether or not statistics run
 */
public record LoadedDesign(Board board, Optional<String> policy, List<InputFile> inputs, String designName,
                           Optional<StatisticsPlan> statistics, Map<String, VariationModel> distributions) {
    public LoadedDesign {
        Objects.requireNonNull(board, "board");
        Objects.requireNonNull(policy, "policy");
        inputs = List.copyOf(inputs);
        Objects.requireNonNull(designName, "designName");
        Objects.requireNonNull(statistics, "statistics");
        distributions = Map.copyOf(distributions);
    }

    /** A design without statistics and with every axis uniform. */
    public LoadedDesign(Board board, Optional<String> policy, List<InputFile> inputs, String designName) {
        this(board, policy, inputs, designName, Optional.empty(), Map.of());
    }

    /**
     * The statistics to run when the command line asks for them: the design's block with {@code samples} and
     * {@code seed} where given, else the defaults with the positions' distributions.
     *
     * @param samples the samples asked for, or empty to keep the design's (or the default)
     * @param seed    the seed asked for, or empty likewise
     */
    public StatisticsPlan statisticsWith(Optional<Long> samples, Optional<Long> seed) {
        StatisticsPlan base = statistics.orElseGet(() -> new StatisticsPlan(
                MonteCarloSettings.of(StatisticsPlan.DEFAULT_SAMPLES, StatisticsPlan.DEFAULT_SEED),
                StatisticsPlan.DEFAULT_YIELD_POINTS, StatisticsPlan.DEFAULT_SURGE_SAMPLES, distributions));
        return base.withSamplesAndSeed(samples.orElse(base.settings().samples()),
                seed.orElse(base.settings().seed()));
    }

    /** The design file itself (the first input), against which a relative policy path resolves. */
    public InputFile designFile() {
        return inputs.get(0);
    }
}
