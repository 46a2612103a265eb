package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.ChainLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;

/**
 * Spinless p-wave wire (Kitaev, Phys.-Usp. 44, 131 (2001)):
 *
 * <pre>  H = Σ_j [ −μ_j c†_j c_j − t (c†_j c_{j+1} + h.c.) + Δ (c_j c_{j+1} + h.c.) ]</pre>
 *
 * in Nambu-per-site BdG form (orbital 0 = c_j, orbital 1 = c†_j, H = ½ Ψ† H_BdG Ψ, see {@link
 * MajoranaForm}). H_BdG entries: (j p, j p) = −μ, (j h, j h) = +μ, (j p, j+1 p) = −t, (j h, j+1 h)
 * = +t, (j+1 p, j h) = +Δ, (j p, j+1 h) = −Δ (derived from ½ Σ Δ̂_{ik} c†_i c†_k + h.c. with
 * Δ̂_{j+1,j} = −Δ̂_{j,j+1} = Δ). Majorana form (derived, REFERENCE): H = (i/2) Σ_j [−μ_j a_j b_j +
 * (Δ − t) a_j b_{j+1} + (Δ + t) b_j a_{j+1}].
 *
 * <p>Real parameters: class BDI (T = complex conjugation). Clean phase: topological iff |μ| &lt;
 * 2|t| and Δ ≠ 0 (Kitaev 2001). Onsite potentials ({@code onsite-box}, {@code onsite-gauss}) are
 * <b>chemical-potential shifts</b> for this model: a value V makes μ_j → μ_j + V (−V on the
 * particle diagonal, +V on the hole diagonal), so {@code onsite-box} gives μ_j = mu + W u_j.
 */
public final class PWaveWireModel implements Model, MajoranaForm, PairingChain {

  public static final String NAME = "pwave-wire";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "spinless p-wave wire (Kitaev, Phys.-Usp. 44, 131 (2001)): H = sum_j [-mu_j c+_j c_j - t(c+_j c_j+1 + h.c.)"
        + " + delta(c_j c_j+1 + h.c.)], BdG with Nambu (c, c+) per site; class BDI (real). Clean: topological iff"
        + " |mu| < 2|t|, delta != 0. Onsite disorder shifts the chemical potential: onsite-box gives mu_j = mu + W u_j.";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return SymmetryClass.BDI;
  }

  @Override
  public int dimension() {
    return 1;
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo("mu", null, "chemical potential mu (energy unit), enters as -mu c+c"),
        new ParameterInfo(
            "t", 1.0, "nearest-neighbour hopping t (energy unit), enters as -t c+_j c_j+1"),
        new ParameterInfo(
            "delta",
            1.0,
            "p-wave pairing delta (energy unit), enters as +delta c_j c_j+1; default 1 = default t"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return ChainLattices.chain(linearSize, 2, boundary);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    double mu = parameters.get("mu");
    double t = parameters.get("t");
    double delta = parameters.get("delta");
    for (int j = 0; j < lattice.sites(); j++) {
      addOnsitePotential(lattice, j, mu, out);
    }
    for (int bond = 0; bond < bondCount(lattice); bond++) {
      int j = bond;
      int k = (bond + 1) % lattice.sites();
      out.addHopping(2 * j, 2 * k, -t, 0.0);
      out.addHopping(2 * j + 1, 2 * k + 1, t, 0.0);
      addPairingShift(lattice, bond, delta, out);
    }
  }

  @Override
  public int bondCount(Lattice lattice) {
    return lattice.boundary() == Boundary.PERIODIC ? lattice.sites() : lattice.sites() - 1;
  }

  @Override
  public void addPairingShift(Lattice lattice, int bond, double delta, HamiltonianBuilder out) {
    int j = bond;
    int k = (bond + 1) % lattice.sites();
    out.addHopping(2 * k, 2 * j + 1, delta, 0.0);
    out.addHopping(2 * j, 2 * k + 1, -delta, 0.0);
  }

  /** μ_site → μ_site + value (see the class comment: a chemical-potential shift). */
  @Override
  public void addOnsitePotential(Lattice lattice, int site, double value, HamiltonianBuilder out) {
    out.addOnsite(2 * site, -value);
    out.addOnsite(2 * site + 1, value);
  }
}
