package org.holdpoint.ui;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The window's dependency rules: a thin shell over workflow (see ArchitectureTest for the package rules). */
class UiArchitectureTest {
    private static JavaClasses classes;

    @BeforeAll
    static void load() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.holdpoint");
    }

    @Test
    void uiGoesThroughWorkflowOnly() {
        noClasses().that().resideInAPackage("org.holdpoint.ui..").should().dependOnClassesThat()
                .resideInAnyPackage("org.holdpoint.cli..", "org.holdpoint.importer..", "org.holdpoint.report..",
                        "org.holdpoint.archive..")
                .check(classes);
    }

    @Test
    void presentationModelsKnowNoSwingComponents() {
        noClasses().that().resideInAPackage("org.holdpoint.ui.model..").should().dependOnClassesThat()
                .resideInAnyPackage("javax.swing..", "java.awt..", "org.holdpoint.ui.swing..", "org.jfree..")
                .check(classes);
    }

    @Test
    void noOtherLayerSeesTheWindow() {
        noClasses().that().resideInAnyPackage("org.holdpoint.cli..", "org.holdpoint.workflow..",
                "org.holdpoint.study..", "org.holdpoint.stats..", "org.holdpoint.chart..", "org.holdpoint.report..",
                "org.holdpoint.importer..").should().dependOnClassesThat().resideInAPackage("org.holdpoint.ui..")
                .check(classes);
    }

    @Test
    void workflowStaysFreeOfSwing() {
        noClasses().that().resideInAPackage("org.holdpoint.workflow..").should().dependOnClassesThat()
                .resideInAnyPackage("javax.swing..", "org.holdpoint.cli..")
                .check(classes);
    }
}
