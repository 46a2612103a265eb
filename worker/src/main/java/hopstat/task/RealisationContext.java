package hopstat.task;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import org.ejml.data.ZMatrixRMaj;

/**
 * One realisation as the observables see it: the built Hamiltonian and lazily computed, cached
 * spectral data. Eigen-decompositions are done once per realisation when the observables declare
 * their needs ({@link Observable#needsOccupiedStates()}), and only as far as needed: eigenvalues
 * only, or eigenvalues plus all eigenvectors; an undeclared request for vectors costs a second one.
 */
public final class RealisationContext {

  private final RealisationWorkspace workspace;
  private final Model model;
  private final Lattice lattice;
  private final PointSpec point;
  private final boolean vectorsWanted;
  private boolean denseBuilt;
  private boolean spectrumDone;
  private boolean vectorsDone;
  private boolean occupiedDone;
  private int occupiedCount;

  RealisationContext(RealisationWorkspace workspace, Model model, Lattice lattice, PointSpec point, boolean vectorsWanted) {
    this.workspace = workspace;
    this.model = model;
    this.lattice = lattice;
    this.point = point;
    this.vectorsWanted = vectorsWanted;
  }

  public Model model() {
    return model;
  }

  public Lattice lattice() {
    return lattice;
  }

  public PointSpec point() {
    return point;
  }

  public double fermiEnergy() {
    return point.fermiEnergy();
  }

  /** The sparse term list of this realisation (clean + disorder). */
  public HamiltonianBuilder terms() {
    return workspace.builder;
  }

  public RealisationWorkspace workspace() {
    return workspace;
  }

  /** Matrix dimension N. */
  public int dimension() {
    return workspace.builder.dimension();
  }

  /** The dense Hamiltonian, built on first use. Read, not modified, by callers. */
  public ZMatrixRMaj denseHamiltonian() {
    if (!denseBuilt) {
      workspace.builder.toDense(workspace.hamiltonian);
      denseBuilt = true;
    }
    return workspace.hamiltonian;
  }

  /**
   * All eigenvalues in ascending order; the array may be longer than {@link #dimension()}, only
   * the first N entries are meaningful. Read, not modified, by callers.
   *
   * @throws ConvergenceFailure if the eigensolver did not converge
   */
  public double[] spectrum() {
    if (!spectrumDone) {
      decompose(vectorsWanted);
    }
    return workspace.spectrum;
  }

  /** One eigen-decomposition, with or without all eigenvectors. */
  private void decompose(boolean withVectors) {
    int n = dimension();
    double[] values = workspace.spectrumOfLength(n);
    boolean ok = withVectors
        ? workspace.eigenSolver.eigenpairs(denseHamiltonian(), values, 0, n - 1, workspace.vectors)
        : workspace.eigenSolver.eigenvalues(denseHamiltonian(), values);
    if (!ok) {
      throw new ConvergenceFailure("Hermitian eigensolver did not converge (N = " + n + ")");
    }
    spectrumDone = true;
    vectorsDone = withVectors;
  }

  /**
   * All eigenvectors as the columns of the N × N matrix, in the order of {@link #spectrum()}. An
   * observable that declared {@link Observable#needsOccupiedStates()} gets them from the one
   * decomposition; otherwise they are computed on first request (a second decomposition if the
   * eigenvalues were already computed alone). Read, not modified, by callers.
   */
  public ZMatrixRMaj allEigenvectors() {
    if (!vectorsDone) {
      decompose(true);
    }
    return workspace.vectors;
  }

  /** Number of eigenvalues strictly below E_F. */
  public int occupiedCount() {
    double[] e = spectrum();
    int n = dimension();
    double ef = fermiEnergy();
    int count = 0;
    while (count < n && e[count] < ef) {
      count++;
    }
    return count;
  }

  /**
   * Eigenvectors of the occupied states (E &lt; E_F) as the columns of an N × n_occ matrix. Read,
   * not modified, by callers.
   */
  public ZMatrixRMaj occupiedStates() {
    if (!occupiedDone) {
      ZMatrixRMaj all = allEigenvectors();
      occupiedCount = occupiedCount();
      int n = dimension();
      ZMatrixRMaj occ = workspace.occupied;
      occ.reshape(n, occupiedCount);
      for (int i = 0; i < n; i++) {
        System.arraycopy(all.data, 2 * i * n, occ.data, 2 * i * occupiedCount, 2 * occupiedCount);
      }
      occupiedDone = true;
    }
    return workspace.occupied;
  }
}
