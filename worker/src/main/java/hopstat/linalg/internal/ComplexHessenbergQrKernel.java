package hopstat.linalg.internal;

import org.ejml.data.ZMatrixRMaj;

/**
 * Eigenvalues of a general complex matrix: Householder reduction to upper Hessenberg form, then
 * single-shift complex QR iteration with Wilkinson shifts and deflation (Golub &amp; Van Loan,
 * "Matrix Computations", 4th ed. 2013, §7.4–7.5; the exceptional shifts every {@link
 * #EXCEPTIONAL_SHIFT_PERIOD} iterations follow the 3/4·|h<sub>k,k−1</sub>| rule of LAPACK {@code
 * zlahqr}). Only the active diagonal block is updated, since no Schur vectors or Schur form are
 * needed.
 *
 * <p>No balancing is done; the intended inputs (near-unitary Bott matrices) are well scaled. Cost:
 * (10/3)n³ real flops for the reduction plus O(n²) per QR sweep, typically a few sweeps per
 * eigenvalue.
 */
final class ComplexHessenbergQrKernel {

  /** Iteration cap per eigenvalue before the call reports non-convergence (zlahqr uses 30). */
  static final int MAX_ITERATIONS_PER_EIGENVALUE = 30;

  /** Period of exceptional shifts that break cycles such as those of permutation matrices. */
  static final int EXCEPTIONAL_SHIFT_PERIOD = 10;

  private static final double EPS = Math.ulp(1.0);

  private ComplexHessenbergQrKernel() {}

  /**
   * @param a n×n complex matrix; read, not modified
   * @param ws workspace; scratch
   * @param real length ≥ n; overwritten with the real parts
   * @param imaginary length ≥ n; overwritten with the imaginary parts
   * @return false if some eigenvalue did not converge within the iteration cap
   */
  static boolean eigenvalues(
      ZMatrixRMaj a, ComplexHessenbergQrWorkspace ws, double[] real, double[] imaginary) {
    int n = a.numRows;
    ws.ensure(n);
    double[] hr = ws.re;
    double[] hi = ws.im;
    for (int k = 0; k < n * n; k++) {
      hr[k] = a.data[2 * k];
      hi[k] = a.data[2 * k + 1];
    }
    reduceToHessenberg(n, hr, hi, ws.vRe, ws.vIm);
    return iterate(n, ws, real, imaginary);
  }

  /** H ← P H P with Householder P = I − 2vv^H zeroing column k below the subdiagonal. */
  private static void reduceToHessenberg(
      int n, double[] hr, double[] hi, double[] vr, double[] vi) {
    for (int k = 0; k < n - 2; k++) {
      double norm2 = 0.0;
      for (int i = k + 1; i < n; i++) {
        norm2 += hr[i * n + k] * hr[i * n + k] + hi[i * n + k] * hi[i * n + k];
      }
      double tail =
          norm2
              - (hr[(k + 1) * n + k] * hr[(k + 1) * n + k]
                  + hi[(k + 1) * n + k] * hi[(k + 1) * n + k]);
      if (tail == 0.0) {
        continue;
      }
      double norm = Math.sqrt(norm2);
      double x0r = hr[(k + 1) * n + k];
      double x0i = hi[(k + 1) * n + k];
      double x0abs = Math.hypot(x0r, x0i);
      // alpha = −e^{i arg x0}·‖x‖, so v = x − alpha·e1 has no cancellation in its first entry.
      double phr = x0abs == 0.0 ? 1.0 : x0r / x0abs;
      double phi = x0abs == 0.0 ? 0.0 : x0i / x0abs;
      for (int i = k + 1; i < n; i++) {
        vr[i] = hr[i * n + k];
        vi[i] = hi[i * n + k];
      }
      vr[k + 1] += phr * norm;
      vi[k + 1] += phi * norm;
      double vnorm2 = 0.0;
      for (int i = k + 1; i < n; i++) {
        vnorm2 += vr[i] * vr[i] + vi[i] * vi[i];
      }
      double scale = 2.0 / vnorm2;
      // Left: H[k+1.., j] −= scale·v (v^H H[k+1.., j]) for columns j ≥ k.
      for (int j = k; j < n; j++) {
        double sr = 0.0;
        double si = 0.0;
        for (int i = k + 1; i < n; i++) {
          double h1 = hr[i * n + j];
          double h2 = hi[i * n + j];
          sr += vr[i] * h1 + vi[i] * h2;
          si += vr[i] * h2 - vi[i] * h1;
        }
        sr *= scale;
        si *= scale;
        for (int i = k + 1; i < n; i++) {
          hr[i * n + j] -= vr[i] * sr - vi[i] * si;
          hi[i * n + j] -= vr[i] * si + vi[i] * sr;
        }
      }
      // Right: H[i, k+1..] −= scale·(H[i, k+1..] v) v^H for all rows.
      for (int i = 0; i < n; i++) {
        double sr = 0.0;
        double si = 0.0;
        for (int j = k + 1; j < n; j++) {
          double h1 = hr[i * n + j];
          double h2 = hi[i * n + j];
          sr += h1 * vr[j] - h2 * vi[j];
          si += h1 * vi[j] + h2 * vr[j];
        }
        sr *= scale;
        si *= scale;
        for (int j = k + 1; j < n; j++) {
          // (s · conj(v_j))
          hr[i * n + j] -= sr * vr[j] + si * vi[j];
          hi[i * n + j] -= si * vr[j] - sr * vi[j];
        }
      }
      for (int i = k + 2; i < n; i++) {
        hr[i * n + k] = 0.0;
        hi[i * n + k] = 0.0;
      }
    }
  }

