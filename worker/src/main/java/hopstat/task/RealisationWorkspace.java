package hopstat.task;

import hopstat.invariant.BottWorkspace;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.linalg.HermitianEigenSolver;
import hopstat.linalg.Linalg;
import org.ejml.data.ZMatrixRMaj;

/**
 * All scratch one worker thread needs to run realisations: the Hamiltonian builder, the dense
 * matrix, spectra, eigenvectors and the per-observable workspaces, plus the linear-algebra solvers.
 * Grows to the largest task seen and never shrinks; reused across tasks. Not thread-safe.
 */
public final class RealisationWorkspace {

  final Linalg linalg;
  final HamiltonianBuilder builder = new HamiltonianBuilder();
  final ZMatrixRMaj hamiltonian = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);
  final ZMatrixRMaj occupied = new ZMatrixRMaj(1, 1);
  final HermitianEigenSolver eigenSolver;
  final BottWorkspace bott;
  double[] spectrum = new double[1];
  private final java.util.Map<Class<?>, Object> extra = new java.util.HashMap<>();

  public RealisationWorkspace(Linalg linalg) {
    this.linalg = linalg;
    this.eigenSolver = linalg.newHermitianEigenSolver();
    this.bott = new BottWorkspace(linalg);
  }

  /** The linear-algebra room this workspace's solvers come from. */
  public Linalg linalg() {
    return linalg;
  }

  /**
   * The per-thread scratch object of the given type, created on first use with {@code factory}.
   * Observables keep their kernel workspaces here, so adding an observable needs no change to this
   * class.
   */
  public <T> T scratch(Class<T> type, java.util.function.Function<Linalg, T> factory) {
    Object o = extra.get(type);
    if (o == null) {
      o = factory.apply(linalg);
      extra.put(type, o);
    }
    return type.cast(o);
  }

  double[] spectrumOfLength(int n) {
    if (spectrum.length < n) {
      spectrum = new double[n];
    }
    return spectrum;
  }
}
