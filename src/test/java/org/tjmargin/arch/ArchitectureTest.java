package org.tjmargin.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/**
 * The direction of dependencies (design 3): the domain knows nothing of files, Jackson, charts or the console, and
 * nothing depends on the command line.
 */
class ArchitectureTest {

    private static final String[] DOMAIN = {"org.tjmargin.device..", "org.tjmargin.thermal..",
        "org.tjmargin.circuit..", "org.tjmargin.solve..", "org.tjmargin.derating..", "org.tjmargin.surge..",
        "org.tjmargin.variation.."};

    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS).importPackages("org.tjmargin");

    @Test
    void domainImportsNoInputOutputLibraries() {
        noClasses().that().resideInAnyPackage(DOMAIN).should().dependOnClassesThat()
                .resideInAnyPackage("com.fasterxml..", "picocli..", "org.jfree..", "java.io..", "java.nio.file..",
                        "org.apache.commons.csv..")
                .check(MAIN);
    }

    @Test
    void domainDoesNotReachUpward() {
        noClasses().that().resideInAnyPackage(DOMAIN).should().dependOnClassesThat()
                .resideInAnyPackage("org.tjmargin.design..", "org.tjmargin.report..", "org.tjmargin.cli..")
                .check(MAIN);
    }

    @Test
    void nothingImportsTheCommandLine() {
        noClasses().that().resideOutsideOfPackage("org.tjmargin.cli..").should().dependOnClassesThat()
                .resideInAPackage("org.tjmargin.cli..").check(MAIN);
    }

    @Test
    void reportDoesNotReadInputFiles() {
        noClasses().that().resideInAPackage("org.tjmargin.report..").should().dependOnClassesThat()
                .resideInAPackage("org.tjmargin.design..").check(MAIN);
    }
}
