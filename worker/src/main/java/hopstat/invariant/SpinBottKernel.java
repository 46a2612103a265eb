package hopstat.invariant;

import hopstat.lattice.Lattice;
import hopstat.model.SpinZOperator;
import org.ejml.data.ZMatrixRMaj;

/**
 * Spin Chern number of a two-dimensional periodic sample from spin-resolved Bott indices.
 *
 * <p>The occupied projector P is split by the spectrum of P S_z P: P₊ (P₋) spans the occupied
 * states with positive (negative) eigenvalue; the spin Chern number is (C₊ − C₋)/2 with C± the
 * Chern numbers of P± (Prodan, PRB 80, 125327 (2009), "Robustness of the spin-Chern number"), here
 * each evaluated as a Bott index (Loring &amp; Hastings, EPL 92, 67004 (2010)) — the "spin Bott
 * index" of Huang &amp; Liu, PRL 121, 126401 (2018). For class AII the Z2 index is the parity of
 * the spin Chern number, valid while P S_z P has a gap at 0 (Prodan 2009); it does not need S_z to
 * be conserved. When S_z is conserved, P commutes with S_z, P S_z P has eigenvalues ±1 and P± are
 * the occupied spin-up/down sectors, so C₊ = C_↑, C₋ = C_↓.
 *
 * <p>Cost: one N·n² product, one n × n Hermitian eigenproblem, two N·n·n± products and two Bott
 * indices (on n₊ and n₋ states).
 */
public final class SpinBottKernel {

  private SpinBottKernel() {}

  /**
   * @param lattice read: periodic two-dimensional sample
   * @param occupied read, not modified: N × n orthonormal occupied states
   * @param spin read: the local S_z; its orbital count must match the lattice
   * @param workspace scratch
   */
  public static SpinBottResult compute(
      Lattice lattice, ZMatrixRMaj occupied, SpinZOperator spin, SpinBottWorkspace workspace) {
    int perSite = lattice.orbitalsPerSite();
    if (spin.orbitalsPerSite() != perSite) {
      throw new IllegalArgumentException(
          "S_z acts on " + spin.orbitalsPerSite() + " orbitals per site, lattice has " + perSite);
    }
    int rows = occupied.numRows;
    int n = occupied.numCols;
    if (rows != lattice.orbitals()) {
      throw new IllegalArgumentException(
          "occupied states have "
              + rows
              + " rows, lattice has "
              + lattice.orbitals()
              + " orbitals");
    }
    if (n == 0) {
      return new SpinBottResult(0.0, 0.0, 0.0, Double.NaN, true);
    }
    // S Ψ, then P S_z P in the occupied basis: Ψ† S_z Ψ (n × n, Hermitian).
    ZMatrixRMaj spinPsi = workspace.spinPsi;
    spinPsi.reshape(rows, n);
    for (int i = 0; i < rows; i++) {
      double s = spin.spinOf(i % perSite);
      int base = 2 * i * n;
      for (int j = 0; j < 2 * n; j++) {
        spinPsi.data[base + j] = s * occupied.data[base + j];
      }
    }
    workspace.products.multConjTransA(occupied, spinPsi, workspace.projectedSpin);
    workspace.ensure(n);
    double[] values = workspace.spinValues;
    if (!workspace.eigenSolver.eigenpairs(
        workspace.projectedSpin, values, 0, n - 1, workspace.spinVectors)) {
      return new SpinBottResult(Double.NaN, Double.NaN, Double.NaN, Double.NaN, false);
    }
    int negative = 0;
    double gap = Double.POSITIVE_INFINITY;
    for (int i = 0; i < n; i++) {
      if (values[i] < 0) {
        negative++;
      }
      gap = Math.min(gap, Math.abs(values[i]));
    }
    double down = sectorBott(lattice, occupied, 0, negative, workspace);
    double up = sectorBott(lattice, occupied, negative, n, workspace);
    if (Double.isNaN(down) || Double.isNaN(up)) {
      return new SpinBottResult(Double.NaN, Double.NaN, Double.NaN, gap, false);
    }
    return new SpinBottResult(up, down, 0.5 * (up - down), gap, true);
  }

  /** Bott index of Ψ V[:, from..to−1]; NaN if the eigenvalue routine failed. */
  private static double sectorBott(
      Lattice lattice, ZMatrixRMaj occupied, int from, int to, SpinBottWorkspace ws) {
    int n = occupied.numCols;
    int m = to - from;
    ZMatrixRMaj v = ws.sectorVectors;
    v.reshape(n, m);
    for (int i = 0; i < n; i++) {
      System.arraycopy(ws.spinVectors.data, 2 * (i * n + from), v.data, 2 * i * m, 2 * m);
    }
    if (m == 0) {
      return 0.0;
    }
    ws.products.mult(occupied, v, ws.sectorStates);
    BottIndexResult r = BottIndexKernel.compute(lattice, ws.sectorStates, ws.bott);
    return r.converged() ? r.bott() : Double.NaN;
  }

  /**
   * How far a Hamiltonian is from conserving S_z: ‖H_off‖_F / ‖H‖_F, H_off the entries between
   * orbitals of opposite spin (‖[S_z, H]‖_F = 2 ‖H_off‖_F). 0 when H = 0.
   *
   * @param hamiltonian read, not modified: N × N, N a multiple of the spin operator's orbitals
   * @param spin read
   */
  public static double relativeSpinMixing(ZMatrixRMaj hamiltonian, SpinZOperator spin) {
    int n = hamiltonian.numRows;
    int perSite = spin.orbitalsPerSite();
    if (hamiltonian.numCols != n || n % perSite != 0) {
      throw new IllegalArgumentException(
          "H must be square with a multiple of " + perSite + " rows");
    }
    double off = 0.0;
    double all = 0.0;
    double[] h = hamiltonian.data;
    for (int i = 0; i < n; i++) {
      int si = spin.spinOf(i % perSite);
      for (int j = 0; j < n; j++) {
        double re = h[2 * (i * n + j)];
        double im = h[2 * (i * n + j) + 1];
        double sq = re * re + im * im;
        all += sq;
        if (si != spin.spinOf(j % perSite)) {
          off += sq;
        }
      }
    }
    return all == 0.0 ? 0.0 : Math.sqrt(off / all);
  }
}
