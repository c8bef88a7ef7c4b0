package org.tjmargin.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;
import picocli.CommandLine;

/** The tool's version, from the build (Maven filters {@code version.properties}). */
public final class VersionProvider implements CommandLine.IVersionProvider {

    /** The version string, e.g. {@code 0.1.0-SNAPSHOT}. */
    public static String version() {
        try (InputStream in = VersionProvider.class.getResourceAsStream("version.properties")) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public String[] getVersion() {
        return new String[] {"tjmargin " + version(),
            "Junction temperature, derating and surge margins of breakdown diodes."};
    }
}
