package org.holdpoint;

import static com.tngtech.archunit.base.DescribedPredicate.describe;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.fields;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;
import java.util.Arrays;
import java.util.Set;

/**
 * The package dependency rules (DEVELOPERS.md, "Packages": stats pure, study the model, adapters apart,
 * result the rules of the verdict, workflow the use cases, thin shells; docs/architecture.md), one rule per
 * direction, checked on the main classes. ArchUnit fails a rule whose "that" finds no class, so a renamed
 * package breaks its rules instead of passing them.
 */
@AnalyzeClasses(packages = "org.holdpoint", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {
    private static final String ROOT = "org.holdpoint";
    private static final String STATS = ROOT + ".stats..";
    private static final String STUDY = ROOT + ".study..";
    private static final String RESULT = ROOT + ".result..";
    private static final String IMPORTER = ROOT + ".importer..";
    private static final String CHART = ROOT + ".chart..";
    private static final String REPORT = ROOT + ".report..";
    private static final String ARCHIVE = ROOT + ".archive..";
    private static final String WORKFLOW = ROOT + ".workflow..";
    private static final String CLI = ROOT + ".cli..";
    private static final String UI = ROOT + ".ui..";
    private static final String FILES = ROOT + ".files..";
    private static final String[] PROJECT = {STATS, STUDY, RESULT, FILES, IMPORTER, CHART, REPORT, ARCHIVE, WORKFLOW,
        CLI, UI};

    private static final String[] IO_AND_UI = {"java.io..", "java.nio.file..", "java.awt..", "javax.swing..",
        "java.sql..", "javax.sql..", "org.apache.poi..", "org.jfree.."};

    /** Every project package except the given ones. */
    private static String[] projectExcept(String... allowed) {
        Set<String> keep = Set.of(allowed);
        return Arrays.stream(PROJECT).filter(p -> !keep.contains(p)).toArray(String[]::new);
    }

    // ---- stats: pure numerics ----

    @ArchTest
    static final ArchRule statsDependsOnNoOtherProjectPackage = noClasses().that().resideInAPackage(STATS)
            .should().dependOnClassesThat().resideInAnyPackage(projectExcept(STATS))
            .orShould().dependOnClassesThat().resideInAPackage(ROOT);

    @ArchTest
    static final ArchRule statsHasNoIoDatabaseOrUi = noClasses().that().resideInAPackage(STATS)
            .should().dependOnClassesThat().resideInAnyPackage(IO_AND_UI)
            .because("stats is pure numerics (no java.io, java.nio.file, AWT/Swing, JDBC, POI, JFreeChart)");

    @ArchTest
    static final ArchRule statsUsesOnlyTheJdkAndCommonsMath = classes().that().resideInAPackage(STATS)
            .should().onlyDependOnClassesThat().resideInAnyPackage("java..", "org.apache.commons.math3..", STATS);

    // ---- study: model and ports, depends only on stats ----

    @ArchTest
    static final ArchRule studyDependsOnlyOnStats = noClasses().that().resideInAPackage(STUDY)
            .should().dependOnClassesThat().resideInAnyPackage(projectExcept(STATS, STUDY))
            .orShould().dependOnClassesThat().resideInAPackage(ROOT);

    @ArchTest
    static final ArchRule studyHasNoFileDatabaseOrUi = noClasses().that().resideInAPackage(STUDY)
            .should().dependOnClassesThat().resideInAnyPackage("java.nio.file..", "java.awt..", "javax.swing..",
                    "java.sql..", "javax.sql..", "org.apache.poi..", "org.jfree..")
            .orShould().dependOnClassesThat(describe("java.io file classes", (JavaClass c) ->
                    c.getPackageName().equals("java.io")
                            && (c.getSimpleName().startsWith("File") || c.getSimpleName().equals("RandomAccessFile"))));

    // ---- result: the result model and the verdict rules, on the model and the numerics only ----

    @ArchTest
    static final ArchRule resultDependsOnlyOnStudyAndStats = noClasses().that().resideInAPackage(RESULT)
            .should().dependOnClassesThat().resideInAnyPackage(projectExcept(STATS, STUDY, RESULT))
            .orShould().dependOnClassesThat().resideInAPackage(ROOT);

    @ArchTest
    static final ArchRule resultHasNoIoDatabaseOrUi = noClasses().that().resideInAPackage(RESULT)
            .should().dependOnClassesThat().resideInAnyPackage(IO_AND_UI);

    @ArchTest
    static final ArchRule studyNeverSeesTheResults = noClasses().that().resideInAPackage(STUDY)
            .should().dependOnClassesThat().resideInAPackage(RESULT)
            .because("the model of the study's inputs is read by the rules, never the other way round");

    // ---- files: the one atomic-write and hash helper, a leaf every adapter may use ----

    @ArchTest
    static final ArchRule filesUsesOnlyTheJdk = classes().that().resideInAPackage(FILES)
            .should().onlyDependOnClassesThat().resideInAnyPackage("java..", FILES);

    @ArchTest
    static final ArchRule oneAtomicWriter = noClasses().that().resideOutsideOfPackage(FILES)
            .should().accessField(java.nio.file.StandardCopyOption.class, "ATOMIC_MOVE")
            .because("every output is written by files.AtomicFiles (temporary file, one move, cleanup on failure)");

    @ArchTest
    static final ArchRule oneHashHelper = noClasses().that().resideOutsideOfPackage(FILES)
            .should().callMethod(java.security.MessageDigest.class, "getInstance", String.class)
            .because("every SHA-256 is computed by files.Sha256");

    // ---- adapters: importer, chart, report, archive depend on study/result/stats (and files) only, never on each other ----

    @ArchTest
    static final ArchRule importerDependsOnlyOnStudyAndStats = adapterRule(IMPORTER);

    @ArchTest
    static final ArchRule chartDependsOnlyOnStudyAndStats = adapterRule(CHART);

    @ArchTest
    static final ArchRule reportDependsOnlyOnStudyAndStats = adapterRule(REPORT);

    @ArchTest
    static final ArchRule archiveDependsOnlyOnStudyAndStats = adapterRule(ARCHIVE);

    private static ArchRule adapterRule(String adapter) {
        return noClasses().that().resideInAPackage(adapter)
                .should().dependOnClassesThat().resideInAnyPackage(projectExcept(STATS, STUDY, RESULT, FILES, adapter))
                .orShould().dependOnClassesThat().resideInAPackage(ROOT);
    }

    @ArchTest
    static final ArchRule reportNeverImportsJFreeChart = noClasses().that().resideInAPackage(REPORT)
            .should().dependOnClassesThat().resideInAPackage("org.jfree..")
            .because("the report embeds an already rendered PNG received as bytes");

    @ArchTest
    static final ArchRule chartNeverImportsPoi = noClasses().that().resideInAPackage(CHART)
            .should().dependOnClassesThat().resideInAPackage("org.apache.poi..");

    // ---- workflow: use cases ----

    @ArchTest
    static final ArchRule workflowNeverImportsShellsSwingOrJdbc = noClasses().that().resideInAPackage(WORKFLOW)
            .should().dependOnClassesThat().resideInAnyPackage(CLI, UI, ROOT, "javax.swing..", "java.sql..",
                    "javax.sql..");

    @ArchTest
    static final ArchRule workflowReachesTheArchiveOnlyThroughItsPort = noClasses().that().resideInAPackage(WORKFLOW)
            .should().dependOnClassesThat().resideInAPackage(ARCHIVE);

    @ArchTest
    static final ArchRule noMutableStaticStateBelowTheShells = fields().that().areStatic()
            .and().areDeclaredInClassesThat().resideInAnyPackage(STATS, STUDY, RESULT, WORKFLOW, IMPORTER, REPORT, CHART)
            // the one exception mirrors POI's own process-wide temporary-file setting, made once per process
            .and().areNotDeclaredIn("org.holdpoint.report.PoiTempFiles")
            .should().beFinal()
            .because("adapters reach the use cases through constructors from the composition root, never through a "
                    + "static locator that one caller can change under another");

    // ---- cli and ui: thin shells over workflow ----

    @ArchTest
    static final ArchRule cliNeverImportsUi = noClasses().that().resideInAPackage(CLI)
            .should().dependOnClassesThat().resideInAPackage(UI);

    @ArchTest
    static final ArchRule uiNeverImportsCli = noClasses().that().resideInAPackage(UI)
            .should().dependOnClassesThat().resideInAPackage(CLI);

    @ArchTest
    static final ArchRule cliGoesThroughWorkflow = noClasses().that().resideInAPackage(CLI)
            .should().dependOnClassesThat().resideInAnyPackage(IMPORTER, REPORT, ARCHIVE, CHART, ROOT);

    @ArchTest
    static final ArchRule uiGoesThroughWorkflow = noClasses().that().resideInAPackage(UI)
            .should().dependOnClassesThat().resideInAnyPackage(IMPORTER, REPORT, ARCHIVE, ROOT)
            .because("ui may use chart to show a chart panel, everything else through workflow");

    // ---- the root package is the composition root ----

    @ArchTest
    static final ArchRule onlyTheRootPackageUsesArchiveClasses = classes().that().resideInAPackage(ARCHIVE)
            .should().onlyHaveDependentClassesThat().resideInAnyPackage(ROOT, ARCHIVE);

    // ---- third-party libraries stay in their package ----

    @ArchTest
    static final ArchRule onlyCliUsesPicocli = noClasses().that().resideOutsideOfPackages(CLI, ROOT)
            .should().dependOnClassesThat().resideInAPackage("picocli..");

    @ArchTest
    static final ArchRule onlyImporterAndReportUsePoi = noClasses().that()
            .resideOutsideOfPackages(IMPORTER, REPORT)
            .should().dependOnClassesThat().resideInAPackage("org.apache.poi..");

    @ArchTest
    static final ArchRule onlyArchiveUsesJdbc = noClasses().that().resideOutsideOfPackages(ARCHIVE, ROOT)
            .should().dependOnClassesThat().resideInAnyPackage("java.sql..", "javax.sql..");

    @ArchTest
    static final ArchRule onlyUiUsesSwing = noClasses().that().resideOutsideOfPackages(UI, ROOT)
            .should().dependOnClassesThat().resideInAPackage("javax.swing..");

    @ArchTest
    static final ArchRule onlyChartAndUiUseJFreeChart = noClasses().that().resideOutsideOfPackages(CHART, UI)
            .should().dependOnClassesThat().resideInAPackage("org.jfree..");

    // ---- no cycles ----

    @ArchTest
    static final ArchRule noCyclesBetweenPackages = slices().matching("org.holdpoint.(*)..").should()
            .beFreeOfCycles();
}
