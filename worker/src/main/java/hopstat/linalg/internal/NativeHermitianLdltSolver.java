package hopstat.linalg.internal;

import static org.bytedeco.openblas.global.openblas.LAPACKE_zhetrf_work;
import static org.bytedeco.openblas.global.openblas.LAPACKE_zhetrs2_work;
import static org.bytedeco.openblas.global.openblas.LAPACK_COL_MAJOR;

import hopstat.linalg.HermitianLdltSolver;
import org.bytedeco.javacpp.DoublePointer;
import org.bytedeco.javacpp.IntPointer;
import org.ejml.data.ZMatrixRMaj;

/**
 * Bunch–Kaufman LDLᴴ on LAPACK {@code zhetrf} (blocked, level-3 BLAS) and solves with {@code
 * zhetrs2} (triangular solves by {@code ztrsm}).
 *
 * <p><b>Storage.</b> As in {@link NativeHermitianEigenSolver}: EJML's row-major array read
 * column-major is Aᵀ = conj(A) (A Hermitian), whose upper triangle holds A's lower triangle, so we
 * factor conj(A) with {@code UPLO='U'}. conj(A) has the inertia of A. For solves, conj(A) Y =
 * conj(B) gives Y = conj(A⁻¹B): right-hand sides are conjugated (and transposed to column-major) on
 * the way in and conjugated on the way out.
 *
 * <p><b>Inertia from D</b> ({@code zhetrf} documentation, UPLO='U'): {@code ipiv[k] > 0} marks a
 * 1×1 block D(k,k); {@code ipiv[k] = ipiv[k+1] < 0} a 2×2 block on rows k, k+1 (0-based), stored in
 * the upper triangle. {@code info > 0} means D(info, info) is exactly zero.
 *
 * <p>Workspace: native matrix, pivots, LAPACK work array and right-hand-side buffer, grow-only. Not
 * thread-safe. Cost: n³/3 complex multiply–adds per factorisation, n² m per solve with m columns.
 */
final class NativeHermitianLdltSolver implements HermitianLdltSolver {

  private static final byte UPLO_UPPER = (byte) 'U';

  private int n = -1;
  private boolean solvable;
  private final int[] counts = new int[3];
  private DoublePointer matrix;
  private IntPointer pivots;
  private DoublePointer work;
  private int lwork;
  private int sizedFor = -1;
  private DoublePointer rhs;
  private DoublePointer solveWork;
  private double[] pivotBlock = new double[6];
  private int[] pivotCopy = new int[1];
  private double[] rhsCopy;

  NativeHermitianLdltSolver() {
    NativeLibrary.requireLoaded();
  }

  @Override
  public boolean factor(ZMatrixRMaj a) {
    int size = LinalgCheckOps.requireSquare(a);
    n = size;
    counts[0] = 0;
    counts[1] = 0;
    counts[2] = 0;
    if (size == 0) {
      solvable = true;
      return true;
    }
    long nn = 2L * size * size;
    matrix = NativeBufferOps.ensure(matrix, nn);
    pivots = NativeBufferOps.ensure(pivots, size);
    if (size != sizedFor) {
      queryWorkspace(size);
    }
    matrix.put(a.data, 0, (int) nn);
    int info =
        LAPACKE_zhetrf_work(LAPACK_COL_MAJOR, UPLO_UPPER, size, matrix, size, pivots, work, lwork);
    if (info < 0) {
      throw new IllegalStateException(
          "zhetrf rejected argument " + (-info) + " (programming error)");
    }
    if (pivotCopy.length < size) {
      pivotCopy = new int[size];
    }
    pivots.get(pivotCopy, 0, size);
    int k = 0;
    while (k < size) {
      if (pivotCopy[k] > 0 || k == size - 1) {
        matrix.position(2L * (k + (long) k * size)).get(pivotBlock, 0, 2);
        InertiaOps.addScalar(pivotBlock[0], counts);
        k++;
      } else {
        matrix.position(2L * (k + (long) k * size)).get(pivotBlock, 0, 2);
        double d0 = pivotBlock[0];
        // Upper-triangle off-diagonal D(k, k+1) and the diagonal D(k+1, k+1).
        matrix.position(2L * (k + (long) (k + 1) * size)).get(pivotBlock, 0, 4);
        double offRe = pivotBlock[0];
        double offIm = pivotBlock[1];
        double d1 = pivotBlock[2];
        InertiaOps.addBlock(d0, offRe, offIm, d1, counts);
        k += 2;
      }
    }
    matrix.position(0);
    solvable = info == 0 && counts[2] == 0;
    return solvable;
  }

  // lwork depends on the current size alone: LAPACK chooses blocked or unblocked paths from it,
  // which round differently (see NativeGeneralEigenvalueSolver#queryWorkspace).
  private void queryWorkspace(int size) {
    DoublePointer opt = new DoublePointer(2);
    int info =
        LAPACKE_zhetrf_work(LAPACK_COL_MAJOR, UPLO_UPPER, size, matrix, size, pivots, opt, -1);
    if (info != 0) {
      throw new IllegalStateException("zhetrf workspace query failed, info = " + info);
    }
    lwork = Math.max(size, (int) opt.get(0));
    opt.close();
    work = NativeBufferOps.ensure(work, 2L * lwork);
    solveWork = NativeBufferOps.ensure(solveWork, 2L * size);
    sizedFor = size;
  }

  @Override
  public int positiveCount() {
    return counts[0];
  }

  @Override
  public int negativeCount() {
    return counts[1];
  }

  @Override
  public int zeroCount() {
    return counts[2];
  }

  @Override
  public void solve(ZMatrixRMaj b) {
    if (n < 0 || !solvable) {
      throw new IllegalStateException(
          "solve needs a successful factorisation of a non-singular matrix");
    }
    if (b.numRows != n) {
      throw new IllegalStateException(
          "right-hand side has " + b.numRows + " rows, the factored matrix " + n);
    }
    int m = b.numCols;
    if (n == 0 || m == 0) {
      return;
    }
    int len = 2 * n * m;
    rhsCopy = NativeBufferOps.ensure(rhsCopy, len);
    double[] in = b.data;
    // conj(B) in column-major order.
    for (int i = 0; i < n; i++) {
      int row = 2 * i * m;
      for (int j = 0; j < m; j++) {
        int dst = 2 * (i + j * n);
        rhsCopy[dst] = in[row + 2 * j];
        rhsCopy[dst + 1] = -in[row + 2 * j + 1];
      }
    }
    rhs = NativeBufferOps.ensure(rhs, len);
    rhs.put(rhsCopy, 0, len);
    int info =
        LAPACKE_zhetrs2_work(
            LAPACK_COL_MAJOR, UPLO_UPPER, n, m, matrix, n, pivots, rhs, n, solveWork);
    if (info != 0) {
      throw new IllegalStateException("zhetrs2 failed, info = " + info + " (programming error)");
    }
    rhs.get(rhsCopy, 0, len);
    for (int i = 0; i < n; i++) {
      int row = 2 * i * m;
      for (int j = 0; j < m; j++) {
        int src = 2 * (i + j * n);
        in[row + 2 * j] = rhsCopy[src];
        in[row + 2 * j + 1] = -rhsCopy[src + 1];
      }
    }
  }
}
