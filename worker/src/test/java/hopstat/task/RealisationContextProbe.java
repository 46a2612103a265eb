package hopstat.task;

import hopstat.disorder.DisorderCatalog;
import hopstat.disorder.DisorderTerm;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import java.util.random.RandomGenerator;
import org.ejml.data.ZMatrixRMaj;

/**
 * Test helper: rebuilds a realisation's Hamiltonian exactly as {@link RealisationRunner} does and
 * answers dense questions about it.
 */
final class RealisationContextProbe {

  private final Lattice lattice;
  private final ZMatrixRMaj h = new ZMatrixRMaj(1, 1);

  private RealisationContextProbe(Lattice lattice, HamiltonianBuilder b) {
    this.lattice = lattice;
    b.toDense(h);
  }

  static RealisationContextProbe of(PointSpec point, long seed) {
    Model model = ModelCatalog.find(point.model()).orElseThrow();
    Lattice lattice = model.lattice(point.linearSize(), point.boundary());
    HamiltonianBuilder b = new HamiltonianBuilder();
    b.reset(lattice.orbitals());
    model.addClean(point.parameters(), lattice, b);
    RandomGenerator random = SeedOps.generator(seed);
    for (DisorderTerm term : point.disorder()) {
      DisorderCatalog.find(term.type())
          .orElseThrow()
          .apply(term, model, point.parameters(), lattice, random, b);
    }
    return new RealisationContextProbe(lattice, b);
  }

  int countBelow(double energy) {
    double[] ev = eigenvalues(h);
    int c = 0;
    for (double e : ev) {
      c += e < energy ? 1 : 0;
    }
    return c;
  }

  double smallestLocalizerModulus(double kappa) {
    int n = h.numRows;
    double x0 = 0;
    double y0 = 0;
    for (int s = 0; s < lattice.sites(); s++) {
      x0 += lattice.position(0, s) / lattice.sites();
      y0 += lattice.position(1, s) / lattice.sites();
    }
    ZMatrixRMaj loc = new ZMatrixRMaj(2 * n, 2 * n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        loc.set(i, j, h.getReal(i, j), h.getImag(i, j));
        loc.set(n + i, n + j, -h.getReal(i, j), -h.getImag(i, j));
      }
      int site = i / lattice.orbitalsPerSite();
      double dx = kappa * (lattice.position(0, site) - x0);
      double dy = kappa * (lattice.position(1, site) - y0);
      loc.set(i, n + i, dx, -dy);
      loc.set(n + i, i, dx, dy);
    }
    double min = Double.MAX_VALUE;
    for (double e : eigenvalues(loc)) {
      min = Math.min(min, Math.abs(e));
    }
    return min;
  }

  private static double[] eigenvalues(ZMatrixRMaj a) {
    double[] ev = new double[a.numRows];
    if (!LinalgFactory.create(LinalgKind.NATIVE).newHermitianEigenSolver().eigenvalues(a, ev)) {
      throw new AssertionError("reference eigensolver did not converge");
    }
    return ev;
  }
}
