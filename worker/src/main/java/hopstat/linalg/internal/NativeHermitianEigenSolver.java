package hopstat.linalg.internal;

import static org.bytedeco.openblas.global.openblas.LAPACKE_zheevr_work;
import static org.bytedeco.openblas.global.openblas.LAPACK_COL_MAJOR;

import hopstat.linalg.HermitianEigenSolver;
import org.bytedeco.javacpp.DoublePointer;
import org.bytedeco.javacpp.IntPointer;
import org.ejml.data.ZMatrixRMaj;

/**
 * Hermitian eigensolver on LAPACK {@code zheevr} (Householder tridiagonalisation, then MRRR for
 * eigenvectors or root-free QR for eigenvalues only).
 *
 * <p><b>Storage.</b> EJML's {@link ZMatrixRMaj} is row-major with interleaved (re, im); LAPACK is
 * column-major. The row-major array read column-major is Aᵀ, which for Hermitian A equals conj(A)
 * (derived). The lower triangle of A is the upper triangle of that view, so we pass {@code
 * UPLO='U'} and read exactly the lower triangle of {@code a}, as the interface promises. conj(A)
 * has the same (real) eigenvalues as A and eigenvectors conj(v); the vectors are conjugated back
 * while copying out, so the caller receives eigenvectors of A itself. No transposition is needed.
 *
 * <p><b>Index ranges.</b> {@link #eigenpairs} computes all n eigenvalues and all n vectors with
 * {@code RANGE='A'} and copies the wanted columns. Alternatives considered: {@code RANGE='I'}
 * returns only the eigenvalues in the index range (all n are required here, so a second reduction —
 * the O(n³) part — would be needed), and for a partial index range {@code zheevr} leaves MRRR for
 * bisection plus inverse iteration ({@code dstebz}/{@code zstein}), whose cost grows with the
 * square of cluster sizes in degenerate spectra. One {@code RANGE='A'} call does a single
 * reduction; the extra cost is the back-transformation of unwanted vectors.
 *
 * <p><b>Workspace.</b> Native buffers (matrix, eigenvalues, vectors, LAPACK work arrays) and one
 * heap scratch array grow to the largest n seen and never shrink; a warm call allocates nothing
 * beyond the copy into native memory. Not thread-safe; one instance per worker thread.
 *
 * <p>Cost: about (16/3)n³ real flops for the reduction, plus about 8n³ for the back-transformation
 * when vectors are wanted.
 */
final class NativeHermitianEigenSolver implements HermitianEigenSolver {

  private static final byte JOBZ_NONE = (byte) 'N';
  private static final byte JOBZ_VECTORS = (byte) 'V';
  private static final byte RANGE_ALL = (byte) 'A';
  private static final byte UPLO_UPPER = (byte) 'U';

  /** n for which the work arrays below were sized; -1 before the first call. */
  private int sizedFor = -1;

  private DoublePointer matrix;
  private DoublePointer eigenvalues;
  private DoublePointer vectorsColumnMajor;
  private IntPointer found;
  private IntPointer support;
  private DoublePointer work;
  private DoublePointer rwork;
  private IntPointer iwork;
  private int lwork;
  private int lrwork;
  private int liwork;

  /** Heap copy of the wanted columns, for the conjugating transpose into the caller's matrix. */
  private double[] columns;

  NativeHermitianEigenSolver() {
    NativeLibrary.requireLoaded();
    found = new IntPointer(1);
  }

  @Override
  public boolean eigenvalues(ZMatrixRMaj a, double[] values) {
    int n = LinalgCheckOps.requireSquare(a);
    LinalgCheckOps.requireLength(values, n, "values");
    if (n == 0) {
      return true;
    }
    prepare(a, n, false);
    if (!run(n, JOBZ_NONE)) {
      return false;
    }
    eigenvalues.get(values, 0, n);
    return true;
  }

