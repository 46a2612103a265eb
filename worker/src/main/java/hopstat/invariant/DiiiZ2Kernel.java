package hopstat.invariant;

import hopstat.lattice.Boundary;
import hopstat.lattice.ChainLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.ComplexDeterminantKernel;
import hopstat.linalg.ComplexLogResult;
import hopstat.linalg.ComplexPfaffianKernel;
import hopstat.model.Symmetry;
import hopstat.model.SymmetryOperator;
import org.ejml.data.ZMatrixRMaj;

/**
 * Z2 invariant of a closed, disordered class-DIII chain (T² = −1, C² = +1, S = TC), by the Pfaffian
 * / determinant-continuation formula of Qi, Hughes, Zhang, PRB 81, 134508 (2010) and Budich &amp;
 * Ardonne, PRB 88, 134523 (2013), applied to the ring as one supercell:
 *
 * <pre>  (−1)^ν = [Pf q(π) / Pf q(0)] · √det q(0) / √det q(π),</pre>
 *
 * the square root continued along φ ∈ [0, π].
 *
 * <p><b>Twist.</b> H(φ) is the realised ring with the closing-bond entries multiplied by e^{iφ}
 * (row at site L−1, column at site 0) and e^{−iφ} (the Hermitian partner), <i>on particle and hole
 * components alike</i>: this is the Bloch Hamiltonian of the ring repeated periodically, at
 * supercell momentum φ (the Nambu spinor (c_k, c†_{−k}) carries one Bloch phase). It keeps the
 * relations of a DIII Bloch Hamiltonian, T H(φ) T⁻¹ = H(−φ), C H(φ) C⁻¹ = −H(−φ), hence S H(φ) S⁻¹
 * = −H(φ) at every φ (derived). A physical flux (particles e^{iφ}, holes e^{−iφ}) would keep C at
 * fixed φ and lose S, so it is not used. φ = 0 is the periodic and φ = π the antiperiodic ring.
 *
 * <p><b>Chiral frame</b> (derived). Γ = S/√(S²) is Hermitian with Γ² = 1 and T maps its +1
 * eigenspace onto the −1 eigenspace. Per site, take an orthonormal basis v₊ of the +1 space and v₋
 * = U_T v₊* of the −1 space; then V†H(φ)V = [[0, q], [q†, 0]] with q = v₊† H v₋, and T gives q(−φ)
 * = −q(φ)ᵀ, so q is antisymmetric at φ = 0, π (in the notation of the formula, W = 1). Sign and
 * ordering choices of the frame change Pf q(0) and Pf q(π) by the same factor and cancel.
 *
 * <p><b>Continuation.</b> arg det q(φ) is followed from 0 to π in steps; a step is halved when the
 * phase changes by more than {@link #MAX_PHASE_STEP} or ln|det q| by more than {@link
 * #MAX_LOG_STEP}, and doubled again (up to the initial step) when the phase changed by less than a
 * quarter of that. With θ(π) − θ(0) the continued phase, (−1)^ν = exp(i[arg Pf q(π) − arg Pf q(0) −
 * (θ(π) − θ(0))/2]), which is ±1 up to rounding (Pf² = det). det q(φ) ≠ 0 exactly while the twisted
 * ring has no E = 0 eigenvalue; a vanishing determinant or Pfaffian, or a step below {@link
 * #MIN_STEP}, is reported as {@link DiiiZ2Result.Status#GAP_CLOSED}.
 *
 * <p>Cost: per determinant an LU of order M = L·o/2 (o orbitals per site), ≈ 8M³/3 real flops; a
 * gapped clean ring needs about 10 determinants (the continued phase changes by O(π) in total), a
 * disordered ring near a gap closing more.
 */
public final class DiiiZ2Kernel {

  /** First (and largest) step in φ. */
  public static final double INITIAL_STEP = Math.PI / 8;

