package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.ChainLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import org.ejml.data.DMatrixRMaj;

/**
 * Conversions between the Nambu-per-site BdG matrix and the Majorana matrix of {@link
 * MajoranaForm}.
 *
 * <p>Per site, Ψ_s = (c_s, c†_s)ᵀ = W γ_s with γ_s = (a_s, b_s)ᵀ and W = ½[[1, i], [1, −i]], whose
 * inverse is 2W†. From H = ½ Ψ† H_BdG Ψ = ½ γᵀ W† H_BdG W γ and H = (i/4) γᵀ A γ (the symmetric,
 * purely real part of W† H_BdG W only adds a constant because γ_m² = 1):
 *
 * <pre>  A = −2i W† H_BdG W,    H_BdG = 2i W A W†     (derived)</pre>
 *
 * Check (derived): one site with −μ c†c has H_BdG = diag(−μ, μ) and A_{ab} = −μ, i.e. H = −(iμ/2) a
 * b; with the parity operator 1 − 2c†c = −i a b the ground state for μ &gt; 0 is occupied (odd) and
 * Pf(A) = −μ &lt; 0: sign Pf(A) = +1 means even parity, as in Kitaev (2001), Eq. (13)–(14) (cited,
 * equation numbers from memory).
 */
public final class MajoranaOps {

  /**
   * Relative size of the imaginary or symmetric part of A (off the diagonal) above which the terms
   * are rejected as not particle–hole symmetric.
   */
  public static final double BDG_FORM_TOLERANCE = 1e-10;

  private MajoranaOps() {}

  /** Majorana index of a_s. */
  public static int a(int site) {
    return 2 * site;
  }

  /** Majorana index of b_s. */
  public static int b(int site) {
    return 2 * site + 1;
  }

  /**
   * Adds the term (i/2)·x·γ_m γ_n (m ≠ n), i.e. A_{mn} += x, A_{nm} −= x, to a Nambu-per-site BdG
   * builder.
   *
   * @param m Majorana index, read
   * @param n Majorana index ≠ m, read
   * @param x real coupling in the energy unit
   * @param out terms appended (H_BdG = 2i W A W† restricted to the two sites)
   */
  public static void addCoupling(int m, int n, double x, HamiltonianBuilder out) {
    if (m == n) {
      throw new IllegalArgumentException("a Majorana coupling needs two different Majoranas: " + m);
    }
    int sm = m / 2;
    int sn = n / 2;
    int[] nambu =
        sm == sn
            ? new int[] {2 * sm, 2 * sm + 1}
            : new int[] {2 * sm, 2 * sm + 1, 2 * sn, 2 * sn + 1};
    for (int i = 0; i < nambu.length; i++) {
      for (int j = i; j < nambu.length; j++) {
        int p = nambu[i];
        int q = nambu[j];
        // H_pq = 2i x (W_pm conj(W_qn) − W_pn conj(W_qm))
        double re1 = wRe(p, m) * wRe(q, n) + wIm(p, m) * wIm(q, n);
        double im1 = wIm(p, m) * wRe(q, n) - wRe(p, m) * wIm(q, n);
        double re2 = wRe(p, n) * wRe(q, m) + wIm(p, n) * wIm(q, m);
        double im2 = wIm(p, n) * wRe(q, m) - wRe(p, n) * wIm(q, m);
        double dRe = re1 - re2;
        double dIm = im1 - im2;
        double hRe = -2.0 * x * dIm;
        double hIm = 2.0 * x * dRe;
        if (p == q) {
          if (hRe != 0.0) {
            out.addOnsite(p, hRe);
          }
        } else if (hRe != 0.0 || hIm != 0.0) {
          out.addHopping(p, q, hRe, hIm);
        }
      }
    }
  }

