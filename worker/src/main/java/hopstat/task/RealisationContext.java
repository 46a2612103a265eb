package hopstat.task;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.spectrum.CsrHermitianMatrix;
import java.util.random.RandomGenerator;
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
  private final RandomGenerator random;
  private boolean denseBuilt;
  private boolean sparseBuilt;
  private boolean spectrumDone;
  private boolean vectorsDone;
  private boolean occupiedDone;
  private int occupiedCount;

  RealisationContext(
      RealisationWorkspace workspace,
      Model model,
      Lattice lattice,
      PointSpec point,
      boolean vectorsWanted) {
    this(workspace, model, lattice, point, vectorsWanted, null);
  }

  RealisationContext(
      RealisationWorkspace workspace,
      Model model,
      Lattice lattice,
      PointSpec point,
      boolean vectorsWanted,
      RandomGenerator random) {
    this.random = random;
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
   * The Hamiltonian in CSR storage (both triangles, duplicates summed; {@link CsrHermitianMatrix}),
   * assembled from {@link #terms()} on first use and cached for the realisation; no dense matrix is
   * built. Read, not modified, by callers.
   */
  public CsrHermitianMatrix sparseHamiltonian() {
    CsrHermitianMatrix m =
        workspace.scratch(CsrHermitianMatrix.class, linalg -> new CsrHermitianMatrix());
    if (!sparseBuilt) {
      m.assemble(workspace.builder);
      sparseBuilt = true;
    }
    return m;
  }

  /**
   * All eigenvalues in ascending order; the array may be longer than {@link #dimension()}, only the
   * first N entries are meaningful. Read, not modified, by callers.
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
    boolean ok =
        withVectors
            ? workspace.eigenSolver.eigenpairs(
                denseHamiltonian(), values, 0, n - 1, workspace.vectors)
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

  /**
   * The realisation's random generator, positioned after the draws of all disorder terms of the
   * sample (and of any earlier observable that drew). Observables that generate further random
   * structure themselves (the transfer-matrix {@code lyapunov}, which draws each slice's disorder
   * as it goes) continue from it, so the realisation stays a function of its seed and the spec's
   * observable order.
   *
   * @throws IllegalStateException if the context was made without a generator
   */
  public RandomGenerator random() {
    if (random == null) {
      throw new IllegalStateException("this realisation context carries no random generator");
    }
    return random;
  }

  /** Index of the first eigenvalue ≥ {@code energy} in {@link #spectrum()} (N if none). */
  public int firstIndexAtOrAbove(double energy) {
    double[] e = spectrum();
    int lo = 0;
    int hi = dimension();
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      if (e[mid] < energy) {
        lo = mid + 1;
      } else {
        hi = mid;
      }
    }
    return lo;
  }

  /**
   * The eigenvectors whose eigenvalues lie in [lower, upper), as the columns of an N × n_w matrix:
   * column j belongs to {@code spectrum()[firstIndexAtOrAbove(lower) + j]}. Only these vectors are
   * computed (one extra partial eigen-decomposition), unless all eigenvectors were computed anyway
   * for an observable that declared {@link Observable#needsOccupiedStates()}. Not cached: each call
   * recomputes. Read, not modified, by callers; overwritten by the next call.
   *
   * @throws ConvergenceFailure if the eigensolver did not converge
   */
  public ZMatrixRMaj eigenvectorsInWindow(double lower, double upper) {
    int first = firstIndexAtOrAbove(lower);
    int end = firstIndexAtOrAbove(upper);
    int n = dimension();
    int count = Math.max(0, end - first);
    WindowVectors window = workspace.scratch(WindowVectors.class, linalg -> new WindowVectors());
    window.vectors.reshape(n, count);
    if (count == 0) {
      return window.vectors;
    }
    if (vectorsWanted) {
      ZMatrixRMaj all = workspace.vectors;
      for (int i = 0; i < n; i++) {
        System.arraycopy(
            all.data, 2 * (i * n + first), window.vectors.data, 2 * i * count, 2 * count);
      }
      return window.vectors;
    }
    if (window.values.length < n) {
      window.values = new double[n];
    }
    if (!workspace.eigenSolver.eigenpairs(
        denseHamiltonian(), window.values, first, end - 1, window.vectors)) {
      throw new ConvergenceFailure(
          "Hermitian eigensolver did not converge for the eigenvectors in ["
              + lower
              + ", "
              + upper
              + ")");
    }
    return window.vectors;
  }

  /** Per-thread storage of {@link #eigenvectorsInWindow}. */
  static final class WindowVectors {
    final ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);
    double[] values = new double[1];
  }
}
