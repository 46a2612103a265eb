package hopstat.spec;

import static hopstat.testing.SpecJson.aQwzSpec;
import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import hopstat.cli.ExitCode;
import hopstat.expand.GridExpander;
import hopstat.expand.StudyPlan;
import hopstat.linalg.LinalgFactory;
import hopstat.queue.JournalReader;
import hopstat.record.RealisationRecord;
import hopstat.task.Outcome;
import hopstat.task.RealisationResult;
import hopstat.task.RealisationRunner;
import hopstat.task.RealisationWorkspace;
import hopstat.testing.Cli;
import hopstat.testing.SpecJson;
import java.nio.file.Path;
import java.util.Map;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** The {@code custom} model: spec parsing, validation with field paths, and runs. */
class CustomModelSpecTest {

  private static final ObjectMapper JSON = new ObjectMapper();

  /**
   * The Qi–Wu–Zhang model (Qi, Wu, Zhang, PRB 74, 085308 (2006)) with t = 1 written as a custom
   * lattice in the orbital order and term order of {@code QwzModel}: T_x = (σz + iσx)/2, T_y = (σz
   * + iσy)/2 from cell r to r + x̂, r + ŷ (derived in QwzModel's Javadoc).
   */
  static final String QWZ_LATTICE =
      """
      {"dimension": 2, "vectors": [[1, 0], [0, 1]],
       "orbitals": [{"name": "a", "position": [0, 0]}, {"name": "b", "position": [0, 0]}],
       "onsite": [{"orbital": "a", "value": "m"}, {"orbital": "b", "value": {"scale": "m", "re": -1}}],
       "hoppings": [
         {"cell": [1, 0], "from": "a", "to": "a", "amplitude": 0.5},
         {"cell": [1, 0], "from": "b", "to": "b", "amplitude": -0.5},
         {"cell": [1, 0], "from": "b", "to": "a", "amplitude": {"re": 0, "im": 0.5}},
         {"cell": [1, 0], "from": "a", "to": "b", "amplitude": {"re": 0, "im": 0.5}},
         {"cell": [0, 1], "from": "a", "to": "a", "amplitude": 0.5},
         {"cell": [0, 1], "from": "b", "to": "b", "amplitude": -0.5},
         {"cell": [0, 1], "from": "b", "to": "a", "amplitude": 0.5},
         {"cell": [0, 1], "from": "a", "to": "b", "amplitude": -0.5}],
       "class": "A"}
      """;

  /**
   * The SSH chain (Su, Schrieffer, Heeger, PRL 42, 1698 (1979)): v intracell A→B, w intercell B_j →
   * A_{j+1}; class BDI with T = K, C = diag(1, −1) K, S = diag(1, −1) (derived: every term joins A
   * and B and is real).
   */
  static final String SSH_LATTICE =
      """
      {"dimension": 1, "vectors": [[1]],
       "orbitals": [{"name": "A", "position": [0]}, {"name": "B", "position": [0.5]}],
       "hoppings": [
         {"cell": [0], "from": "A", "to": "B", "amplitude": "v"},
         {"cell": [1], "from": "B", "to": "A", "amplitude": "w"}],
       "class": "BDI",
       "symmetries": {
         "T": {"matrix": [[1, 0], [0, 1]], "antiunitary": true},
         "C": {"matrix": [[1, 0], [0, -1]], "antiunitary": true},
         "S": {"matrix": [[1, 0], [0, -1]], "antiunitary": false}}}
      """;

  @TempDir Path tmp;

  static ObjectNode lattice(String text) {
    return (ObjectNode) json(text);
  }

  static com.fasterxml.jackson.databind.JsonNode json(String text) {
    try {
      return JSON.readTree(text);
    } catch (java.io.IOException e) {
      throw new java.io.UncheckedIOException(e);
    }
  }

  static SpecJson customQwz() {
    SpecJson s =
        aQwzSpec().sweep("W", 0.0, 2.0).sizes(4).realisations(3).observables("gap", "bott");
    s.tree().put("model", "custom");
    s.tree().set("lattice", lattice(QWZ_LATTICE));
    return s;
  }

  static SpecJson ssh() {
    SpecJson s = aQwzSpec().observables("winding").realisations(1).sizes(48);
    s.tree().put("model", "custom");
    s.tree().put("boundary", "open");
    s.tree().remove("disorder");
    ObjectNode p = (ObjectNode) s.tree().get("parameters");
    p.remove("m");
    p.remove("W");
    s.tree().set("lattice", lattice(SSH_LATTICE));
    return s;
  }

