package org.tjmargin.report;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * What the HTML report shows besides the analysis: the tool's version, the safety cautions to print, and the
 * SHA-256 of every input file, so that a reviewer can tell which files produced the page.
 *
 * @param toolVersion the tool's version, e.g. {@code 0.1.0}
 * @param cautions    the safety cautions, in the order to print them (plain text; the report escapes it)
 * @param inputs      every input file with its digest, in the order to list them
 */
public record ReportInputs(String toolVersion, List<String> cautions, List<InputDigest> inputs) {

    public ReportInputs {
        Objects.requireNonNull(toolVersion, "toolVersion");
        cautions = List.copyOf(cautions);
        inputs = List.copyOf(inputs);
    }

    /**
     * One input file and its SHA-256.
     *
     * @param path   the path as the user gave it (shown as text, never opened here)
     * @param sha256 64 hexadecimal digits, kept in lower case
     */
    public record InputDigest(String path, String sha256) {

        private static final Pattern HEX64 = Pattern.compile("[0-9a-fA-F]{64}");

        public InputDigest {
            Objects.requireNonNull(path, "path");
            if (sha256 == null || !HEX64.matcher(sha256).matches()) {
                throw new IllegalArgumentException("SHA-256 must be 64 hexadecimal digits, got " + sha256
                        + " for " + path);
            }
            sha256 = sha256.toLowerCase(Locale.ROOT);
        }

        /** The digest of a file's bytes (FIPS 180-4 SHA-256, from the Java runtime). */
        public static InputDigest of(String path, byte[] content) {
            try {
                byte[] d = MessageDigest.getInstance("SHA-256").digest(content);
                return new InputDigest(path, HexFormat.of().formatHex(d));
            } catch (NoSuchAlgorithmException e) {
                // Every Java runtime must provide SHA-256 (java.security.MessageDigest's contract).
                throw new IllegalStateException("this Java runtime has no SHA-256", e);
            }
        }

        /** The digest of a text's UTF-8 bytes. */
        public static InputDigest ofText(String path, String content) {
            return of(path, content.getBytes(StandardCharsets.UTF_8));
        }
    }
}
