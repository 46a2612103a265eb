package hopstat.spectrum;

import static org.assertj.core.api.Assertions.assertThat;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.InertiaResult;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.HaldaneModel;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.QwzModel;
import java.util.Map;
import java.util.SplittableRandom;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The slice sweep against dense eigenvalues (source-free: Sylvester's law of inertia makes the
 * counts exact integers, so they must agree exactly with the signs of the eigenvalues of the same
 * matrix). Shifts are chosen away from eigenvalues (checked: the nearest is ≥ 1e-6 away).
 */
class SliceInertiaKernelTest {

  @ParameterizedTest(name = "{0} m={1} W={2} E={3} {4}")
  @CsvSource({
    "qwz, -1.0, 0.0, 0.0, NATIVE",
    "qwz, 1.0, 2.5, 0.31, NATIVE",
    "qwz, 3.0, 1.0, -0.7, JAVA",
    "haldane, 0.2, 1.5, 0.05, NATIVE",
    "haldane, 0.0, 0.0, 0.13, JAVA"
  })
  void hamiltonianCountsMatchEigenvalues(
      String model, double m, double w, double energy, LinalgKind kind) {
    Sample s = sample(model, m, w, 7);
    Linalg la = LinalgFactory.create(kind);
    InertiaResult in =
        SliceInertiaKernel.hamiltonianInertia(
            s.terms, s.lattice, energy, new SliceInertiaWorkspace(la));
    double[] ev = eigenvalues(dense(s.terms));
    int below = 0;
    for (double e : ev) {
      assertThat(Math.abs(e - energy)).isGreaterThan(1e-6);
      below += e < energy ? 1 : 0;
    }
    assertThat(in.negative()).isEqualTo(below);
    assertThat(in.positive()).isEqualTo(ev.length - below);
    assertThat(in.zero()).isZero();
  }

  @ParameterizedTest(name = "{0} m={1} W={2} kappa={3} shift={4} {5}")
  @CsvSource({
    "qwz, -1.0, 0.0, 0.1, 0.0, NATIVE", "qwz, 1.0, 3.0, 0.3, 0.0, NATIVE",
        "qwz, 1.0, 3.0, 0.3, 0.21, JAVA",
    "qwz, 3.0, 1.0, 0.05, -0.4, NATIVE", "haldane, 0.2, 1.0, 0.2, 0.0, NATIVE",
        "haldane, 0.2, 0.0, 0.2, 0.03, JAVA"
  })
  void localizerCountsMatchEigenvalues(
      String model, double m, double w, double kappa, double shift, LinalgKind kind) {
    Sample s = sample(model, m, w, 11);
    double x0 = centre(s.lattice, 0);
    double y0 = centre(s.lattice, 1);
    InertiaResult in =
        SliceInertiaKernel.localizerInertia(
            s.terms,
            s.lattice,
            0.0,
            kappa,
            x0,
            y0,
            shift,
            new SliceInertiaWorkspace(LinalgFactory.create(kind)));
    ZMatrixRMaj h = dense(s.terms);
    int n = h.numRows;
    ZMatrixRMaj loc = new ZMatrixRMaj(2 * n, 2 * n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        loc.set(i, j, h.getReal(i, j), h.getImag(i, j));
        loc.set(n + i, n + j, -h.getReal(i, j), -h.getImag(i, j));
      }
      int site = i / s.lattice.orbitalsPerSite();
      double dx = kappa * (s.lattice.position(0, site) - x0);
      double dy = kappa * (s.lattice.position(1, site) - y0);
      loc.set(i, n + i, dx, -dy);
      loc.set(n + i, i, dx, dy);
    }
    double[] ev = eigenvalues(loc);
    int below = 0;
    for (double e : ev) {
      assertThat(Math.abs(e - shift)).isGreaterThan(1e-6);
      below += e < shift ? 1 : 0;
    }
    assertThat(in.negative()).isEqualTo(below);
    assertThat(in.positive()).isEqualTo(2 * n - below);
  }

  record Sample(Lattice lattice, HamiltonianBuilder terms) {}

  static Sample sample(String name, double m, double w, long seed) {
    Model model = name.equals("qwz") ? new QwzModel() : new HaldaneModel();
    Map<String, Double> p =
        name.equals("qwz")
            ? Map.of("m", m, "t", 1.0)
            : Map.of("t1", 1.0, "t2", 0.15, "phi", Math.PI / 2, "M", m);
    Lattice lattice = model.lattice(name.equals("qwz") ? 6 : 4, Boundary.OPEN);
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addClean(new ParameterValues(p), lattice, b);
    SplittableRandom rng = new SplittableRandom(seed);
    for (int i = 0; i < lattice.orbitals(); i++) {
      b.addOnsite(i, w * (rng.nextDouble() - 0.5));
    }
    return new Sample(lattice, b);
  }

  static double centre(Lattice lattice, int d) {
    double sum = 0;
    for (int s = 0; s < lattice.sites(); s++) {
      sum += lattice.position(d, s);
    }
    return sum / lattice.sites();
  }

  static ZMatrixRMaj dense(HamiltonianBuilder b) {
    ZMatrixRMaj h = new ZMatrixRMaj(1, 1);
    b.toDense(h);
    return h;
  }

  static double[] eigenvalues(ZMatrixRMaj a) {
    HermitianEigenSolver solver = LinalgFactory.create(LinalgKind.NATIVE).newHermitianEigenSolver();
    double[] ev = new double[a.numRows];
    assertThat(solver.eigenvalues(a, ev)).isTrue();
    return ev;
  }
}