  /**
   * A = −2i W† H_BdG W of the realised terms; on a periodic chain (L ≥ 3) the closing-bond terms
   * are multiplied by {@code closurePhase}. A site may hold several fermions, each as a Nambu pair
   * (orbitals 2f, 2f+1 = c_f, c†_f, e.g. spinful chains); W acts on each pair, so Majorana 2f is
   * a_f and 2f+1 is b_f of fermion f = orbital index / 2.
   *
   * @param lattice read
   * @param terms read
   * @param closurePhase +1 or −1
   * @param out overwritten: the real antisymmetric A (2·sites square, zero diagonal)
   * @param scratch overwritten: imaginary parts, checked to vanish
   * @throws IllegalStateException if A is not real antisymmetric to {@link #BDG_FORM_TOLERANCE}
   */
  public static void toMajoranaMatrix(
      Lattice lattice,
      HamiltonianBuilder terms,
      int closurePhase,
      DMatrixRMaj out,
      DMatrixRMaj scratch) {
    if (closurePhase != 1 && closurePhase != -1) {
      throw new IllegalArgumentException("closure phase must be +1 or -1: " + closurePhase);
    }
    int o = lattice.orbitalsPerSite();
    if (o % 2 != 0 || terms.dimension() != lattice.orbitals()) {
      throw new IllegalArgumentException(
          "Majorana form needs Nambu pairs (an even number of orbitals per site) and a matching builder");
    }
    boolean ring = lattice.dimension() == 1 && lattice.boundary() == Boundary.PERIODIC;
    if (ring && closurePhase == -1 && lattice.linearSize() < 3) {
      throw new IllegalArgumentException(
          "antiperiodic closure needs L >= 3 to tell the closing bond apart");
    }
    int n = terms.dimension();
    out.reshape(n, n);
    out.zero();
    scratch.reshape(n, n);
    scratch.zero();
    for (int k = 0; k < terms.termCount(); k++) {
      int p = terms.row(k);
      int q = terms.column(k);
      double zr = terms.realPart(k);
      double zi = terms.imaginaryPart(k);
      if (ring && closurePhase == -1 && ChainLattices.isClosingBond(lattice, p / o, q / o)) {
        zr = -zr;
        zi = -zi;
      }
      accumulate(p, q, zr, zi, out, scratch);
      if (p != q) {
        accumulate(q, p, zr, -zi, out, scratch);
      }
    }
    double max = 0.0;
    for (int i = 0; i < n * n; i++) {
      max = Math.max(max, Math.abs(out.data[i]));
    }
    for (int i = 0; i < n; i++) {
      out.data[i * n + i] = 0.0; // constants (γ² = 1), no dynamics
      for (int j = i + 1; j < n; j++) {
        double sym = out.data[i * n + j] + out.data[j * n + i];
        double imag =
            Math.max(Math.abs(scratch.data[i * n + j]), Math.abs(scratch.data[j * n + i]));
        if (Math.abs(sym) > BDG_FORM_TOLERANCE * max || imag > BDG_FORM_TOLERANCE * max) {
          throw new IllegalStateException(
              "the Hamiltonian is not of particle-hole symmetric BdG form at Majoranas ("
                  + i
                  + ", "
                  + j
                  + "): symmetric part "
                  + sym
                  + ", imaginary part "
                  + imag);
        }
        double anti = 0.5 * (out.data[i * n + j] - out.data[j * n + i]);
        out.data[i * n + j] = anti;
        out.data[j * n + i] = -anti;
      }
    }
  }

  /** Adds −2i conj(W_pm) z W_qn to entry (m, n) for the two Majoranas of each site. */
  private static void accumulate(
      int p, int q, double zr, double zi, DMatrixRMaj re, DMatrixRMaj im) {
    int n = re.numCols;
    int sp = p / 2;
    int sq = q / 2;
    for (int mi = 0; mi < 2; mi++) {
      int m = 2 * sp + mi;
      // conj(W_pm) · z
      double cr = wRe(p, m) * zr + wIm(p, m) * zi;
      double ci = wRe(p, m) * zi - wIm(p, m) * zr;
      for (int ni = 0; ni < 2; ni++) {
        int col = 2 * sq + ni;
        double vr = cr * wRe(q, col) - ci * wIm(q, col);
        double vi = cr * wIm(q, col) + ci * wRe(q, col);
        // times −2i: (vr + i vi)(−2i) = 2 vi − 2i vr
        re.data[m * n + col] += 2.0 * vi;
        im.data[m * n + col] += -2.0 * vr;
      }
    }
  }

  /** Re W_{p m}: W = ½[[1, i], [1, −i]] within a site, zero across sites. */
  private static double wRe(int p, int m) {
    return p / 2 == m / 2 && m % 2 == 0 ? 0.5 : 0.0;
  }

  /** Im W_{p m}. */
  private static double wIm(int p, int m) {
    if (p / 2 != m / 2 || m % 2 == 0) {
      return 0.0;
    }
    return p % 2 == 0 ? 0.5 : -0.5;
  }
}