  /** Largest accepted change of arg det q between two evaluations (radians). */
  public static final double MAX_PHASE_STEP = Math.PI / 4;

  /** Largest accepted change of ln|det q| between two evaluations (a dip signals a nearby zero). */
  public static final double MAX_LOG_STEP = 1.0;

  /** Smallest step before the continuation gives up: π/2²⁰ ≈ 3e−6. */
  public static final double MIN_STEP = Math.PI / (1 << 20);

  /**
   * A Pfaffian or determinant whose smallest elimination pivot is below this fraction of the
   * largest entry is treated as zero (as {@link MajoranaKernel#SINGULAR_PIVOT_RATIO}).
   */
  public static final double SINGULAR_PIVOT_RATIO = 1e-12;

  /** Tolerance on the phase of (−1)^ν being 0 or π (radians). */
  public static final double QUANTISATION_TOLERANCE = 1e-6;

  /** Relative defect max|q + qᵀ| / max|q| at φ = 0, π above which T is taken to be broken. */
  public static final double ANTISYMMETRY_TOLERANCE = 1e-8;

  private DiiiZ2Kernel() {}

  /**
   * The Z2 invariant of a closed class-DIII chain.
   *
   * @param lattice read: a periodic chain with L ≥ 3 and an even number o of orbitals per site
   * @param terms read: the realised terms (built with the periodic closure)
   * @param timeReversal read: the model's T = U_T K (local, unstaggered, U_T U_T* = −1)
   * @param chiral read: the model's S (local, unstaggered, unitary, S² ∝ 1, S H S† = −H)
   * @param workspace scratch
   * @return the invariant or why it is undefined
   * @throws IllegalArgumentException for a lattice or operators outside this contract
   * @throws IllegalStateException if q(0) or q(π) is not antisymmetric (T does not hold)
   */
  public static DiiiZ2Result compute(
      Lattice lattice,
      HamiltonianBuilder terms,
      SymmetryOperator timeReversal,
      SymmetryOperator chiral,
      DiiiZ2Workspace workspace) {
    if (lattice.dimension() != 1
        || lattice.boundary() != Boundary.PERIODIC
        || lattice.linearSize() < 3) {
      throw new IllegalArgumentException(
          "the DIII Z2 needs a periodic chain with L >= 3, got " + lattice);
    }
    int o = lattice.orbitalsPerSite();
    if (o % 2 != 0 || terms.dimension() != lattice.orbitals()) {
      throw new IllegalArgumentException(
          "the DIII Z2 needs an even number of orbitals per site and a matching builder");
    }
    if (timeReversal.symmetry() != Symmetry.TIME_REVERSAL
        || chiral.symmetry() != Symmetry.CHIRAL
        || timeReversal.orbitalsPerSite() != o
        || chiral.orbitalsPerSite() != o
        || timeReversal.siteSignCount() != 0
        || chiral.siteSignCount() != 0) {
      throw new IllegalArgumentException(
          "the DIII Z2 needs unstaggered local T and S operators on " + o + " orbitals");
    }
    double[][] frame = chiralFrame(timeReversal, chiral);
    int m = lattice.sites() * o / 2;
    workspace.block.reshape(m, m);
    workspace.antisymmetric.reshape(m, m);

    buildBlock(lattice, terms, frame, 0.0, workspace.block);
    ComplexLogResult pf0 = pfaffian(workspace);
    ComplexLogResult det0 =
        ComplexDeterminantKernel.compute(workspace.block, workspace.determinant);
    int evaluations = 1;
    if (isZero(pf0) || isZero(det0)) {
      return new DiiiZ2Result(
          DiiiZ2Result.Status.GAP_CLOSED, -1, evaluations, Double.NaN, Double.NaN);
    }
    double phi = 0.0;
    double step = INITIAL_STEP;
    double smallest = Double.POSITIVE_INFINITY;
    double phase = det0.phase();
    double logAbs = det0.logAbs();
    double continued = 0.0;
    while (phi < Math.PI) {
      double next = Math.min(Math.PI, phi + step);
      buildBlock(lattice, terms, frame, next, workspace.block);
      ComplexLogResult det =
          ComplexDeterminantKernel.compute(workspace.block, workspace.determinant);
      evaluations++;
      if (isZero(det)) {
        return new DiiiZ2Result(
            DiiiZ2Result.Status.GAP_CLOSED, -1, evaluations, smallest, Double.NaN);
      }
      double change = ComplexLogResult.wrap(det.phase() - phase);
      if (Math.abs(change) > MAX_PHASE_STEP || Math.abs(det.logAbs() - logAbs) > MAX_LOG_STEP) {
        step *= 0.5;
        if (step < MIN_STEP) {
          return new DiiiZ2Result(
              DiiiZ2Result.Status.GAP_CLOSED, -1, evaluations, smallest, Double.NaN);
        }
        continue;
      }
      smallest = Math.min(smallest, next - phi);
      phi = next;
      phase = det.phase();
      logAbs = det.logAbs();
      continued += change;
      if (Math.abs(change) < 0.25 * MAX_PHASE_STEP) {
        step = Math.min(INITIAL_STEP, 2 * step);
      }
    }
    // workspace.block now holds q(π)
    ComplexLogResult pfPi = pfaffian(workspace);
    if (isZero(pfPi)) {
      return new DiiiZ2Result(
          DiiiZ2Result.Status.GAP_CLOSED, -1, evaluations, smallest, Double.NaN);
    }
    double total = ComplexLogResult.wrap(pfPi.phase() - pf0.phase() - 0.5 * continued);
    double defect = Math.min(Math.abs(total), Math.PI - Math.abs(total));
    if (defect > QUANTISATION_TOLERANCE) {
      return new DiiiZ2Result(DiiiZ2Result.Status.NOT_QUANTISED, -1, evaluations, smallest, defect);
    }
    return new DiiiZ2Result(
        DiiiZ2Result.Status.CONVERGED,
        Math.abs(total) > 0.5 * Math.PI ? 1 : 0,
        evaluations,
        smallest,
        defect);
  }

