package org.tjmargin.report;

import java.util.List;

/**
 * Where a result came from: the tool's version and a digest of every input file read.
 *
 * @param toolVersion the tool's version
 * @param inputs      each input file with its SHA-256
 */
public record Provenance(String toolVersion, List<InputDigest> inputs) {

    /**
     * One input file.
     *
     * @param path   the path as given (or resolved from the design)
     * @param sha256 hex SHA-256 of its bytes
     */
    public record InputDigest(String path, String sha256) {
    }

    public Provenance {
        inputs = List.copyOf(inputs);
    }
}
