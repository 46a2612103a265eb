package hopstat.linalg;

import java.util.SplittableRandom;
import org.ejml.data.ZMatrixRMaj;

/** Deterministic test matrices and small reference computations (naive loops) for linalg tests. */
final class LinalgTestMatrices {

  private LinalgTestMatrices() {}

  /** Random Hermitian matrix with entries of order one (GUE-like), fixed seed. */
  static ZMatrixRMaj randomHermitian(int n, long seed) {
    SplittableRandom rng = new SplittableRandom(seed);
    ZMatrixRMaj a = new ZMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      a.set(i, i, rng.nextDouble(-1, 1), 0.0);
      for (int j = 0; j < i; j++) {
        double re = rng.nextDouble(-1, 1);
        double im = rng.nextDouble(-1, 1);
        a.set(i, j, re, im);
        a.set(j, i, re, -im);
      }
    }
    return a;
  }

  /** Random complex matrix (no symmetry), fixed seed. */
  static ZMatrixRMaj randomGeneral(int rows, int cols, long seed) {
    SplittableRandom rng = new SplittableRandom(seed);
    ZMatrixRMaj a = new ZMatrixRMaj(rows, cols);
    for (int i = 0; i < rows; i++) {
      for (int j = 0; j < cols; j++) {
        a.set(i, j, rng.nextDouble(-1, 1), rng.nextDouble(-1, 1));
      }
    }
    return a;
  }

  /** A random unitary: Gram–Schmidt (applied twice) of the columns of a random complex matrix. */
  static ZMatrixRMaj randomUnitary(int n, long seed) {
    ZMatrixRMaj u = randomGeneral(n, n, seed);
    for (int pass = 0; pass < 2; pass++) {
      for (int j = 0; j < n; j++) {
        for (int k = 0; k < j; k++) {
          double re = 0;
          double im = 0;
          for (int i = 0; i < n; i++) {
            // <u_k, u_j> = sum conj(u_ik) u_ij
            re += u.getReal(i, k) * u.getReal(i, j) + u.getImag(i, k) * u.getImag(i, j);
            im += u.getReal(i, k) * u.getImag(i, j) - u.getImag(i, k) * u.getReal(i, j);
          }
          for (int i = 0; i < n; i++) {
            double kr = u.getReal(i, k);
            double ki = u.getImag(i, k);
            u.set(
                i, j, u.getReal(i, j) - (kr * re - ki * im), u.getImag(i, j) - (kr * im + ki * re));
          }
        }
        double norm = 0;
        for (int i = 0; i < n; i++) {
          norm += u.getReal(i, j) * u.getReal(i, j) + u.getImag(i, j) * u.getImag(i, j);
        }
        norm = Math.sqrt(norm);
        for (int i = 0; i < n; i++) {
          u.set(i, j, u.getReal(i, j) / norm, u.getImag(i, j) / norm);
        }
      }
    }
    return u;
  }

  /** U diag(spectrum) U^H for a random unitary U: Hermitian with exactly the given spectrum. */
  static ZMatrixRMaj hermitianWithSpectrum(double[] spectrum, long seed) {
    int n = spectrum.length;
    ZMatrixRMaj u = randomUnitary(n, seed);
    ZMatrixRMaj a = new ZMatrixRMaj(n, n);
    for (int i = 0; i < n; i++) {
      for (int j = 0; j <= i; j++) {
        double re = 0;
        double im = 0;
        for (int k = 0; k < n; k++) {
          // u_ik λ_k conj(u_jk)
          double ar = u.getReal(i, k);
          double ai = u.getImag(i, k);
          double br = u.getReal(j, k);
          double bi = -u.getImag(j, k);
          re += spectrum[k] * (ar * br - ai * bi);
          im += spectrum[k] * (ar * bi + ai * br);
        }
        if (i == j) {
          a.set(i, i, re, 0.0);
        } else {
          a.set(i, j, re, im);
          a.set(j, i, re, -im);
        }
      }
    }
    return a;
  }

  /** Naive triple loop c = op(a)·op(b), op = identity or conjugate transpose. */
  static ZMatrixRMaj naiveProduct(ZMatrixRMaj a, boolean conjA, ZMatrixRMaj b, boolean conjB) {
    int m = conjA ? a.numCols : a.numRows;
    int k = conjA ? a.numRows : a.numCols;
    int n = conjB ? b.numRows : b.numCols;
    ZMatrixRMaj c = new ZMatrixRMaj(m, n);
    for (int i = 0; i < m; i++) {
      for (int j = 0; j < n; j++) {
        double re = 0;
        double im = 0;
        for (int l = 0; l < k; l++) {
          double ar = conjA ? a.getReal(l, i) : a.getReal(i, l);
          double ai = conjA ? -a.getImag(l, i) : a.getImag(i, l);
          double br = conjB ? b.getReal(j, l) : b.getReal(l, j);
          double bi = conjB ? -b.getImag(j, l) : b.getImag(l, j);
          re += ar * br - ai * bi;
          im += ar * bi + ai * br;
        }
        c.set(i, j, re, im);
      }
    }
    return c;
  }

  /** Largest modulus of an entry of a − b. */
  static double maxAbsDifference(ZMatrixRMaj a, ZMatrixRMaj b) {
    double max = 0;
    for (int i = 0; i < a.numRows; i++) {
      for (int j = 0; j < a.numCols; j++) {
        max =
            Math.max(
                max,
                Math.hypot(a.getReal(i, j) - b.getReal(i, j), a.getImag(i, j) - b.getImag(i, j)));
      }
    }
    return max;
  }

  /** Frobenius norm, an upper bound of the spectral norm used to scale tolerances. */
  static double frobenius(ZMatrixRMaj a) {
    double s = 0;
    for (int i = 0; i < a.getDataLength(); i++) {
      s += a.data[i] * a.data[i];
    }
    return Math.sqrt(s);
  }

  /**
   * Largest distance between two complex multisets after greedy nearest matching; adequate for
   * well-separated test spectra.
   */
  static double multisetDistance(double[] re1, double[] im1, double[] re2, double[] im2, int n) {
    boolean[] taken = new boolean[n];
    double worst = 0;
    for (int i = 0; i < n; i++) {
      int best = -1;
      double bestDist = Double.POSITIVE_INFINITY;
      for (int j = 0; j < n; j++) {
        if (!taken[j]) {
          double d = Math.hypot(re1[i] - re2[j], im1[i] - im2[j]);
          if (d < bestDist) {
            bestDist = d;
            best = j;
          }
        }
      }
      taken[best] = true;
      worst = Math.max(worst, bestDist);
    }
    return worst;
  }
}
