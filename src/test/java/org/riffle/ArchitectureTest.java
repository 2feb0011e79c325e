package org.riffle;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The layering of ARCHITECTURE.md as executable rules: data flows one way, log → engines → triage →
 * faces; only {@code tui} imports Lanterna, only {@code cli} imports picocli; engines import no face.
 */
class ArchitectureTest {
    private static JavaClasses classes;

    @BeforeAll
    static void importClasses() {
        classes = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.riffle");
    }

    @Test
    void noPackageCycles() {
        slices().matching("org.riffle.(*)..").should().beFreeOfCycles().check(classes);
    }

    @Test
    void onlyTheScreenImportsLanterna() {
        noClasses().that().resideOutsideOfPackage("org.riffle.tui..")
                .should().dependOnClassesThat().resideInAPackage("com.googlecode.lanterna..")
                .check(classes);
    }

    @Test
    void onlyTheCommandLineImportsPicocli() {
        noClasses().that().resideOutsideOfPackage("org.riffle.cli..")
                .should().dependOnClassesThat().resideInAPackage("picocli..")
                .check(classes);
    }

    @Test
    void logDependsOnNoOtherRifflePackage() {
        noClasses().that().resideInAPackage("org.riffle.log..")
                .should().dependOnClassesThat().resideInAnyPackage("org.riffle.signal..", "org.riffle.embed..",
                        "org.riffle.recurrence..", "org.riffle.reservoir..", "org.riffle.triage..",
                        "org.riffle.note..", "org.riffle.tui..", "org.riffle.cli..")
                .check(classes);
    }

    @Test
    void enginesImportNoFaceAndNoTriage() {
        noClasses().that().resideInAnyPackage("org.riffle.signal..", "org.riffle.embed..",
                        "org.riffle.recurrence..", "org.riffle.reservoir..")
                .should().dependOnClassesThat().resideInAnyPackage("org.riffle.triage..", "org.riffle.note..",
                        "org.riffle.tui..", "org.riffle.cli..")
                .check(classes);
    }

    @Test
    void triageImportsNoFace() {
        noClasses().that().resideInAPackage("org.riffle.triage..")
                .should().dependOnClassesThat().resideInAnyPackage("org.riffle.note..", "org.riffle.tui..",
                        "org.riffle.cli..")
                .check(classes);
    }

    @Test
    void facesReadAssessmentsNotEngines() {
        noClasses().that().resideInAnyPackage("org.riffle.note..", "org.riffle.tui..")
                .should().dependOnClassesThat().resideInAnyPackage("org.riffle.embed..",
                        "org.riffle.recurrence..", "org.riffle.reservoir..")
                .check(classes);
    }

    @Test
    void noteImportsNoScreen() {
        noClasses().that().resideInAPackage("org.riffle.note..")
                .should().dependOnClassesThat().resideInAnyPackage("org.riffle.tui..", "org.riffle.cli..")
                .check(classes);
    }
}
