package hopstat.task;

import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.ParameterValues;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Test-data builder for grid points of the two-dimensional models: {@code aPoint("qwz").with("m",
 * -1).size(14).open()}.
 */
public final class Points2d {

  private final String model;
  private final Map<String, Double> parameters = new LinkedHashMap<>();
  private final List<DisorderTerm> disorder = new ArrayList<>();
  private final List<String> observables = new ArrayList<>();
  private int size = 12;
  private Boundary boundary = Boundary.PERIODIC;
  private double fermiEnergy;

  private Points2d(String model) {
    this.model = model;
  }

  public static Points2d aPoint(String model) {
    return new Points2d(model);
  }

  public Points2d with(String name, double value) {
    parameters.put(name, value);
    return this;
  }

  public Points2d size(int linearSize) {
    this.size = linearSize;
    return this;
  }

  public Points2d open() {
    this.boundary = Boundary.OPEN;
    return this;
  }

  public Points2d periodic() {
    this.boundary = Boundary.PERIODIC;
    return this;
  }

  public Points2d fermiEnergy(double value) {
    this.fermiEnergy = value;
    return this;
  }

  /** Adds an {@code onsite-box} term of strength W with the given options. */
  public Points2d boxDisorder(double strength, Map<String, String> options) {
    disorder.add(new DisorderTerm("onsite-box", strength, options));
    return this;
  }

  public Points2d observing(String... names) {
    observables.addAll(List.of(names));
    return this;
  }

  public PointSpec build() {
    return new PointSpec(
        model, new ParameterValues(parameters), size, boundary, fermiEnergy, disorder, observables);
  }

  /** Runs one realisation with this seed on the native backend and returns the result. */
  public RealisationResult run(long seed) {
    return RealisationRunner.run(
        new RealisationTask("t", 0, 0, seed, build()), Workspaces.shared());
  }

  /** Runs one realisation and returns its values; fails the test if the realisation FAILED. */
  public Map<String, Double> values(long seed) {
    RealisationResult r = run(seed);
    if (r.outcome() != Outcome.DONE) {
      throw new AssertionError("realisation failed: " + r.failure());
    }
    return r.values();
  }

  /** One shared workspace per test thread (tests run single-threaded per class). */
  static final class Workspaces {
    private static final ThreadLocal<RealisationWorkspace> WORKSPACE =
        ThreadLocal.withInitial(
            () -> new RealisationWorkspace(LinalgFactory.create(LinalgKind.NATIVE)));

    private Workspaces() {}

    static RealisationWorkspace shared() {
      return WORKSPACE.get();
    }
  }
}
