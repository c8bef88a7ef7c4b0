package org.tjmargin.report;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A set of output files assembled in memory and written whole: each goes to a temporary file in the output
 * folder and is then moved over its name atomically, so a reader never sees half a file and a failure leaves
 * earlier versions intact. Files are only written once everything has been rendered.
 */
public final class OutputFiles {

    /** Each file as the pieces written one after another. */
    private final Map<String, List<byte[]>> files = new LinkedHashMap<>();

    /** Adds a text file (UTF-8). */
    public OutputFiles text(String name, String content) {
        return put(name, List.of(content.getBytes(StandardCharsets.UTF_8)));
    }

    /** Adds a binary file (a copy of {@code content}). */
    public OutputFiles bytes(String name, byte[] content) {
        return put(name, List.of(content.clone()));
    }

    /**
     * Adds a file made of {@code pieces} written one after another, kept as they are (not copied: the caller does
     * not change them afterwards). A large file (a big board's {@code sweep.csv} is tens of megabytes) is then never
     * held joined in memory.
     */
    public OutputFiles pieces(String name, List<byte[]> pieces) {
        return put(name, List.copyOf(pieces));
    }

    private OutputFiles put(String name, List<byte[]> pieces) {
        if (name.contains("/") || name.contains("\\") || name.startsWith(".")) {
            throw new IllegalArgumentException("output names are plain file names, got " + name);
        }
        files.put(name, pieces);
        return this;
    }

    /** The names added so far, in order. */
    public List<String> names() {
        return new ArrayList<>(files.keySet());
    }

    /**
     * Refuses an output folder in which a file to be written is one of the inputs.
     *
     * @param dir    the output folder
     * @param inputs the input files
     * @return the input that would be overwritten, or null
     */
    public Path wouldOverwrite(Path dir, List<Path> inputs) throws IOException {
        for (String name : files.keySet()) {
            Path target = dir.resolve(name).toAbsolutePath().normalize();
            for (Path in : inputs) {
                Path input = in.toAbsolutePath().normalize();
                if (target.equals(input) || (Files.exists(target) && Files.exists(input)
                        && Files.isSameFile(target, input))) {
                    return in;
                }
            }
        }
        return null;
    }

    /** Writes every file into {@code dir} (created if missing), each atomically. */
    public void writeTo(Path dir) throws IOException {
        Files.createDirectories(dir);
        for (Map.Entry<String, List<byte[]>> e : files.entrySet()) {
            Path target = dir.resolve(e.getKey());
            Path tmp = Files.createTempFile(dir, "." + e.getKey() + ".", ".part");
            try {
                try (OutputStream os = Files.newOutputStream(tmp)) {
                    for (byte[] piece : e.getValue()) {
                        os.write(piece);
                    }
                }
                try {
                    Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
                } catch (AtomicMoveNotSupportedException ex) {
                    Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
                }
            } finally {
                Files.deleteIfExists(tmp);
            }
        }
    }
}
