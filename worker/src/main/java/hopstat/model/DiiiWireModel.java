package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.ChainLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;

/**
 * Time-reversal invariant spinful p-wave wire, class DIII, d = 1: a Kramers pair of Kitaev chains
 * (Kitaev, Phys.-Usp. 44, 131 (2001)) coupled by a spin–orbit hopping,
 *
 * <pre>
 *  H = Σ_{j,σ} [ −μ_j c†_{jσ} c_{jσ} − t (c†_{jσ} c_{j+1,σ} + h.c.) + Δ (c_{jσ} c_{j+1,σ} + h.c.) ]
 *    + Σ_j [ c†_{j+1} (iλ s_x) c_j + h.c. ]
 * </pre>
 *
 * (s = Pauli matrices on spin). Bloch form of the normal part (derived): ξ_k + 2λ sin k s_x with
 * ξ_k = −2t cos k − μ; each spin pairs with itself (equal-spin triplet).
 *
 * <p><b>Basis</b> (Nambu per spin, H = ½ Ψ† H_BdG Ψ): orbital 0 = c_↑, 1 = c†_↑, 2 = c_↓, 3 = c†_↓;
 * matrix index 4j + orbital. Each spin's BdG entries are those of {@link PWaveWireModel}; the
 * spin–orbit term has H_BdG entries (j+1 ↑p, j ↓p) = (j+1 ↓p, j ↑p) = iλ and, for holes, −(iλ)* =
 * iλ at (j+1 ↑h, j ↓h), (j+1 ↓h, j ↑h) (derived: hole block −h*).
 *
 * <p><b>Symmetries</b> (local 4 × 4 matrices, spin ⊗ Nambu): time reversal T = (i s_y ⊗ 1) K, i.e.
 * T c_↑ T⁻¹ = c_↓, T c_↓ T⁻¹ = −c_↑, T² = −1; particle–hole C = (1 ⊗ τ_x) K, C² = +1; chiral S = T
 * C = i s_y ⊗ τ_x. T invariance of the pairing needs Δ_↓ = Δ_↑*, so real Δ pairs both spins alike
 * (derived); any hopping c†_{j+1} M c_j is T-invariant iff s_y M* s_y = M, which holds for iλ s_x
 * (derived). The spin–orbit term mixes the spins, so S_z is conserved only at λ = 0. (A unitary s_x
 * symmetry remains: each s_x sector is a class-D Kitaev chain with complex hopping −t ± iλ,
 * exchanged by T; the DIII invariant does not use it.)
 *
 * <p><b>Phases</b> (derived from the Bloch form): E(k) = ±2λ sin k ± √(ξ_k² + 4Δ² sin²k), so for
 * |λ| &lt; |Δ| the E = 0 gap closes only at μ = ±2t and the wire is DIII-topological (a Kramers
 * pair of Majorana zero modes at each end) iff |μ| &lt; 2|t|, Δ ≠ 0, as for λ = 0 (Kitaev 2001);
 * for |λ| &gt; |Δ| and |μ| &lt; 2|t| the E = 0 gap is closed (the spin–orbit tilt moves bands
 * through zero).
 *
 * <p>Onsite potentials ({@code onsite-box}, {@code onsite-gauss}) are spin-independent
 * chemical-potential shifts μ_j → μ_j + V: they keep T and C (class DIII). {@code onsite-box} with
 * {@code orbitals = independent} would put a draw on single Nambu orbitals, breaking T and C; the
 * symmetry check rejects it. {@code zeeman-box} ({@link ZeemanCoupling}) breaks T and keeps C
 * (class D); {@code pairing-box} shifts Δ on both spins alike (keeps DIII).
 */
public final class DiiiWireModel implements Model, MajoranaForm, PairingChain, ZeemanCoupling {

  public static final String NAME = "diii-wire";

  /** T = (i s_y ⊗ 1) K in the orbital order (↑p, ↑h, ↓p, ↓h). */
  private static final SymmetryOperator TIME_REVERSAL =
      SymmetryOperator.local(
          Symmetry.TIME_REVERSAL,
          new double[][] {{0, 0, 1, 0}, {0, 0, 0, 1}, {-1, 0, 0, 0}, {0, -1, 0, 0}},
          new double[4][4]);

  /** C = (1 ⊗ τ_x) K. */
  private static final SymmetryOperator PARTICLE_HOLE =
      SymmetryOperator.local(
          Symmetry.PARTICLE_HOLE,
          new double[][] {{0, 1, 0, 0}, {1, 0, 0, 0}, {0, 0, 0, 1}, {0, 0, 1, 0}},
          new double[4][4]);

