package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;

/**
 * Spinless chiral p + ip superconductor on the square lattice in Bogoliubov–de Gennes form (class
 * D; Read &amp; Green, PRB 61, 10267 (2000) for the continuum model). Nambu basis (c_r, c†_r):
 * orbital 0 = particle, orbital 1 = hole, τ the Pauli matrices on it. Bloch form
 *
 * <pre>  H(k) = [−2t (cos kx + cos ky) − μ] τz + Δ (sin kx τx + sin ky τy).</pre>
 *
 * Real space: onsite −μ τz; hop r → r + x with T_x = −t τz + (iΔ/2) τx, r → r + y with T_y = −t τz
 * + (iΔ/2) τy (derived as for {@link QwzModel}). Particle–hole symmetry C = τx K, C² = +1.
 *
 * <p>Clean Chern number of the negative-energy BdG bands (E_F = 0), derived: H(k) = R_z d_QWZ(k)·τ
 * up to positive rescaling of the x, y components, with R_z = diag(1, 1, −1) and QWZ mass m =
 * μ/(2t); the mirror R_z reverses the orientation, so C = −C_QWZ(μ/2t): for t, Δ &gt; 0, C = +1 for
 * 0 &lt; μ &lt; 4t, C = −1 for −4t &lt; μ &lt; 0, C = 0 for |μ| &gt; 4t (sign convention of {@link
 * QwzModel}, checked by a test). An onsite potential V enters as a chemical-potential shift, +V on
 * particles and −V on holes.
 */
public final class PipSquareModel implements Model {

  public static final String NAME = "pip-square";

  private static final SymmetryOperator PARTICLE_HOLE =
      SymmetryOperator.local(
          Symmetry.PARTICLE_HOLE, new double[][] {{0, 1}, {1, 0}}, new double[][] {{0, 0}, {0, 0}});

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "spinless chiral p+ip superconductor, BdG on the square lattice (class D), Nambu (c, c+):"
        + " H(k) = [-2t(cos kx + cos ky) - mu] tz + delta (sin kx tx + sin ky ty); C = tx K;"
        + " C = +1 for 0<mu<4t, -1 for -4t<mu<0, 0 for |mu|>4t (t, delta > 0; qwz sign convention);"
        + " onsite potential V shifts mu (+V particles, -V holes).";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return SymmetryClass.D;
  }

  @Override
  public int dimension() {
    return 2;
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo("mu", null, "chemical potential mu (energy)"),
        new ParameterInfo("t", 1.0, "nearest-neighbour hopping t (energy unit)"),
        new ParameterInfo("delta", 1.0, "p-wave pairing amplitude delta (energy)"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return Lattice.square(linearSize, 2, boundary);
  }

  @Override
  public SymmetryOperators symmetryOperators() {
    return lattice -> List.of(PARTICLE_HOLE);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    double mu = parameters.get("mu");
    double t = parameters.get("t");
    double delta = parameters.get("delta");
    int size = lattice.linearSize();
    boolean periodic = lattice.boundary() == Boundary.PERIODIC;
    for (int y = 0; y < size; y++) {
      for (int x = 0; x < size; x++) {
        int s = x + size * y;
        out.addOnsite(2 * s, -mu);
        out.addOnsite(2 * s + 1, mu);
        if (x + 1 < size || (periodic && size > 1)) {
          addBond(out, s, (x + 1) % size + size * y, t, delta, true);
        }
        if (y + 1 < size || (periodic && size > 1)) {
          addBond(out, s, x + size * ((y + 1) % size), t, delta, false);
        }
      }
    }
  }

  /**
   * Adds c†_to T c_from + h.c. with T = −t τz + (iΔ/2) τ, τ = τx or τy. iτx = [[0, i], [i, 0]], iτy
   * = [[0, 1], [−1, 0]].
   */
  private static void addBond(
      HamiltonianBuilder out, int from, int to, double t, double delta, boolean alongX) {
    double h = 0.5 * delta;
    out.addHopping(2 * to, 2 * from, -t, 0.0);
    out.addHopping(2 * to + 1, 2 * from + 1, t, 0.0);
    if (alongX) {
      out.addHopping(2 * to, 2 * from + 1, 0.0, h);
      out.addHopping(2 * to + 1, 2 * from, 0.0, h);
    } else {
      out.addHopping(2 * to, 2 * from + 1, h, 0.0);
      out.addHopping(2 * to + 1, 2 * from, -h, 0.0);
    }
  }

  /** A potential V shifts the chemical potential: +V on the particle, −V on the hole orbital. */
  @Override
  public void addOnsitePotential(Lattice lattice, int site, double value, HamiltonianBuilder out) {
    out.addOnsite(2 * site, value);
    out.addOnsite(2 * site + 1, -value);
  }
}
