package hopstat.cluster;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import hopstat.task.InvalidInputException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BatchScriptOpsTest {

  @TempDir Path tmp;

  private static ClusterRun run(JavaLauncher launcher, List<String> jvm, SlurmSubmitSpec options) {
    return new ClusterRun(ClusterRun.FORMAT, "slurm", 3, "auto", launcher, jvm, options, List.of());
  }

  @Test
  void shardScriptRequestsResourcesAndRunsTheShardOfItsArrayIndex() {
    SlurmSubmitSpec o = new SlurmSubmitSpec(5, "short", "1-00:30:00", 4, "8g", List.of("--qos=x"));
    ClusterRun r =
        run(
            new JavaLauncher("/opt/jdk/bin/java", List.of("-jar", "/opt/hopstat/hopstat.jar")),
            SlurmBackend.jvmOptions(o),
            o);
    String script = BatchScriptOps.shardScript("hopstat-demo", Path.of("/scratch/run1"), r, 2);
    assertThat(script).startsWith("#!/bin/bash\n");
    assertThat(script.lines().filter(l -> l.startsWith("#SBATCH")))
        .containsExactly(
            "#SBATCH --job-name=hopstat-demo",
            "#SBATCH --output=/scratch/run1/cluster/logs/shard-%4a-job%A.out",
            "#SBATCH --nodes=1",
            "#SBATCH --ntasks=1",
            "#SBATCH --cpus-per-task=4",
            "#SBATCH --partition=short",
            "#SBATCH --time=1-00:30:00",
            "#SBATCH --mem=8G");
    // 8 GiB = 8192 MiB; heap 3/4 of it.
    assertThat(script)
        .contains(
            "exec /opt/jdk/bin/java -Xmx6144m -jar /opt/hopstat/hopstat.jar shard /scratch/run1 --index \"${SLURM_ARRAY_TASK_ID}\" --count 3 --threads 4 --linalg auto\n");
    // --extra goes on the command line, not into the script.
    assertThat(script).doesNotContain("--qos");
    assertThat(SlurmBackend.arrayOptions(r, List.of(0, 2)))
        .containsExactly("--array=0,2", "--qos=x");
    assertThat(SlurmBackend.reportOptions(r, "77"))
        .containsExactly("--dependency=afterany:77", "--qos=x");
  }

  @Test
  void reportScriptRunsTheReportCommandOnOneCpu() {
    SlurmSubmitSpec o = new SlurmSubmitSpec(2, null, null, 8, null, List.of());
    String script =
        BatchScriptOps.reportScript(
            "hopstat-demo",
            Path.of("/scratch/run1"),
            run(new JavaLauncher("/usr/bin/java", List.of("-jar", "/h.jar")), List.of(), o),
            1);
    assertThat(script)
        .contains(
            "#SBATCH --job-name=hopstat-demo-report\n",
            "#SBATCH --cpus-per-task=1\n",
            "#SBATCH --output=/scratch/run1/cluster/logs/report-job%j.out\n");
    assertThat(script).doesNotContain("--partition", "--time", "--mem");
    assertThat(script).endsWith("exec /usr/bin/java -jar /h.jar report /scratch/run1\n");
  }

  @Test
  void theScriptPassesAwkwardPathsIntactThroughBash() throws Exception {
    // Runs the generated script with printf standing in for java: each argument the JVM would
    // get is printed in brackets, so quoting mistakes show up as split or mangled arguments.
    JavaLauncher launcher =
        new JavaLauncher(
            "/usr/bin/printf",
            List.of("[%s]\\n", "-jar", "/opt/my apps/it's \"here\"/hopstat $HOME.jar"));
    SlurmSubmitSpec o = new SlurmSubmitSpec(3, null, null, 2, null, List.of());
    Path script = tmp.resolve("s.sbatch");
    Files.writeString(
        script,
        BatchScriptOps.shardScript(
            "hopstat-x", Path.of("/scratch/run-1"), run(launcher, List.of(), o), 1));
    ProcessBuilder pb = new ProcessBuilder("bash", script.toString()).redirectErrorStream(true);
    pb.environment().put("SLURM_ARRAY_TASK_ID", "2");
    Process p = pb.start();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertThat(p.waitFor()).isZero();
    assertThat(out.lines())
        .containsExactly(
            "[-jar]",
            "[/opt/my apps/it's \"here\"/hopstat $HOME.jar]",
            "[shard]",
            "[/scratch/run-1]",
            "[--index]",
            "[2]",
            "[--count]",
            "[3]",
            "[--threads]",
            "[2]",
            "[--linalg]",
            "[auto]");
  }

  @Test
  void runDirectoriesThatSlurmWouldMisreadAreRefused() {
    for (String bad : List.of("/scratch/my run", "/scratch/100%", "/scratch/it's", "/scratch/$x")) {
      assertThatThrownBy(() -> BatchScriptOps.requireSafePath(Path.of(bad)))
          .isInstanceOf(InvalidInputException.class)
          .hasMessageContaining("--out");
    }
    BatchScriptOps.requireSafePath(Path.of("/scratch/run_1.a-b"));
  }

  @Test
  void jobNamesKeepOnlySafeCharacters() {
    assertThat(BatchScriptOps.jobName("QWZ disorder / L=8"))
        .isEqualTo("hopstat-QWZ_disorder___L_8");
    assertThat(BatchScriptOps.jobName("x".repeat(100))).hasSize("hopstat-".length() + 40);
  }
}