  private static boolean iterate(
      int n, ComplexHessenbergQrWorkspace ws, double[] real, double[] imaginary) {
    double[] hr = ws.re;
    double[] hi = ws.im;
    double[] cs = ws.cos;
    double[] snr = ws.sinRe;
    double[] sni = ws.sinIm;
    int hiIdx = n - 1;
    int iterations = 0;
    while (hiIdx >= 0) {
      // Deflation: find the start lo of the unreduced block ending at hiIdx.
      int lo = hiIdx;
      while (lo > 0) {
        int d = lo * n + lo - 1;
        double sub = Math.abs(hr[d]) + Math.abs(hi[d]);
        double diag =
            Math.abs(hr[lo * n + lo])
                + Math.abs(hi[lo * n + lo])
                + Math.abs(hr[(lo - 1) * n + lo - 1])
                + Math.abs(hi[(lo - 1) * n + lo - 1]);
        if (sub <= EPS * diag || sub < Double.MIN_NORMAL) {
          hr[d] = 0.0;
          hi[d] = 0.0;
          break;
        }
        lo--;
      }
      if (lo == hiIdx) {
        real[hiIdx] = hr[hiIdx * n + hiIdx];
        imaginary[hiIdx] = hi[hiIdx * n + hiIdx];
        hiIdx--;
        iterations = 0;
        continue;
      }
      if (++iterations > MAX_ITERATIONS_PER_EIGENVALUE) {
        return false;
      }
      double muR;
      double muI;
      int t = hiIdx * n + hiIdx;
      int s = (hiIdx - 1) * n + hiIdx - 1;
      if (iterations % EXCEPTIONAL_SHIFT_PERIOD == 0) {
        muR = hr[t] + 0.75 * Math.abs(hr[hiIdx * n + hiIdx - 1]);
        muI = hi[t];
      } else {
        // Wilkinson shift: eigenvalue of the trailing 2×2 [[p, q], [r, d]] nearer to d.
        double pr = hr[s];
        double pi = hi[s];
        double qr = hr[(hiIdx - 1) * n + hiIdx];
        double qi = hi[(hiIdx - 1) * n + hiIdx];
        double rr = hr[hiIdx * n + hiIdx - 1];
        double ri = hi[hiIdx * n + hiIdx - 1];
        double dr = hr[t];
        double di = hi[t];
        double hr2 = 0.5 * (pr - dr);
        double hi2 = 0.5 * (pi - di);
        // disc = h² + q·r
        double discR = hr2 * hr2 - hi2 * hi2 + qr * rr - qi * ri;
        double discI = 2.0 * hr2 * hi2 + qr * ri + qi * rr;
        double mod = Math.hypot(discR, discI);
        double sqR = Math.sqrt(0.5 * (mod + discR));
        double sqI = Math.copySign(Math.sqrt(0.5 * Math.max(0.0, mod - discR)), discI);
        // Choose the root d + h ∓ sqrt so that the shift lies nearer to d.
        if (hr2 * sqR + hi2 * sqI < 0.0) {
          sqR = -sqR;
          sqI = -sqI;
        }
        // mu = d + h − sqrt(...) when h·sqrt ≥ 0 i.e. mu = d − q·r/(h + sqrt) (stable form).
        double denR = hr2 + sqR;
        double denI = hi2 + sqI;
        double den2 = denR * denR + denI * denI;
        if (den2 == 0.0) {
          muR = dr;
          muI = di;
        } else {
          double qrR = qr * rr - qi * ri;
          double qrI = qr * ri + qi * rr;
          muR = dr - (qrR * denR + qrI * denI) / den2;
          muI = di - (qrI * denR - qrR * denI) / den2;
        }
      }
      qrSweep(n, lo, hiIdx, muR, muI, hr, hi, cs, snr, sni);
    }
    return true;
  }

