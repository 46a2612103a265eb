package hopstat.localisation;

import hopstat.linalg.ComplexHouseholderOps;
import org.ejml.data.ZMatrixRMaj;

/**
 * The smallest positive Lyapunov exponent of a quasi-one-dimensional bar with complex slices and
 * possibly singular inter-slice couplings (e.g. the QWZ hopping t(σz + iσx)/2, BdG wires at Δ = t,
 * SSH), by a QR-stabilised propagation of the space of solutions written as a matrix pencil, so
 * that no coupling and no self-energy is ever inverted. (The class keeps its historical name: it
 * used to run the recursive Green's function of MacKinnon &amp; Kramer, Z. Phys. B 53, 1 (1983);
 * see "Why not the Green's function recursion" below.)
 *
 * <p><b>Equation.</b> Bar of slices with on-slice blocks H_n and couplings T_n = H_{n+1,n} (see
 * {@link BarSlices}): T_{n−1} ψ_{n−1} + (H_n − E) ψ_n + T_n† ψ_{n+1} = 0. A K-dimensional space of
 * solutions is held as an orthonormal 2K × K frame F_n = [P; Q] of pairs (ψ_n, ψ_{n−1}). With Z =
 * (E − H_n) P − T_{n−1} Q, the solution with frame coordinates c continues to every ψ_{n+1} with
 * T_n† ψ_{n+1} = Z c, i.e. (ψ_{n+1}, c) ∈ ker B, B = [T_n†, −Z] (K × 2K). A Householder QR of B† =
 * [T_n; −Z†] gives an orthonormal basis [X; C] of ker B (the last K columns of its full Q; {@link
 * hopstat.linalg.ComplexHouseholderOps}); the new pairs are [X; P C]. At the end of every block of
 * {@link #BLOCK_SLICES} slices they are orthonormalised, [X; P C] = F_{n+1} R (QR again), and
 * new-frame coordinates z map to old ones by A_n = C R⁻¹; inside a block the frame F_{n+1} = [X; P
 * C] is kept as it is and A_n = C (derived). No inverse of T_n is needed: a singular T_n makes C
 * singular, which is an infinitely fast channel (γ = ∞), not a breakdown.
 *
 * <p><b>Why once per block suffices.</b> The unorthonormalised frame is not a power iteration: [X;
 * P C] = diag(1, P)·[X; C] with [X; C] orthonormal and freshly computed each slice, and P the top
 * of an orthonormal 2K × K matrix (the previous [X; C], or the frame at a block start), so ‖F‖ ≤ 1
 * and cond(F) ≤ 1/σ_min(P) (derived) — a bound set by the previous slice alone, the same one that
 * governs R in a scheme that orthonormalises every slice. Once per block caps any carry-over at
 * {@link #BLOCK_SLICES} slices, as QR_INTERVAL does in {@link TransferMatrixKernel}. And because
 * the frame is orthonormal at every block end, the product M there differs from the every-slice
 * scheme's only by a unitary factor on the right, so ‖M‖_F, hence every block increment d_b below,
 * is the same up to rounding (measured: γ agrees to ~1e-13 relative on the benchmark strips, K =
 * 2–16).
 *
 * <p><b>Exponent.</b> The forward map restricted to the frame has the K largest exponents γ_1 ≥ … ≥
 * γ_K of the 2K (for Hermitian slices at real E they come in ± pairs, so these are the non-negative
 * ones, some possibly +∞ from singular couplings), hence the backward product M_N = A_1 A_2 ⋯ A_N
 * has singular values ~ e^{−γ_i N} (Oseledec; the QR/Benettin scheme as in {@link
 * TransferMatrixKernel}) and ‖M_N‖ ~ e^{−γ_min N} with γ_min the smallest FINITE non-negative
 * exponent: γ = −lim (1/N) ln ‖M_N‖_F, amplitude convention |ψ| ~ e^{−γx}. M is renormalised to
 * unit Frobenius norm after every slice and the logarithms summed. Only this one exponent is
 * returned ({@code exponents} has one entry).
 *
 * <p><b>Starting frame.</b> A fixed, deterministic generic frame (a golden-ratio Weyl sequence,
 * orthonormalised) with a fictitious coupling T_0 = 1, not the open end ψ_0 = 0: at E = 0 in a
 * topological phase the open end holds zero modes that decay into the bar, a non-generic start that
 * would only be corrected by rounding. No randomness is drawn for it.
 *
 * <p><b>Zero modes at the ends.</b> Because the frame is generic and the exponent is the top one of
 * the backward product, the result does not depend on end modes: several zero modes per end
 * (|winding| ≥ 2 in class BDI, Kramers pairs in class DIII) or a mix of topological and trivial
 * channels give the smallest exponent of all channels (tested against two SSH chains, decoupled and
 * coupled, and the diii-wire with spin–orbit coupling, clean and disordered).
 *
 * <p><b>Why not the Green's function recursion.</b> The previous engine built G_{1N} of the open
 * bar by Dyson's equation, Σ_{n+1} = T_n (E − H_n − Σ_n)⁻¹ T_n†, and took |rate| of ‖G_{1N}‖ (it
 * grows when the open ends hold zero modes). At E = 0 in a topological phase the right-end surface
 * Green's function of a long bar has a pole, and the open left end keeps Σ finite only through an
 * exact cancellation between left and right end modes that the antiunitary symmetries (T, C)
 * enforce. Rounding breaks those symmetries at 1e-16 and the break grows by ~e^{2γ} per slice
 * (measured on the clean diii-wire, μ = 0.5, λ = 0.3: relative T- and C-breaking of Σ_n from 7e-16
 * to O(1) within 9 slices, then Σ exploded on a rank-2 subspace and the factorisation failed;
 * symmetrising Σ by T and C at every slice removed the breakdown, which located the cause). Real 2
 * × 2 BdG slices and SSH-like zero patterns preserved the cancellation exactly, which is why the
 * Kitaev and SSH chains were unaffected. Also, |rate| of ‖G_{1N}‖ reported the fastest topological
 * channel, not the slowest channel, when channels differ.
 *
 * <p><b>Warm-up, error estimate and stopping</b> as in {@link TransferMatrixKernel}: the first
 * max(64, 10·K) slices (whole blocks) are not counted; d_b = −(sum of the log-norm increments) over
 * a block of {@link #BLOCK_SLICES} slices; γ = Σ d_b / (B·BLOCK_SLICES) and its relative standard
 * error sqrt(var(d)/B)/|mean(d)| with blocks treated as independent (block-to-block correlations
 * over the localisation length are ignored, as in the transfer-matrix kernel). After at least
 * {@link TransferMatrixKernel#MIN_BLOCKS} blocks the run stops when the error reaches the target;
 * after {@code spec.maxSlices()} slices it stops unconverged. In a band of a clean bar γ → 0 and
 * may come out slightly negative; the caller treats γ ≤ 0 as not converged.
 *
 * <p><b>Failure outcomes</b> (NaN exponent, not an exception): a zero or non-finite diagonal entry
 * of R (checked at block ends), an overflow, or a one-slice factor ‖M A_n‖ ≤ {@link #DECOUPLED}
 * (the slices decouple to working precision, e.g. T = 0: γ = ∞).
 *
 * <p><b>Randomness.</b> None drawn here: the {@link SliceSource} supplies H_n and T_n for n = 1, 2,
 * … in order, once each.
 *
 * <p><b>Cost.</b> Per slice one Householder QR of the 2K × K matrix [T_n; −Z†] and the formation of
 * K columns of its Q (pure Java, ≈ 1.7K³ + 3K³ complex multiply-adds, about 1K³ + 2K³ when T_n is
 * upper triangular, e.g. diagonal, because zero reflector rows are skipped), Z with the zero
 * entries of H_n and T_{n−1} skipped, and two K × K products (P C and M A_n); once per block of
 * {@link #BLOCK_SLICES} slices a second QR with the thin Q and a triangular solve. No allocation
 * per slice; memory O(K²), independent of the length. Measured by {@code SliceRecursionBenchmark}
 * (design notes, 2026-12-02).
 */
