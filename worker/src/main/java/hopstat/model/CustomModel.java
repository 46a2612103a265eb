package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.CubicLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.ArrayList;
import java.util.List;

/**
 * The {@code custom} model: a tight-binding (or BdG) Hamiltonian written by the user in the job
 * spec, see {@link CustomModelDefinition} for the conventions. Terms are added cell by cell in cell
 * order; per cell the onsite energies in list order, then the hoppings, then the pairings in list
 * order. In Nambu form (pairings present) the particle block is h, the hole block −h^T and the
 * pairing block D with D_ij = Δ, D_ji = −Δ for Δ c†_i c†_j (H = ½ Ψ† H_BdG Ψ, Ψ = (c, c†)); an
 * onsite potential enters as +V on particles and −V on holes. Immutable and thread-safe.
 */
public final class CustomModel implements Model {

  /** The spec name of user-defined models. */
  public static final String NAME = "custom";

  private final CustomModelDefinition definition;

  public CustomModel(CustomModelDefinition definition) {
    this.definition = java.util.Objects.requireNonNull(definition, "definition");
  }

  /** The definition this model was built from. */
  public CustomModelDefinition definition() {
    return definition;
  }

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "user-defined lattice model from the spec's \"lattice\" block: "
        + definition.orbitals().size()
        + " orbital(s) per cell, d = "
        + definition.dimension()
        + (definition.isBdg() ? ", BdG (Nambu form)" : "")
        + ", declared class "
        + definition.symmetryClass()
        + ".";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return definition.symmetryClass();
  }

  @Override
  public int dimension() {
    return definition.dimension();
  }

  /** Every parameter an amplitude names, required (no defaults). */
  @Override
  public List<ParameterInfo> parameters() {
    List<ParameterInfo> list = new ArrayList<>();
    for (String name : definition.parameterNames()) {
      list.add(new ParameterInfo(name, null, "read by the custom lattice model"));
    }
    return list;
  }

  /**
   * The L^d grid of cells (cell coordinates, extent L) with each orbital at its declared position:
   * {@link Lattice#orbitalPosition} = cell coordinate + the orbital's fractional position, so the
   * position operators of the Bott index and the Chern markers see the intra-cell geometry. In
   * Nambu form the hole copy of orbital k sits where orbital k sits. An orbital without a position
   * sits at the cell origin.
   */
  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    Lattice cells =
        CubicLattices.hypercubic(
            definition.dimension(), linearSize, definition.orbitalsPerCell(), boundary);
    int d = definition.dimension();
    int n = definition.orbitals().size();
    int o = definition.orbitalsPerCell();
    double[][] offsets = new double[d][o];
    for (int k = 0; k < o; k++) {
      List<Double> position = definition.orbitals().get(k % n).position();
      for (int axis = 0; axis < d && axis < position.size(); axis++) {
        offsets[axis][k] = position.get(axis);
      }
    }
    return cells.withOrbitalOffsets(offsets);
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    int o = definition.orbitalsPerCell();
    int n = definition.orbitals().size();
    boolean bdg = definition.isBdg();
    for (int cell = 0; cell < lattice.sites(); cell++) {
      for (CustomModelDefinition.Onsite e : definition.onsite()) {
        double v = e.value().re(parameters);
        out.addOnsite(cell * o + e.orbital(), v);
        if (bdg) {
          out.addOnsite(cell * o + n + e.orbital(), -v);
        }
      }
      for (CustomModelDefinition.Term t : definition.hoppings()) {
        int target = shift(lattice, cell, t.cell());
        if (target < 0) {
          continue;
        }
        double re = t.amplitude().re(parameters);
        double im = t.amplitude().im(parameters);
        out.addHopping(target * o + t.to(), cell * o + t.from(), re, im);
        if (bdg) {
          // hole block −h^T: entry (i', j') = −h_ji = −conj(h_ij)
          out.addHopping(target * o + n + t.to(), cell * o + n + t.from(), -re, im);
        }
      }
      for (CustomModelDefinition.Term t : definition.pairings()) {
        int target = shift(lattice, cell, t.cell());
        if (target < 0) {
          continue;
        }
        double re = t.amplitude().re(parameters);
        double im = t.amplitude().im(parameters);
        int i = target * o + t.to();
        int j = cell * o + t.from();
        // D_ij = Δ at (particle i, hole j), D_ji = −Δ at (particle j, hole i)
        out.addHopping(i, j + n, re, im);
        out.addHopping(j, i + n, -re, -im);
      }
    }
  }

  /** The cell r + R, or −1 when it lies outside an open sample; periodic samples wrap modulo L. */
  private static int shift(Lattice lattice, int cell, List<Integer> offset) {
    int size = lattice.linearSize();
    int rest = cell;
    int result = 0;
    int stride = 1;
    for (int d = 0; d < offset.size(); d++) {
      int c = rest % size + offset.get(d);
      rest /= size;
      if (lattice.boundary() == Boundary.PERIODIC) {
        c = Math.floorMod(c, size);
      } else if (c < 0 || c >= size) {
        return -1;
      }
      result += c * stride;
      stride *= size;
    }
    return result;
  }

  /**
   * In Nambu form, V on the particles and −V on the holes of the cell (a chemical-potential shift).
   */
  @Override
  public void addOnsitePotential(Lattice lattice, int site, double value, HamiltonianBuilder out) {
    if (!definition.isBdg()) {
      Model.super.addOnsitePotential(lattice, site, value, out);
      return;
    }
    int n = definition.orbitals().size();
    int base = site * lattice.orbitalsPerSite();
    for (int k = 0; k < n; k++) {
      out.addOnsite(base + k, value);
      out.addOnsite(base + n + k, -value);
    }
  }

  /**
   * In Nambu form, a draw for particle orbital k (k &lt; n) adds V to it and −V to its hole; a draw
   * for a hole orbital (k ≥ n) adds nothing (its value came with the particle), so C is kept.
   */
  @Override
  public void addOrbitalPotential(
      Lattice lattice, int site, int orbital, double value, HamiltonianBuilder out) {
    if (!definition.isBdg()) {
      Model.super.addOrbitalPotential(lattice, site, orbital, value, out);
      return;
    }
    int n = definition.orbitals().size();
    if (orbital < n) {
      int base = site * lattice.orbitalsPerSite();
      out.addOnsite(base + orbital, value);
      out.addOnsite(base + n + orbital, -value);
    }
  }

  /**
   * The declared operators; in Nambu form, when the class has C and none is declared, the
   * structural particle–hole operator C = τx K (swap particles and holes) is supplied.
   */
  @Override
  public SymmetryOperators symmetryOperators() {
    List<SymmetryOperator> ops = new ArrayList<>(definition.symmetries());
    if (definition.isBdg()
        && definition.symmetryClass().hasParticleHole()
        && ops.stream().noneMatch(op -> op.symmetry() == Symmetry.PARTICLE_HOLE)) {
      ops.add(nambuParticleHole(definition.orbitals().size()));
    }
    List<SymmetryOperator> fixed = List.copyOf(ops);
    return lattice -> fixed;
  }

  /** C = τx K on n particle and n hole orbitals. */
  static SymmetryOperator nambuParticleHole(int n) {
    double[][] re = new double[2 * n][2 * n];
    for (int k = 0; k < n; k++) {
      re[k][n + k] = 1.0;
      re[n + k][k] = 1.0;
    }
    return SymmetryOperator.local(Symmetry.PARTICLE_HOLE, re, new double[2 * n][2 * n]);
  }

  /**
   * True for a chain whose two orbitals per cell are the chiral sublattices, as the winding
   * observable assumes: d = 1, two orbitals, no pairings, and a declared S = diag(+1, −1).
   */
  public boolean isSublatticeChain() {
    if (definition.dimension() != 1 || definition.orbitalsPerCell() != 2) {
      return false;
    }
    for (SymmetryOperator op : definition.symmetries()) {
      if (op.symmetry() == Symmetry.CHIRAL) {
        double[] re = op.matrixRe();
        double[] im = op.matrixIm();
        return re[0] == 1.0
            && re[1] == 0.0
            && re[2] == 0.0
            && re[3] == -1.0
            && im[0] == 0.0
            && im[1] == 0.0
            && im[2] == 0.0
            && im[3] == 0.0;
      }
    }
    return false;
  }
}
