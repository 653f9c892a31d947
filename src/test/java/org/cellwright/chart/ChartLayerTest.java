package org.cellwright.chart;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/**
 * The chart package is shared by the headless command line and the window: it draws with JFreeChart and
 * Java 2D but uses no Swing components, FlatLaf or GPL-licensed JFree SVG/PDF.
 */
class ChartLayerTest {

    @Test
    void chartsStayHeadlessAndFreeOfGplExporters() {
        JavaClasses classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.cellwright.chart");
        noClasses().that().resideInAPackage("org.cellwright.chart..")
                .should().dependOnClassesThat().resideInAnyPackage("javax.swing..", "com.formdev..",
                        "org.jfree.svg..", "org.jfree.pdf..", "org.jfree.chart.swing..", "org.cellwright.ui..",
                        "org.cellwright.cli..")
                .check(classes);
        noClasses().that().resideInAPackage("org.cellwright.chart..")
                .should().dependOnClassesThat().haveFullyQualifiedName("org.jfree.chart.ChartPanel")
                .check(classes);
    }
}
