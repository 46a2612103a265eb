package hopstat.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.fields;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** House rules that hold across all modules (the scheduler's test classpath sees every module). */
class ArchitectureTest {

  static JavaClasses classes;

  @BeforeAll
  static void load() {
    // Only our own modules' classes (directories or hopstat-*.jar), not the large native jars.
    ImportOption ours =
        location ->
            (location.contains("/target/classes") || location.contains("hopstat-"))
                && !location.contains("-tests.jar");
    classes =
        new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .withImportOption(ours)
            .importPackages("hopstat");
  }

  @Test
  void onlyTheCliPrintsToTheTerminal() {
    noClasses()
        .that()
        .resideOutsideOfPackage("hopstat.cli..")
        .should()
        .accessField(System.class, "out")
        .orShould()
        .accessField(System.class, "err")
        .because("library code logs through slf4j; human-facing output belongs to hopstat.cli")
        .check(classes);
  }

  @Test
  void workerKnowsNothingOfSchedulerOrResults() {
    noClasses()
        .that()
        .resideInAnyPackage(
            "hopstat.task..",
            "hopstat.model..",
            "hopstat.lattice..",
            "hopstat.disorder..",
            "hopstat.linalg..",
            "hopstat.invariant..",
            "hopstat.localisation..",
            "hopstat.spectrum..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage(
            "hopstat.spec..",
            "hopstat.expand..",
            "hopstat.queue..",
            "hopstat.pool..",
            "hopstat.cluster..",
            "hopstat.cli..",
            "hopstat.statistics..",
            "hopstat.report..",
            "hopstat.record..")
        .check(classes);
  }

  @Test
  void resultsReadsOnlyRecords() {
    noClasses()
        .that()
        .resideInAnyPackage("hopstat.statistics..", "hopstat.report..", "hopstat.record..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage(
            "hopstat.spec..",
            "hopstat.expand..",
            "hopstat.queue..",
            "hopstat.pool..",
            "hopstat.cli..")
        .check(classes);
  }

  @Test
  void kernelPackagesDoNoFileIo() {
    noClasses()
        .that()
        .resideInAnyPackage(
            "hopstat.invariant..",
            "hopstat.localisation..",
            "hopstat.spectrum..",
            "hopstat.lattice..",
            "hopstat.disorder..")
        .should()
        .dependOnClassesThat()
        .resideInAnyPackage("java.io..", "java.nio.file..")
        .check(classes);
  }

  @Test
  void noPublicMutableStatics() {
    fields().that().areStatic().and().arePublic().should().beFinal().check(classes);
  }

  @Test
  void onlyTheCliExits() {
    noClasses()
        .that()
        .resideOutsideOfPackage("hopstat.cli..")
        .should()
        .callMethod(System.class, "exit", int.class)
        .check(classes);
  }

  @Test
  void internalPackagesStayInternal() {
    noClasses()
        .that()
        .resideOutsideOfPackage("hopstat.linalg..")
        .should()
        .dependOnClassesThat()
        .resideInAPackage("hopstat.linalg.internal..")
        .check(classes);
  }
}
