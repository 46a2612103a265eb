package hopstat.linalg;

import static hopstat.linalg.LinalgTestMatrices.randomGeneral;
import static hopstat.linalg.LinalgTestMatrices.randomHermitian;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;

/**
 * Separate solvers on separate threads share the one native library. With one BLAS thread the
 * results must be bitwise identical to a sequential run (common practice: single-threaded OpenBLAS
 * is deterministic for fixed inputs and code path).
 */
class NativeConcurrencyTest {

  private static final int MATRICES = 12;

  private final Linalg linalg = LinalgFactory.create(LinalgKind.NATIVE);

  /** One worker's job: eigenpairs, general eigenvalues and a product over its matrices. */
  private double[][] work(int offset) {
    HermitianEigenSolver hermitian = linalg.newHermitianEigenSolver();
    GeneralEigenvalueSolver general = linalg.newGeneralEigenvalueSolver();
    ComplexProducts products = linalg.newComplexProducts();
    double[][] out = new double[MATRICES][];
    for (int k = 0; k < MATRICES; k++) {
      int n = 20 + 5 * k;
      ZMatrixRMaj h = randomHermitian(n, offset + k);
      double[] values = new double[n];
      ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);
      assertThat(hermitian.eigenpairs(h, values, 0, n / 2, vectors)).isTrue();
      double[] re = new double[n];
      double[] im = new double[n];
      assertThat(general.eigenvalues(randomGeneral(n, n, offset + k), re, im)).isTrue();
      ZMatrixRMaj c = new ZMatrixRMaj(1, 1);
      products.multConjTransB(vectors, vectors, c);
      double[] all = new double[3 * n + vectors.getDataLength() + c.getDataLength()];
      System.arraycopy(values, 0, all, 0, n);
      System.arraycopy(re, 0, all, n, n);
      System.arraycopy(im, 0, all, 2 * n, n);
      System.arraycopy(vectors.data, 0, all, 3 * n, vectors.getDataLength());
      System.arraycopy(c.data, 0, all, 3 * n + vectors.getDataLength(), c.getDataLength());
      out[k] = all;
    }
    return out;
  }

  @Test
  void twoThreadsMatchSequentialBitwise() throws Exception {
    double[][] seqA = work(1000);
    double[][] seqB = work(2000);
    ExecutorService pool = Executors.newFixedThreadPool(2);
    try {
      for (int round = 0; round < 3; round++) {
        Callable<double[][]> jobA = () -> work(1000);
        Callable<double[][]> jobB = () -> work(2000);
        Future<double[][]> a = pool.submit(jobA);
        Future<double[][]> b = pool.submit(jobB);
        assertThat(a.get()).isDeepEqualTo(seqA);
        assertThat(b.get()).isDeepEqualTo(seqB);
      }
    } finally {
      pool.shutdownNow();
    }
  }
}
