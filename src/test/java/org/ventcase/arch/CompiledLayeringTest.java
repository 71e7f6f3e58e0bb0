package org.ventcase.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;

/**
 * The layering of DEVELOPERS.md checked on the compiled classes (ArchUnit), so that a fully
 * qualified name in the code cannot slip past the import-line check of {@link LayeringTest}: each
 * domain package may depend only on java.*, Commons Math and the packages below it.
 */
class CompiledLayeringTest {

    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS).importPackages("org.ventcase");

    /** Package -> packages it must not depend on (the same layering as LayeringTest). */
    private static final Map<String, List<String>> FORBIDDEN = Map.ofEntries(
            Map.entry("common", List.of("org.ventcase.units..", "org.ventcase.thermo..", "org.ventcase.vessel..",
                    "org.ventcase.inventory..", "org.ventcase.relief..", "org.ventcase.device..", "org.ventcase.calc..",
                    "org.ventcase.casefile..", "org.ventcase.report..", "org.ventcase.cli..", "org.ventcase.ui..")),
            Map.entry("thermo", List.of("org.ventcase.vessel..", "org.ventcase.inventory..", "org.ventcase.relief..",
                    "org.ventcase.device..", "org.ventcase.calc..", "org.ventcase.audit..", "org.ventcase.review..",
                    "org.ventcase.casefile..", "org.ventcase.report..", "org.ventcase.cli..", "org.ventcase.ui..")),
            Map.entry("vessel", List.of("org.ventcase.thermo..", "org.ventcase.relief..", "org.ventcase.device..",
                    "org.ventcase.calc..", "org.ventcase.casefile..", "org.ventcase.report..", "org.ventcase.cli..",
                    "org.ventcase.ui..")),
            Map.entry("inventory", List.of("org.ventcase.relief..", "org.ventcase.device..", "org.ventcase.calc..",
                    "org.ventcase.casefile..", "org.ventcase.report..", "org.ventcase.cli..", "org.ventcase.ui..")),
            Map.entry("relief", List.of("org.ventcase.calc..", "org.ventcase.audit..", "org.ventcase.review..",
                    "org.ventcase.casefile..", "org.ventcase.report..", "org.ventcase.cli..", "org.ventcase.ui..")),
            Map.entry("device", List.of("org.ventcase.calc..", "org.ventcase.casefile..", "org.ventcase.report..",
                    "org.ventcase.cli..", "org.ventcase.ui..")),
            Map.entry("calc", List.of("org.ventcase.casefile..", "org.ventcase.report..", "org.ventcase.cli..",
                    "org.ventcase.ui..")),
            Map.entry("review", List.of("org.ventcase.casefile..", "org.ventcase.report..", "org.ventcase.cli..",
                    "org.ventcase.ui..")),
            Map.entry("app", List.of("org.ventcase.cli..", "org.ventcase.ui..")),
            Map.entry("audit", List.of("org.ventcase.casefile..", "org.ventcase.report..", "org.ventcase.cli..",
                    "org.ventcase.ui..")));

    /** Third-party libraries that belong to one edge each. */
    private static final List<String> EDGE_LIBRARIES = List.of("com.fasterxml..", "picocli..", "org.apache.pdfbox..",
            "javafx..");

    @Test
    void domainPackagesDependOnlyOnLowerLayersAndNoEdgeLibrary() {
        for (Map.Entry<String, List<String>> e : FORBIDDEN.entrySet()) {
            String pkg = "org.ventcase." + e.getKey() + "..";
            noClasses().that().resideInAPackage(pkg).should().dependOnClassesThat()
                    .resideInAnyPackage(e.getValue().toArray(String[]::new)).check(MAIN);
            noClasses().that().resideInAPackage(pkg).should().dependOnClassesThat()
                    .resideInAnyPackage(EDGE_LIBRARIES.toArray(String[]::new)).check(MAIN);
        }
    }

    @Test
    void eachEdgeLibraryStaysInItsEdge() {
        // the wizard's draft (ui.DraftCase) holds the case as a JSON tree between steps, so ui is the
        // one package besides casefile that may use Jackson; app, the application layer, may not
        noClasses().that().resideOutsideOfPackages("org.ventcase.casefile..", "org.ventcase.ui").should()
                .dependOnClassesThat().resideInAPackage("com.fasterxml..").check(MAIN);
        noClasses().that().resideOutsideOfPackages("org.ventcase.cli..").should().dependOnClassesThat()
                .resideInAPackage("picocli..").check(MAIN);
        noClasses().that().resideOutsideOfPackages("org.ventcase.report..").should().dependOnClassesThat()
                .resideInAPackage("org.apache.pdfbox..").check(MAIN);
        noClasses().that().resideOutsideOfPackages("org.ventcase.ui").should().dependOnClassesThat()
                .resideInAPackage("javafx..").check(MAIN);
    }
}
