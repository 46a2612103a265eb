package hopstat.model;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * A user-defined tight-binding model, as written in a job spec's {@code "lattice"} block (with
 * {@code "model": "custom"}); {@link CustomModel} turns it into a {@link Model}. Immutable; the
 * compact constructors check structure (indices in range, offsets of length d). User-facing
 * validation with field paths happens in the spec parser, before this record is built.
 *
 * <p>Conventions: the sample is the L^d grid of unit cells, cell index x + L·y + L²·z; matrix index
 * = cell·o + orbital with o = n (normal) or 2n (Nambu form, when {@code pairings} is non-empty:
 * orbitals 0..n−1 are particles, n..2n−1 the holes of the same orbitals). A hopping {@code (R, a →
 * b, t)} adds t c†_{b, r+R} c_{a, r} + h.c. for every cell r; a pairing {@code (R, a, b, Δ)} adds Δ
 * c†_{b, r+R} c†_{a, r} + h.c. Cells outside an open sample are dropped; a periodic sample wraps
 * offsets modulo L.
 *
 * @param dimension d = 1..3
 * @param vectors d lattice vectors of length d (recorded; observables use cell (fractional)
 *     coordinates)
 * @param orbitals the orbitals of one cell, in matrix order
 * @param onsite onsite energies (real per orbital)
 * @param hoppings hopping terms, each standing for itself plus its Hermitian conjugate
 * @param pairings BdG pairing terms; empty for a normal (non-superconducting) model
 * @param symmetryClass the declared Altland–Zirnbauer class
 * @param symmetries declared T, C, S operators on the o orbitals of one cell, at most one each
 */
public record CustomModelDefinition(
    int dimension,
    List<List<Double>> vectors,
    List<Orbital> orbitals,
    List<Onsite> onsite,
    List<Term> hoppings,
    List<Term> pairings,
    SymmetryClass symmetryClass,
    List<SymmetryOperator> symmetries) {

  /**
   * A complex amplitude, optionally scaled by a spec parameter: value = p·(re + i·im) with p the
   * parameter's value, or re + i·im when {@code parameter} is null.
   */
  public record Amplitude(String parameter, double re, double im) {
    public Amplitude {
      if (!Double.isFinite(re) || !Double.isFinite(im)) {
        throw new IllegalArgumentException("amplitude must be finite");
      }
    }

    /** A fixed number. */
    public static Amplitude of(double re, double im) {
      return new Amplitude(null, re, im);
    }

    /** Real part for these parameters. */
    public double re(ParameterValues p) {
      return parameter == null ? re : p.get(parameter) * re;
    }

    /** Imaginary part for these parameters. */
    public double im(ParameterValues p) {
      return parameter == null ? im : p.get(parameter) * im;
    }
  }

  /**
   * One orbital of the unit cell; position in fractional coordinates (length d). The position
   * operators of the Bott index, the Chern markers and the Chern localizer place the orbital at
   * cell coordinate + position ({@link hopstat.lattice.Lattice#orbitalPosition}); the chain
   * windings use the cell coordinate alone (they are defined relative to the unit cell).
   */
  public record Orbital(String name, List<Double> position) {
    public Orbital {
      Objects.requireNonNull(name, "name");
      position = List.copyOf(position);
    }
  }

  /** Onsite energy of one orbital (index into {@link #orbitals}); must be real. */
  public record Onsite(int orbital, Amplitude value) {
    public Onsite {
      Objects.requireNonNull(value, "value");
      if (value.im() != 0.0) {
        throw new IllegalArgumentException("an onsite energy must be real");
      }
    }
  }

  /**
   * A hopping or pairing term between orbital {@code from} in cell r and {@code to} in cell r +
   * cell.
   */
  public record Term(List<Integer> cell, int from, int to, Amplitude amplitude) {
    public Term {
      cell = List.copyOf(cell);
      Objects.requireNonNull(amplitude, "amplitude");
    }
  }

  public CustomModelDefinition {
    if (dimension < 1 || dimension > 3) {
      throw new IllegalArgumentException("dimension must be 1..3: " + dimension);
    }
    vectors = vectors.stream().map(List::copyOf).toList();
    orbitals = List.copyOf(orbitals);
    onsite = List.copyOf(onsite);
    hoppings = List.copyOf(hoppings);
    pairings = List.copyOf(pairings);
    symmetries = List.copyOf(symmetries);
    Objects.requireNonNull(symmetryClass, "symmetryClass");
    if (vectors.size() != dimension || vectors.stream().anyMatch(v -> v.size() != dimension)) {
      throw new IllegalArgumentException(
          "need " + dimension + " lattice vectors of length " + dimension);
    }
    if (orbitals.isEmpty()) {
      throw new IllegalArgumentException("need at least one orbital");
    }
    int n = orbitals.size();
    for (Onsite e : onsite) {
      checkOrbital(e.orbital(), n);
    }
    List<Term> all = new ArrayList<>(hoppings);
    all.addAll(pairings);
    for (Term t : all) {
      checkOrbital(t.from(), n);
      checkOrbital(t.to(), n);
      if (t.cell().size() != dimension) {
        throw new IllegalArgumentException(
            "cell offset must have " + dimension + " entries: " + t.cell());
      }
    }
    int o = pairings.isEmpty() ? n : 2 * n;
    Set<Symmetry> seen = new LinkedHashSet<>();
    for (SymmetryOperator op : symmetries) {
      if (op.orbitalsPerSite() != o) {
        throw new IllegalArgumentException(
            op.symmetry() + " must act on " + o + " orbitals per cell");
      }
      if (!seen.add(op.symmetry())) {
        throw new IllegalArgumentException("two operators for " + op.symmetry());
      }
    }
  }

  private static void checkOrbital(int index, int n) {
    if (index < 0 || index >= n) {
      throw new IllegalArgumentException("orbital index out of range: " + index);
    }
  }

  /** True when pairing terms make this a BdG model in Nambu form. */
  public boolean isBdg() {
    return !pairings.isEmpty();
  }

  /** Orbitals per cell in the matrix: n, or 2n in Nambu form. */
  public int orbitalsPerCell() {
    return isBdg() ? 2 * orbitals.size() : orbitals.size();
  }

  /**
   * The parameter names the amplitudes read, in order of first appearance (onsite, hoppings,
   * pairings).
   */
  public List<String> parameterNames() {
    Set<String> names = new LinkedHashSet<>();
    for (Onsite e : onsite) {
      if (e.value().parameter() != null) {
        names.add(e.value().parameter());
      }
    }
    for (List<Term> list : List.of(hoppings, pairings)) {
      for (Term t : list) {
        if (t.amplitude().parameter() != null) {
          names.add(t.amplitude().parameter());
        }
      }
    }
    return List.copyOf(names);
  }
}
