package hopstat.cli;

import static hopstat.testing.SpecJson.aQwzSpec;
import static org.assertj.core.api.Assertions.assertThat;

import hopstat.testing.Cli;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CommandsTest {

  @TempDir Path tmp;

  @Test
  void checkPrintsThePlanMemoryAndAnEstimate() {
    Path spec =
        aQwzSpec()
            .sweep("W", 0, 1, 2)
            .sizes(4, 6)
            .realisations(10)
            .writeTo(tmp.resolve("spec.json"));
    Cli.Outcome o = Cli.run("check", spec.toString(), "--threads", "2");
    assertThat(o.exitCode()).as(o.err()).isEqualTo(ExitCode.OK);
    assertThat(o.out())
        .contains("grid        W x L = 6 point(s)")
        .contains("10 realisations per point -> 60 tasks")
        .contains("L = 4        matrix dimension N = 32")
        .contains("L = 6        matrix dimension N = 72")
        .contains("timing      L = 6:")
        .contains("wall time for 60 task(s) on 2 thread(s)")
        .contains("ok: spec is valid");
  }

  @Test
  void checkRefusesAStudyThatCannotFitInMemory() {
    Path spec = aQwzSpec().sizes(4000).realisations(1).writeTo(tmp.resolve("spec.json"));
    Cli.Outcome o = Cli.run("check", "--no-timing", spec.toString(), "--threads", "2");
    assertThat(o.exitCode()).isEqualTo(ExitCode.BAD_INPUT);
    assertThat(o.err()).contains("--threads:").contains("N = 32000000").contains("java -Xmx");
  }

  @Test
  void modelsListsEveryModelWithItsClass() {
    Cli.Outcome o = Cli.run("models");
    assertThat(o.exitCode()).isEqualTo(ExitCode.OK);
    assertThat(o.out())
        .contains("qwz  (class A, d = 2)")
        .contains("bott (periodic)")
        .contains("onsite-box");
  }

  @Test
  void everyCommandHasHelp() {
    for (String command :
        new String[] {"check", "run", "resume", "status", "report", "models", "bench", "submit"}) {
      Cli.Outcome o = Cli.run(command, "--help");
      assertThat(o.exitCode()).as(command).isEqualTo(ExitCode.OK);
      assertThat(o.out()).as(command).contains("Usage: hopstat " + command);
    }
  }

  @Test
  void versionNamesTheBuild() {
    Cli.Outcome o = Cli.run("--version");
    assertThat(o.exitCode()).isEqualTo(ExitCode.OK);
    assertThat(o.out()).startsWith("hopstat ");
  }

  @Test
  void verboseShowsTheStackTrace() {
    Cli.Outcome o = Cli.run("report", "--verbose", tmp.resolve("nothing").toString());
    assertThat(o.exitCode()).isEqualTo(ExitCode.RUNTIME_FAILURE);
    assertThat(o.err()).contains("is not a hopstat run directory").contains("at hopstat.");
  }

  /**
   * The CLI's logging configuration must parse (a broken one prints a stack trace on every start).
   */
  @Test
  void loggingConfigurationIsWellFormedXml() throws Exception {
    try (var in = HopstatCommand.class.getResourceAsStream("/logback.xml")) {
      assertThat(in).isNotNull();
      javax.xml.parsers.DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(in);
    }
  }
}
