package org.tjmargin.design;

import java.nio.file.Path;
import java.util.Objects;

/**
 * An input file that a load read, for provenance: reports print the path and hash of every file behind a result.
 *
 * @param path   the file's path (normalised, relative where it was named relatively)
 * @param sha256 SHA-256 of the bytes that were parsed, 64 lower-case hexadecimal digits
 */
public record InputFile(Path path, String sha256) {
    public InputFile {
        Objects.requireNonNull(path, "path");
        if (sha256 == null || !sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("SHA-256 must be 64 lower-case hex digits, got " + sha256);
        }
    }
}
