package hopstat.spec;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import hopstat.model.SymmetryClass;
import hopstat.task.InvalidInputException;
import hopstat.task.InvalidInputException.Violation;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Spec validation of {@code vacancies} and {@code bond-scale}: strength range, term order,
 * observables that cannot cope.
 */
class DilutionSpecTest {

  private static String spec(
      String model, String parameters, String disorder, String boundary, String... observables) {
    return "{\"name\":\"d\",\"seed\":1,\"model\":\""
        + model
        + "\",\"parameters\":{"
        + parameters
        + "},\"disorder\":["
        + disorder
        + "],\"boundary\":\""
        + boundary
        + "\",\"observables\":[\""
        + String.join("\",\"", observables)
        + "\"],\"realisations\":2}";
  }

  private static List<Violation> violations(String text) {
    InvalidInputException e =
        org.junit.jupiter.api.Assertions.assertThrows(
            InvalidInputException.class, () -> SpecParser.parse(text));
    return e.violations();
  }

  private static final String QWZ = "\"m\":-1,\"L\":6";
  private static final String VACANCIES = "{\"type\":\"vacancies\",\"strength\":0.1}";

  @Test
  void concentrationMustLieBelowOne() {
    assertThat(
            violations(
                spec("qwz", QWZ, "{\"type\":\"vacancies\",\"strength\":1.0}", "periodic", "bott")))
        .extracting(Violation::fieldPath)
        .containsExactly("disorder[0].strength");
    assertThat(
            violations(
                spec(
                    "qwz",
                    QWZ + ",\"c\":[0.1,1.2]",
                    "{\"type\":\"vacancies\",\"strength\":\"c\"}",
                    "periodic",
                    "bott")))
        .extracting(Violation::fieldPath)
        .containsExactly("parameters.c");
    assertThat(
            violations(
                spec("qwz", QWZ, "{\"type\":\"vacancies\",\"strength\":-0.1}", "periodic", "bott")))
        .extracting(Violation::fieldPath)
        .containsExactly("disorder[0].strength");
    JobSpec ok =
        SpecParser.parse(
            spec(
                "qwz",
                QWZ + ",\"c\":[0,0.05,0.5]",
                "{\"type\":\"vacancies\",\"strength\":\"c\"}",
                "periodic",
                "bott",
                "gap"));
    assertThat(ok.effectiveClass()).isEqualTo(SymmetryClass.A);
  }

  @Test
  void vacanciesMustBeTheLastDisorderTerm() {
    String box = "{\"type\":\"onsite-box\",\"strength\":1}";
    assertThat(violations(spec("qwz", QWZ, VACANCIES + "," + box, "periodic", "bott")))
        .extracting(Violation::fieldPath)
        .containsExactly("disorder[0].type");
    assertThat(
            SpecParser.parse(spec("qwz", QWZ, box + "," + VACANCIES, "periodic", "bott"))
                .disorder())
        .hasSize(2);
    assertThat(violations(spec("majorana-cluster", "\"L\":4", VACANCIES, "periodic", "parity")))
        .extracting(Violation::fieldPath)
        .contains("disorder[0].type");
  }

  /**
   * Vacancies break the chiral symmetry of ssh, so the winding (which needs S) is rejected by the
   * class machinery; bond-scale keeps it.
   */
  @Test
  void windingOnSshNeedsAChiralDisorder() {
    String ssh = "\"v\":0.5,\"w\":1,\"L\":8";
    List<Violation> v = violations(spec("ssh", ssh, VACANCIES, "open", "winding"));
    assertThat(v).extracting(Violation::fieldPath).containsExactly("observables[0]");
    assertThat(v.get(0).reason()).contains("chiral");
    JobSpec ok =
        SpecParser.parse(
            spec("ssh", ssh, "{\"type\":\"bond-scale\",\"strength\":0.5}", "open", "winding"));
    assertThat(ok.effectiveClass()).isEqualTo(SymmetryClass.BDI);
  }

  @Test
  void observablesUpsetByTheVacancyLevelsAreRejected() {
    assertThat(
            violations(
                spec(
                    "qwz",
                    QWZ + ",\"dosEnergyMin\":-1,\"dosEnergyMax\":1",
                    VACANCIES,
                    "periodic",
                    "dos")))
        .extracting(Violation::fieldPath)
        .containsExactly("observables[0]");
    assertThat(violations(spec("qwz", QWZ, VACANCIES, "periodic", "gap", "level-ratio")))
        .extracting(Violation::fieldPath)
        .containsExactly("observables[1]");
    SpecParser.parse(
        spec(
            "qwz",
            QWZ + ",\"windowMin\":-1,\"windowMax\":1",
            VACANCIES,
            "periodic",
            "level-ratio",
            "ipr"));
    assertThat(violations(spec("qwz", QWZ, VACANCIES, "open", "chern-localizer")))
        .extracting(Violation::fieldPath)
        .containsExactly("observables[0]");
    SpecParser.parse(
        spec("qwz", QWZ + ",\"kappa\":0.1", VACANCIES, "open", "chern-localizer", "chern-marker"));
  }

  @Test
  void lyapunovCannotApplyBondDisorderSliceBySlice() {
    String anderson = "\"dim\":2,\"L\":4,\"energy\":0";
    assertThat(
            violations(
                spec(
                    "anderson",
                    anderson,
                    "{\"type\":\"bond-scale\",\"strength\":1}",
                    "periodic",
                    "lyapunov")))
        .extracting(Violation::fieldPath)
        .containsExactly("observables[0]");
    SpecParser.parse(
        spec(
            "anderson",
            anderson,
            "{\"type\":\"onsite-box\",\"strength\":1}",
            "periodic",
            "lyapunov"));
  }

  @Test
  void bdgWireKeepsItsClassWithVacancies() {
    JobSpec wire =
        SpecParser.parse(spec("pwave-wire", "\"mu\":1,\"L\":10", VACANCIES, "periodic", "z2"));
    assertThat(wire.effectiveClass()).isEqualTo(SymmetryClass.BDI);
    assertThatThrownBy(
            () ->
                SpecParser.parse(
                    spec("pwave-wire", "\"mu\":1,\"L\":10", VACANCIES, "periodic", "z2")
                        .replace("0.1", "\"x\"")))
        .isInstanceOf(InvalidInputException.class);
  }
}
