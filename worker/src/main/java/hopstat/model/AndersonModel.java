package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.CubicLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;

/**
 * The Anderson model on the hypercubic lattice L^d (Anderson, Phys. Rev. 109, 1492 (1958)),
 *
 * <pre>
 *   H = Σ_i ε_i c†_i c_i − t Σ_⟨ij⟩ (c†_i c_j + h.c.),
 * </pre>
 *
 * one orbital per site, unit spacing, nearest-neighbour hopping −t (clean band E(k) = −2t Σ_a cos
 * k_a, width 4dt). The clean Hamiltonian has ε_i = 0; the random potential comes from a disorder
 * term, usually {@code onsite-box} (ε_i = W·u_i, u_i uniform in [−1/2, 1/2)). Real and
 * time-reversal invariant: class AI.
 *
 * <p>The dimension is fixed per registered model ({@code anderson-1d}, {@code anderson-2d}, {@code
 * anderson-3d}) rather than read from a parameter, because {@link Model#dimension()} and {@link
 * Model#lattice} take no parameters and observables decide applicability from the model's
 * dimension.
 *
 * <p>Periodic boundaries follow {@link CubicLattices#forEachBond}: no wrap-around bond for L ≤ 2.
 * Implements {@link SliceHamiltonian}: slices are stacked along the last direction, T = −t·1.
 */
public final class AndersonModel implements Model, SliceHamiltonian {

  /**
   * Spec name prefix; the registered names are {@code anderson-1d}, {@code anderson-2d}, {@code
   * anderson-3d}.
   */
  public static final String NAME_PREFIX = "anderson-";

  private final int dimension;

  /**
   * @param dimension d = 1, 2 or 3
   */
  public AndersonModel(int dimension) {
    if (dimension < 1 || dimension > 3) {
      throw new IllegalArgumentException(
          "Anderson model dimension must be 1, 2 or 3: " + dimension);
    }
    this.dimension = dimension;
  }

  @Override
  public String name() {
    return NAME_PREFIX + dimension + "d";
  }

  @Override
  public String description() {
    return "Anderson model on the "
        + dimension
        + "D hypercubic lattice (Anderson, Phys. Rev. 109, 1492 (1958)):"
        + " H = sum_i eps_i n_i - t sum_<ij> (c_i^+ c_j + h.c.), one orbital per site, clean band [-"
        + (2 * dimension)
        + "t, "
        + (2 * dimension)
        + "t]; add the random potential with disorder 'onsite-box' (eps = W u, u in [-1/2, 1/2))."
        + " Class AI. Supports the transfer-matrix observable 'lyapunov' (slices along the last direction).";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return SymmetryClass.AI;
  }

  @Override
  public int dimension() {
    return dimension;
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo(
            "t",
            1.0,
            "nearest-neighbour hopping t (energy unit); the hopping matrix element is -t"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return CubicLattices.hypercubic(dimension, linearSize, 1, boundary);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    addHoppings(dimension, lattice.linearSize(), lattice.boundary(), parameters.get("t"), out);
  }

  @Override
  public Lattice sliceLattice(int crossSection, Boundary transverse) {
    if (dimension == 1) {
      return CubicLattices.hypercubic(1, 1, 1, transverse);
    }
    return CubicLattices.hypercubic(dimension - 1, crossSection, 1, transverse);
  }

  @Override
  public void addCleanSlice(ParameterValues parameters, Lattice slice, HamiltonianBuilder out) {
    addHoppings(dimension - 1, slice.linearSize(), slice.boundary(), parameters.get("t"), out);
  }

  @Override
  public void interSliceHopping(ParameterValues parameters, Lattice slice, double[] out) {
    int k = slice.orbitals();
    double t = parameters.get("t");
    for (int i = 0; i < k * k; i++) {
      out[i] = 0.0;
    }
    for (int i = 0; i < k; i++) {
      out[i * k + i] = -t;
    }
  }

  private static void addHoppings(
      int dimension, int linearSize, Boundary boundary, double t, HamiltonianBuilder out) {
    CubicLattices.forEachBond(
        dimension,
        linearSize,
        boundary,
        (from, to, direction) -> out.addHopping(from, to, -t, 0.0));
  }
}
