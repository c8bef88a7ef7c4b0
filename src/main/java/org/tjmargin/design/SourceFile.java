package org.tjmargin.design;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Locale;
import java.util.Optional;

/**
 * One input file's bytes as read, with the name it is reported under and its SHA-256, so that the hash recorded
 * for provenance is the hash of exactly what was parsed.
 *
 * @param path   the file's path as the user (or the referring file) named it
 * @param name   the name problems are reported under
 * @param bytes  the content
 * @param sha256 SHA-256 of the content, lower-case hexadecimal
 */
record SourceFile(Path path, String name, byte[] bytes, String sha256) {

    /** The two syntaxes, chosen by the file's extension. */
    enum Syntax { YAML, JSON }

    /**
     * Reads a file, reporting a problem (at {@code referrer}, if given) when it cannot be read.
     *
     * @param path     the file
     * @param problems where to report
     * @param referrer the file and node that named this one, or empty for a file named on the command line
     */
    static Optional<SourceFile> read(Path path, Problems problems, Optional<Referrer> referrer) {
        String name = path.normalize().toString();
        try {
            byte[] bytes = Files.readAllBytes(path);
            return Optional.of(new SourceFile(path, name, bytes, sha256Of(bytes)));
        } catch (NoSuchFileException e) {
            report(problems, referrer, name, "no such file: " + name);
        } catch (IOException e) {
            report(problems, referrer, name, "cannot read " + name + ": " + e.getMessage());
        }
        return Optional.empty();
    }

    private static void report(Problems problems, Optional<Referrer> referrer, String name, String message) {
        if (referrer.isPresent()) {
            Referrer r = referrer.get();
            r.file().report(InputProblem.Kind.FILE_NOT_FOUND, r.node(), r.field(), message);
        } else {
            problems.add(new InputProblem(InputProblem.Kind.FILE_NOT_FOUND, name, 0, 0, "", message));
        }
    }

    /**
     * Where a file was named.
     *
     * @param file  the referring file
     * @param node  the value that names it
     * @param field its field path
     */
    record Referrer(FileContext file, Node node, String field) {
    }

    /** The syntax by extension: {@code .json} is JSON, {@code .yaml} and {@code .yml} are YAML. */
    Optional<Syntax> syntax() {
        String n = path.getFileName() == null ? "" : path.getFileName().toString().toLowerCase(Locale.ROOT);
        if (n.endsWith(".json")) {
            return Optional.of(Syntax.JSON);
        }
        if (n.endsWith(".yaml") || n.endsWith(".yml")) {
            return Optional.of(Syntax.YAML);
        }
        return Optional.empty();
    }

    /** This file's provenance record. */
    InputFile toInputFile() {
        return new InputFile(path.normalize(), sha256);
    }

    static String sha256Of(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            // Every Java platform must provide SHA-256 (java.security.MessageDigest, "Standard Names").
            throw new IllegalStateException(e);
        }
    }
}
