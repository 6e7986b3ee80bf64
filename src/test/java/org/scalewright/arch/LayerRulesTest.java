package org.scalewright.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.fields;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.Architectures.layeredArchitecture;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.JavaMethodCall;
import com.tngtech.archunit.core.domain.JavaModifier;
import java.io.FileOutputStream;
import java.io.FileWriter;
import java.util.Set;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The layer rule of DESIGN §6: model → physics → design → io → chart → report → cli | app, each
 * depending only on those before it; only cli writes to standard output; only app imports
 * JavaFX; cli and app do not depend on each other. The root package holds only the launcher,
 * which may call cli and app. Also the conventions of DEVELOPERS.md that can be checked: the
 * window's rooms, one home per library, files written only through io, an immutable model.
 */
class LayerRulesTest {
    private static JavaClasses classes;

    @BeforeAll
    static void importClasses() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.scalewright");
    }

    @Test
    void layersDependOnlyOnTheLayersBeforeThem() {
        layeredArchitecture().consideringOnlyDependenciesInLayers()
                .layer("model").definedBy("org.scalewright.model..")
                .layer("physics").definedBy("org.scalewright.physics..")
                .layer("design").definedBy("org.scalewright.design..")
                .layer("io").definedBy("org.scalewright.io..")
                .layer("archive").definedBy("org.scalewright.archive..")
                .layer("chart").definedBy("org.scalewright.chart..")
                .layer("report").definedBy("org.scalewright.report..")
                .layer("cli").definedBy("org.scalewright.cli..")
                .layer("app").definedBy("org.scalewright.app..")
                .layer("launcher").definedBy("org.scalewright")
                .whereLayer("launcher").mayNotBeAccessedByAnyLayer()
                .whereLayer("app").mayOnlyBeAccessedByLayers("launcher")
                .whereLayer("cli").mayOnlyBeAccessedByLayers("launcher")
                .whereLayer("report").mayOnlyBeAccessedByLayers("cli", "app")
                .whereLayer("chart").mayOnlyBeAccessedByLayers("report", "cli", "app")
                .whereLayer("archive").mayOnlyBeAccessedByLayers("cli", "app")
                .whereLayer("io").mayOnlyBeAccessedByLayers("chart", "report", "archive", "cli", "app")
                .whereLayer("design").mayOnlyBeAccessedByLayers("io", "archive", "chart", "report", "cli", "app")
                .whereLayer("physics").mayOnlyBeAccessedByLayers("design", "io", "archive", "chart", "report", "cli",
                        "app")
                .withOptionalLayers(true)
                .check(classes);
    }

    @Test
    void onlyTheCommandLineWritesToStandardOutput() {
        noClasses().that().resideOutsideOfPackage("org.scalewright.cli..")
                .should().accessField(System.class, "out")
                .orShould().accessField(System.class, "err")
                .check(classes);
    }

    @Test
    void onlyTheDesktopAppUsesJavaFx() {
        noClasses().that().resideOutsideOfPackage("org.scalewright.app..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..", "org.jfree.chart.fx..")
                .check(classes);
    }

    @Test
    void engineLayersDoNoInputOrOutput() {
        noClasses().that().resideInAnyPackage("org.scalewright.model..", "org.scalewright.physics..",
                        "org.scalewright.design..")
                .should().dependOnClassesThat().resideInAnyPackage("java.io..", "java.nio.file..", "com.opencsv..")
                .check(classes);
    }

    @Test
    void chartsAreBuiltWithoutTheGuiToolkit() {
        noClasses().that().resideInAPackage("org.scalewright.chart..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..", "org.scalewright.app..")
                .allowEmptyShould(true)
                .check(classes);
    }

    @Test
    void theWindowsRoomsHaveNoCycles() {
        slices().matching("org.scalewright.app.(*)..").should().beFreeOfCycles().check(classes);
    }

    @Test
    void eachToolStandsOnTheSharedRoomsOnly() {
        layeredArchitecture().consideringOnlyDependenciesInLayers()
                .layer("window").definedBy("org.scalewright.app")
                .layer("tools").definedBy("org.scalewright.app.rescale..", "org.scalewright.app.wirecheck..",
                        "org.scalewright.app.diagnosis..", "org.scalewright.app.stretch..",
                        "org.scalewright.app.export..", "org.scalewright.app.archive..")
                .layer("tool parts").definedBy("org.scalewright.app.tool..")
                .layer("table and curves").definedBy("org.scalewright.app.table..", "org.scalewright.app.curves..")
                .layer("session").definedBy("org.scalewright.app.session..")
                .whereLayer("window").mayNotBeAccessedByAnyLayer()
                .whereLayer("tools").mayOnlyBeAccessedByLayers("window")
                .whereLayer("tool parts").mayOnlyBeAccessedByLayers("window", "tools")
                .whereLayer("table and curves").mayOnlyBeAccessedByLayers("window", "tools", "tool parts")
                .check(classes);
        for (String tool : new String[] {"rescale", "wirecheck", "diagnosis", "stretch", "export", "archive"}) {
            noClasses().that().resideInAPackage("org.scalewright.app." + tool + "..")
                    .should().dependOnClassesThat().resideInAnyPackage(otherTools(tool))
                    .check(classes);
        }
    }

    private static String[] otherTools(String tool) {
        return java.util.stream.Stream.of("rescale", "wirecheck", "diagnosis", "stretch", "export", "archive")
                .filter(t -> !t.equals(tool)).map(t -> "org.scalewright.app." + t + "..").toArray(String[]::new);
    }

    @Test
    void eachLibraryHasOneHome() {
        noClasses().that().resideOutsideOfPackage("org.scalewright.cli..")
                .should().dependOnClassesThat().resideInAPackage("picocli..").check(classes);
        noClasses().that().resideOutsideOfPackage("org.scalewright.report..")
                .should().dependOnClassesThat().resideInAPackage("org.apache.pdfbox..").check(classes);
        noClasses().that().resideOutsideOfPackages("org.scalewright.io..", "org.scalewright.report..")
                .should().dependOnClassesThat().resideInAPackage("com.opencsv..").check(classes);
        noClasses().that().resideOutsideOfPackages("org.scalewright.chart..", "org.scalewright.report..",
                        "org.scalewright.app..")
                .should().dependOnClassesThat().resideInAPackage("org.jfree..").check(classes);
        noClasses().that().resideOutsideOfPackage("org.scalewright.archive..")
                .should().dependOnClassesThat().resideInAnyPackage("java.sql..", "org.sqlite..")
                .because("only the workshop archive uses JDBC and SQLite").check(classes);
    }

    @Test
    void filesAreWrittenOnlyThroughTheFileWritersOfIo() {
        noClasses().that().resideOutsideOfPackage("org.scalewright.io..")
                .should().callMethodWhere(target("java.nio.file.Files", "write", "writeString", "newOutputStream",
                        "newBufferedWriter", "move", "copy"))
                .orShould().callConstructor(FileOutputStream.class, String.class)
                .orShould().callConstructor(FileWriter.class, String.class)
                .because("a user's file is written through a temporary file and a move (io.AtomicFiles), a log through io.LogFiles")
                .check(classes);
    }

    private static DescribedPredicate<JavaMethodCall> target(String owner,
            String... names) {
        Set<String> set = Set.of(names);
        return DescribedPredicate.describe(owner + " " + set, call -> call.getTargetOwner().getName().equals(owner)
                && set.contains(call.getName()));
    }

    @Test
    void modelValuesAreImmutable() {
        fields().that().areDeclaredInClassesThat(publicOrPackageTypesIn("org.scalewright.model"))
                .should().beFinal()
                .because("the model is immutable values; a change makes a new value")
                .check(classes);
    }

    private static DescribedPredicate<JavaClass> publicOrPackageTypesIn(String pkg) {
        return DescribedPredicate.describe("types of " + pkg + " that are not private helpers",
                c -> c.getPackageName().startsWith(pkg) && !c.getModifiers().contains(JavaModifier.PRIVATE));
    }

    @Test
    void aViewTalksToItsViewModelNotToTheSession() {
        noClasses().that().haveSimpleNameEndingWith("View")
                .should().callMethodWhere(DescribedPredicate.describe("a method of ScaleSession",
                        call -> call.getTargetOwner().getName().equals("org.scalewright.app.session.ScaleSession")))
                .check(classes);
    }
}