public final class GreenRecursionKernel {

  /**
   * Slices per error block (same as {@link TransferMatrixKernel#QR_INTERVAL}, so both kernels'
   * errors compare).
   */
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
  public static LyapunovResult run(
      int k, LyapunovSpec spec, SliceSource source, GreenRecursionWorkspace workspace) {
    if (k < 1) {
      throw new IllegalArgumentException("slice dimension must be >= 1: " + k);
    }
    GreenRecursionWorkspace ws = workspace;
    ws.ensure(k);
    double energy = spec.energy();
    long warmupBlocks =
        (Math.max(TransferMatrixKernel.MIN_WARMUP_SLICES, 10L * k) + BLOCK_SLICES - 1)
            / BLOCK_SLICES;
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
        formZ(energy, ws.onSlice, ws.previousCoupling, ws.frameTop, ws.frameBottom, ws.z);
        // B† = [T_n; −Z†]; ker B = {(ψ_{n+1}, c) : T_n† ψ_{n+1} = Z c} = last K columns of B†'s
        // full Q
        stack(ws.coupling, ws.z, true, ws.stacked);
        ComplexHouseholderOps.factor(ws.stacked, ws.reflectors, ws.row);
        ComplexHouseholderOps.formQ(ws.reflectors, k, ws.kernel, ws.row);
        split(ws.kernel, ws.x, ws.c);
        // new pairs (ψ_{n+1}, ψ_n) = [X; P C]: X becomes the top, P C the bottom
        ws.products.mult(ws.frameTop, ws.c, ws.frameBottom);
        ZMatrixRMaj swap = ws.frameTop;
        ws.frameTop = ws.x;
        ws.x = swap;
        ZMatrixRMaj factor;
        if (step == BLOCK_SLICES - 1) {
          // block end: orthonormalise, [X; P C] = F' R, and A_n = C R⁻¹
          stack(ws.frameTop, ws.frameBottom, false, ws.stacked);
          ComplexHouseholderOps.factor(ws.stacked, ws.reflectors, ws.row);
          ComplexHouseholderOps.formQ(ws.reflectors, 0, ws.kernel, ws.row);
          split(ws.kernel, ws.frameTop, ws.frameBottom);
          if (!solveRight(ws.c, ws.stacked, ws.a)) {
            broken = true;
            break outer;
          }
          factor = ws.a;
        } else {
          // inside a block the frame [X; P C] is kept as it is: A_n = C
          factor = ws.c;
        }
        // M ← M A_n
        if (first) {
          ws.product.setTo(factor);
        } else {
          ws.products.mult(ws.product, factor, ws.scratch);
          swap = ws.product;
          ws.product = ws.scratch;
          ws.scratch = swap;
        }
        double norm = frobenius(ws.product);
        if (!(norm > DECOUPLED) || !Double.isFinite(norm)) {
          broken = true;
          break outer;
        }
        scale(ws.product, 1.0 / norm);
        blockLog += Math.log(norm);
        swap = ws.previousCoupling;
        ws.previousCoupling = ws.coupling;
        ws.coupling = swap;
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
    return new LyapunovResult(
        gamma,
        broken ? Double.NaN : relativeError,
        slices,
        converged && !broken,
        new double[] {gamma});
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
    ComplexHouseholderOps.factor(ws.stacked, ws.reflectors, ws.row);
    ComplexHouseholderOps.formQ(ws.reflectors, 0, ws.kernel, ws.row);
    split(ws.kernel, ws.frameTop, ws.frameBottom);
  }