  /**
   * Derived: the custom lattice adds the same doubles to the same entries as QwzModel, so runs
   * agree bit for bit.
   */
  @Test
  void customQwzGivesBitIdenticalJournalValues() throws Exception {
    Path builtIn =
        aQwzSpec()
            .sweep("W", 0.0, 2.0)
            .sizes(4)
            .realisations(3)
            .observables("gap", "bott")
            .writeTo(tmp.resolve("qwz.json"));
    Path custom = customQwz().writeTo(tmp.resolve("custom.json"));
    for (Path spec : new Path[] {builtIn, custom}) {
      Cli.Outcome o =
          Cli.run(
              "run",
              spec.toString(),
              "--out",
              tmp.resolve(spec.getFileName() + ".run").toString(),
              "--threads",
              "1",
              "--quiet");
      assertThat(o.exitCode()).as(o.err()).isEqualTo(ExitCode.OK);
    }
    Map<String, RealisationRecord> a =
        JournalReader.read(tmp.resolve("qwz.json.run").resolve("journal")).records();
    Map<String, RealisationRecord> b =
        JournalReader.read(tmp.resolve("custom.json.run").resolve("journal")).records();
    assertThat(a).hasSize(6);
    assertThat(b.keySet()).isEqualTo(a.keySet());
    for (String task : a.keySet()) {
      RealisationResult x = a.get(task).result();
      RealisationResult y = b.get(task).result();
      assertThat(x.outcome()).isEqualTo(Outcome.DONE);
      assertThat(y.seed()).isEqualTo(x.seed());
      // Double.equals compares bit patterns.
      assertThat(y.values()).as(task).isEqualTo(x.values());
    }
    // m = 1: the clean QWZ lower band has C = -1 (Qi, Wu, Zhang 2006; sign as in REFERENCE.md); the
    // Bott index equals C.
    assertThat(
            a.values().stream()
                .filter(r -> r.grid().get("W") == 0.0)
                .map(r -> r.result().values().get("bott")))
        .hasSize(3)
        .allSatisfy(
            bott -> assertThat(bott).isCloseTo(-1.0, org.assertj.core.data.Offset.offset(1e-9)));
  }

  /**
   * SSH: winding 1 iff |v| &lt; |w| (Su, Schrieffer, Heeger 1979; real-space winding of
   * Mondragon-Shem, Hughes, Song, Prodan, PRL 113, 046802 (2014)). Tolerance 1e-3: clean open
   * chain, L = 48, window 12 cells from each end; the end corrections fall off like
   * (|v|/|w|)^distance and were 3.6e-3 at |v|/|w| = 0.6 with L = 24 (measured in this test's first
   * run), far smaller at L = 48.
   */
  @Test
  void customSshWindingIsOneIffIntracellIsWeaker() {
    double[][] vw = {{0.3, 1.0}, {-0.6, 1.0}, {0.6, -1.0}, {1.5, 1.0}, {2.5, -1.0}, {-1.6, 1.0}};
    RealisationWorkspace ws = new RealisationWorkspace(LinalgFactory.preferred());
    for (double[] c : vw) {
      SpecJson s = ssh().parameter("v", c[0]).parameter("w", c[1]);
      StudyPlan plan = GridExpander.expand(SpecParser.parse(s.text()));
      RealisationResult r = RealisationRunner.run(plan.task(0, 0), ws);
      assertThat(r.outcome()).as(r.failure()).isEqualTo(Outcome.DONE);
      double expected = Math.abs(c[0]) < Math.abs(c[1]) ? 1.0 : 0.0;
      assertThat(Math.abs(r.values().get("winding")))
          .as("v=%s w=%s", c[0], c[1])
          .isCloseTo(expected, org.assertj.core.data.Offset.offset(1e-3));
    }
  }

