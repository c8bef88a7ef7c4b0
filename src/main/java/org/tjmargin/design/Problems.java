package org.tjmargin.design;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The problems of one load, collected so that all of them are reported together, and the further files the load
 * read on the way (waveform tables named by a design), so that their digests reach the provenance. Mutable and
 * confined to the load that owns it.
 */
final class Problems {

    private final List<InputFile> furtherInputs = new ArrayList<>();

    /** Records a file read while mapping (beyond the design and its parts library). */
    void readAlso(InputFile f) {
        furtherInputs.add(f);
    }

    /** The files recorded by {@link #readAlso}, in reading order. */
    List<InputFile> furtherInputs() {
        return List.copyOf(furtherInputs);
    }

    private final List<InputProblem> list = new ArrayList<>();
    private final Map<String, Integer> fileOrder = new LinkedHashMap<>();

    /** The context of a file about to be mapped; files are reported in the order their contexts were made. */
    FileContext contextFor(String fileName) {
        fileOrder.putIfAbsent(fileName, fileOrder.size());
        return new FileContext(fileName, this);
    }

    void add(InputProblem p) {
        list.add(p);
    }

    boolean isEmpty() {
        return list.isEmpty();
    }

    /** Throws the collected problems, if any: files in the order they were read, then by line and column. */
    void throwIfAny() {
        if (list.isEmpty()) {
            return;
        }
        for (InputProblem p : list) {
            fileOrder.putIfAbsent(p.file(), fileOrder.size());
        }
        List<InputProblem> sorted = new ArrayList<>(list);
        sorted.sort(Comparator.<InputProblem>comparingInt(p -> fileOrder.get(p.file()))
                .thenComparingInt(InputProblem::line).thenComparingInt(InputProblem::column));
        throw new InputException(sorted);
    }
}
