package hopstat.invariant;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.Linalg;
import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import java.util.Map;
import org.ejml.data.ZMatrixRMaj;

/** Test fixture: a clean sample of a catalogue model, diagonalised, with its lowest states. */
final class OccupiedStates {

  static final Linalg LINALG = LinalgFactory.create(LinalgKind.NATIVE);

  final Lattice lattice;
  final ZMatrixRMaj hamiltonian = new ZMatrixRMaj(1, 1);
  final double[] spectrum;
  final ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);

  OccupiedStates(String model, Map<String, Double> parameters, int linearSize, Boundary boundary) {
    Model m = ModelCatalog.find(model).orElseThrow();
    lattice = m.lattice(linearSize, boundary);
    HamiltonianBuilder builder = new HamiltonianBuilder();
    builder.reset(lattice.orbitals());
    m.addClean(new ParameterValues(parameters), lattice, builder);
    builder.toDense(hamiltonian);
    int n = lattice.orbitals();
    spectrum = new double[n];
    HermitianEigenSolver solver = LINALG.newHermitianEigenSolver();
    if (!solver.eigenpairs(hamiltonian, spectrum, 0, n - 1, vectors)) {
      throw new IllegalStateException("eigensolver failed");
    }
  }

  /** The lowest {@code count} eigenvectors as an N × count matrix. */
  ZMatrixRMaj lowest(int count) {
    int n = lattice.orbitals();
    ZMatrixRMaj out = new ZMatrixRMaj(n, count);
    for (int i = 0; i < n; i++) {
      System.arraycopy(vectors.data, 2 * i * n, out.data, 2 * i * count, 2 * count);
    }
    return out;
  }

  /** Number of eigenvalues below e. */
  int countBelow(double e) {
    int c = 0;
    while (c < spectrum.length && spectrum[c] < e) {
      c++;
    }
    return c;
  }
}
