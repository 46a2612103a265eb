package hopstat.disorder;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.ChiralChain;
import hopstat.model.CustomModel;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import hopstat.model.Symmetry;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Random hopping phases of a chiral chain (class AIII realisations): each selected A–B hopping is
 * multiplied by e^{iθ}, θ = W·u, u uniform in [−1/2, 1/2), W in <b>radians</b> (W = 2π gives phases
 * uniform on the circle). Convention: the matrix element H[A][B] of the bond becomes
 * e^{iθ}·H[A][B], i.e. v_j → v_j e^{iθ_j} on the intracell bond A_j–B_j and w_j → w_j e^{iθ'_j} on
 * the intercell bond A_{j+1}–B_j (the layout of {@link ChiralChain}: orbital 0 = A, 1 = B).
 *
 * <p>Option {@code bonds}: {@code intracell}, {@code intercell} or {@code all} (default), as for
 * {@code bond-box}. Draw order: cell by cell, j = 0, 1, …; within cell j first the intracell bond,
 * then the intercell bond j (if it exists: L − 1 of them open, L periodic). A phase is drawn for
 * every selected bond, also when its hopping is zero, so the number of draws depends only on L, the
 * boundary and {@code bonds}.
 *
 * <p><b>Order matters:</b> the phase multiplies the hopping accumulated <i>so far</i> (clean value
 * plus the earlier disorder terms in spec order). Put {@code bond-phase} after {@code bond-box} to
 * get w_j = |w + W u_j|·(±e^{iθ_j}); a {@code bond-box} placed after it adds a real shift to a
 * complex hopping. Implemented additively: one pass over the terms gathers the hopping h of every
 * bond and (e^{iθ} − 1)·h is appended, so the builder's other terms are untouched. Hoppings that do
 * not join A_j–B_j or B_j–A_{j+1} (e.g. longer-range terms of a custom chain) are not changed.
 *
 * <p>Symmetry: A–B hoppings only, so the chiral symmetry S = diag(1, −1) is kept; complex values
 * break T = K and C = S·K: a BDI chain becomes AIII ({@link
 * hopstat.model.SymmetryClass#restrictTo}). On an open chain every set of phases is a gauge
 * transformation (c_k → e^{iχ_k} c_k), so spectra and the winding equal those of the chain with
 * hoppings |v_j|, |w_j| and signs absorbed (derived); on a ring the total phase Σθ is a flux
 * through the ring that cannot be gauged away.
 */
public final class BondPhaseDisorder implements DisorderKind {

  public static final String NAME = "bond-phase";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "chiral chain: each selected hopping H[A][B] multiplied by exp(i theta), theta = W*u, u uniform in [-1/2, 1/2),"
        + " W in radians (2 pi: fully random phases); bonds = intracell | intercell | all (default); draws cell by cell,"
        + " intracell before intercell; multiplies the hopping accumulated so far (place after bond-box); keeps S only (BDI -> AIII)";
  }

  @Override
  public Set<Symmetry> keptSymmetries(Model model) {
    return Set.of(Symmetry.CHIRAL);
  }

  @Override
  public Optional<String> whyNotApplicable(Model model) {
    boolean chain =
        model instanceof ChiralChain || (model instanceof CustomModel c && c.isSublatticeChain());
    return chain
        ? Optional.empty()
        : Optional.of(
            NAME
                + " needs a chiral chain model (ssh, or a custom chain with two orbitals and S = diag(1, -1)), not "
                + model.name());
  }

  @Override
  public Map<String, Set<String>> options() {
    return Map.of("bonds", Set.of("intracell", "intercell", "all"));
  }

  @Override
  public void apply(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice lattice,
      RandomGenerator random,
      HamiltonianBuilder out) {
    if (lattice.dimension() != 1
        || lattice.orbitalsPerSite() != 2
        || out.dimension() != 2 * lattice.sites()) {
      throw new IllegalArgumentException(
          NAME + " needs a chain with two orbitals (A, B) per cell: " + lattice);
    }
    String bonds = term.options().getOrDefault("bonds", "all");
    boolean intra = !"intercell".equals(bonds);
    boolean inter = !"intracell".equals(bonds);
    int cells = lattice.sites();
    int intercellBonds =
        model instanceof ChiralChain chain
            ? chain.intercellBondCount(lattice)
            : lattice.boundary() == Boundary.PERIODIC ? cells : cells - 1;
    // Accumulated H[A][B] per bond: [2j] intracell j (A_j, B_j), [2j + 1] intercell j (A_{j+1},
    // B_j).
    double[] hRe = new double[2 * cells];
    double[] hIm = new double[2 * cells];
    int terms = out.termCount();
    for (int k = 0; k < terms; k++) {
      int r = out.row(k);
      int c = out.column(k);
      if (r == c || r % 2 == c % 2) {
        continue;
      }
      // H[r][c] = z; as an A→B element: z if r is A, conj(z) if r is B.
      boolean rowIsA = r % 2 == 0;
      int a = rowIsA ? r : c;
      int b = rowIsA ? c : r;
      double re = out.realPart(k);
      double im = rowIsA ? out.imaginaryPart(k) : -out.imaginaryPart(k);
      int cellA = a / 2;
      int cellB = b / 2;
      int slot;
      if (cellA == cellB) {
        slot = 2 * cellB;
      } else if (cellB < intercellBonds && cellA == (cellB + 1) % cells) {
        slot = 2 * cellB + 1;
      } else {
        continue;
      }
      hRe[slot] += re;
      hIm[slot] += im;
    }
    double width = term.strength();
    for (int j = 0; j < cells; j++) {
      if (intra) {
        addPhase(
            2 * j, 2 * j + 1, hRe[2 * j], hIm[2 * j], width * (random.nextDouble() - 0.5), out);
      }
      if (inter && j < intercellBonds) {
        addPhase(
            2 * ((j + 1) % cells),
            2 * j + 1,
            hRe[2 * j + 1],
            hIm[2 * j + 1],
            width * (random.nextDouble() - 0.5),
            out);
      }
    }
  }

  /** Appends (e^{iθ} − 1)·h to H[a][b] (and its conjugate to H[b][a]). */
  private static void addPhase(
      int a, int b, double re, double im, double theta, HamiltonianBuilder out) {
    if (re == 0.0 && im == 0.0) {
      return;
    }
    double fr = Math.cos(theta) - 1.0;
    double fi = Math.sin(theta);
    out.addHopping(a, b, fr * re - fi * im, fr * im + fi * re);
  }
}
