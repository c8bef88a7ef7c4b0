package org.tjmargin.variation;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/**
 * The variation values ({@code org.tjmargin.variation}) are used by {@code circuit} and {@code solve}, so they must
 * not depend back on them: the engines that solve positions live in {@code variation.statistical} (design 3).
 */
class VariationDependencyTest {

    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS).importPackages("org.tjmargin");

    @Test
    void variationValuesDependOnNoSolverPackage() {
        noClasses().that().resideInAPackage("org.tjmargin.variation").should().dependOnClassesThat()
                .resideInAnyPackage("org.tjmargin.solve..", "org.tjmargin.circuit..", "org.tjmargin.derating..",
                        "org.tjmargin.device..", "org.tjmargin.thermal..", "org.tjmargin.surge..",
                        "org.tjmargin.variation.statistical..")
                .check(MAIN);
    }
}