  /** One explicit shifted QR step on the block lo..hiIdx: H − μI = QR, H ← RQ + μI. */
  private static void qrSweep(
      int n,
      int lo,
      int end,
      double muR,
      double muI,
      double[] hr,
      double[] hi,
      double[] cs,
      double[] snr,
      double[] sni) {
    for (int k = lo; k <= end; k++) {
      hr[k * n + k] -= muR;
      hi[k * n + k] -= muI;
    }
    for (int k = lo; k < end; k++) {
      double ar = hr[k * n + k];
      double ai = hi[k * n + k];
      double br = hr[(k + 1) * n + k];
      double bi = hi[(k + 1) * n + k];
      double aAbs = Math.hypot(ar, ai);
      double bAbs = Math.hypot(br, bi);
      double r = Math.hypot(aAbs, bAbs);
      double c;
      double sr;
      double si;
      if (r == 0.0) {
        c = 1.0;
        sr = 0.0;
        si = 0.0;
      } else if (aAbs == 0.0) {
        c = 0.0;
        sr = br / bAbs;
        si = -bi / bAbs;
      } else {
        // G = [[c, s], [−conj(s), c]], c = |a|/r, s = (a/|a|)·conj(b)/r, so G·[a; b] = [·; 0].
        c = aAbs / r;
        double ur = ar / aAbs;
        double ui = ai / aAbs;
        sr = (ur * br + ui * bi) / r;
        si = (ui * br - ur * bi) / r;
      }
      cs[k] = c;
      snr[k] = sr;
      sni[k] = si;
      for (int j = k; j <= end; j++) {
        double xr = hr[k * n + j];
        double xi = hi[k * n + j];
        double yr = hr[(k + 1) * n + j];
        double yi = hi[(k + 1) * n + j];
        hr[k * n + j] = c * xr + sr * yr - si * yi;
        hi[k * n + j] = c * xi + sr * yi + si * yr;
        // −conj(s)·x + c·y
        hr[(k + 1) * n + j] = -(sr * xr + si * xi) + c * yr;
        hi[(k + 1) * n + j] = -(sr * xi - si * xr) + c * yi;
      }
      hr[(k + 1) * n + k] = 0.0;
      hi[(k + 1) * n + k] = 0.0;
    }
    for (int k = lo; k < end; k++) {
      double c = cs[k];
      double sr = snr[k];
      double si = sni[k];
      int rowEnd = Math.min(k + 1, end);
      for (int i = lo; i <= rowEnd; i++) {
        double xr = hr[i * n + k];
        double xi = hi[i * n + k];
        double yr = hr[i * n + k + 1];
        double yi = hi[i * n + k + 1];
        // [x, y]·G^H: x' = c·x + conj(s)·y, y' = −s·x + c·y
        hr[i * n + k] = c * xr + sr * yr + si * yi;
        hi[i * n + k] = c * xi + sr * yi - si * yr;
        hr[i * n + k + 1] = -(sr * xr - si * xi) + c * yr;
        hi[i * n + k + 1] = -(sr * xi + si * xr) + c * yi;
      }
    }
    for (int k = lo; k <= end; k++) {
      hr[k * n + k] += muR;
      hi[k * n + k] += muI;
    }
  }
}