  private static boolean isZero(ComplexLogResult r) {
    return r.isZero() || r.smallestPivotRatio() < SINGULAR_PIVOT_RATIO;
  }

  /** Pf of the block after checking and enforcing antisymmetry. */
  private static ComplexLogResult pfaffian(DiiiZ2Workspace workspace) {
    ZMatrixRMaj q = workspace.block;
    ZMatrixRMaj a = workspace.antisymmetric;
    int m = q.numRows;
    double max = 0.0;
    double defect = 0.0;
    for (int i = 0; i < m; i++) {
      for (int j = 0; j < m; j++) {
        int ij = 2 * (i * m + j);
        int ji = 2 * (j * m + i);
        max = Math.max(max, Math.hypot(q.data[ij], q.data[ij + 1]));
        defect =
            Math.max(defect, Math.hypot(q.data[ij] + q.data[ji], q.data[ij + 1] + q.data[ji + 1]));
        a.data[ij] = 0.5 * (q.data[ij] - q.data[ji]);
        a.data[ij + 1] = 0.5 * (q.data[ij + 1] - q.data[ji + 1]);
      }
    }
    if (defect > ANTISYMMETRY_TOLERANCE * max) {
      throw new IllegalStateException(
          "the chiral block is not antisymmetric at a time-reversal invariant twist (max |q + q^T| = "
              + defect
              + " for max |q| = "
              + max
              + "): time reversal is broken");
    }
    return ComplexPfaffianKernel.compute(a, workspace.pfaffian);
  }

