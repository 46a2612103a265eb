package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;
import java.util.Optional;

/**
 * A lattice model: geometry, clean Hamiltonian and how an onsite potential couples to it.
 * Implementations are stateless and thread-safe.
 */
public interface Model {

  /** Name used in the job spec's {@code model} field. */
  String name();

  /** One-paragraph description with the Hamiltonian's convention and its source. */
  String description();

  /** Altland–Zirnbauer class of the clean model. */
  SymmetryClass symmetryClass();

  /** Spatial dimension d. */
  int dimension();

  /** The parameters the model reads, with defaults. */
  List<ParameterInfo> parameters();

  /** The finite sample of linear size L. */
  Lattice lattice(int linearSize, Boundary boundary);

  /**
   * Adds the clean Hamiltonian's terms.
   *
   * @param parameters read, not modified
   * @param lattice read, not modified (from {@link #lattice})
   * @param out terms are appended; must have been reset to {@code lattice.orbitals()}
   */
  void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out);

  /**
   * Adds an onsite potential V on site {@code site}. Default: V on every orbital of the site (a
   * scalar potential). BdG models override this so that V enters as a chemical-potential shift (+V
   * on particles, −V on holes).
   */
  default void addOnsitePotential(Lattice lattice, int site, double value, HamiltonianBuilder out) {
    int base = site * lattice.orbitalsPerSite();
    for (int o = 0; o < lattice.orbitalsPerSite(); o++) {
      out.addOnsite(base + o, value);
    }
  }

  /** Adds V on one orbital of one site (for independent-per-orbital disorder). */
  default void addOrbitalPotential(
      Lattice lattice, int site, int orbital, double value, HamiltonianBuilder out) {
    out.addOnsite(site * lattice.orbitalsPerSite() + orbital, value);
  }

  /**
   * The T, C, S operators this model declares on its samples, for the numerical symmetry checks
   * ({@link SymmetryCheckKernel}). Default: none declared, so nothing is checked.
   */
  default SymmetryOperators symmetryOperators() {
    return SymmetryOperators.NONE;
  }

  /**
   * The model's S_z operator, if it has a spin degree of freedom with a diagonal S_z in its orbital
   * basis (used by spin-resolved invariants). Default: none.
   */
  default Optional<SpinZOperator> spinZ() {
    return Optional.empty();
  }

  /**
   * Why these parameters cannot be used with this sample size and boundary (e.g. a magnetic unit
   * cell that does not fit the torus), or empty if they can. Called by spec validation after
   * defaults are applied; a reason is reported as bad input. Default: always valid.
   *
   * @param parameters read: the resolved parameters of one grid point
   * @param linearSize L
   * @param boundary boundary condition
   */
  default Optional<String> whyNotValid(
      ParameterValues parameters, int linearSize, Boundary boundary) {
    return Optional.empty();
  }
}
