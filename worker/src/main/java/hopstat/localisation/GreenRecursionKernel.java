package hopstat.localisation;

import org.ejml.data.ZMatrixRMaj;

/**
 * The smallest Lyapunov exponent of a quasi-one-dimensional bar from the recursive Green's function
 * (MacKinnon &amp; Kramer, Z. Phys. B 53, 1 (1983)). Works for complex slices and for singular
 * inter-slice couplings (e.g. the QWZ hopping t(σz + iσx)/2 or the Kitaev-wire BdG hopping at Δ =
 * t), because it never inverts the coupling.
 *
 * <p><b>Equation.</b> Bar of slices 1..N with on-slice blocks H_n and couplings T_n = H_{n+1,n} (see
 * {@link BarSlices}). With G^{(N)} = (E − H_bar)⁻¹ of the first N slices,
 *
 * <pre>
 *   G_{N,N}  = (E − H_N − T_{N−1} G_{N−1,N−1} T_{N−1}†)⁻¹ ,   G_{1,1} = (E − H_1)⁻¹ ,
 *   G_{1,N}  = G_{1,N−1} T_{N−1}† G_{N,N}
 * </pre>
 *
 * (Dyson's equation for attaching slice N; derived). For real E the matrix inverted is Hermitian,
 * so it is factored by LDLᴴ ({@link hopstat.linalg.HermitianLdltSolver}). The end-to-end propagator
 * decays with the slowest channel, ‖G_{1N}‖ ~ e^{−γN} in the amplitude convention |ψ| ~ e^{−γx}
 * (MacKinnon &amp; Kramer write Tr|G_{1N}|² ~ e^{−2N/λ}), so γ = −lim (1/N) ln ‖G_{1N}‖_F. G_{1N}
 * is renormalised to unit Frobenius norm after every slice and the logarithms of the norms are
 * summed (they telescope to ln ‖G_{1N}‖).
 *
 * <p><b>Zero modes at the bar's ends.</b> At an energy where an open end of the growing bar holds a
 * protected zero mode (E = 0 in a topological phase of a chiral or BdG chain: SSH with |v| &lt; |w|,
 * the Kitaev wire with |μ| &lt; 2|t|), the left- and right-end modes hybridise with a splitting ~
 * e^{−γN} and ‖G_{1N}‖ grows as e^{+γN} instead of decaying; the kernel therefore returns γ = |lim
 * (1/N) ln ‖G_{1N}‖| (checked against the closed forms of both phases). With two or more such end
 * modes per end (|winding| ≥ 2, possible in class BDI/AIII with several channels) the growth rate is
 * set by the fastest-decaying end mode, so γ may then exceed the smallest exponent; not tested.
 *
 * <p><b>Warm-up, error estimate and stopping</b> as in {@link TransferMatrixKernel}: the first
 * max(64, 10·K) slices (whole blocks) are not counted; d_b = sum of the log-norm increments over a
 * block of {@link #BLOCK_SLICES} slices; γ = −Σ d_b / (B·BLOCK_SLICES) and its relative standard
 * error sqrt(var(d)/B)/|mean(d)| with blocks treated as independent (block-to-block correlations
 * over the localisation length are ignored, as in the transfer-matrix kernel). After at least
 * {@link TransferMatrixKernel#MIN_BLOCKS} blocks the run stops when the error reaches the target;
 * after {@code spec.maxSlices()} slices it stops unconverged.
 *
 * <p><b>Failure outcomes</b> (NaN exponent, not an exception): an exactly singular E − H_N − Σ (E
 * an eigenvalue of the bar grown so far; measure zero with disorder, but possible for clean,
 * symmetric slices), an overflow, or G_{1N} = 0 (the slices decouple, γ = ∞).
 *
 * <p><b>Randomness.</b> None drawn here: the {@link SliceSource} supplies H_n and T_n for n = 1,
 * 2, … in order.
 *
 * <p><b>Cost.</b> Per slice one LDLᴴ factorisation and solve (≈ 4K³/3 complex multiply–adds) and
 * four K × K products (4K³); memory O(K²), independent of the length.
 */
public final class GreenRecursionKernel {

  /** Slices per error block (same as {@link TransferMatrixKernel#QR_INTERVAL}, so both kernels' errors compare). */
  public static final int BLOCK_SLICES = 4;

  /** Supplies the slices of the bar. */
  @FunctionalInterface
  public interface SliceSource {
    /**
     * Adds the next slice's blocks.
     *
     * @param onSlice K × K, zeroed by the kernel; receives H_n (Hermitian)
     * @param coupling K × K, zeroed by the kernel; receives T_n = H_{n+1,n}, the coupling to the
     *     next slice
     */
    void next(ZMatrixRMaj onSlice, ZMatrixRMaj coupling);
  }

  private GreenRecursionKernel() {}

