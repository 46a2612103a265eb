package hopstat.linalg;

import static hopstat.linalg.LinalgTestMatrices.hermitianWithSpectrum;
import static hopstat.linalg.LinalgTestMatrices.naiveProduct;
import static hopstat.linalg.LinalgTestMatrices.randomGeneral;
import static hopstat.linalg.LinalgTestMatrices.randomHermitian;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.stream.Stream;
import org.ejml.data.ZMatrixRMaj;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Contract of every {@link HermitianLdltSolver}: the inertia equals the eigenvalue sign counts of a
 * reference eigen-decomposition (Sylvester's law of inertia), and solves have small residuals.
 *
 * <p>Tolerances (common practice): Bunch–Kaufman is normwise backward stable with a modest growth
 * factor (Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed. 2002, §11.1), so for the
 * well-conditioned n ≤ 60 matrices here the relative residual ‖AX − B‖/(‖A‖‖X‖) is near 1e-15;
 * 1e-10 leaves a wide margin and still catches any wrong index, sign or conjugation. Spectra are
 * kept at least 0.05 away from zero so the reference counts are unambiguous.
 */
abstract class HermitianLdltContractTest {

  protected abstract LinalgKind kind();

  static Stream<Arguments> cases() {
    return Stream.of(
        Arguments.of("random n=1", randomHermitian(1, 21)),
        Arguments.of("random n=2", randomHermitian(2, 22)),
        Arguments.of("random n=9", randomHermitian(9, 23)),
        Arguments.of("random n=60", randomHermitian(60, 24)),
        // Zero diagonal forces 2×2 pivots throughout.
        Arguments.of("zero diagonal n=30", zeroDiagonal(30, 25)),
        Arguments.of(
            "prescribed n=12",
            hermitianWithSpectrum(
                new double[] {-3, -2, -2, -1, -0.5, 0.25, 0.5, 1, 1, 1, 2, 4}, 26)),
        Arguments.of(
            "negative definite n=8",
            hermitianWithSpectrum(new double[] {-8, -7, -6, -5, -4, -3, -2, -1}, 27)));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("cases")
  void inertiaMatchesEigenvalueSigns(String name, ZMatrixRMaj a) {
    int n = a.numRows;
    double[] values = new double[n];
    assertThat(
            LinalgFactory.create(LinalgKind.NATIVE)
                .newHermitianEigenSolver()
                .eigenvalues(a, values))
        .isTrue();
    int pos = 0;
    int neg = 0;
    for (int i = 0; i < n; i++) {
      assertThat(Math.abs(values[i])).as("reference eigenvalue away from zero").isGreaterThan(1e-3);
      if (values[i] > 0) {
        pos++;
      } else {
        neg++;
      }
    }
    HermitianLdltSolver solver = HermitianLdltFactory.create(kind());
    ZMatrixRMaj copy = a.copy();
    assertThat(solver.factor(a)).isTrue();
    assertThat(a.data).as("input not modified").isEqualTo(copy.data);
    assertThat(solver.positiveCount()).isEqualTo(pos);
    assertThat(solver.negativeCount()).isEqualTo(neg);
    assertThat(solver.zeroCount()).isZero();
    assertThat(solver.inertia()).isEqualTo(new InertiaResult(pos, neg, 0));
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("cases")
  void solveHasSmallResidual(String name, ZMatrixRMaj a) {
    int n = a.numRows;
    HermitianLdltSolver solver = HermitianLdltFactory.create(kind());
    assertThat(solver.factor(a)).isTrue();
    ZMatrixRMaj b = randomGeneral(n, 5, 31);
    ZMatrixRMaj x = b.copy();
    solver.solve(x);
    ZMatrixRMaj ax = naiveProduct(a, false, x, false);
    double res = 0;
    double bn = 0;
    for (int i = 0; i < ax.data.length; i++) {
      res = Math.max(res, Math.abs(ax.data[i] - b.data[i]));
      bn = Math.max(bn, Math.abs(b.data[i]));
    }
    assertThat(res / bn).isLessThan(1e-10);
  }

  /** Reading only the lower triangle: garbage in the strict upper triangle must not matter. */
  @Test
  void readsOnlyTheLowerTriangle() {
    ZMatrixRMaj a = randomHermitian(20, 41);
    ZMatrixRMaj garbled = a.copy();
    for (int i = 0; i < 20; i++) {
      for (int j = i + 1; j < 20; j++) {
        garbled.set(i, j, 99.0 + i, -7.0 * j);
      }
    }
    HermitianLdltSolver s1 = HermitianLdltFactory.create(kind());
    HermitianLdltSolver s2 = HermitianLdltFactory.create(kind());
    s1.factor(a);
    s2.factor(garbled);
    assertThat(s2.inertia()).isEqualTo(s1.inertia());
  }

  /** An exactly zero row and column: one zero eigenvalue, reported, and solve refused (derived). */
  @Test
  void exactlySingularMatrixReportsAZero() {
    ZMatrixRMaj a = randomHermitian(10, 51);
    for (int j = 0; j < 10; j++) {
      a.set(4, j, 0, 0);
      a.set(j, 4, 0, 0);
    }
    HermitianLdltSolver solver = HermitianLdltFactory.create(kind());
    assertThat(solver.factor(a)).isFalse();
    assertThat(solver.zeroCount()).isEqualTo(1);
    assertThat(solver.positiveCount() + solver.negativeCount()).isEqualTo(9);
    assertThatThrownBy(() -> solver.solve(new ZMatrixRMaj(10, 1)))
        .isInstanceOf(IllegalStateException.class);
  }

  /**
   * Workspace reuse: a large then a small then a large matrix give the same answers as fresh
   * solvers.
   */
  @Test
  void reuseAcrossSizes() {
    HermitianLdltSolver reused = HermitianLdltFactory.create(kind());
    for (int n : new int[] {40, 5, 40, 17}) {
      ZMatrixRMaj a = randomHermitian(n, 60 + n);
      HermitianLdltSolver fresh = HermitianLdltFactory.create(kind());
      reused.factor(a);
      fresh.factor(a);
      assertThat(reused.inertia()).isEqualTo(fresh.inertia());
    }
  }

  private static ZMatrixRMaj zeroDiagonal(int n, long seed) {
    ZMatrixRMaj a = randomHermitian(n, seed);
    for (int i = 0; i < n; i++) {
      a.set(i, i, 0.0, 0.0);
    }
    return a;
  }
}
