package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.ChainLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;

/**
 * A zero-dimensional cluster of L fermion modes = 2L Majoranas (class D), H = (i/4) Σ A_{mn} γ_m
 * γ_n in the {@link MajoranaForm} convention. The clean part is a uniform chemical potential, H_0 =
 * −μ Σ_s c†_s c_s (A_{a_s b_s} = −μ); the random real antisymmetric part comes from the {@code
 * majorana-gauss} disorder (A_{mn} += W g_{mn}, g standard normal, all m &lt; n), the class-D
 * random-matrix ensemble (Altland &amp; Zirnbauer, PRB 55, 1142 (1997)). Observable: {@code parity}
 * = ground-state fermion parity from sign Pf(A). The spec's L is the number of fermion modes; the
 * boundary is ignored (nothing to close).
 */
public final class MajoranaClusterModel implements Model, MajoranaForm {

  public static final String NAME = "majorana-cluster";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "zero-dimensional cluster of L fermions = 2L Majoranas, H = (i/4) sum A_mn g_m g_n (class D);"
        + " clean part -mu sum c+c, random real antisymmetric part from disorder majorana-gauss (A_mn += W g, g ~ N(0,1), m < n)."
        + " Observable parity = ground-state fermion parity (sign Pf(A) = +1 even).";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return SymmetryClass.D;
  }

  @Override
  public int dimension() {
    return 0;
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo(
            "mu", 0.0, "uniform chemical potential mu (energy unit), enters as -mu c+c"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return ChainLattices.cluster(linearSize, linearSize, 2);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    double mu = parameters.get("mu");
    if (mu == 0.0) {
      return;
    }
    for (int s = 0; s < lattice.sites(); s++) {
      addOnsitePotential(lattice, s, mu, out);
    }
  }

  /** μ_site → μ_site + value (a chemical-potential shift, as for {@link PWaveWireModel}). */
  @Override
  public void addOnsitePotential(Lattice lattice, int site, double value, HamiltonianBuilder out) {
    out.addOnsite(2 * site, -value);
    out.addOnsite(2 * site + 1, value);
  }
}
