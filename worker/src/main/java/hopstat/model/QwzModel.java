package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;

/**
 * The Qi–Wu–Zhang two-band Chern insulator on the square lattice (Qi, Wu, Zhang, PRB 74, 085308
 * (2006)), Bloch form H(k) = t [sin kx σx + sin ky σy + (m + cos kx + cos ky) σz].
 *
 * <p>Real space, with c_r = N^{−1/2} Σ_k e^{ik·r} c_k: H = Σ_r [ t·m c†_r σz c_r + (c†_{r+x} T_x
 * c_r + c†_{r+y} T_y c_r + h.c.) ] with T_x = t(σz + iσx)/2, T_y = t(σz + iσy)/2 (derived: T
 * e^{−ik} + T† e^{ik} = t(cos k σz + sin k σ)). Orbital 0 is the σz = +1 component. Clean Chern
 * number of the lower band: +1 for −2 &lt; m &lt; 0, −1 for 0 &lt; m &lt; 2, 0 for |m| &gt; 2
 * (sign: see REFERENCE conventions, checked in tests).
 */
public final class QwzModel implements Model {

  public static final String NAME = "qwz";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Qi-Wu-Zhang two-band Chern insulator on the square lattice (Qi, Wu, Zhang, PRB 74, 085308 (2006)):"
        + " H(k) = t[sin kx sx + sin ky sy + (m + cos kx + cos ky) sz]; C = +1 for -2<m<0, -1 for 0<m<2, 0 for |m|>2.";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return SymmetryClass.A;
  }

  /** Class A: no T, C or S to declare, so nothing is checked. */
  @Override
  public SymmetryOperators symmetryOperators() {
    return SymmetryOperators.NONE;
  }

  @Override
  public int dimension() {
    return 2;
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo("m", null, "mass m (dimensionless, in units of t)"),
        new ParameterInfo("t", 1.0, "hopping scale t (energy unit)"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return Lattice.square(linearSize, 2, boundary);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    double t = parameters.get("t");
    double m = parameters.get("m");
    int size = lattice.linearSize();
    boolean periodic = lattice.boundary() == Boundary.PERIODIC;
    for (int y = 0; y < size; y++) {
      for (int x = 0; x < size; x++) {
        int s = x + size * y;
        out.addOnsite(2 * s, t * m);
        out.addOnsite(2 * s + 1, -t * m);
        if (x + 1 < size || (periodic && size > 1)) {
          addBond(out, s, (x + 1) % size + size * y, t, 0.0, 1.0);
        }
        if (y + 1 < size || (periodic && size > 1)) {
          addBond(out, s, x + size * ((y + 1) % size), t, 1.0, 0.0);
        }
      }
    }
  }

  /**
   * Adds c†_to T c_from + h.c. with T = t(σz + i σ)/2 and σ = σx (sx = 1, sy = 0) or σy. σx =
   * [[0,1],[1,0]], σy = [[0,−i],[i,0]], so iσx = [[0,i],[i,0]], iσy = [[0,1],[−1,0]].
   */
  private static void addBond(
      HamiltonianBuilder out, int from, int to, double t, double sy, double sx) {
    double h = 0.5 * t;
    int a0 = 2 * to;
    int a1 = 2 * to + 1;
    int b0 = 2 * from;
    int b1 = 2 * from + 1;
    out.addHopping(a0, b0, h, 0.0);
    out.addHopping(a1, b1, -h, 0.0);
    // off-diagonal of i σ: sx·(i, i) + sy·(1, −1)
    out.addHopping(a0, b1, h * sy, h * sx);
    out.addHopping(a1, b0, -h * sy, h * sx);
  }
}
