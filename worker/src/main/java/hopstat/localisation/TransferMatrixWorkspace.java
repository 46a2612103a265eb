package hopstat.localisation;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.linalg.Linalg;
import hopstat.linalg.RealQrWorkspace;

/**
 * Scratch for {@link TransferMatrixKernel}: the two current slices of the K propagated vectors, the
 * slice's term list, the inverse inter-slice hopping and the QR workspace. Sized by K only (memory
 * independent of the bar length). Grows, never shrinks. One per worker thread.
 */
public final class TransferMatrixWorkspace {

  final RealQrWorkspace qr = new RealQrWorkspace();

  /** The slice Hamiltonian H_n, refilled by the slice source for every slice. */
  final HamiltonianBuilder slice = new HamiltonianBuilder();

  double[] current = new double[1];
  double[] previous = new double[1];
  double[] next = new double[1];
  double[] stacked = new double[1];
  double[] hoppingInverse = new double[1];
  double[] hoppingRatio = new double[1];
  double[] scratch = new double[1];
  double[] rDiagonal = new double[1];
  double[] logSums = new double[1];

  /**
   * @param linalg unused today (the QR is pure Java); kept so the workspace can be made through the
   *     usual factory
   */
  public TransferMatrixWorkspace(Linalg linalg) {}

  /** A workspace without a linear-algebra room (the kernel needs none). */
  public TransferMatrixWorkspace() {}

  void ensure(int k) {
    int kk = k * k;
    if (current.length < kk) {
      current = new double[kk];
      previous = new double[kk];
      next = new double[kk];
      hoppingInverse = new double[kk];
      hoppingRatio = new double[kk];
      scratch = new double[kk];
    }
    if (stacked.length < 2 * kk) {
      stacked = new double[2 * kk];
    }
    if (rDiagonal.length < k) {
      rDiagonal = new double[k];
      logSums = new double[k];
    }
  }
}
