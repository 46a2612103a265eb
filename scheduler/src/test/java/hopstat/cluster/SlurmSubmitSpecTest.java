package hopstat.cluster;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import hopstat.task.InvalidInputException;
import java.util.List;
import org.junit.jupiter.api.Test;

class SlurmSubmitSpecTest {

  private static SlurmSubmitSpec spec(
      int tasks, String partition, String time, int cpus, String mem, List<String> extra) {
    return new SlurmSubmitSpec(tasks, partition, time, cpus, mem, extra);
  }

  @Test
  void collectsEveryBadOptionWithItsFieldPath() {
    assertThatThrownBy(() -> spec(0, "bad name", "abc", 0, "lots", List.of("--array=1-3")))
        .isInstanceOf(InvalidInputException.class)
        .satisfies(
            e ->
                assertThat(((InvalidInputException) e).violations())
                    .extracting(InvalidInputException.Violation::fieldPath)
                    .containsExactly(
                        "--tasks", "--cpus-per-task", "--partition", "--time", "--mem", "--extra"));
  }

  @Test
  void acceptsSlurmTimeFormats() {
    // The formats sbatch(1) documents for --time (Slurm 22.05 manual): "minutes",
    // "minutes:seconds",
    // "hours:minutes:seconds", "days-hours", "days-hours:minutes", "days-hours:minutes:seconds".
    for (String t :
        List.of("30", "30:00", "01:30:00", "2-0", "2-12:30", "2-12:30:00", "UNLIMITED")) {
      assertThat(spec(1, null, t, 1, null, List.of()).time()).isEqualTo(t);
    }
    for (String t : List.of("abc", "1:2:3:4", "1h", "-5", "01:30:00 ", "2-")) {
      assertThatThrownBy(() -> spec(1, null, t, 1, null, List.of()))
          .isInstanceOf(InvalidInputException.class)
          .hasMessageContaining("--time");
    }
  }

  @Test
  void memoryInMebibytesFollowsSlurmUnits() {
    // sbatch(1): --mem "Default units are megabytes. Different units can be specified using the
    // suffix [K|M|G|T]".
    assertThat(spec(1, null, null, 1, "4G", List.of()).memMebibytes()).isEqualTo(4096);
    assertThat(spec(1, null, null, 1, "1500", List.of()).memMebibytes()).isEqualTo(1500);
    assertThat(spec(1, null, null, 1, "2048k", List.of()).memMebibytes()).isEqualTo(2);
    assertThat(spec(1, null, null, 1, "1T", List.of()).memMebibytes()).isEqualTo(1024 * 1024);
    assertThat(spec(1, null, null, 1, null, List.of()).memMebibytes()).isEqualTo(-1);
  }

  @Test
  void extraSplitsOnWhitespaceAndKeepsQuotedGroups() {
    assertThat(
            SlurmSubmitSpec.splitExtra(
                "  --account=phys   --comment='two words' -q \"short run\" "))
        .containsExactly("--account=phys", "--comment=two words", "-q", "short run");
    assertThat(SlurmSubmitSpec.splitExtra(null)).isEmpty();
    assertThat(SlurmSubmitSpec.splitExtra("''")).containsExactly("");
    assertThatThrownBy(() -> SlurmSubmitSpec.splitExtra("--comment='open"))
        .isInstanceOf(InvalidInputException.class)
        .hasMessageContaining("--extra");
  }

  @Test
  void extraMayNotOverrideWhatHopstatSets() {
    for (String reserved :
        List.of(
            "--dependency=afterok:1",
            "-a",
            "--output=x",
            "-c",
            "--cpus-per-task=4",
            "--wrap=true",
            "-p")) {
      assertThatThrownBy(() -> spec(1, null, null, 1, null, List.of(reserved)))
          .isInstanceOf(InvalidInputException.class)
          .hasMessageContaining("--extra");
    }
    assertThat(spec(1, null, null, 1, null, List.of("--account=phys", "--qos=short")).extra())
        .hasSize(2);
  }

  @Test
  void overridesReplaceOnlyWhatIsGiven() {
    SlurmSubmitSpec s = spec(3, "short", "00:10:00", 2, "1G", List.of("--qos=a"));
    SlurmSubmitSpec t = s.withOverrides(null, "01:00:00", null, null);
    assertThat(t).isEqualTo(spec(3, "short", "01:00:00", 2, "1G", List.of("--qos=a")));
    assertThatThrownBy(() -> s.withOverrides(null, "soon", null, null))
        .isInstanceOf(InvalidInputException.class);
  }
}