  /**
   * q(φ)_{(s,a),(s',b)} = Σ_{αβ} conj(v₊[α][a]) H(φ)_{(s,α),(s',β)} v₋[β][b].
   *
   * @param frame {re v₊, im v₊, re v₋, im v₋}, each o × (o/2) row-major
   */
  private static void buildBlock(
      Lattice lattice, HamiltonianBuilder terms, double[][] frame, double phi, ZMatrixRMaj out) {
    int o = lattice.orbitalsPerSite();
    int half = o / 2;
    int last = lattice.sites() - 1;
    double cos = Math.cos(phi);
    double sin = Math.sin(phi);
    out.zero();
    for (int k = 0; k < terms.termCount(); k++) {
      int p = terms.row(k);
      int q = terms.column(k);
      double zr = terms.realPart(k);
      double zi = terms.imaginaryPart(k);
      int sp = p / o;
      int sq = q / o;
      if (ChainLattices.isClosingBond(lattice, sp, sq)) {
        // entry (row at L−1, column at 0) gets e^{iφ}; the opposite orientation e^{−iφ}
        double s = sp == last ? sin : -sin;
        double r = zr * cos - zi * s;
        zi = zr * s + zi * cos;
        zr = r;
      }
      accumulate(out, frame, half, sp, p % o, sq, q % o, zr, zi);
      if (p != q) {
        accumulate(out, frame, half, sq, q % o, sp, p % o, zr, -zi);
      }
    }
  }

  /** Adds conj(v₊[α][a]) z v₋[β][b] to q[(sp,a),(sq,b)] for all a, b. */
  private static void accumulate(
      ZMatrixRMaj out,
      double[][] frame,
      int half,
      int sp,
      int alpha,
      int sq,
      int beta,
      double zr,
      double zi) {
    double[] pr = frame[0];
    double[] pi = frame[1];
    double[] mr = frame[2];
    double[] mi = frame[3];
    int m = out.numCols;
    for (int a = 0; a < half; a++) {
      double ur = pr[alpha * half + a];
      double ui = -pi[alpha * half + a];
      if (ur == 0.0 && ui == 0.0) {
        continue;
      }
      double cr = ur * zr - ui * zi;
      double ci = ur * zi + ui * zr;
      int row = sp * half + a;
      for (int b = 0; b < half; b++) {
        double vr = mr[beta * half + b];
        double vi = mi[beta * half + b];
        int idx = 2 * (row * m + sq * half + b);
        out.data[idx] += cr * vr - ci * vi;
        out.data[idx + 1] += cr * vi + ci * vr;
      }
    }
  }

