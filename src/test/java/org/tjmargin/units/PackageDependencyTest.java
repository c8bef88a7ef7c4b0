package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * The package uses nothing but java.base, and no java.io. Checked on the source text (the test
 * runs from the project directory, as Maven Surefire does by default).
 */
class PackageDependencyTest {

    private static final Path SOURCES = Path.of("src/main/java/org/tjmargin/units");
    private static final List<String> ALLOWED = List.of("java.lang.", "java.math.",
            "java.util.", "org.tjmargin.units.");

    @Test
    void importsOnlyFromTheAllowedPackages() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(SOURCES)) {
            files = s.filter(p -> p.toString().endsWith(".java")).collect(Collectors.toList());
        }
        assertTrue(files.size() >= 5, "sources not found under " + SOURCES.toAbsolutePath());
        for (Path file : files) {
            String source = Files.readString(file, StandardCharsets.UTF_8);
            for (String line : source.split("\n")) {
                String t = line.strip();
                if (t.startsWith("import ")) {
                    String name = t.substring("import ".length()).replace("static ", "");
                    assertTrue(ALLOWED.stream().anyMatch(name::startsWith),
                            file.getFileName() + ": " + t);
                }
            }
            assertFalse(source.contains("java.io."), file.getFileName() + " mentions java.io");
            assertFalse(source.contains("java.nio."), file.getFileName() + " mentions java.nio");
        }
    }
}
