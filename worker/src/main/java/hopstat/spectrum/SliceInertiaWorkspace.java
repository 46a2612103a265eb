package hopstat.spectrum;

import hopstat.linalg.HermitianLdltFactory;
import hopstat.linalg.HermitianLdltSolver;
import hopstat.linalg.Linalg;
import org.ejml.data.ZMatrixRMaj;

/**
 * Scratch of {@link SliceInertiaKernel}: the slice partition, the bucketed term list, the current
 * Schur complement, the coupling block and the LDLᴴ solver. Memory O(n_slice²) for the two dense
 * blocks plus O(N + terms) integers. Grows to the largest problem seen, never shrinks; one per
 * worker thread.
 */
public final class SliceInertiaWorkspace {

  final HermitianLdltSolver solver;

  /** Current Schur complement S_g (n_g × n_g). */
  final ZMatrixRMaj schur = new ZMatrixRMaj(1, 1);

  /** Coupling B_g, then overwritten by S_g⁻¹ B_g (n_g × n_{g+1}). */
  final ZMatrixRMaj coupling = new ZMatrixRMaj(1, 1);

  double[] sortedX = new double[1];
  int[] sliceOfSite = new int[1];
  int[] reach = new int[1];
  int[] groupOfSlice = new int[1];
  int[] groupOfOrbital = new int[1];
  int[] localIndex = new int[1];
  int[] groupSize = new int[1];
  int[] termStart = new int[2];
  int[] termOrder = new int[1];
  int groups;

  /**
   * @param linalg read; picks the native or Java LDLᴴ solver
   */
  public SliceInertiaWorkspace(Linalg linalg) {
    this.solver = HermitianLdltFactory.create(linalg);
  }

  /** Largest slice-block dimension of the last call (for memory reports). */
  public int largestBlock() {
    int m = 0;
    for (int g = 0; g < groups; g++) {
      m = Math.max(m, groupSize[g]);
    }
    return m;
  }
}