  /** S = T C = i s_y ⊗ τ_x (unitary; S² = −1, S H S† = −H). */
  private static final SymmetryOperator CHIRAL =
      SymmetryOperator.local(
          Symmetry.CHIRAL,
          new double[][] {{0, 0, 0, 1}, {0, 0, 1, 0}, {0, -1, 0, 0}, {-1, 0, 0, 0}},
          new double[4][4]);

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "time-reversal invariant spinful p-wave wire, class DIII: a Kramers pair of Kitaev chains (Kitaev, Phys.-Usp. 44,"
        + " 131 (2001)) H = sum_{j,s} [-mu_j n_js - t(c+_js c_j+1,s + h.c.) + delta(c_js c_j+1,s + h.c.)]"
        + " + sum_j [c+_j+1 (i lambda s_x) c_j + h.c.]; orbitals (c_up, c+_up, c_dn, c+_dn) per site; T = i s_y K,"
        + " C = tau_x K, S = TC. Clean: Kramers pairs of Majorana end modes iff |mu| < 2|t| (for |lambda| < |delta|)."
        + " Onsite disorder shifts mu on both spins (keeps DIII); zeeman-box breaks T (class D).";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return SymmetryClass.DIII;
  }

  @Override
  public int dimension() {
    return 1;
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo(
            "mu", null, "chemical potential mu (energy unit), enters as -mu (n_up + n_dn)"),
        new ParameterInfo(
            "t", 1.0, "nearest-neighbour hopping t (energy unit), enters as -t c+_j,s c_j+1,s"),
        new ParameterInfo(
            "delta",
            1.0,
            "equal-spin p-wave pairing delta (energy unit), +delta c_j,s c_j+1,s for both spins"),
        new ParameterInfo(
            "lambda",
            0.0,
            "spin-orbit hopping lambda (energy unit): c+_j+1 (i lambda s_x) c_j + h.c.;"
                + " breaks S_z conservation, keeps T"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return ChainLattices.chain(linearSize, 4, boundary);
  }

  @Override
  public SymmetryOperators symmetryOperators() {
    return lattice -> List.of(TIME_REVERSAL, PARTICLE_HOLE, CHIRAL);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    double mu = parameters.get("mu");
    double t = parameters.get("t");
    double delta = parameters.get("delta");
    double lambda = parameters.get("lambda");
    for (int j = 0; j < lattice.sites(); j++) {
      addOnsitePotential(lattice, j, mu, out);
    }
    for (int bond = 0; bond < bondCount(lattice); bond++) {
      int j = bond;
      int k = (bond + 1) % lattice.sites();
      for (int spin = 0; spin < 2; spin++) {
        int o = 2 * spin;
        out.addHopping(4 * j + o, 4 * k + o, -t, 0.0);
        out.addHopping(4 * j + o + 1, 4 * k + o + 1, t, 0.0);
      }
      addPairingShift(lattice, bond, delta, out);
      if (lambda != 0.0) {
        // c+_{k} (i lambda s_x) c_j: particles iλ, holes −(iλ)* = iλ
        out.addHopping(4 * k, 4 * j + 2, 0.0, lambda);
        out.addHopping(4 * k + 2, 4 * j, 0.0, lambda);
        out.addHopping(4 * k + 1, 4 * j + 3, 0.0, lambda);
        out.addHopping(4 * k + 3, 4 * j + 1, 0.0, lambda);
      }
    }
  }

  @Override
  public int bondCount(Lattice lattice) {
    return lattice.boundary() == Boundary.PERIODIC ? lattice.sites() : lattice.sites() - 1;
  }

  /**
   * Δ_j → Δ_j + δ on both spins (real δ keeps T: Δ_↓ = Δ_↑*). Entries as in {@link PWaveWireModel}.
   */
  @Override
  public void addPairingShift(Lattice lattice, int bond, double delta, HamiltonianBuilder out) {
    int j = bond;
    int k = (bond + 1) % lattice.sites();
    for (int spin = 0; spin < 2; spin++) {
      int o = 2 * spin;
      out.addHopping(4 * k + o, 4 * j + o + 1, delta, 0.0);
      out.addHopping(4 * j + o, 4 * k + o + 1, -delta, 0.0);
    }
  }

  /** μ_site → μ_site + value on both spins (a spin-independent chemical-potential shift). */
  @Override
  public void addOnsitePotential(Lattice lattice, int site, double value, HamiltonianBuilder out) {
    out.addOnsite(4 * site, -value);
    out.addOnsite(4 * site + 1, value);
    out.addOnsite(4 * site + 2, -value);
    out.addOnsite(4 * site + 3, value);
  }

  /** h (n_↑ − n_↓): particles +h (↑), −h (↓); holes the opposite. */
  @Override
  public void addZeemanField(Lattice lattice, int site, double field, HamiltonianBuilder out) {
    out.addOnsite(4 * site, field);
    out.addOnsite(4 * site + 1, -field);
    out.addOnsite(4 * site + 2, -field);
    out.addOnsite(4 * site + 3, field);
  }
}