  /**
   * z ← (E − H) P − T Q, row by row; zero entries of H and T (nearest-neighbour slices are sparse)
   * are skipped.
   */
  private static void formZ(
      double energy, ZMatrixRMaj h, ZMatrixRMaj t, ZMatrixRMaj p, ZMatrixRMaj q, ZMatrixRMaj z) {
    int k = h.numRows;
    int rowLen = 2 * k;
    double[] hd = h.data;
    double[] td = t.data;
    double[] pd = p.data;
    double[] qd = q.data;
    double[] zd = z.data;
    for (int i = 0; i < k; i++) {
      int zi = i * rowLen;
      for (int j = 0; j < rowLen; j++) {
        zd[zi + j] = energy * pd[zi + j];
      }
      for (int l = 0; l < k; l++) {
        int il = zi + 2 * l;
        subtractRow(hd[il], hd[il + 1], pd, l * rowLen, zd, zi, rowLen);
        subtractRow(td[il], td[il + 1], qd, l * rowLen, zd, zi, rowLen);
      }
    }
  }

  /** out[outOff ..] −= (ar + i·ai) · in[inOff ..] over len doubles (len/2 complex); skips a = 0. */
  private static void subtractRow(
      double ar, double ai, double[] in, int inOff, double[] out, int outOff, int len) {
    if (ar == 0 && ai == 0) {
      return;
    }
    for (int j = 0; j < len; j += 2) {
      double xr = in[inOff + j];
      double xi = in[inOff + j + 1];
      out[outOff + j] -= ar * xr - ai * xi;
      out[outOff + j + 1] -= ar * xi + ai * xr;
    }
  }

  /** out (2K × K) ← [top; bottom] or, if {@code negConjBottom}, [top; −bottom†]. */
  private static void stack(
      ZMatrixRMaj top, ZMatrixRMaj bottom, boolean negConjBottom, ZMatrixRMaj out) {
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
