package hopstat.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import hopstat.testing.Cli;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A small real study through the CLI: 3D Anderson model (class AI with on-site box disorder), two
 * sizes, transfer matrix at E = 0 and level statistics in 8 windows; the mobility section of
 * summary.json, mobility.csv and the report section must exist and be well formed. The grid is L
 * alone (one energy) to keep the run and the report's figures under ~20 s.
 */
class MobilityReportTest {

  @TempDir Path tmp;

  private static final String SPEC =
      """
      {
        "name": "mobility-it",
        "seed": 7,
        "model": "anderson",
        "parameters": {"dim": 3, "L": [4, 6], "W": 12, "energy": 0,
                       "windows": 8, "windowMin": -8, "windowMax": 8, "lyapunovError": 0.05},
        "disorder": [{"type": "onsite-box", "strength": "W"}],
        "boundary": "periodic",
        "observables": ["lyapunov", "level-ratio"],
        "realisations": 4
      }
      """;

  @Test
  void aRealStudyGetsAWellFormedMobilitySection() throws IOException {
    Path spec = tmp.resolve("spec.json");
    Files.writeString(spec, SPEC);
    Path out = tmp.resolve("run");
    Cli.Outcome run =
        Cli.run("run", spec.toString(), "--out", out.toString(), "--threads", "2", "--quiet");
    assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCode.OK);

    JsonNode m = new ObjectMapper().readTree(out.resolve("summary.json").toFile()).get("mobility");
    assertThat(m).isNotNull();
    // the scheduler passes the effective class: on-site box disorder keeps T (T² = +1) → AI → GOE
    assertThat(m.get("conventions").get("effectiveClass").asText()).isEqualTo("AI");
    assertThat(m.get("conventions").get("wignerDysonEnsemble").asText()).isEqualTo("GOE");

    Set<String> methods = new java.util.TreeSet<>();
    for (JsonNode c : m.get("curves")) {
      methods.add(c.get("method").asText());
      assertThat(c.get("size").asDouble()).isIn(4.0, 6.0);
      double previous = Double.NEGATIVE_INFINITY;
      for (JsonNode p : c.get("points")) {
        assertThat(p.get("position").asDouble()).isGreaterThan(previous);
        previous = p.get("position").asDouble();
        assertThat(p.get("n").asInt()).isBetween(1, 4);
        assertThat(p.get("ci95")).hasSize(2);
        assertThat(p.get("state").asText()).isIn("", "localised", "extended", "undecided");
      }
    }
    assertThat(methods).containsExactly("LEVEL_RATIO", "TRANSFER_MATRIX");

    List<JsonNode> gaps = new ArrayList<>();
    m.get("gaps").forEach(gaps::add);
    // energy is not a grid axis, so only level statistics give a gap (the transfer matrix
    // classifies E = 0)
    assertThat(gaps)
        .singleElement()
        .satisfies(
            g -> {
              assertThat(g.get("method").asText()).isEqualTo("LEVEL_RATIO");
              assertThat(g.get("sizeLow").asDouble()).isEqualTo(4.0);
              assertThat(g.get("sizeHigh").asDouble()).isEqualTo(6.0);
            });
    for (JsonNode g : gaps) {
      assertThat(g.get("reference").asDouble()).isEqualTo(0.0);
      double half = g.get("halfWidth").asDouble();
      assertThat(half).isGreaterThanOrEqualTo(0);
      assertThat(g.get("halfWidthCi95").get(0).asDouble())
          .isLessThanOrEqualTo(g.get("halfWidthCi95").get(1).asDouble());
      assertThat(g.get("insideFraction").asDouble()).isBetween(0.0, 1.0);
    }
    // W = 12 lies below the critical disorder W_c ≈ 16.5 of the 3D orthogonal Anderson model at E =
    // 0
    // (Slevin & Ohtsuki, PRL 82, 382 (1999)), so E = 0 is not localised: Λ must not fall with M
    // there
    // with a resolved interval.
    JsonNode largeLambda = null;
    for (JsonNode c : m.get("curves")) {
      if (c.get("method").asText().equals("TRANSFER_MATRIX") && c.get("size").asDouble() == 6.0) {
        largeLambda = c;
      }
    }
    assertThat(largeLambda).isNotNull();
    assertThat(largeLambda.get("points"))
        .singleElement()
        .satisfies(
            p -> {
              assertThat(p.get("position").asDouble()).isEqualTo(0.0);
              assertThat(p.get("state").asText()).isIn("extended", "undecided");
            });

    List<String> csv = Files.readAllLines(out.resolve("mobility.csv"));
    assertThat(csv.get(0)).startsWith("record,method,quantity,axis,fixed,criterion");
    assertThat(csv).hasSize(1 + gaps.size() + m.get("edges").size());

    Cli.Outcome report = Cli.run("report", out.toString());
    assertThat(report.exitCode()).as(report.err()).isEqualTo(ExitCode.OK);
    assertThat(Files.readString(out.resolve("report.html")))
        .contains("Mobility edges and mobility gap")
        .contains("LEVEL_RATIO");
    try (Stream<Path> figures = Files.list(out.resolve("figures"))) {
      assertThat(figures.map(p -> p.getFileName().toString()))
          .anyMatch(n -> n.startsWith("mobility-") && n.endsWith(".png"));
    }
  }
}
