package hopstat.localisation;

import hopstat.linalg.ComplexHouseholderOps;
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

  /**
   * A one-slice factor ‖M A_n‖ (M of unit norm) at or below this means the slices are decoupled to
   * working precision (e.g. T_n = 0 gives rounding-level C): a failure outcome, γ ≳ −ln(64 ε) ≈ 31
   * per slice is beyond what double precision resolves.
   */
  static final double DECOUPLED = 64 * Math.ulp(1.0);

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
    initialFrame(ws, k);
    ws.previousCoupling.setTo(ws.identity);

    outer:
    while (slices < spec.maxSlices()) {
      double blockLog = 0;
      for (int step = 0; step < BLOCK_SLICES; step++) {
        ws.onSlice.zero();
        ws.coupling.zero();
        source.next(ws.onSlice, ws.coupling);
        // Z = (E − H_n) P − T_{n−1} Q for the frame [P; Q] of pairs (ψ_n, ψ_{n−1})
        ws.products.mult(ws.onSlice, ws.frameTop, ws.z);
        ws.products.mult(ws.previousCoupling, ws.frameBottom, ws.scratch);
        double[] z = ws.z.data;
        double[] p = ws.frameTop.data;
        double[] tq = ws.scratch.data;
        int len = 2 * k * k;
        for (int i = 0; i < len; i++) {
          z[i] = energy * p[i] - z[i] - tq[i];
        }
        // B† = [T_n; −Z†]; ker B = {(ψ_{n+1}, c) : T_n† ψ_{n+1} = Z c} = last K columns of B†'s full Q
        stack(ws.coupling, ws.z, true, ws.stacked);
        ComplexHouseholderOps.factor(ws.stacked, ws.reflectors);
        ComplexHouseholderOps.formQ(ws.reflectors, k, ws.kernel);
        // new pairs (ψ_{n+1}, ψ_n) = [X; P C], orthonormalised: [X; P C] = F' R
        split(ws.kernel, ws.x, ws.c);
        ws.products.mult(ws.frameTop, ws.c, ws.scratch);
        stack(ws.x, ws.scratch, false, ws.stacked);
        ComplexHouseholderOps.factor(ws.stacked, ws.reflectors);
        ComplexHouseholderOps.formQ(ws.reflectors, 0, ws.kernel);
        split(ws.kernel, ws.frameTop, ws.frameBottom);
        // A_n = C R⁻¹ maps new-frame coordinates to old ones; M ← M A_n
        if (!solveRight(ws.c, ws.stacked, ws.a)) {
          broken = true;
          break outer;
        }
        if (first) {
          ws.product.setTo(ws.a);
        } else {
          ws.products.mult(ws.product, ws.a, ws.scratch);
          ws.product.setTo(ws.scratch);
        }
        double norm = frobenius(ws.product);
        if (!(norm > DECOUPLED) || !Double.isFinite(norm)) {
          broken = true;
          break outer;
        }
        scale(ws.product, 1.0 / norm);
        blockLog += Math.log(norm);
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
    double gamma = counted == 0 || broken ? Double.NaN : sum / (counted * (double) BLOCK_SLICES);
    return new LyapunovResult(gamma, broken ? Double.NaN : relativeError, slices, converged && !broken, new double[] {gamma});
  }

  /**
   * A fixed generic starting frame (ψ_1, ψ_0) (a deterministic quasi-random 2K × K matrix,
   * orthonormalised), so that no open-end boundary condition, and no end zero mode, is imposed.
   */
  private static void initialFrame(GreenRecursionWorkspace ws, int k) {
    double[] s = ws.stacked.data;
    int len = 2 * (2 * k) * k;
    for (int i = 0; i < len; i++) {
      // golden-ratio Weyl sequence, centred: no structure a Hamiltonian could share
      double u = (i + 1) * 0.6180339887498949;
      s[i] = (u - Math.floor(u)) - 0.5;
    }
    ComplexHouseholderOps.factor(ws.stacked, ws.reflectors);
    ComplexHouseholderOps.formQ(ws.reflectors, 0, ws.kernel);
    split(ws.kernel, ws.frameTop, ws.frameBottom);
  }

  /** out (2K × K) ← [top; bottom] or, if {@code negConjBottom}, [top; −bottom†]. */
  private static void stack(ZMatrixRMaj top, ZMatrixRMaj bottom, boolean negConjBottom, ZMatrixRMaj out) {
    int k = top.numRows;
    double[] o = out.data;
    double[] t = top.data;
    double[] b = bottom.data;
    System.arraycopy(t, 0, o, 0, 2 * k * k);
    int off = 2 * k * k;
    for (int i = 0; i < k; i++) {
      for (int j = 0; j < k; j++) {
        int ij = 2 * (i * k + j);
        if (negConjBottom) {
          int ji = 2 * (j * k + i);
          o[off + ij] = -b[ji];
          o[off + ij + 1] = b[ji + 1];
        } else {
          o[off + ij] = b[ij];
          o[off + ij + 1] = b[ij + 1];
        }
      }
    }
  }

  /** [top; bottom] ← in (2K × K). */
  private static void split(ZMatrixRMaj in, ZMatrixRMaj top, ZMatrixRMaj bottom) {
    int len = 2 * top.numRows * top.numCols;
    System.arraycopy(in.data, 0, top.data, 0, len);
    System.arraycopy(in.data, len, bottom.data, 0, len);
  }

  /**
   * out ← c R⁻¹ with R the upper K × K triangle of {@code r} (2K × K), by substitution along each
   * row; false if a diagonal entry of R is zero or the result is not finite.
   */
  private static boolean solveRight(ZMatrixRMaj c, ZMatrixRMaj r, ZMatrixRMaj out) {
    int k = c.numRows;
    double[] cd = c.data;
    double[] rd = r.data;
    double[] o = out.data;
    for (int row = 0; row < k; row++) {
      for (int j = 0; j < k; j++) {
        int oj = 2 * (row * k + j);
        double re = cd[oj];
        double im = cd[oj + 1];
        for (int l = 0; l < j; l++) {
          int ol = 2 * (row * k + l);
          int lj = 2 * (l * k + j);
          re -= o[ol] * rd[lj] - o[ol + 1] * rd[lj + 1];
          im -= o[ol] * rd[lj + 1] + o[ol + 1] * rd[lj];
        }
        int jj = 2 * (j * k + j);
        double dr = rd[jj];
        double di = rd[jj + 1];
        double den = dr * dr + di * di;
        if (!(den > 0)) {
          return false;
        }
        o[oj] = (re * dr + im * di) / den;
        o[oj + 1] = (im * dr - re * di) / den;
        if (!Double.isFinite(o[oj]) || !Double.isFinite(o[oj + 1])) {
          return false;
        }
      }
    }
    return true;
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
}
