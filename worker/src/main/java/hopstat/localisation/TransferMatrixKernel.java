package hopstat.localisation;

import hopstat.lattice.HamiltonianBuilder;

/**
 * Lyapunov exponents of a quasi-one-dimensional bar by the transfer-matrix method (MacKinnon &amp;
 * Kramer, PRL 47, 1546 (1981); Z. Phys. B 53, 1 (1983)).
 *
 * <p><b>Equation.</b> For the nearest-slice chain T_{n−1}ᵀψ_{n−1} + H_nψ_n + Tψ_{n+1} = Eψ_n (see
 * {@link hopstat.model.SliceHamiltonian}; T the same for every slice, real, invertible),
 *
 * <pre>
 *   ψ_{n+1} = T⁻¹ [(E − H_n) ψ_n − Tᵀ ψ_{n−1}] .
 * </pre>
 *
 * K = slice dimension. The kernel propagates K vectors (the columns of the 2K × K block [ψ_n;
 * ψ_{n−1}], started from [1; 0]) and re-orthonormalises them by a Householder QR every {@link
 * #QR_INTERVAL} slices. ln|R_jj| summed over the run and divided by the number of slices converges
 * to the j-th largest Lyapunov exponent γ_j (Benettin et al., Meccanica 15, 9 (1980)); with K
 * vectors the last one, γ_K, is the smallest non-negative exponent of the symplectic spectrum
 * {±γ_j}: the inverse localisation length of the bar.
 *
 * <p><b>Warm-up.</b> The first {@code max(64, 10·K)} slices (rounded up to whole QR blocks) are
 * propagated but not counted, so the orthonormal frame has aligned with the Lyapunov vectors before
 * accumulation starts (common practice).
 *
 * <p><b>Error estimate and stopping.</b> Let d_b = ln|R_KK| of block b (QR_INTERVAL slices). The
 * estimate is γ_K = Σ d_b / (B·QR_INTERVAL) and its relative standard error is
 * sqrt(var(d)/B)/|mean(d)| with the sample variance of the d_b, treating blocks as independent (the
 * usual practice since MacKinnon &amp; Kramer; block-to-block correlations are ignored, and for
 * weak disorder the quasi-periodic in-band oscillation of d_b inflates var(d), making the estimate
 * conservative). After at least {@link #MIN_BLOCKS} counted blocks the run stops as soon as the
 * estimate reaches {@code spec.targetRelativeError()}; after {@code spec.maxSlices()} slices it
 * stops unconverged.
 *
 * <p><b>Randomness.</b> The kernel draws nothing itself: the {@link SliceSource} fills H_n for
 * slice n = 1, 2, … in order, drawing that slice's disorder from the realisation's generator.
 *
 * <p><b>Cost.</b> Per slice O(nnz(H_n)·K) plus O(K²) (diagonal T) or O(K³) (general T), and a QR of
 * 2K × K, O(8K³), every QR_INTERVAL slices. Memory O(K²), independent of the length.
 */
public final class TransferMatrixKernel {

  /**
   * Slices between re-orthonormalisations. Between two QRs the vectors' norms spread by
   * e^{QR_INTERVAL·(γ_1 − γ_K)}; with γ_1 ≲ 4 per slice for box disorder W ≲ 50 this stays below
   * e^{16}, i.e. within the ~1e16 range of double precision without losing γ_K's direction.
   */
  public static final int QR_INTERVAL = 4;

  /** Minimum number of counted QR blocks before the error estimate is trusted. */
  public static final int MIN_BLOCKS = 100;

  /** Minimum number of warm-up slices (see the class Javadoc). */
  public static final int MIN_WARMUP_SLICES = 64;

  /** Fills the on-slice Hamiltonian of the next slice. */
  @FunctionalInterface
  public interface SliceSource {
    /**
     * @param slice reset to dimension K by the kernel; the source appends H_n's terms (real values
     *     only; an imaginary part is rejected)
     */
    void fill(HamiltonianBuilder slice);
  }

