package hopstat.linalg;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.ejml.dense.row.NormOps_ZDRM;
import org.junit.jupiter.api.Test;

/**
 * Source-free checks of the Householder QR: reconstruction residual, orthonormality, complement
 * (Golub &amp; Van Loan §5.2).
 */
class ComplexHouseholderOpsTest {

  private static ZMatrixRMaj random(int m, int n, long seed) {
    SplittableRandom rng = new SplittableRandom(seed);
    ZMatrixRMaj a = new ZMatrixRMaj(m, n);
    for (int i = 0; i < a.getDataLength(); i++) {
      a.data[i] = rng.nextDouble() - 0.5;
    }
    return a;
  }

  /**
   * A = Q_thin R, Q†Q = 1 for the full Q, and the last m − n columns annihilate A (Q_⊥† A = 0), to
   * rounding.
   */
  @Test
  void factorsReconstructAndTheComplementIsOrthogonal() {
    for (int[] shape : new int[][] {{8, 4}, {6, 3}, {2, 1}, {5, 5}}) {
      int m = shape[0];
      int n = shape[1];
      ZMatrixRMaj a = random(m, n, 31L * m + n);
      // a structurally zero column below the diagonal and a zero column: H_k = 1 must be handled
      for (int i = 1; i < m; i++) {
        a.set(i, 0, 0, 0);
      }
      if (n > 2) {
        for (int i = 0; i < m; i++) {
          a.set(i, 2, 0, 0);
        }
      }
      ZMatrixRMaj work = a.copy();
      ZMatrixRMaj v = new ZMatrixRMaj(m, n);
      ComplexHouseholderOps.factor(work, v);
      ZMatrixRMaj q = new ZMatrixRMaj(m, m);
      ComplexHouseholderOps.formQ(v, 0, q);
      ZMatrixRMaj qh = new ZMatrixRMaj(m, m);
      CommonOps_ZDRM.transposeConjugate(q, qh);
      ZMatrixRMaj qq = new ZMatrixRMaj(m, m);
      CommonOps_ZDRM.mult(qh, q, qq);
      ZMatrixRMaj eye = CommonOps_ZDRM.identity(m);
      CommonOps_ZDRM.subtract(qq.copy(), eye, qq);
      assertThat(NormOps_ZDRM.normF(qq)).isLessThan(1e-14);
      ZMatrixRMaj r = new ZMatrixRMaj(m, n);
      for (int i = 0; i < n; i++) {
        for (int j = i; j < n; j++) {
          r.set(i, j, work.getReal(i, j), work.getImag(i, j));
        }
      }
      ZMatrixRMaj qr = new ZMatrixRMaj(m, n);
      CommonOps_ZDRM.mult(q, r, qr);
      CommonOps_ZDRM.subtract(qr.copy(), a, qr);
      assertThat(NormOps_ZDRM.normF(qr)).isLessThan(1e-14 * (1 + NormOps_ZDRM.normF(a)));
      if (m > n) {
        ZMatrixRMaj perp = new ZMatrixRMaj(m, m - n);
        ComplexHouseholderOps.formQ(v, n, perp);
        for (int i = 0; i < m; i++) {
          for (int j = 0; j < m - n; j++) {
            assertThat(perp.getReal(i, j)).isEqualTo(q.getReal(i, n + j));
            assertThat(perp.getImag(i, j)).isEqualTo(q.getImag(i, n + j));
          }
        }
        ZMatrixRMaj ph = new ZMatrixRMaj(m - n, m);
        CommonOps_ZDRM.transposeConjugate(perp, ph);
        ZMatrixRMaj pa = new ZMatrixRMaj(m - n, n);
        CommonOps_ZDRM.mult(ph, a, pa);
        assertThat(NormOps_ZDRM.normF(pa)).isLessThan(1e-14 * (1 + NormOps_ZDRM.normF(a)));
      }
    }
  }

  /**
   * The shape the Lyapunov recursion factors, [T; −Z†] with an upper-triangular (here diagonal plus
   * one super-diagonal) top block: the zero rows of the reflectors are skipped, so check the same
   * residuals as above (A = Q_thin R, Q_⊥† A = 0, Q†Q = 1 on the complement) and that the top block
   * of the reflectors stays zero below the diagonal (derived: H_k only mixes row k with the dense
   * lower block). The allocation-free overloads give the same bits as the allocating ones.
   */
  @Test
  void triangularTopBlockKeepsItsZerosAndFactorsCorrectly() {
    int k = 5;
    ZMatrixRMaj a = random(2 * k, k, 77);
    for (int i = 0; i < k; i++) {
      for (int j = 0; j < k; j++) {
        if (j != i && j != i + 1) {
          a.set(i, j, 0, 0);
        }
      }
    }
    ZMatrixRMaj work = a.copy();
    ZMatrixRMaj v = new ZMatrixRMaj(2 * k, k);
    ComplexHouseholderOps.factor(work, v, new double[2 * k + 6]);
    for (int i = 0; i < k; i++) {
      for (int j = 0; j < i; j++) {
        assertThat(v.getReal(i, j)).isZero();
        assertThat(v.getImag(i, j)).isZero();
      }
    }
    ZMatrixRMaj work2 = a.copy();
    ZMatrixRMaj v2 = new ZMatrixRMaj(2 * k, k);
    ComplexHouseholderOps.factor(work2, v2);
    assertThat(work2.data).containsExactly(work.data);
    assertThat(v2.data).containsExactly(v.data);
    ZMatrixRMaj thin = new ZMatrixRMaj(2 * k, k);
    ComplexHouseholderOps.formQ(v, 0, thin, new double[2 * k]);
    ZMatrixRMaj perp = new ZMatrixRMaj(2 * k, k);
    ComplexHouseholderOps.formQ(v, k, perp, new double[2 * k]);
    ZMatrixRMaj perp2 = new ZMatrixRMaj(2 * k, k);
    ComplexHouseholderOps.formQ(v, k, perp2);
    assertThat(perp2.data).containsExactly(perp.data);
    ZMatrixRMaj r = new ZMatrixRMaj(k, k);
    for (int i = 0; i < k; i++) {
      for (int j = i; j < k; j++) {
        r.set(i, j, work.getReal(i, j), work.getImag(i, j));
      }
    }
    ZMatrixRMaj qr = new ZMatrixRMaj(2 * k, k);
    CommonOps_ZDRM.mult(thin, r, qr);
    CommonOps_ZDRM.subtract(qr.copy(), a, qr);
    assertThat(NormOps_ZDRM.normF(qr)).isLessThan(1e-14 * (1 + NormOps_ZDRM.normF(a)));
    ZMatrixRMaj ph = new ZMatrixRMaj(k, 2 * k);
    CommonOps_ZDRM.transposeConjugate(perp, ph);
    ZMatrixRMaj pa = new ZMatrixRMaj(k, k);
    CommonOps_ZDRM.mult(ph, a, pa);
    assertThat(NormOps_ZDRM.normF(pa)).isLessThan(1e-14 * (1 + NormOps_ZDRM.normF(a)));
    ZMatrixRMaj pp = new ZMatrixRMaj(k, k);
    CommonOps_ZDRM.mult(ph, perp, pp);
    CommonOps_ZDRM.subtract(pp.copy(), CommonOps_ZDRM.identity(k), pp);
    assertThat(NormOps_ZDRM.normF(pp)).isLessThan(1e-14);
  }
}
