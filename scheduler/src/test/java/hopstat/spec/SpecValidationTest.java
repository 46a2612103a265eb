package hopstat.spec;

import static hopstat.testing.SpecJson.aQwzSpec;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.node.ObjectNode;
import hopstat.cli.ExitCode;
import hopstat.task.InvalidInputException;
import hopstat.testing.Cli;
import hopstat.testing.SpecJson;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Bad specs give exit code 2 and a message naming the field path and what is allowed. */
class SpecValidationTest {

  @TempDir Path dir;

  static Stream<Arguments> badSpecs() {
    return Stream.of(
        bad("unknown top-level key", s -> s.tree().put("colour", "red"), "colour: unknown key"),
        bad("missing name", s -> s.tree().remove("name"), "name: required"),
        bad("name with a slash", s -> s.tree().put("name", "../etc"), "name: 1-80 characters"),
        bad("seed not an integer", s -> s.tree().put("seed", 1.5), "seed: must be an integer"),
        bad(
            "unknown model",
            s -> s.tree().put("model", "qwzz"),
            "model: unknown model; known: qwz"),
        bad(
            "non-integer size",
            s -> s.sizes(4, 5).tree().with("parameters").putArray("L").add(4).add(5.5),
            "parameters.L[1]: must be an integer from 2"),
        bad(
            "size below 2",
            s -> s.tree().with("parameters").put("L", 1),
            "parameters.L: must be an integer from 2"),
        bad(
            "range with zero steps",
            s ->
                s.tree()
                    .with("parameters")
                    .putObject("W")
                    .put("from", 0)
                    .put("to", 1)
                    .put("steps", 0),
            "parameters.W.steps: must be an integer from 1"),
        bad(
            "range missing 'to'",
            s -> s.tree().with("parameters").putObject("W").put("from", 0).put("steps", 3),
            "parameters.W.to: required in a range"),
        bad(
            "parameter as a string",
            s -> s.tree().with("parameters").put("m", "one"),
            "parameters.m: must be a number, a list of numbers or a range"),
        bad(
            "unknown parameter",
            s -> s.parameter("mass", 1),
            "parameters.mass: not a parameter of model qwz"),
        bad(
            "missing model parameter",
            s -> s.tree().with("parameters").remove("m"),
            "parameters.m: required by model qwz"),
        bad(
            "unknown disorder type",
            s ->
                s.tree()
                    .withArray("disorder")
                    .insertObject(0)
                    .put("type", "onsite-boxx")
                    .put("strength", 1),
            "disorder[0].type: unknown disorder type"),
        bad(
            "disorder strength names nothing",
            s -> ((ObjectNode) s.tree().withArray("disorder").get(0)).put("strength", "V"),
            "disorder[0].strength: names no entry"),
        bad(
            "negative disorder strength",
            s -> ((ObjectNode) s.tree().withArray("disorder").get(0)).put("strength", -1),
            "disorder[0].strength: must be >= 0"),
        bad(
            "negative swept strength",
            s -> s.sweep("W", 0, -2),
            "parameters.W: used as a disorder strength"),
        bad(
            "unknown disorder option",
            s -> ((ObjectNode) s.tree().withArray("disorder").get(0)).put("sites", "all"),
            "disorder[0].sites: unknown option of onsite-box"),
        bad(
            "bad option value",
            s -> ((ObjectNode) s.tree().withArray("disorder").get(0)).put("orbitals", "some"),
            "disorder[0].orbitals: allowed values: independent, same"),
        bad(
            "unknown observable",
            s -> s.observables("gap", "chern"),
            "observables[1]: unknown observable"),
        bad(
            "observable listed twice",
            s -> s.observables("gap", "gap"),
            "observables[1]: listed twice"),
        bad(
            "Bott index on an open sample",
            s -> s.tree().put("boundary", "open"),
            "observables[1]: the Bott index needs \"boundary\": \"periodic\""),
        bad(
            "bad boundary",
            s -> s.tree().put("boundary", "twisted"),
            "boundary: must be \"periodic\" or \"open\""),
        bad("zero realisations", s -> s.realisations(0), "realisations: must be an integer from 1"),
        bad(
            "sampling with realisations",
            s -> s.adaptive(4, 8, 4, "bott", 0.1).realisations(5),
            "realisations: omit it when \"sampling\" is given"),
        bad(
            "sampling target on an unknown quantity",
            s -> s.adaptive(4, 8, 4, "chern", 0.1),
            "sampling.targets[0].quantity: not produced"),
        bad(
            "sampling minimum not a multiple of batch",
            s -> s.adaptive(6, 12, 4, "bott", 0.1),
            "sampling.minimum: must be a positive multiple"),
        bad(
            "disorder kind not for this model",
            s -> ((ObjectNode) s.tree().withArray("disorder").get(0)).put("type", "field-box"),
            "disorder[0].type"));
  }