  /**
   * Grows the bar until the target error or the length guard.
   *
   * @param k slice dimension K ≥ 1
   * @param spec energy, target error and length guard; read
   * @param source called once per slice, in order
   * @param workspace scratch
   * @return γ as {@code smallestPositive} (and the only entry of {@code exponents}); NaN exponent
   *     and error on the failure outcomes listed in the class Javadoc
   */
  public static LyapunovResult run(int k, LyapunovSpec spec, SliceSource source, GreenRecursionWorkspace workspace) {
    if (k < 1) {
      throw new IllegalArgumentException("slice dimension must be >= 1: " + k);
    }
    GreenRecursionWorkspace ws = workspace;
    ws.ensure(k);
    double energy = spec.energy();
    long warmupBlocks = (Math.max(TransferMatrixKernel.MIN_WARMUP_SLICES, 10L * k) + BLOCK_SLICES - 1) / BLOCK_SLICES;
    long blocks = 0;
    long counted = 0;
    double sum = 0;
    double sumSquares = 0;
    double relativeError = Double.POSITIVE_INFINITY;
    long slices = 0;
    boolean converged = false;
    boolean broken = false;
    boolean first = true;

    outer:
    while (slices < spec.maxSlices()) {
      double blockLog = 0;
      for (int step = 0; step < BLOCK_SLICES; step++) {
        ws.onSlice.zero();
        ws.coupling.zero();
        source.next(ws.onSlice, ws.coupling);
        // a = E − H_n − Σ_n, Σ_n = T_{n−1} G_{n−1} T_{n−1}† (zero for the first slice)
        double[] a = ws.a.data;
        double[] h = ws.onSlice.data;
        double[] sigma = ws.sigma.data;
        int len = 2 * k * k;
        for (int i = 0; i < len; i++) {
          a[i] = -h[i] - (first ? 0.0 : sigma[i]);
        }
        for (int i = 0; i < k; i++) {
          a[2 * (i * k + i)] += energy;
        }
        if (!ws.ldlt.factor(ws.a)) {
          broken = true;
          break outer;
        }
        ws.green.setTo(ws.identity);
        ws.ldlt.solve(ws.green);
        // G_{1n} = G_{1,n−1} T_{n−1}† G_n (G_{11} = G_1)
        if (first) {
          ws.endToEnd.setTo(ws.green);
        } else {
          ws.products.multConjTransB(ws.endToEnd, ws.previousCoupling, ws.scratch);
          ws.products.mult(ws.scratch, ws.green, ws.endToEnd);
        }
        double norm = frobenius(ws.endToEnd);
        if (!(norm > 0) || !Double.isFinite(norm)) {
          broken = true;
          break outer;
        }
        scale(ws.endToEnd, 1.0 / norm);
        blockLog += Math.log(norm);
        // Σ_{n+1} = T_n G_n T_n†, kept Hermitian against rounding drift
        ws.products.mult(ws.coupling, ws.green, ws.scratch);
        ws.products.multConjTransB(ws.scratch, ws.coupling, ws.sigma);
        hermitise(ws.sigma);
        ws.previousCoupling.setTo(ws.coupling);
        first = false;
      }
      slices += BLOCK_SLICES;
      blocks++;
      if (blocks <= warmupBlocks) {
        continue;
      }
      double d = -blockLog;
      counted++;
      sum += d;
      sumSquares += d * d;
      if (counted >= TransferMatrixKernel.MIN_BLOCKS) {
        double mean = sum / counted;
        double variance = Math.max(0.0, (sumSquares - counted * mean * mean) / (counted - 1));
        relativeError = Math.sqrt(variance / counted) / Math.abs(mean);
        if (relativeError <= spec.targetRelativeError()) {
          converged = true;
          break;
        }
      }
    }
    // |rate|: at an energy where an open end of the bar holds a protected zero mode, ‖G_1N‖ grows at the same rate
    double gamma = counted == 0 || broken ? Double.NaN : Math.abs(sum / (counted * (double) BLOCK_SLICES));
    return new LyapunovResult(gamma, broken ? Double.NaN : relativeError, slices, converged && !broken, new double[] {gamma});
  }

  private static double frobenius(ZMatrixRMaj a) {
    double s = 0;
    double[] d = a.data;
    int len = a.getDataLength();
    for (int i = 0; i < len; i++) {
      s += d[i] * d[i];
    }
    return Math.sqrt(s);
  }

  private static void scale(ZMatrixRMaj a, double factor) {
    double[] d = a.data;
    int len = a.getDataLength();
    for (int i = 0; i < len; i++) {
      d[i] *= factor;
    }
  }

  /** a ← (a + a†)/2. */
  private static void hermitise(ZMatrixRMaj a) {
    int n = a.numRows;
    double[] d = a.data;
    for (int i = 0; i < n; i++) {
      int ii = 2 * (i * n + i);
      d[ii + 1] = 0.0;
      for (int j = 0; j < i; j++) {
        int ij = 2 * (i * n + j);
        int ji = 2 * (j * n + i);
        double re = 0.5 * (d[ij] + d[ji]);
        double im = 0.5 * (d[ij + 1] - d[ji + 1]);
        d[ij] = re;
        d[ij + 1] = im;
        d[ji] = re;
        d[ji + 1] = -im;
      }
    }
  }
}
