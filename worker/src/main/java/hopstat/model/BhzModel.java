package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;
import java.util.Optional;

/**
 * Bernevig–Hughes–Zhang quantum spin Hall model on the square lattice (Bernevig, Hughes, Zhang,
 * Science 314, 1757 (2006)), class AII, four orbitals per site: 0 = (↑, a), 1 = (↑, b), 2 = (↓, a),
 * 3 = (↓, b); σ acts on (a, b), s on spin. Bloch form
 *
 * <pre>  H(k) = diag(h(k), h*(−k)) + R (s_x sin ky − s_y sin kx) ⊗ 1_σ,
 *  h(k) = A sin kx σx + A sin ky σy + [M − 2B (2 − cos kx − cos ky)] σz.</pre>
 *
 * Real space (derived as for {@link QwzModel}): spin ↑ hops r → r + x with T_x = B σz + (iA/2) σx,
 * r → r + y with T_y = B σz + (iA/2) σy, onsite (M − 4B) σz; spin ↓ uses the complex conjugates.
 * The Rashba-like coupling R (parameter {@code rashba}) adds −(iR/2) s_y ⊗ 1 to T_x and (iR/2) s_x
 * ⊗ 1 to T_y; it is odd in k and odd under spin flip, so it keeps T = i s_y K (T² = −1) and breaks
 * S_z conservation (form common practice in quantum spin Hall model studies).
 *
 * <p>Each spin block is the QWZ model with m = M/(2B) − 2 after rescaling, so for R = 0 and A, B
 * &gt; 0: C_↑ = +1 for 0 &lt; M/B &lt; 4, −1 for 4 &lt; M/B &lt; 8, 0 outside [0, 8], C_↓ = −C_↑,
 * and Z2 is odd for 0 &lt; M/B &lt; 8, M/B ≠ 4 (mapping derived; QWZ sign convention). Half
 * filling: E_F = 0 (the spectrum is symmetric about 0 at R = 0).
 */
public final class BhzModel implements Model {

  public static final String NAME = "bhz";

  private static final SymmetryOperator TIME_REVERSAL =
      SymmetryOperator.local(
          Symmetry.TIME_REVERSAL,
          new double[][] {{0, 0, 1, 0}, {0, 0, 0, 1}, {-1, 0, 0, 0}, {0, -1, 0, 0}},
          new double[4][4]);

  private static final SpinZOperator SPIN_Z = new SpinZOperator(new int[] {1, 1, -1, -1});

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Bernevig-Hughes-Zhang quantum spin Hall model (Science 314, 1757 (2006)) on the square lattice, class AII,"
        + " orbitals (up,a),(up,b),(dn,a),(dn,b): H(k) = diag(h(k), h*(-k)) + rashba (sx sin ky - sy sin kx),"
        + " h(k) = A sin kx sx + A sin ky sy + [M - 2B(2 - cos kx - cos ky)] sz; T = i sy K;"
        + " Z2 odd for 0 < M/B < 8, M/B != 4 (rashba = 0).";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return SymmetryClass.AII;
  }

  @Override
  public int dimension() {
    return 2;
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo("A", 1.0, "spin-orbit (linear-in-k) amplitude A (energy)"),
        new ParameterInfo("B", 1.0, "band curvature B (energy unit)"),
        new ParameterInfo("M", null, "mass M (energy); Z2 odd for 0 < M/B < 8, M/B != 4"),
        new ParameterInfo(
            "rashba",
            0.0,
            "T-preserving spin-mixing amplitude R of R (sx sin ky - sy sin kx) (energy)"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return Lattice.square(linearSize, 4, boundary);
  }

  @Override
  public SymmetryOperators symmetryOperators() {
    return lattice -> List.of(TIME_REVERSAL);
  }

  @Override
  public Optional<SpinZOperator> spinZ() {
    return Optional.of(SPIN_Z);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    double a = parameters.get("A");
    double b = parameters.get("B");
    double m = parameters.get("M");
    double r = parameters.get("rashba");
    int size = lattice.linearSize();
    boolean periodic = lattice.boundary() == Boundary.PERIODIC;
    // Hopping matrices T[row][col] (re, im) for r → r + x and r → r + y, 4 × 4.
    double[][] txRe = new double[4][4];
    double[][] txIm = new double[4][4];
    double[][] tyRe = new double[4][4];
    double[][] tyIm = new double[4][4];
    for (int spin = 0; spin < 2; spin++) {
      int o = 2 * spin;
      double conj = spin == 0 ? 1.0 : -1.0;
      txRe[o][o] = b;
      txRe[o + 1][o + 1] = -b;
      tyRe[o][o] = b;
      tyRe[o + 1][o + 1] = -b;
      // (iA/2) σx = [[0, iA/2], [iA/2, 0]], conjugated for spin ↓
      txIm[o][o + 1] = conj * 0.5 * a;
      txIm[o + 1][o] = conj * 0.5 * a;
      // (iA/2) σy = [[0, A/2], [−A/2, 0]], real, equal for both spins
      tyRe[o][o + 1] = 0.5 * a;
      tyRe[o + 1][o] = -0.5 * a;
    }
    for (int orb = 0; orb < 2; orb++) {
      // −(iR/2) s_y = [[0, −R/2], [R/2, 0]] in spin space
      txRe[orb][orb + 2] = -0.5 * r;
      txRe[orb + 2][orb] = 0.5 * r;
      // (iR/2) s_x = [[0, iR/2], [iR/2, 0]]
      tyIm[orb][orb + 2] = 0.5 * r;
      tyIm[orb + 2][orb] = 0.5 * r;
    }
    double onsite = m - 4.0 * b;
    for (int y = 0; y < size; y++) {
      for (int x = 0; x < size; x++) {
        int s = x + size * y;
        out.addOnsite(4 * s, onsite);
        out.addOnsite(4 * s + 1, -onsite);
        out.addOnsite(4 * s + 2, onsite);
        out.addOnsite(4 * s + 3, -onsite);
        if (x + 1 < size || (periodic && size > 1)) {
          addBond(out, s, (x + 1) % size + size * y, txRe, txIm);
        }
        if (y + 1 < size || (periodic && size > 1)) {
          addBond(out, s, x + size * ((y + 1) % size), tyRe, tyIm);
        }
      }
    }
  }

  /** Adds c†_to T c_from + h.c. for a 4 × 4 hopping matrix T. */
  private static void addBond(
      HamiltonianBuilder out, int from, int to, double[][] re, double[][] im) {
    for (int i = 0; i < 4; i++) {
      for (int j = 0; j < 4; j++) {
        if (re[i][j] != 0.0 || im[i][j] != 0.0) {
          out.addHopping(4 * to + i, 4 * from + j, re[i][j], im[i][j]);
        }
      }
    }
  }
}