  static Stream<Arguments> badLattices() {
    return Stream.of(
        Arguments.of(
            "unknown orbital",
            (Consumer<ObjectNode>) l -> ((ObjectNode) l.get("hoppings").get(3)).put("to", "c"),
            "lattice.hoppings[3].to: unknown orbital 'c'; known: a, b"),
        Arguments.of(
            "cell offset length",
            (Consumer<ObjectNode>)
                l -> ((ObjectNode) l.get("hoppings").get(0)).putArray("cell").add(1),
            "lattice.hoppings[0].cell"),
        Arguments.of(
            "vector length",
            (Consumer<ObjectNode>)
                l ->
                    l.putArray("vectors")
                        .add(JSON.createArrayNode().add(1).add(0))
                        .add(JSON.createArrayNode().add(1)),
            "lattice.vectors[1]"),
        Arguments.of(
            "unknown parameter",
            (Consumer<ObjectNode>)
                l -> ((ObjectNode) l.get("hoppings").get(0)).put("amplitude", "tt"),
            "lattice.hoppings[0].amplitude: unknown parameter name"),
        Arguments.of(
            "complex onsite",
            (Consumer<ObjectNode>)
                l ->
                    ((ObjectNode) l.get("onsite").get(0))
                        .putObject("value")
                        .put("re", 1)
                        .put("im", 0.5),
            "lattice.onsite[0].value"),
        Arguments.of(
            "class without operators",
            (Consumer<ObjectNode>) l -> l.put("class", "AIII"),
            "lattice.symmetries.S"),
        Arguments.of(
            "operator not unitary",
            (Consumer<ObjectNode>)
                l -> {
                  l.put("class", "AIII");
                  l.putObject("symmetries").putObject("S").set("matrix", json("[[1, 1], [0, 1]]"));
                },
            "lattice.symmetries.S.matrix"),
        Arguments.of(
            "T squared wrong",
            (Consumer<ObjectNode>)
                l -> {
                  l.put("class", "AII");
                  l.putObject("symmetries")
                      .putObject("T")
                      .put("antiunitary", true)
                      .set("matrix", json("[[1, 0], [0, 1]]"));
                },
            "T^2 = U U* = -1"),
        Arguments.of(
            "onsite hopping",
            (Consumer<ObjectNode>)
                l -> ((ObjectNode) l.get("hoppings").get(0)).putArray("cell").add(0).add(0),
            "lattice.hoppings[0]"),
        Arguments.of(
            "unknown class", (Consumer<ObjectNode>) l -> l.put("class", "Z"), "lattice.class"));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("badLattices")
  void badLatticeIsRefusedWithItsFieldPath(String kind, Consumer<ObjectNode> edit, String message) {
    SpecJson s = customQwz();
    edit.accept((ObjectNode) s.tree().get("lattice"));
    Cli.Outcome o = Cli.run("check", "--no-timing", s.writeTo(tmp.resolve("bad.json")).toString());
    assertThat(o.exitCode()).as(o.err()).isEqualTo(ExitCode.BAD_INPUT);
    assertThat(o.err()).contains(message);
  }

  @Test
  void latticeWithABuiltInModelIsRefused() {
    SpecJson s = aQwzSpec();
    s.tree().set("lattice", lattice(QWZ_LATTICE));
    Cli.Outcome o = Cli.run("check", "--no-timing", s.writeTo(tmp.resolve("bad.json")).toString());
    assertThat(o.exitCode()).isEqualTo(ExitCode.BAD_INPUT);
    assertThat(o.err()).contains("lattice: read only with \"model\": \"custom\"");
  }

  @Test
  void customParametersJoinTheNamespace() {
    SpecJson s = customQwz();
    ((ObjectNode) s.tree().get("parameters")).remove("m");
    Cli.Outcome o = Cli.run("check", "--no-timing", s.writeTo(tmp.resolve("bad.json")).toString());
    assertThat(o.exitCode()).isEqualTo(ExitCode.BAD_INPUT);
    assertThat(o.err()).contains("lattice.onsite[0].value").contains("unknown parameter name");
    SpecJson extra = customQwz().parameter("q", 1.0);
    o = Cli.run("check", "--no-timing", extra.writeTo(tmp.resolve("extra.json")).toString());
    assertThat(o.exitCode()).isEqualTo(ExitCode.BAD_INPUT);
    assertThat(o.err()).contains("parameters.q");
  }

  /**
   * Derived: an onsite energy on sublattice A alone anticommutes with neither S nor C = diag(1, −1)
   * K.
   */
  @Test
  void declaredSymmetryBrokenByATermIsRefusedByCheck() {
    SpecJson s = ssh().parameter("v", 0.5).parameter("w", 1.0).parameter("e", 0.3);
    ((ObjectNode) s.tree().get("lattice"))
        .putArray("onsite")
        .addObject()
        .put("orbital", "A")
        .put("value", "e");
    Cli.Outcome o =
        Cli.run("check", "--no-timing", s.writeTo(tmp.resolve("broken.json")).toString());
    assertThat(o.exitCode()).as(o.out()).isEqualTo(ExitCode.BAD_INPUT);
    assertThat(o.err())
        .contains("lattice.symmetries")
        .contains("declares class BDI")
        .contains("breaks");
    // the same chain without the term passes
    Cli.Outcome ok =
        Cli.run(
            "check",
            "--no-timing",
            ssh()
                .parameter("v", 0.5)
                .parameter("w", 1.0)
                .writeTo(tmp.resolve("ok.json"))
                .toString());
    assertThat(ok.exitCode()).as(ok.err()).isEqualTo(ExitCode.OK);
  }
}
