package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.ChiralChain;
import hopstat.model.CustomModel;
import hopstat.model.CustomModelDefinition;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Multiplicative bond disorder on any lattice: every bond b is multiplied by the real factor f_b =
 * 1 + W·u_b, u_b uniform in [−1/2, 1/2) (mean 1, variance W²/12; f_b may change sign for W &gt; 2).
 *
 * <p>A bond is an unordered pair of distinct atoms coupled by a term present when this disorder is
 * applied (the clean Hamiltonian and earlier disorder terms); all its matrix elements, hoppings and
 * BdG pairings alike, and any earlier additive shifts of them, get the same factor. An atom is a
 * lattice site, except: on a chiral chain (ssh) each sublattice orbital is an atom, so both the
 * intracell v and the intercell w bonds are scaled; on a custom model orbitals of a cell with
 * different positions are different atoms (orbitals at one position, e.g. spin or the particle and
 * hole of a BdG orbital, form one atom). Terms inside one atom (onsite energies, intra-atomic
 * orbital mixing) are unchanged.
 *
 * <p>Draw order: one draw per bond, in the order in which bonds first appear in the term list (the
 * model's clean term order, which is deterministic; bonds zeroed by earlier terms still draw).
 *
 * <p>Symmetry: a real factor common to all elements of a bond commutes with complex conjugation
 * (T), with the BdG particle–hole map (hopping and pairing blocks scaled alike: C) and with any
 * sublattice operator diagonal on atoms (S), so every symmetry of the model is kept. Not drawn
 * slice by slice ({@link SliceDisorder} not implemented), so {@code lyapunov} rejects it.
 */
public final class BondScaleDisorder implements DisorderKind {

  public static final String NAME = "bond-scale";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "every bond (pair of distinct atoms coupled by the Hamiltonian: all its hopping and pairing elements) times 1 + W*u,"
        + " u uniform in [-1/2, 1/2); one draw per bond in order of first appearance in the term list; keeps T, C, S";
  }

  @Override
  public Set<Symmetry> keptSymmetries(Model model) {
    return Set.of(Symmetry.TIME_REVERSAL, Symmetry.PARTICLE_HOLE, Symmetry.CHIRAL);
  }

  @Override
  public Map<String, Set<String>> options() {
    return Map.of();
  }

  @Override
  public void apply(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice lattice,
      RandomGenerator random,
      HamiltonianBuilder out) {
    double w = term.strength();
    int[] atomOf = atoms(model, lattice);
    long atomCount = lattice.orbitals();
    Map<Long, Double> factors = new HashMap<>();
    for (int k = 0; k < out.termCount(); k++) {
      int a = atomOf[out.row(k)];
      int b = atomOf[out.column(k)];
      if (a == b) {
        continue;
      }
      long key = Math.min(a, b) * atomCount + Math.max(a, b);
      Double f = factors.get(key);
      if (f == null) {
        f = 1.0 + w * (random.nextDouble() - 0.5);
        factors.put(key, f);
      }
      out.scaleTerm(k, f);
    }
  }

  /** Atom index of every matrix index (see the class comment). */
  static int[] atoms(Model model, Lattice lattice) {
    int n = lattice.orbitals();
    int per = lattice.orbitalsPerSite();
    int[] atom = new int[n];
    int[] representative = new int[per]; // default: all orbitals of a site form one atom
    if (model instanceof ChiralChain) {
      for (int o = 0; o < per; o++) {
        representative[o] = o;
      }
    } else if (model instanceof CustomModel custom) {
      CustomModelDefinition d = custom.definition();
      List<CustomModelDefinition.Orbital> orbitals = d.orbitals();
      int count = orbitals.size();
      for (int o = 0; o < per; o++) {
        int k = o % count;
        int r = k;
        for (int q = 0; q < k; q++) {
          if (orbitals.get(q).position().equals(orbitals.get(k).position())) {
            r = q;
            break;
          }
        }
        representative[o] = r;
      }
    }
    for (int i = 0; i < n; i++) {
      atom[i] = (i / per) * per + representative[i % per];
    }
    return atom;
  }
}