  private TransferMatrixKernel() {}

  /**
   * Runs the transfer-matrix iteration.
   *
   * @param interSliceHopping T (K × K, row-major, real); read, not modified
   * @param k slice dimension K ≥ 1
   * @param spec energy, target error and length guard; read
   * @param source supplies H_n slice after slice; called once per slice
   * @param workspace scratch
   * @return the exponents; {@code converged} false if the length guard was hit, and NaN exponents
   *     if the vectors overflowed or became linearly dependent
   * @throws IllegalArgumentException if T is singular or a slice term is complex
   */
  public static LyapunovResult run(
      double[] interSliceHopping,
      int k,
      LyapunovSpec spec,
      SliceSource source,
      TransferMatrixWorkspace workspace) {
    if (k < 1 || interSliceHopping.length < k * k) {
      throw new IllegalArgumentException("inter-slice hopping must be K x K with K >= 1, K = " + k);
    }
    TransferMatrixWorkspace ws = workspace;
    ws.ensure(k);
    boolean diagonal = prepareHopping(interSliceHopping, k, ws);

    double[] cur = ws.current;
    double[] prev = ws.previous;
    double[] nxt = ws.next;
    java.util.Arrays.fill(cur, 0, k * k, 0.0);
    java.util.Arrays.fill(prev, 0, k * k, 0.0);
    for (int i = 0; i < k; i++) {
      cur[i * k + i] = 1.0;
    }
    java.util.Arrays.fill(ws.logSums, 0, k, 0.0);

    long warmupBlocks = (Math.max(MIN_WARMUP_SLICES, 10L * k) + QR_INTERVAL - 1) / QR_INTERVAL;
    long blocks = 0;
    long counted = 0;
    double sum = 0;
    double sumSquares = 0;
    double relativeError = Double.POSITIVE_INFINITY;
    long slices = 0;
    boolean converged = false;
    boolean broken = false;
    double energy = spec.energy();

    while (slices < spec.maxSlices()) {
      for (int step = 0; step < QR_INTERVAL; step++) {
        ws.slice.reset(k);
        source.fill(ws.slice);
        propagate(ws.slice, energy, k, diagonal, cur, prev, nxt, ws);
        double[] t = prev;
        prev = cur;
        cur = nxt;
        nxt = t;
      }
      slices += QR_INTERVAL;
      blocks++;
      if (!reorthonormalise(cur, prev, k, ws)) {
        broken = true;
        break;
      }
      if (blocks <= warmupBlocks) {
        continue;
      }
      for (int j = 0; j < k; j++) {
        ws.logSums[j] += Math.log(Math.abs(ws.rDiagonal[j]));
      }
      double d = Math.log(Math.abs(ws.rDiagonal[k - 1]));
      counted++;
      sum += d;
      sumSquares += d * d;
      if (counted >= MIN_BLOCKS) {
        double mean = sum / counted;
        double variance = Math.max(0.0, (sumSquares - counted * mean * mean) / (counted - 1));
        relativeError = Math.sqrt(variance / counted) / Math.abs(mean);
        if (relativeError <= spec.targetRelativeError()) {
          converged = true;
          break;
        }
      }
    }
    // keep the rotated buffers owned by the workspace
    ws.current = cur;
    ws.previous = prev;
    ws.next = nxt;

    double[] exponents = new double[k];
    double length = (double) counted * QR_INTERVAL;
    for (int j = 0; j < k; j++) {
      exponents[j] = counted == 0 || broken ? Double.NaN : ws.logSums[j] / length;
    }
    return new LyapunovResult(
        exponents[k - 1], broken ? Double.NaN : relativeError, slices, converged, exponents);
  }

