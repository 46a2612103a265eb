package hopstat.task;

import static org.assertj.core.api.Assertions.assertThat;

import hopstat.disorder.DisorderTerm;
import hopstat.invariant.MajoranaKernel;
import hopstat.invariant.MajoranaWorkspace;
import hopstat.invariant.TestRealisation;
import hopstat.lattice.Boundary;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.DiiiWireModel;
import hopstat.model.MajoranaForm;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import hopstat.model.SymmetryClass;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The class-DIII branch of {@code z2} on diii-wire, run through the worker boundary. */
class DiiiZ2ObservableTest {

  private static final RealisationWorkspace WORKSPACE =
      new RealisationWorkspace(LinalgFactory.create(LinalgKind.JAVA));
  private static final long JOB_SEED = 2024;

  /** Test-data builder for a diii-wire realisation task. */
  private static final class TaskBuilder {
    private final Map<String, Double> parameters =
        new LinkedHashMap<>(Map.of("t", 1.0, "delta", 1.0, "lambda", 0.0));
    private final List<DisorderTerm> disorder = new ArrayList<>();
    private final List<String> observables = new ArrayList<>();
    private int size = 20;
    private Boundary boundary = Boundary.PERIODIC;
    private int realisation = 0;

    TaskBuilder with(String name, double value) {
      parameters.put(name, value);
      return this;
    }

    TaskBuilder size(int l) {
      size = l;
      return this;
    }

    TaskBuilder open() {
      boundary = Boundary.OPEN;
      return this;
    }

    TaskBuilder disorder(String type, double strength, Map<String, String> options) {
      disorder.add(new DisorderTerm(type, strength, options));
      return this;
    }

    TaskBuilder observe(String name) {
      observables.add(name);
      return this;
    }

    TaskBuilder realisation(int r) {
      realisation = r;
      return this;
    }

    long seed() {
      return SeedOps.realisationSeed(JOB_SEED, 0, realisation);
    }

    RealisationResult run() {
      PointSpec point =
          new PointSpec(
              DiiiWireModel.NAME,
              new ParameterValues(parameters),
              size,
              boundary,
              0.0,
              disorder,
              observables);
      return RealisationRunner.run(
          new RealisationTask(RealisationTask.idOf(0, realisation), 0, realisation, seed(), point),
          WORKSPACE);
    }
  }

  private static TaskBuilder aTask() {
    return new TaskBuilder();
  }

  private static double z2(RealisationResult r) {
    assertThat(r.outcome()).as("outcome (%s)", r.failure()).isEqualTo(Outcome.DONE);
    return r.values().get("z2");
  }

  @Test
  void endToEndWithOnsiteBoxDisorder() {
    // Kitaev (2001) per spin block, Qi-Hughes-Zhang (2010) for the Kramers pair: weak disorder
    // (W = 1) keeps the clean answer, z2 = 1 iff |μ| < 2|t|, with S_z broken (λ = 0.5 < Δ).
    for (int r = 0; r < 3; r++) {
      RealisationResult inside =
          aTask()
              .with("mu", 0.5)
              .with("lambda", 0.5)
              .with("delta", 0.8)
              .disorder("onsite-box", 1.0, Map.of())
              .observe("z2")
              .observe("gap")
              .realisation(r)
              .run();
      assertThat(z2(inside)).isEqualTo(1.0);
      assertThat(inside.values()).containsKey("gap");
      RealisationResult outside =
          aTask()
              .with("mu", 3.2)
              .with("lambda", 0.5)
              .with("delta", 0.8)
              .disorder("onsite-box", 1.0, Map.of())
              .observe("z2")
              .realisation(r)
              .run();
      assertThat(z2(outside)).isEqualTo(0.0);
    }
  }

  @Test
  void breakingTimeReversalFallsBackToTheClassDMajoranaNumber() {
    // Periodic table (Kitaev 2009; Schnyder et al. 2008): a random Zeeman field leaves class D,
    // d = 1, Z2 = the Majorana number (Kitaev 2001). In the DIII-topological phase the two spin
    // blocks are both non-trivial, so Q = (−1)(−1) = +1: without T the Kramers pair of end
    // Majoranas
    // is not protected and z2 = 0 (derived). The runner's value equals MajoranaKernel's on the same
    // realisation.
    Model model = ModelCatalog.find(DiiiWireModel.NAME).orElseThrow();
    Observable z2 = ObservableCatalog.find("z2").orElseThrow();
    assertThat(
            SymmetryCheckOps.effectiveClass(
                model, List.of(new DisorderTerm("zeeman-box", 0.2, Map.of()))))
        .isEqualTo(SymmetryClass.D);
    assertThat(z2.whyNotApplicable(model, Boundary.PERIODIC, SymmetryClass.D)).isEmpty();
    MajoranaWorkspace ws = new MajoranaWorkspace();
    for (int r = 0; r < 3; r++) {
      TaskBuilder task =
          aTask()
              .with("mu", 0.5)
              .disorder("zeeman-box", 0.2, Map.of())
              .observe("z2")
              .realisation(r);
      double value = z2(task.run());
      assertThat(value).isEqualTo(0.0);
      TestRealisation same =
          TestRealisation.aRealisation(DiiiWireModel.NAME)
              .with("mu", 0.5)
              .with("t", 1.0)
              .with("delta", 1.0)
              .with("lambda", 0.0)
              .size(20)
              .seed(task.seed())
              .disorder("zeeman-box", 0.2);
      int q =
          MajoranaKernel.majoranaNumber((MajoranaForm) model, same.lattice(), same.build(), ws).q();
      assertThat(q).isEqualTo(1);
    }
    // Without the Zeeman field the same point is DIII-non-trivial.
    assertThat(z2(aTask().with("mu", 0.5).observe("z2").run())).isEqualTo(1.0);
  }

  @Test
  void applicabilityAndFailuresAreExplained() {
    Model model = ModelCatalog.find(DiiiWireModel.NAME).orElseThrow();
    Observable z2 = ObservableCatalog.find("z2").orElseThrow();
    assertThat(z2.whyNotApplicable(model, Boundary.PERIODIC, SymmetryClass.DIII)).isEmpty();
    assertThat(z2.whyNotApplicable(model, Boundary.OPEN, SymmetryClass.DIII))
        .hasValueSatisfying(m -> assertThat(m).contains("periodic"));
    // A DIII effective class on a model without declared T and S (hypothetical) is refused.
    Model noOperators = ModelCatalog.find("pwave-wire").orElseThrow();
    assertThat(z2.whyNotApplicable(noOperators, Boundary.PERIODIC, SymmetryClass.DIII))
        .hasValueSatisfying(m -> assertThat(m).contains("declares"));
    // Derived: at μ = 2t the periodic ring has E = 0 at k = 0: a recorded failure, not a crash.
    RealisationResult closed = aTask().with("mu", 2.0).size(10).observe("z2").run();
    assertThat(closed.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(closed.failure()).contains("gap");
    // orbitals = independent puts unrelated draws on Nambu orbitals: the per-realisation check
    // catches the broken T/C that onsite-box claims to keep.
    RealisationResult independent =
        aTask()
            .with("mu", 0.5)
            .size(6)
            .disorder("onsite-box", 1.0, Map.of("orbitals", "independent"))
            .observe("z2")
            .run();
    assertThat(independent.outcome()).isEqualTo(Outcome.FAILED);
    assertThat(independent.failure()).contains("violated");
  }
}