  /**
   * The per-site chiral frame: v₊ spans the +1 eigenspace of Γ = S/√(S²) (Gram–Schmidt on the
   * columns of (1 + Γ)/2), v₋ = U_T v₊*.
   *
   * @return {re v₊, im v₊, re v₋, im v₋}, each o × (o/2) row-major
   * @throws IllegalArgumentException if S² is not a multiple of 1, T² ≠ −1, or the ±1 spaces of Γ
   *     are not of equal size o/2
   */
  static double[][] chiralFrame(SymmetryOperator timeReversal, SymmetryOperator chiral) {
    int o = chiral.orbitalsPerSite();
    int half = o / 2;
    double[] sr = chiral.matrixRe();
    double[] si = chiral.matrixIm();
    double[] tr = timeReversal.matrixRe();
    double[] ti = timeReversal.matrixIm();
    // S² = c·1
    double[] s2r = new double[o * o];
    double[] s2i = new double[o * o];
    multiply(sr, si, sr, si, o, s2r, s2i);
    double cr = s2r[0];
    double ci = s2i[0];
    for (int i = 0; i < o; i++) {
      for (int j = 0; j < o; j++) {
        double er = i == j ? cr : 0.0;
        double ei = i == j ? ci : 0.0;
        if (Math.hypot(s2r[i * o + j] - er, s2i[i * o + j] - ei) > 1e-12) {
          throw new IllegalArgumentException("the chiral operator must square to a multiple of 1");
        }
      }
    }
    // U_T U_T* = −1
    double[] t2r = new double[o * o];
    double[] t2i = new double[o * o];
    double[] tci = new double[o * o];
    for (int i = 0; i < o * o; i++) {
      tci[i] = -ti[i];
    }
    multiply(tr, ti, tr, tci, o, t2r, t2i);
    for (int i = 0; i < o; i++) {
      for (int j = 0; j < o; j++) {
        if (Math.hypot(t2r[i * o + j] + (i == j ? 1.0 : 0.0), t2i[i * o + j]) > 1e-12) {
          throw new IllegalArgumentException("class DIII needs T^2 = -1");
        }
      }
    }
    // Γ = S / sqrt(c); projector columns (1 + Γ)/2
    double arg = -0.5 * Math.atan2(ci, cr);
    double gr = Math.cos(arg);
    double gi = Math.sin(arg);
    double[] pr = new double[o * half];
    double[] pi = new double[o * half];
    int found = 0;
    double[] colR = new double[o];
    double[] colI = new double[o];
    for (int col = 0; col < o && found < half; col++) {
      for (int i = 0; i < o; i++) {
        double gmr = sr[i * o + col] * gr - si[i * o + col] * gi;
        double gmi = sr[i * o + col] * gi + si[i * o + col] * gr;
        colR[i] = 0.5 * ((i == col ? 1.0 : 0.0) + gmr);
        colI[i] = 0.5 * gmi;
      }
      for (int b = 0; b < found; b++) {
        // col −= v_b (v_b† col)
        double dr = 0;
        double di = 0;
        for (int i = 0; i < o; i++) {
          double vr = pr[i * half + b];
          double vi = pi[i * half + b];
          dr += vr * colR[i] + vi * colI[i];
          di += vr * colI[i] - vi * colR[i];
        }
        for (int i = 0; i < o; i++) {
          double vr = pr[i * half + b];
          double vi = pi[i * half + b];
          colR[i] -= vr * dr - vi * di;
          colI[i] -= vr * di + vi * dr;
        }
      }
      double norm = 0;
      for (int i = 0; i < o; i++) {
        norm += colR[i] * colR[i] + colI[i] * colI[i];
      }
      norm = Math.sqrt(norm);
      if (norm > 1e-6) {
        for (int i = 0; i < o; i++) {
          pr[i * half + found] = colR[i] / norm;
          pi[i * half + found] = colI[i] / norm;
        }
        found++;
      }
    }
    if (found != half) {
      throw new IllegalArgumentException(
          "the chiral operator's +1 eigenspace has dimension " + found + ", not " + half);
    }
    // v₋ = U_T conj(v₊)
    double[] mr = new double[o * half];
    double[] mi = new double[o * half];
    for (int i = 0; i < o; i++) {
      for (int b = 0; b < half; b++) {
        double accR = 0;
        double accI = 0;
        for (int k = 0; k < o; k++) {
          double ar = tr[i * o + k];
          double ai = ti[i * o + k];
          double vr = pr[k * half + b];
          double vi = -pi[k * half + b];
          accR += ar * vr - ai * vi;
          accI += ar * vi + ai * vr;
        }
        mr[i * half + b] = accR;
        mi[i * half + b] = accI;
      }
    }
    return new double[][] {pr, pi, mr, mi};
  }

  private static void multiply(
      double[] ar, double[] ai, double[] br, double[] bi, int o, double[] outR, double[] outI) {
    for (int i = 0; i < o; i++) {
      for (int j = 0; j < o; j++) {
        double re = 0;
        double im = 0;
        for (int k = 0; k < o; k++) {
          re += ar[i * o + k] * br[k * o + j] - ai[i * o + k] * bi[k * o + j];
          im += ar[i * o + k] * bi[k * o + j] + ai[i * o + k] * br[k * o + j];
        }
        outR[i * o + j] = re;
        outI[i * o + j] = im;
      }
    }
  }
}