  @Override
  public boolean eigenpairs(
      ZMatrixRMaj a, double[] values, int first, int last, ZMatrixRMaj vectors) {
    int n = LinalgCheckOps.requireSquare(a);
    LinalgCheckOps.requireLength(values, n, "values");
    LinalgCheckOps.requireRange(first, last, n);
    LinalgCheckOps.requireDistinct(a, vectors, "a", "vectors");
    int m = last - first + 1;
    vectors.reshape(n, m);
    if (n == 0) {
      return true;
    }
    prepare(a, n, true);
    if (!run(n, JOBZ_VECTORS)) {
      return false;
    }
    eigenvalues.get(values, 0, n);
    if (m == 0) {
      return true;
    }
    // Columns first..last are contiguous in the column-major result.
    int len = 2 * n * m;
    columns = NativeBufferOps.ensure(columns, len);
    vectorsColumnMajor.position(2L * n * first).get(columns, 0, len);
    vectorsColumnMajor.position(0);
    double[] out = vectors.data;
    for (int j = 0; j < m; j++) {
      int src = 2 * n * j;
      for (int i = 0; i < n; i++) {
        int dst = 2 * (i * m + j);
        out[dst] = columns[src + 2 * i];
        // conj: LAPACK saw conj(A), whose eigenvectors are conj(v).
        out[dst + 1] = -columns[src + 2 * i + 1];
      }
    }
    return true;
  }

  private void prepare(ZMatrixRMaj a, int n, boolean wantVectors) {
    long nn = 2L * n * n;
    matrix = NativeBufferOps.ensure(matrix, nn);
    eigenvalues = NativeBufferOps.ensure(eigenvalues, n);
    support = NativeBufferOps.ensure(support, 2L * n);
    if (wantVectors) {
      vectorsColumnMajor = NativeBufferOps.ensure(vectorsColumnMajor, nn);
    }
    if (n != sizedFor) {
      queryWorkspace(n);
    }
    matrix.put(a.data, 0, (int) nn);
  }

  /** Workspace query (lwork = -1) with vectors wanted, which needs at least as much as without. */
  // lwork depends on the current size alone: LAPACK chooses blocked or unblocked paths from it,
  // which round differently (see NativeGeneralEigenvalueSolver#queryWorkspace).
  private void queryWorkspace(int n) {
    DoublePointer optWork = new DoublePointer(2);
    DoublePointer optRwork = new DoublePointer(1);
    IntPointer optIwork = new IntPointer(1);
    // Z is not referenced by a query; the eigenvalue buffer stands in so that an
    // eigenvalues-only solver never allocates the n×n vector buffer.
    int info =
        LAPACKE_zheevr_work(
            LAPACK_COL_MAJOR,
            JOBZ_VECTORS,
            RANGE_ALL,
            UPLO_UPPER,
            n,
            matrix,
            n,
            0.0,
            0.0,
            0,
            0,
            0.0,
            found,
            eigenvalues,
            eigenvalues,
            n,
            support,
            optWork,
            -1,
            optRwork,
            -1,
            optIwork,
            -1);
    if (info != 0) {
      throw new IllegalStateException("zheevr workspace query failed, info = " + info);
    }
    lwork = Math.max(2 * n, (int) optWork.get(0));
    lrwork = Math.max(24 * n, (int) optRwork.get(0));
    liwork = Math.max(10 * n, optIwork.get(0));
    optWork.close();
    optRwork.close();
    optIwork.close();
    work = NativeBufferOps.ensure(work, 2L * lwork);
    rwork = NativeBufferOps.ensure(rwork, lrwork);
    iwork = NativeBufferOps.ensure(iwork, liwork);
    sizedFor = n;
  }

  private boolean run(int n, byte jobz) {
    DoublePointer z = jobz == JOBZ_VECTORS ? vectorsColumnMajor : eigenvalues;
    int ldz = jobz == JOBZ_VECTORS ? n : 1;
    int info =
        LAPACKE_zheevr_work(
            LAPACK_COL_MAJOR,
            jobz,
            RANGE_ALL,
            UPLO_UPPER,
            n,
            matrix,
            n,
            0.0,
            0.0,
            0,
            0,
            0.0,
            found,
            eigenvalues,
            z,
            ldz,
            support,
            work,
            lwork,
            rwork,
            lrwork,
            iwork,
            liwork);
    if (info < 0) {
      throw new IllegalStateException(
          "zheevr rejected argument " + (-info) + " (programming error)");
    }
    return info == 0;
  }
}
