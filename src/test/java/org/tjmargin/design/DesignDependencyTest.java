package org.tjmargin.design;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/** File handling stays at the edge: only {@code design} (and later {@code report}, {@code cli}) reads files. */
class DesignDependencyTest {

    private static final String[] DOMAIN = {"org.tjmargin.device..", "org.tjmargin.thermal..",
        "org.tjmargin.circuit..", "org.tjmargin.solve..", "org.tjmargin.derating..", "org.tjmargin.surge..",
        "org.tjmargin.variation..", "org.tjmargin.units.."};

    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS).importPackages("org.tjmargin");

    @Test
    void domainDoesNotReadFilesOrKnowJackson() {
        noClasses().that().resideInAnyPackage(DOMAIN).should().dependOnClassesThat()
                .resideInAnyPackage("com.fasterxml.jackson..", "java.io..", "org.tjmargin.design..")
                .check(MAIN);
    }
}
