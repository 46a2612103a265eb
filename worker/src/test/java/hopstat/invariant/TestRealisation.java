package hopstat.invariant;

import hopstat.disorder.DisorderCatalog;
import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import hopstat.task.SeedOps;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.random.RandomGenerator;

/**
 * Test-data builder for one realisation, in the same order as {@code RealisationRunner}: clean
 * terms, then one generator from {@link SeedOps#generator}, then the disorder terms in order.
 */
public final class TestRealisation {

  private final Model model;
  private final Map<String, Double> parameters = new LinkedHashMap<>();
  private final List<DisorderTerm> disorder = new ArrayList<>();
  private int size = 10;
  private Boundary boundary = Boundary.PERIODIC;
  private long seed = 1;

  private TestRealisation(String model) {
    this.model = ModelCatalog.find(model).orElseThrow();
    for (var p : this.model.parameters()) {
      if (p.defaultValue() != null) {
        parameters.put(p.name(), p.defaultValue());
      }
    }
  }

  public static TestRealisation aRealisation(String model) {
    return new TestRealisation(model);
  }

  public TestRealisation with(String name, double value) {
    parameters.put(name, value);
    return this;
  }

  public TestRealisation size(int linearSize) {
    this.size = linearSize;
    return this;
  }

  public TestRealisation boundary(Boundary b) {
    this.boundary = b;
    return this;
  }

  public TestRealisation seed(long s) {
    this.seed = s;
    return this;
  }

  public TestRealisation disorder(String type, double strength) {
    return disorder(type, strength, Map.of());
  }

  public TestRealisation disorder(String type, double strength, Map<String, String> options) {
    disorder.add(new DisorderTerm(type, strength, options));
    return this;
  }

  public Model model() {
    return model;
  }

  public Lattice lattice() {
    return model.lattice(size, boundary);
  }

  /** The realised terms. */
  public HamiltonianBuilder build() {
    Lattice lattice = lattice();
    HamiltonianBuilder out = new HamiltonianBuilder();
    out.reset(lattice.orbitals());
    ParameterValues values = new ParameterValues(parameters);
    model.addClean(values, lattice, out);
    RandomGenerator random = SeedOps.generator(seed);
    for (DisorderTerm t : disorder) {
      DisorderCatalog.find(t.type()).orElseThrow().apply(t, model, values, lattice, random, out);
    }
    return out;
  }
}