  /** Stores T⁻¹ and T⁻¹Tᵀ; returns true if T is diagonal (then only the diagonals are used). */
  private static boolean prepareHopping(double[] t, int k, TransferMatrixWorkspace ws) {
    boolean diagonal = true;
    for (int i = 0; i < k && diagonal; i++) {
      for (int j = 0; j < k; j++) {
        if (i != j && t[i * k + j] != 0.0) {
          diagonal = false;
          break;
        }
      }
    }
    if (diagonal) {
      for (int i = 0; i < k; i++) {
        double tii = t[i * k + i];
        if (tii == 0.0) {
          throw new IllegalArgumentException(
              "the inter-slice hopping is singular (T[" + i + "][" + i + "] = 0)");
        }
        ws.hoppingInverse[i] = 1.0 / tii;
        ws.hoppingRatio[i] = 1.0; // T⁻¹Tᵀ = 1 for diagonal T
      }
      return true;
    }
    if (!ws.qr.invert(t, k, ws.hoppingInverse, ws.scratch, ws.rDiagonal)) {
      throw new IllegalArgumentException(
          "the inter-slice hopping T is singular; the transfer matrix does not exist");
    }
    // T⁻¹Tᵀ
    for (int i = 0; i < k; i++) {
      for (int j = 0; j < k; j++) {
        double s = 0;
        for (int l = 0; l < k; l++) {
          s += ws.hoppingInverse[i * k + l] * t[j * k + l];
        }
        ws.hoppingRatio[i * k + j] = s;
      }
    }
    return false;
  }

  /** nxt = T⁻¹[(E − H)cur] − T⁻¹Tᵀ prev, all K × K row-major. */
  private static void propagate(
      HamiltonianBuilder h,
      double energy,
      int k,
      boolean diagonal,
      double[] cur,
      double[] prev,
      double[] nxt,
      TransferMatrixWorkspace ws) {
    double[] tmp = ws.scratch;
    int kk = k * k;
    for (int i = 0; i < kk; i++) {
      tmp[i] = energy * cur[i];
    }
    int terms = h.termCount();
    for (int term = 0; term < terms; term++) {
      if (h.imaginaryPart(term) != 0.0) {
        throw new IllegalArgumentException(
            "complex slice Hamiltonian: the real transfer-matrix kernel needs real H_n");
      }
      int r = h.row(term);
      int c = h.column(term);
      double v = h.realPart(term);
      int rr = r * k;
      int cc = c * k;
      for (int j = 0; j < k; j++) {
        tmp[rr + j] -= v * cur[cc + j];
      }
      if (r != c) {
        for (int j = 0; j < k; j++) {
          tmp[cc + j] -= v * cur[rr + j];
        }
      }
    }
    if (diagonal) {
      double[] inv = ws.hoppingInverse;
      for (int i = 0; i < k; i++) {
        double a = inv[i];
        int row = i * k;
        for (int j = 0; j < k; j++) {
          nxt[row + j] = a * tmp[row + j] - prev[row + j];
        }
      }
      return;
    }
    double[] inv = ws.hoppingInverse;
    double[] ratio = ws.hoppingRatio;
    for (int i = 0; i < k; i++) {
      int row = i * k;
      for (int j = 0; j < k; j++) {
        nxt[row + j] = 0.0;
      }
      for (int l = 0; l < k; l++) {
        double a = inv[row + l];
        double b = ratio[row + l];
        int lr = l * k;
        for (int j = 0; j < k; j++) {
          nxt[row + j] += a * tmp[lr + j] - b * prev[lr + j];
        }
      }
    }
  }

  /** QR of [cur; prev]; false if a column vanished or overflowed (then exponents are NaN). */
  private static boolean reorthonormalise(
      double[] cur, double[] prev, int k, TransferMatrixWorkspace ws) {
    int kk = k * k;
    double[] a = ws.stacked;
    System.arraycopy(cur, 0, a, 0, kk);
    System.arraycopy(prev, 0, a, kk, kk);
    if (!ws.qr.orthonormalise(a, 2 * k, k, ws.rDiagonal)) {
      return false;
    }
    System.arraycopy(a, 0, cur, 0, kk);
    System.arraycopy(a, kk, prev, 0, kk);
    return true;
  }
}
