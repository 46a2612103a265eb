package hopstat.linalg;

import static hopstat.linalg.LinalgTestMatrices.frobenius;
import static hopstat.linalg.LinalgTestMatrices.hermitianWithSpectrum;
import static hopstat.linalg.LinalgTestMatrices.maxAbsDifference;
import static hopstat.linalg.LinalgTestMatrices.multisetDistance;
import static hopstat.linalg.LinalgTestMatrices.naiveProduct;
import static hopstat.linalg.LinalgTestMatrices.randomGeneral;
import static hopstat.linalg.LinalgTestMatrices.randomHermitian;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Arrays;
import java.util.stream.Stream;
import org.ejml.data.Complex_F64;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Contract every {@link Linalg} implementation must meet; one small subclass per backend.
 *
 * <p>Tolerances (common practice): backward-stable dense eigensolvers and products have errors of
 * order n·ε·‖A‖ (Golub &amp; Van Loan, Matrix Computations, 4th ed. 2013, §7.5 and §8.3). For n ≤
 * 40 that is below 1e-14·‖A‖; the checks allow {@link #TOL} = 1e-11 relative, a margin of about
 * 1000 that still catches any wrong sign, conjugation or index.
 */
abstract class LinalgContractTest {

  /** Relative tolerance, see class Javadoc. */
  static final double TOL = 1e-11;

  /** The backend under test. */
  protected abstract Linalg linalg();

  static Stream<Arguments> hermitianCases() {
    return Stream.of(
        Arguments.of("random n=1", randomHermitian(1, 11)),
        Arguments.of("random n=2", randomHermitian(2, 12)),
        Arguments.of("random n=7", randomHermitian(7, 13)),
        Arguments.of("random n=40", randomHermitian(40, 14)),
        // Degenerate spectra: multiplicities 3 and 2 at n = 7, and a 40×40 with a ten-fold and a
        // five-fold eigenvalue plus a pair at zero.
        Arguments.of(
            "degenerate n=7", hermitianWithSpectrum(new double[] {-1, -1, -1, 0.5, 2, 2, 3}, 15)),
        Arguments.of("degenerate n=40", hermitianWithSpectrum(degenerateSpectrum40(), 16)),
        Arguments.of("identity n=7", hermitianWithSpectrum(filled(7, 1.0), 17)));
  }

  private static double[] degenerateSpectrum40() {
    double[] s = new double[40];
    for (int i = 0; i < 40; i++) {
      s[i] = i < 10 ? -2.0 : i < 15 ? 1.5 : i < 17 ? 0.0 : -1.0 + 0.1 * i;
    }
    return s;
  }

  private static double[] filled(int n, double v) {
    double[] s = new double[n];
    Arrays.fill(s, v);
    return s;
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("hermitianCases")
  void eigenvaluesAscendAndSumToTrace(String name, ZMatrixRMaj a) {
    int n = a.numRows;
    double[] values = new double[n];
    assertThat(linalg().newHermitianEigenSolver().eigenvalues(a, values)).isTrue();
    for (int i = 1; i < n; i++) {
      assertThat(values[i]).isGreaterThanOrEqualTo(values[i - 1]);
    }
    // trace = Σλ (derived: the trace is invariant under similarity).
    double trace = 0;
    double sum = 0;
    for (int i = 0; i < n; i++) {
      trace += a.getReal(i, i);
      sum += values[i];
    }
    assertThat(Math.abs(sum - trace)).isLessThan(TOL * n * Math.max(1, frobenius(a)));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("hermitianCases")
  void eigenpairsHaveSmallResidualAndOrthonormalVectors(String name, ZMatrixRMaj a) {
    int n = a.numRows;
    double[] values = new double[n];
    ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);
    assertThat(linalg().newHermitianEigenSolver().eigenpairs(a, values, 0, n - 1, vectors))
        .isTrue();
    assertThat(vectors.numRows).isEqualTo(n);
    assertThat(vectors.numCols).isEqualTo(n);
    assertResidual(a, values, 0, vectors);
    assertOrthonormal(vectors);
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("hermitianCases")
  void eigenpairsValuesMatchValuesOnly(String name, ZMatrixRMaj a) {
    int n = a.numRows;
    double[] valuesOnly = new double[n];
    double[] values = new double[n];
    HermitianEigenSolver solver = linalg().newHermitianEigenSolver();
    assertThat(solver.eigenvalues(a, valuesOnly)).isTrue();
    assertThat(solver.eigenpairs(a, values, 0, n - 1, new ZMatrixRMaj(1, 1))).isTrue();
    double scale = Math.max(1, frobenius(a));
    for (int i = 0; i < n; i++) {
      assertThat(Math.abs(values[i] - valuesOnly[i])).isLessThan(TOL * scale);
    }
  }

  @Test
  void indexRangesReturnTheRightColumnsAndAllValues() {
    ZMatrixRMaj a = hermitianWithSpectrum(new double[] {-1, -1, -1, 0.5, 2, 2, 3}, 21);
    HermitianEigenSolver solver = linalg().newHermitianEigenSolver();
    double[] all = new double[7];
    assertThat(solver.eigenvalues(a, all)).isTrue();
    int[][] ranges = {{0, 0}, {2, 4}, {1, 2}, {5, 6}, {6, 6}, {3, 2}, {0, -1}, {7, 6}};
    for (int[] r : ranges) {
      double[] values = new double[9];
      Arrays.fill(values, Double.NaN);
      ZMatrixRMaj vectors = new ZMatrixRMaj(3, 3);
      assertThat(solver.eigenpairs(a, values, r[0], r[1], vectors)).isTrue();
      assertThat(vectors.numRows).isEqualTo(7);
      assertThat(vectors.numCols).isEqualTo(r[1] - r[0] + 1);
      for (int i = 0; i < 7; i++) {
        assertThat(values[i]).isCloseTo(all[i], org.assertj.core.data.Offset.offset(TOL * 10));
      }
      assertThat(values[7]).isNaN();
      assertResidual(a, values, r[0], vectors);
      assertOrthonormal(vectors);
    }
  }

  @Test
  void invalidRangesAndShapesAreRejected() {
    HermitianEigenSolver solver = linalg().newHermitianEigenSolver();
    ZMatrixRMaj a = randomHermitian(4, 22);
    double[] values = new double[4];
    ZMatrixRMaj v = new ZMatrixRMaj(1, 1);
    assertThatThrownBy(() -> solver.eigenpairs(a, values, -1, 2, v))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> solver.eigenpairs(a, values, 2, 4, v))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> solver.eigenpairs(a, values, 3, 1, v))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> solver.eigenpairs(a, values, 0, 3, a))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> solver.eigenvalues(new ZMatrixRMaj(3, 4), values))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> solver.eigenvalues(a, new double[3]))
        .isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void onlyTheLowerTriangleIsRead() {
    ZMatrixRMaj a = randomHermitian(7, 23);
    ZMatrixRMaj spoiled = a.copy();
    for (int i = 0; i < 7; i++) {
      for (int j = i + 1; j < 7; j++) {
        spoiled.set(i, j, 1e3 * (i + 1), -7e2 * (j + 1));
      }
    }
    HermitianEigenSolver solver = linalg().newHermitianEigenSolver();
    double[] expected = new double[7];
    double[] actual = new double[7];
    ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);
    assertThat(solver.eigenvalues(a, expected)).isTrue();
    assertThat(solver.eigenpairs(spoiled, actual, 0, 6, vectors)).isTrue();
    for (int i = 0; i < 7; i++) {
      assertThat(actual[i]).isCloseTo(expected[i], org.assertj.core.data.Offset.offset(1e-12));
    }
    assertResidual(a, actual, 0, vectors);
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2, 7, 40})
  void tightBindingRingHasCosineBand(int n) {
    // Ring of n sites with hopping e^{iφ} (flux φ·n through the ring): eigenvalues
    // 2cos(2πk/n + φ), k = 0..n−1 (derived: the matrix is circulant, diagonalised by plane
    // waves). For n = 1 the single site couples to itself: 2cos φ; for n = 2 both bonds add.
    double phi = 0.3;
    ZMatrixRMaj h = new ZMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      int j = (i + 1) % n;
      // H[j][i] += e^{iφ}, H[i][j] += e^{−iφ}
      h.set(j, i, h.getReal(j, i) + Math.cos(phi), h.getImag(j, i) + Math.sin(phi));
      h.set(i, j, h.getReal(i, j) + Math.cos(phi), h.getImag(i, j) - Math.sin(phi));
    }
    double[] expected = new double[n];
    for (int k = 0; k < n; k++) {
      expected[k] = 2 * Math.cos(2 * Math.PI * k / n + phi);
    }
    if (n == 2) {
      // Both bonds join the same two sites: H = [[0, 2cos φ], [2cos φ, 0]].
      expected = new double[] {-2 * Math.cos(phi), 2 * Math.cos(phi)};
    }
    Arrays.sort(expected);
    double[] values = new double[n];
    ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);
    assertThat(linalg().newHermitianEigenSolver().eigenpairs(h, values, 0, n - 1, vectors))
        .isTrue();
    for (int k = 0; k < n; k++) {
      assertThat(values[k]).isCloseTo(expected[k], org.assertj.core.data.Offset.offset(1e-12));
    }
    assertResidual(h, values, 0, vectors);
    assertOrthonormal(vectors);
  }

  @Test
  void solverReusesWorkspaceAcrossSizes() {
    HermitianEigenSolver solver = linalg().newHermitianEigenSolver();
    for (int n : new int[] {40, 7, 2, 40, 1}) {
      ZMatrixRMaj a = randomHermitian(n, 100 + n);
      double[] values = new double[n];
      ZMatrixRMaj vectors = new ZMatrixRMaj(1, 1);
      assertThat(solver.eigenpairs(a, values, 0, n - 1, vectors)).isTrue();
      assertResidual(a, values, 0, vectors);
    }
  }

  // ---- general eigenvalues ----------------------------------------------------------------

  @ParameterizedTest
  @ValueSource(ints = {1, 2, 7, 40})
  void generalEigenvaluesMatchTraceAndDeterminant(int n) {
    ZMatrixRMaj a = randomGeneral(n, n, 30 + n);
    double[] re = new double[n];
    double[] im = new double[n];
    assertThat(linalg().newGeneralEigenvalueSolver().eigenvalues(a, re, im)).isTrue();
    double trRe = 0;
    double trIm = 0;
    double sumRe = 0;
    double sumIm = 0;
    // Product accumulated in log-modulus and angle to avoid overflow concerns.
    double logAbs = 0;
    double arg = 0;
    for (int i = 0; i < n; i++) {
      trRe += a.getReal(i, i);
      trIm += a.getImag(i, i);
      sumRe += re[i];
      sumIm += im[i];
      logAbs += Math.log(Math.hypot(re[i], im[i]));
      arg += Math.atan2(im[i], re[i]);
    }
    // Σλ = trace and Πλ = det (derived); det from EJML's LU decomposition.
    double scale = frobenius(a);
    assertThat(Math.hypot(sumRe - trRe, sumIm - trIm)).isLessThan(TOL * n * scale);
    Complex_F64 det = CommonOps_ZDRM.det(a);
    double detAbs = Math.hypot(det.real, det.imaginary);
    double prodRe = Math.exp(logAbs) * Math.cos(arg);
    double prodIm = Math.exp(logAbs) * Math.sin(arg);
    assertThat(Math.hypot(prodRe - det.real, prodIm - det.imaginary) / detAbs).isLessThan(1e-9);
  }

  @ParameterizedTest
  @ValueSource(ints = {1, 2, 7, 40})
  void cyclicShiftHasRootsOfUnity(int n) {
    // Cyclic shift S e_j = e_{j+1 mod n}: S^n = I and its characteristic polynomial is λ^n − 1,
    // so the eigenvalues are the n-th roots of unity (derived). Plain QR stalls on this
    // permutation matrix; convergence needs the exceptional shifts.
    ZMatrixRMaj s = new ZMatrixRMaj(n, n);
    for (int j = 0; j < n; j++) {
      s.set((j + 1) % n, j, 1.0, 0.0);
    }
    assertRootsOfUnityScaled(s, n, 1.0, 0.0);
  }

  @Test
  void complexCirculantHasDftEigenvalues() {
    // Circulant C_ij = c_{(i−j) mod n}: eigenvalues λ_k = Σ_j c_j ω^{jk}, ω = e^{2πi/n}
    // (derived: plane waves diagonalise every circulant).
    int n = 9;
    ZMatrixRMaj first = randomGeneral(n, 1, 41);
    ZMatrixRMaj c = new ZMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        int d = Math.floorMod(i - j, n);
        c.set(i, j, first.getReal(d, 0), first.getImag(d, 0));
      }
    }
    double[] expRe = new double[n];
    double[] expIm = new double[n];
    for (int k = 0; k < n; k++) {
      for (int j = 0; j < n; j++) {
        double w = 2 * Math.PI * j * k / n;
        expRe[k] += first.getReal(j, 0) * Math.cos(w) - first.getImag(j, 0) * Math.sin(w);
        expIm[k] += first.getReal(j, 0) * Math.sin(w) + first.getImag(j, 0) * Math.cos(w);
      }
    }
    double[] re = new double[n];
    double[] im = new double[n];
    assertThat(linalg().newGeneralEigenvalueSolver().eigenvalues(c, re, im)).isTrue();
    assertThat(multisetDistance(expRe, expIm, re, im, n)).isLessThan(1e-12 * n);
  }

  @Test
  void generalRejectsAliasedOrShortOutputs() {
    GeneralEigenvalueSolver solver = linalg().newGeneralEigenvalueSolver();
    ZMatrixRMaj a = randomGeneral(3, 3, 42);
    double[] re = new double[3];
    assertThatThrownBy(() -> solver.eigenvalues(a, re, re))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> solver.eigenvalues(a, re, new double[2]))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> solver.eigenvalues(new ZMatrixRMaj(2, 3), re, new double[3]))
        .isInstanceOf(IllegalArgumentException.class);
  }

  private void assertRootsOfUnityScaled(ZMatrixRMaj a, int n, double radius, double phase) {
    double[] re = new double[n];
    double[] im = new double[n];
    assertThat(linalg().newGeneralEigenvalueSolver().eigenvalues(a, re, im)).isTrue();
    double[] expRe = new double[n];
    double[] expIm = new double[n];
    for (int k = 0; k < n; k++) {
      expRe[k] = radius * Math.cos(2 * Math.PI * k / n + phase);
      expIm[k] = radius * Math.sin(2 * Math.PI * k / n + phase);
    }
    assertThat(multisetDistance(expRe, expIm, re, im, n)).isLessThan(1e-12 * n);
  }

  // ---- products ---------------------------------------------------------------------------

  @Test
  void productsMatchNaiveLoops() {
    ComplexProducts products = linalg().newComplexProducts();
    // Non-square shapes catch swapped leading dimensions; the naive loop is the reference.
    ZMatrixRMaj a = randomGeneral(3, 5, 51);
    ZMatrixRMaj b = randomGeneral(5, 4, 52);
    ZMatrixRMaj c = new ZMatrixRMaj(1, 1);
    products.mult(a, b, c);
    assertThat(maxAbsDifference(c, naiveProduct(a, false, b, false))).isLessThan(1e-14 * 5);

    ZMatrixRMaj at = randomGeneral(5, 3, 53);
    products.multConjTransA(at, b, c);
    assertThat(c.numRows).isEqualTo(3);
    assertThat(c.numCols).isEqualTo(4);
    assertThat(maxAbsDifference(c, naiveProduct(at, true, b, false))).isLessThan(1e-14 * 5);

    ZMatrixRMaj bt = randomGeneral(4, 5, 54);
    products.multConjTransB(a, bt, c);
    assertThat(c.numRows).isEqualTo(3);
    assertThat(c.numCols).isEqualTo(4);
    assertThat(maxAbsDifference(c, naiveProduct(a, false, bt, true))).isLessThan(1e-14 * 5);

    ZMatrixRMaj big = randomGeneral(40, 40, 55);
    ZMatrixRMaj big2 = randomGeneral(40, 40, 56);
    products.multConjTransA(big, big2, c);
    assertThat(maxAbsDifference(c, naiveProduct(big, true, big2, false))).isLessThan(1e-13);
  }

  @Test
  void conjugateTransposeProductOfScalarsConjugates() {
    // 1×1 check that "ConjTrans" conjugates: (i)^H · 1 = −i, 1 · (i)^H = −i (derived).
    ComplexProducts products = linalg().newComplexProducts();
    ZMatrixRMaj i = new ZMatrixRMaj(1, 1, true, 0.0, 1.0);
    ZMatrixRMaj one = new ZMatrixRMaj(1, 1, true, 1.0, 0.0);
    ZMatrixRMaj c = new ZMatrixRMaj(1, 1);
    products.multConjTransA(i, one, c);
    assertThat(c.data[0]).isEqualTo(0.0);
    assertThat(c.data[1]).isEqualTo(-1.0);
    products.multConjTransB(one, i, c);
    assertThat(c.data[1]).isEqualTo(-1.0);
  }

  @Test
  void productsRejectBadShapesAndAliasing() {
    ComplexProducts products = linalg().newComplexProducts();
    ZMatrixRMaj a = randomGeneral(3, 3, 57);
    ZMatrixRMaj b = randomGeneral(4, 3, 58);
    assertThatThrownBy(() -> products.mult(a, b, new ZMatrixRMaj(1, 1)))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> products.mult(a, a, a)).isInstanceOf(IllegalArgumentException.class);
    ZMatrixRMaj empty = new ZMatrixRMaj(3, 0);
    ZMatrixRMaj c = new ZMatrixRMaj(2, 2);
    products.mult(empty, new ZMatrixRMaj(0, 2), c);
    assertThat(c.numRows).isEqualTo(3);
    assertThat(c.numCols).isEqualTo(2);
    assertThat(frobenius(c)).isZero();
  }

  // ---- helpers ----------------------------------------------------------------------------

  /** ‖A v_j − λ_{offset+j} v_j‖ ≤ TOL·‖A‖_F for every column, and unit norm. */
  static void assertResidual(ZMatrixRMaj a, double[] values, int offset, ZMatrixRMaj vectors) {
    int n = a.numRows;
    double scale = Math.max(1, frobenius(a));
    for (int j = 0; j < vectors.numCols; j++) {
      double lambda = values[offset + j];
      double res = 0;
      for (int i = 0; i < n; i++) {
        double re = -lambda * vectors.getReal(i, j);
        double im = -lambda * vectors.getImag(i, j);
        for (int k = 0; k < n; k++) {
          re += a.getReal(i, k) * vectors.getReal(k, j) - a.getImag(i, k) * vectors.getImag(k, j);
          im += a.getReal(i, k) * vectors.getImag(k, j) + a.getImag(i, k) * vectors.getReal(k, j);
        }
        res += re * re + im * im;
      }
      assertThat(Math.sqrt(res)).as("residual of column %d", j).isLessThan(TOL * scale);
    }
  }

  /** ‖V^H V − I‖_max ≤ TOL·n. */
  static void assertOrthonormal(ZMatrixRMaj v) {
    ZMatrixRMaj gram = naiveProduct(v, true, v, false);
    ZMatrixRMaj identity = CommonOps_ZDRM.identity(v.numCols);
    assertThat(maxAbsDifference(gram, identity)).isLessThan(TOL * Math.max(1, v.numRows));
  }
}
