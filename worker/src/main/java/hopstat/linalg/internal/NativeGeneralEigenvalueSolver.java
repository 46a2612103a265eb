package hopstat.linalg.internal;

import static org.bytedeco.openblas.global.openblas.LAPACKE_zgeev_work;
import static org.bytedeco.openblas.global.openblas.LAPACK_COL_MAJOR;

import hopstat.linalg.GeneralEigenvalueSolver;
import org.bytedeco.javacpp.DoublePointer;
import org.ejml.data.ZMatrixRMaj;

/**
 * General complex eigenvalues on LAPACK {@code zgeev} with {@code JOBVL = JOBVR = 'N'} (balancing,
 * Hessenberg reduction, complex Schur QR).
 *
 * <p>The row-major EJML array read column-major is Aᵀ, which has the same eigenvalues as A, so the
 * data are passed without transposition. Buffers grow to the largest n seen and never shrink. Not
 * thread-safe; one instance per worker thread. Cost: roughly 10n³ complex flops (LAPACK Working
 * Note 41 quotes this order for eigenvalues only).
 */
final class NativeGeneralEigenvalueSolver implements GeneralEigenvalueSolver {

  private static final byte JOB_NONE = (byte) 'N';

  private int sizedFor = -1;
  private DoublePointer matrix;
  private DoublePointer eigenvalues;
  private DoublePointer unused;
  private DoublePointer work;
  private DoublePointer rwork;
  private int lwork;
  private double[] interleaved;

  NativeGeneralEigenvalueSolver() {
    NativeLibrary.requireLoaded();
    unused = new DoublePointer(2);
  }

  @Override
  public boolean eigenvalues(ZMatrixRMaj a, double[] real, double[] imaginary) {
    int n = LinalgCheckOps.requireSquare(a);
    LinalgCheckOps.requireLength(real, n, "real");
    LinalgCheckOps.requireLength(imaginary, n, "imaginary");
    LinalgCheckOps.requireDistinct(real, imaginary);
    if (n == 0) {
      return true;
    }
    long nn = 2L * n * n;
    matrix = NativeBufferOps.ensure(matrix, nn);
    eigenvalues = NativeBufferOps.ensure(eigenvalues, 2L * n);
    if (n != sizedFor) {
      queryWorkspace(n);
    }
    matrix.put(a.data, 0, (int) nn);
    int info =
        LAPACKE_zgeev_work(
            LAPACK_COL_MAJOR,
            JOB_NONE,
            JOB_NONE,
            n,
            matrix,
            n,
            eigenvalues,
            unused,
            1,
            unused,
            1,
            work,
            lwork,
            rwork);
    if (info < 0) {
      throw new IllegalStateException(
          "zgeev rejected argument " + (-info) + " (programming error)");
    }
    if (info > 0) {
      return false;
    }
    interleaved = NativeBufferOps.ensure(interleaved, 2 * n);
    eigenvalues.get(interleaved, 0, 2 * n);
    for (int i = 0; i < n; i++) {
      real[i] = interleaved[2 * i];
      imaginary[i] = interleaved[2 * i + 1];
    }
    return true;
  }

  /**
   * Sizes the workspace for exactly this n. LAPACK picks blocked or unblocked code paths from
   * lwork, and different paths round differently, so lwork must be a function of n alone (not the
   * largest n seen): otherwise the same matrix gives results differing in the last bits depending
   * on which realisations ran before it. Buffers still only grow.
   */
  private void queryWorkspace(int n) {
    DoublePointer opt = new DoublePointer(2);
    rwork = NativeBufferOps.ensure(rwork, 2L * n);
    int info =
        LAPACKE_zgeev_work(
            LAPACK_COL_MAJOR,
            JOB_NONE,
            JOB_NONE,
            n,
            matrix,
            n,
            eigenvalues,
            unused,
            1,
            unused,
            1,
            opt,
            -1,
            rwork);
    if (info != 0) {
      throw new IllegalStateException("zgeev workspace query failed, info = " + info);
    }
    lwork = Math.max(2 * n, (int) opt.get(0));
    opt.close();
    work = NativeBufferOps.ensure(work, 2L * lwork);
    sizedFor = n;
  }
}
