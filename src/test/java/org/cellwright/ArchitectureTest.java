package org.cellwright;

import static com.tngtech.archunit.base.DescribedPredicate.not;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.belongToAnyOf;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import java.io.IOException;
import java.io.ObjectInput;
import java.io.ObjectOutput;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Keeps the layers of docs/architecture: the engine (chem, cell, sim) imports no UI, charts, file I/O or
 * JSON, and arrows point down the list chem, cell, sim, study, io, chart, ui, cli only.
 */
class ArchitectureTest {

    private static JavaClasses classes;

    @BeforeAll
    static void load() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.cellwright");
    }

    /**
     * The one exception to "no java.io" is the Externalizable contract that Commons Math's
     * {@code AbstractStepInterpolator} imposes on every step interpolator ({@code writeExternal(ObjectOutput)},
     * {@code readExternal(ObjectInput)} throwing {@code IOException}); streams, files and readers stay forbidden.
     */
    @Test
    void engineImportsNoUiChartsIoOrJson() {
        DescribedPredicate<JavaClass> forbidden = resideInAnyPackage(
                "javax.swing..", "java.awt..", "org.jfree..", "com.formdev..", "com.fasterxml..",
                "picocli..", "org.tomlj..", "java.io..", "java.nio.file..",
                "org.cellwright.study..", "org.cellwright.io..", "org.cellwright.chart..",
                "org.cellwright.ui..", "org.cellwright.cli..")
                .and(not(belongToAnyOf(ObjectInput.class, ObjectOutput.class, IOException.class)))
                .as("UI, charts, I/O, JSON or upper layers (Externalizable contract types excepted)");
        noClasses().that().resideInAnyPackage("org.cellwright.chem..", "org.cellwright.cell..", "org.cellwright.sim..")
                .should().dependOnClassesThat(forbidden)
                .check(classes);
    }

    @Test
    void chemistryDependsOnNothingAbove() {
        noClasses().that().resideInAPackage("org.cellwright.chem..")
                .should().dependOnClassesThat().resideInAnyPackage("org.cellwright.cell..", "org.cellwright.sim..")
                .check(classes);
    }

    @Test
    void cellDependsOnlyOnChemistry() {
        noClasses().that().resideInAPackage("org.cellwright.cell..")
                .should().dependOnClassesThat().resideInAnyPackage("org.cellwright.sim..")
                .check(classes);
    }

    @Test
    void studyAndIoDoNotReachUp() {
        noClasses().that().resideInAnyPackage("org.cellwright.study..", "org.cellwright.io..", "org.cellwright.chart..")
                .should().dependOnClassesThat().resideInAnyPackage("org.cellwright.ui..", "org.cellwright.cli..")
                .allowEmptyShould(true)
                .check(classes);
        noClasses().that().resideInAnyPackage("org.cellwright.study..", "org.cellwright.io..")
                .should().dependOnClassesThat().resideInAnyPackage("javax.swing..", "org.jfree..", "com.formdev..")
                .allowEmptyShould(true)
                .check(classes);
    }
}
