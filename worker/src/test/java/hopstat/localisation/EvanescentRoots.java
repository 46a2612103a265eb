package hopstat.localisation;

import java.util.function.BiConsumer;

/**
 * Test helper, independent of the kernels: the clean decay rates of a block-tridiagonal chain at
 * energy E from its Bloch problem (derived). With ψ_n = z^n φ a solution needs det h(z) = 0, where
 * h(z) is the Bloch matrix continued to complex z = e^{ik}; z^K det h(z) is a polynomial of degree
 * ≤ 2K. Its coefficients are read off by a discrete Fourier transform of samples on the unit
 * circle, its roots found by the Durand–Kerner (Weierstrass) iteration, and every root with |z| ≠ 1
 * decays or grows at |ln|z|| per cell. The smallest such rate is the slowest evanescent channel.
 */
public final class EvanescentRoots {

  private EvanescentRoots() {}

  /**
   * @param k block size K
   * @param bloch writes h(z) (K × K; re and im parts, row-major) for the complex z = (re, im) given
   * @return the smallest |ln|z|| over the roots off the unit circle (roots at 0 or ∞, from singular
   *     couplings, are infinitely fast channels and are skipped)
   */
  public static double slowestDecay(int k, BiConsumer<double[], double[][]> bloch) {
    int d = 2 * k;
    int samples = d + 1;
    double[] cr = new double[samples];
    double[] ci = new double[samples];
    double[][] h = new double[2][k * k];
    for (int j = 0; j < samples; j++) {
      double phi = 2 * Math.PI * j / samples;
      double zr = Math.cos(phi);
      double zi = Math.sin(phi);
      bloch.accept(new double[] {zr, zi}, h);
      double[] det = determinant(k, h[0].clone(), h[1].clone());
      // z^K det
      double pr = det[0];
      double pi = det[1];
      for (int m = 0; m < k; m++) {
        double t = pr * zr - pi * zi;
        pi = pr * zi + pi * zr;
        pr = t;
      }
      for (int m = 0; m < samples; m++) {
        double a = -2 * Math.PI * j * m / samples;
        cr[m] += (pr * Math.cos(a) - pi * Math.sin(a)) / samples;
        ci[m] += (pr * Math.sin(a) + pi * Math.cos(a)) / samples;
      }
    }
    double scale = 0;
    for (int m = 0; m < samples; m++) {
      scale = Math.max(scale, Math.hypot(cr[m], ci[m]));
    }
    int low = 0;
    while (Math.hypot(cr[low], ci[low]) < 1e-12 * scale) {
      low++;
    }
    int high = samples - 1;
    while (Math.hypot(cr[high], ci[high]) < 1e-12 * scale) {
      high--;
    }
    int degree = high - low;
    double[][] roots = durandKerner(cr, ci, low, degree);
    double best = Double.POSITIVE_INFINITY;
    for (double[] r : roots) {
      double rate = Math.abs(Math.log(Math.hypot(r[0], r[1])));
      if (rate > 1e-7) {
        best = Math.min(best, rate);
      }
    }
    return best;
  }

  /** Roots of Σ_{m=0}^{degree} c_{low+m} z^m. */
  private static double[][] durandKerner(double[] cr, double[] ci, int low, int degree) {
    // monic: divide by the leading coefficient
    double lr = cr[low + degree];
    double li = ci[low + degree];
    double ln = lr * lr + li * li;
    double[] ar = new double[degree + 1];
    double[] ai = new double[degree + 1];
    for (int m = 0; m <= degree; m++) {
      ar[m] = (cr[low + m] * lr + ci[low + m] * li) / ln;
      ai[m] = (ci[low + m] * lr - cr[low + m] * li) / ln;
    }
    double[][] z = new double[degree][2];
    for (int i = 0; i < degree; i++) {
      // the customary start (0.4 + 0.9i)^i
      double r = Math.pow(Math.hypot(0.4, 0.9), i);
      double a = i * Math.atan2(0.9, 0.4);
      z[i][0] = r * Math.cos(a);
      z[i][1] = r * Math.sin(a);
    }
    for (int iter = 0; iter < 2000; iter++) {
      double change = 0;
      for (int i = 0; i < degree; i++) {
        // p(z_i) by Horner
        double pr = 1;
        double pi = 0;
        for (int m = degree - 1; m >= 0; m--) {
          double t = pr * z[i][0] - pi * z[i][1] + ar[m];
          pi = pr * z[i][1] + pi * z[i][0] + ai[m];
          pr = t;
        }
        double qr = 1;
        double qi = 0;
        for (int j = 0; j < degree; j++) {
          if (j != i) {
            double dr = z[i][0] - z[j][0];
            double di = z[i][1] - z[j][1];
            double t = qr * dr - qi * di;
            qi = qr * di + qi * dr;
            qr = t;
          }
        }
        double qn = qr * qr + qi * qi;
        double sr = (pr * qr + pi * qi) / qn;
        double si = (pi * qr - pr * qi) / qn;
        z[i][0] -= sr;
        z[i][1] -= si;
        change = Math.max(change, Math.hypot(sr, si));
      }
      if (change < 1e-15) {
        break;
      }
    }
    return z;
  }

  /**
   * det of a K × K complex matrix by Gaussian elimination with partial pivoting (inputs
   * overwritten).
   */
  static double[] determinant(int k, double[] re, double[] im) {
    double dr = 1;
    double di = 0;
    for (int col = 0; col < k; col++) {
      int piv = col;
      for (int r = col + 1; r < k; r++) {
        if (Math.hypot(re[r * k + col], im[r * k + col])
            > Math.hypot(re[piv * k + col], im[piv * k + col])) {
          piv = r;
        }
      }
      if (piv != col) {
        for (int c = 0; c < k; c++) {
          double t = re[col * k + c];
          re[col * k + c] = re[piv * k + c];
          re[piv * k + c] = t;
          t = im[col * k + c];
          im[col * k + c] = im[piv * k + c];
          im[piv * k + c] = t;
        }
        dr = -dr;
        di = -di;
      }
      double pr = re[col * k + col];
      double pi = im[col * k + col];
      double t = dr * pr - di * pi;
      di = dr * pi + di * pr;
      dr = t;
      double pn = pr * pr + pi * pi;
      if (pn == 0) {
        return new double[] {0, 0};
      }
      for (int r = col + 1; r < k; r++) {
        double fr = (re[r * k + col] * pr + im[r * k + col] * pi) / pn;
        double fi = (im[r * k + col] * pr - re[r * k + col] * pi) / pn;
        for (int c = col; c < k; c++) {
          re[r * k + c] -= fr * re[col * k + c] - fi * im[col * k + c];
          im[r * k + c] -= fr * im[col * k + c] + fi * re[col * k + c];
        }
      }
    }
    return new double[] {dr, di};
  }
}
