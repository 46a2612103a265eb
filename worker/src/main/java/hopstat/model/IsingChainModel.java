package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.ChainLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;

/**
 * Transverse-field Ising chain H = −Σ_j J_j σᶻ_j σᶻ_{j+1} − Σ_j h_j σˣ_j, solved as a Majorana
 * chain by the Jordan–Wigner map a_j = (Π_{k&lt;j} σˣ_k) σᶻ_j, b_j = (Π_{k&lt;j} σˣ_k) σʸ_j, which
 * gives σˣ_j = i a_j b_j and σᶻ_j σᶻ_{j+1} = i b_j a_{j+1} (derived), hence
 *
 * <pre>  H = (i/2) Σ_j [ −2 h_j a_j b_j − 2 J_j b_j a_{j+1} ],</pre>
 *
 * the p-wave wire with Δ = t = −J, μ = 2h (Pfeuty, Ann. Phys. 57, 79 (1970); Kitaev 2001). The
 * matrix is the fermionic BdG matrix in the {@link MajoranaForm} convention; its spectrum is ±ε_k,
 * ε_k = 2√(J² + h² − 2Jh cos k) for the clean chain. A periodic lattice closes the <i>fermion</i>
 * chain with the bond J_{L−1} b_{L−1} a_0 (periodic fermions); for the spin ring the fermion
 * boundary condition depends on the parity sector, which the Majorana number (z2) sidesteps: z2 = 1
 * (Q = −1) is the ordered phase, clean |h| &lt; |J|. Onsite potentials shift the field: value V
 * gives h_j → h_j + V. Real couplings: class BDI.
 */
public final class IsingChainModel implements Model, MajoranaForm, TransverseFieldChain {

  public static final String NAME = "ising-chain";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "transverse-field Ising chain H = -sum J_j sz_j sz_j+1 - sum h_j sx_j as a Majorana chain by Jordan-Wigner"
        + " (Pfeuty, Ann. Phys. 57, 79 (1970)): H = (i/2) sum [-2h_j a_j b_j - 2J_j b_j a_j+1], BdG Nambu (c, c+) per site,"
        + " periodic lattice = periodic fermions; ordered (z2 = 1) iff |h| < |J| clean. Onsite disorder shifts h_j. Class BDI.";
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
        new ParameterInfo("J", 1.0, "Ising coupling J (energy unit), enters as -J sz_j sz_j+1"),
        new ParameterInfo("h", null, "transverse field h (energy unit), enters as -h sx_j"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return ChainLattices.chain(linearSize, 2, boundary);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    double coupling = parameters.get("J");
    double field = parameters.get("h");
    for (int j = 0; j < lattice.sites(); j++) {
      addFieldShift(lattice, j, field, out);
    }
    for (int bond = 0; bond < bondCount(lattice); bond++) {
      addCouplingShift(lattice, bond, coupling, out);
    }
  }

  @Override
  public int bondCount(Lattice lattice) {
    return lattice.boundary() == Boundary.PERIODIC ? lattice.sites() : lattice.sites() - 1;
  }

  @Override
  public void addFieldShift(Lattice lattice, int site, double delta, HamiltonianBuilder out) {
    MajoranaOps.addCoupling(MajoranaOps.a(site), MajoranaOps.b(site), -2.0 * delta, out);
  }

  @Override
  public void addCouplingShift(Lattice lattice, int bond, double delta, HamiltonianBuilder out) {
    int next = (bond + 1) % lattice.sites();
    MajoranaOps.addCoupling(MajoranaOps.b(bond), MajoranaOps.a(next), -2.0 * delta, out);
  }

  /** h_site → h_site + value. */
  @Override
  public void addOnsitePotential(Lattice lattice, int site, double value, HamiltonianBuilder out) {
    addFieldShift(lattice, site, value, out);
  }
}
