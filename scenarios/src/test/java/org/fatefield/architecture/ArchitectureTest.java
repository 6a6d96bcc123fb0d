package org.fatefield.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.JavaPackage;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The module and package map of DEVELOPERS.md, enforced: dependencies point one way
 * (circuits, engine, viz, scenarios), the numerics and the tissue import no drawing or window
 * types, and no two packages depend on each other, directly or through others.
 */
class ArchitectureTest {

    private static JavaClasses classes;

    @BeforeAll
    static void importProductionClasses() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.fatefield");
    }

    @Test
    void everyModuleIsOnTheClassPath() {
        for (String module : new String[] {"circuits", "engine", "viz", "scenarios"}) {
            assertTrue(
                    classes.stream().anyMatch(c -> c.getPackageName().startsWith("org.fatefield." + module + ".")),
                    "no production class of module " + module + " was imported, so the rules below would pass vacuously");
        }
    }

    @Test
    void circuitsArePureNumerics() {
        noClasses().that().resideInAPackage("org.fatefield.circuits..")
                .should().dependOnClassesThat().resideInAnyPackage("org.fatefield.engine..", "org.fatefield.viz..",
                        "org.fatefield.scenarios..", "sim..", "java.awt..", "javax.swing..", "org.jfree..")
                .check(classes);
    }

    @Test
    void engineDrawsNothing() {
        noClasses().that().resideInAPackage("org.fatefield.engine..")
                .should().dependOnClassesThat().resideInAnyPackage("org.fatefield.viz..", "org.fatefield.scenarios..",
                        "sim.display..", "sim.portrayal..", "java.awt..", "javax.swing..", "org.jfree..")
                .check(classes);
    }

    @Test
    void vizDoesNotReachIntoTheCommandLine() {
        noClasses().that().resideInAPackage("org.fatefield.viz..")
                .should().dependOnClassesThat().resideInAPackage("org.fatefield.scenarios..")
                .check(classes);
    }

    @Test
    void onlyTheTickDrawsFromACellsStream() {
        noClasses().that().resideOutsideOfPackages("org.fatefield.engine.tissue", "org.fatefield.engine.cell")
                .should().dependOnClassesThat().haveFullyQualifiedName("org.fatefield.engine.cell.CellRandom")
                .check(classes);
    }

    @Test
    void everyPackageSaysWhatLivesThere() {
        List<String> missing = new ArrayList<>();
        for (JavaClass c : classes) {
            JavaPackage p = c.getPackage();
            if (p.tryGetPackageInfo().isEmpty() && !missing.contains(p.getName())) {
                missing.add(p.getName());
            }
        }
        assertTrue(missing.isEmpty(), "packages without a package-info.java: " + missing);
    }

    @Test
    void noPackageCycles() {
        slices().matching("org.fatefield.(**)").should().beFreeOfCycles().check(classes);
    }
}