  private static Arguments bad(String name, Consumer<SpecJson> edit, String expected) {
    return Arguments.of(name, edit, expected);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("badSpecs")
  void badSpecGivesExitTwoNamingTheField(String name, Consumer<SpecJson> edit, String expected)
      throws Exception {
    SpecJson spec = aQwzSpec();
    edit.accept(spec);
    Path file = spec.writeTo(dir.resolve("spec.json"));
    Cli.Outcome o = Cli.run("check", "--no-timing", file.toString());
    assertThat(o.exitCode()).as(o.err()).isEqualTo(ExitCode.BAD_INPUT);
    assertThat(o.err()).contains(expected);
    assertThat(o.err()).doesNotContain("at hopstat."); // no stack trace without --verbose
  }

  @Test
  void invalidJsonNamesLineAndColumn() throws Exception {
    Path file =
        Files.writeString(dir.resolve("spec.json"), "{\n  \"name\": \"x\",\n  \"seed\": 1,,\n}");
    Cli.Outcome o = Cli.run("check", "--no-timing", file.toString());
    assertThat(o.exitCode()).isEqualTo(ExitCode.BAD_INPUT);
    assertThat(o.err()).contains("not valid JSON at line 3");
  }

  @Test
  void duplicateKeysAreRejected() {
    assertThatThrownBy(() -> SpecParser.parse("{\"name\": \"a\", \"name\": \"b\"}"))
        .isInstanceOf(InvalidInputException.class)
        .hasMessageContaining("Duplicate field 'name'");
  }

  @Test
  void allProblemsAreReportedAtOnce() {
    SpecJson spec = aQwzSpec();
    spec.tree().remove("name");
    spec.tree().put("model", "nope");
    spec.realisations(-1);
    InvalidInputException e =
        org.junit.jupiter.api.Assertions.assertThrows(
            InvalidInputException.class, () -> SpecParser.parse(spec.text()));
    assertThat(e.violations())
        .extracting(InvalidInputException.Violation::fieldPath)
        .contains("name", "model", "realisations");
  }

  @Test
  void missingSpecFileIsBadInput() {
    Cli.Outcome o = Cli.run("check", dir.resolve("absent.json").toString());
    assertThat(o.exitCode()).isEqualTo(ExitCode.BAD_INPUT);
    assertThat(o.err()).contains("SPEC: cannot read the spec file");
  }

  @Test
  void unknownCommandLineOptionIsBadInput() {
    Cli.Outcome o = Cli.run("run", "--thread", "2", "x.json");
    assertThat(o.exitCode()).isEqualTo(ExitCode.BAD_INPUT);
  }

  @Test
  void validSpecParsesWithDefaultsAndGridInSpecOrder() {
    JobSpec spec = SpecParser.parse(aQwzSpec().sweep("W", 0, 1, 2).sizes(4, 6).text());
    assertThat(spec.parameter("t").orElseThrow().values()).containsExactly(1.0);
    assertThat(spec.parameter("fermiEnergy").orElseThrow().values()).containsExactly(0.0);
    assertThat(spec.effectiveClass()).isEqualTo(hopstat.model.SymmetryClass.A);
    assertThat(spec.specHash()).hasSize(64);
    // canonical hash ignores whitespace and key order
    assertThat(
            SpecParser.parse(aQwzSpec().sweep("W", 0, 1, 2).sizes(4, 6).text().replace("\n", " "))
                .specHash())
        .isEqualTo(spec.specHash());
  }

  @Test
  void rangeIncludesBothEnds() {
    SpecJson s = aQwzSpec();
    s.tree().with("parameters").putObject("W").put("from", 0.0).put("to", 0.3).put("steps", 4);
    JobSpec spec = SpecParser.parse(s.text());
    assertThat(spec.parameter("W").orElseThrow().values()).containsExactly(0.0, 0.1, 0.2, 0.3);
  }

  @Test
  void andersonAliasPicksTheDimension() {
    String text =
        "{\"name\":\"a\",\"seed\":1,\"model\":\"anderson\",\"parameters\":{\"dim\":1,\"L\":8,\"W\":1},"
            + "\"disorder\":[{\"type\":\"onsite-box\",\"strength\":\"W\"}],\"boundary\":\"open\",\"observables\":[\"gap\"],\"realisations\":1}";
    assertThat(SpecParser.parse(text).model()).isEqualTo("anderson-1d");
    assertThatThrownBy(() -> SpecParser.parse(text.replace("\"dim\":1", "\"dim\":4")))
        .isInstanceOf(InvalidInputException.class)
        .hasMessageContaining("parameters.dim");
  }
}
