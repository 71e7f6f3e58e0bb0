package org.ventcase.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.properties.HasName;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;

/**
 * The layering of DEVELOPERS.md checked on the compiled classes with ArchUnit, as an allow-list:
 * each package may depend only on the JDK, the packages listed below it and the third-party
 * libraries named for it. A fully qualified name in the code cannot slip past, and a dependency
 * nobody thought to forbid fails too (the import-line check of {@link LayeringTest} stays for the
 * standard-stream rule, which class files cannot show).
 */
class CompiledLayeringTest {

    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS).importPackages("org.ventcase");

    private static final String MATH = "org.apache.commons.math3..";
    private static final String JACKSON = "com.fasterxml.jackson..";

    /**
     * The layers bottom-up, each with the third-party libraries it may use. A package may use every
     * package above it in this list (lower layers), never one below it.
     */
    private static final Map<String, List<String>> LAYERS = new LinkedHashMap<>();

    static {
        LAYERS.put("common", List.of());
        LAYERS.put("units", List.of());
        LAYERS.put("thermo", List.of(MATH));
        LAYERS.put("vessel", List.of(MATH));
        LAYERS.put("inventory", List.of(MATH));
        LAYERS.put("device", List.of(MATH));
        LAYERS.put("relief", List.of(MATH));
        LAYERS.put("calc", List.of(MATH));
        LAYERS.put("review", List.of(MATH));
        LAYERS.put("audit", List.of(MATH));
        LAYERS.put("casefile", List.of(MATH, JACKSON));
        LAYERS.put("report", List.of(MATH, "org.apache.pdfbox.."));
        LAYERS.put("app", List.of(MATH));
        LAYERS.put("ui", List.of(MATH, "javafx..", JACKSON));
        LAYERS.put("cli", List.of(MATH, "picocli.."));
    }

    /** Packages of the same height that must not use each other (both sit on what is below). */
    private static final Map<String, String> SIBLINGS = Map.of("audit", "review");

    @Test
    void everyPackageDependsOnlyOnItsAllowList() {
        List<String> below = new ArrayList<>();
        for (Map.Entry<String, List<String>> layer : LAYERS.entrySet()) {
            String pkg = "org.ventcase." + layer.getKey();
            List<String> allowed = new ArrayList<>(List.of("java..", pkg + ".."));
            for (String b : below) {
                if (!b.equals(SIBLINGS.get(layer.getKey()))) {
                    allowed.add("org.ventcase." + b + "..");
                }
            }
            allowed.addAll(layer.getValue());
            classes().that().resideInAPackage(pkg + "..").should().onlyDependOnClassesThat()
                    .resideInAnyPackage(allowed.toArray(String[]::new))
                    .because("DEVELOPERS.md, Layers: " + layer.getKey() + " sits on " + below)
                    .check(MAIN);
            below.add(layer.getKey());
        }
    }

    @Test
    void everyPackageIsInTheLayerList() {
        // a new package must be placed in the layering before it can be used
        classes().should().resideInAnyPackage(LAYERS.keySet().stream().map(p -> "org.ventcase." + p + "..")
                .toArray(String[]::new)).check(MAIN);
    }

    @Test
    void narrowEdgesInsideTheirPackages() {
        // the wizard's draft (ui.DraftCase) holds the case as a JSON tree between steps: the one ui class on Jackson
        noClasses().that().resideInAPackage("org.ventcase.ui..").and().doNotHaveSimpleName("DraftCase")
                .and().haveNameNotMatching("org\\.ventcase\\.ui\\.DraftCase\\$.*")
                .should().dependOnClassesThat().resideInAPackage(JACKSON).check(MAIN);
        // the sheet takes from the case-file layer only its text blocks
        noClasses().that().resideInAPackage("org.ventcase.report..").should().dependOnClassesThat(
                JavaClass.Predicates.resideInAPackage("org.ventcase.casefile..")
                        .and(DescribedPredicate.not(HasName.Predicates.nameMatching(
                                "org\\.ventcase\\.casefile\\.Templates(\\$.*)?"))))
                .check(MAIN);
    }
}
