package hopstat.localisation;

import hopstat.lattice.Boundary;
import hopstat.lattice.ChainLattices;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.CustomModel;
import hopstat.model.CustomModelDefinition;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.ejml.data.ZMatrixRMaj;

/**
 * Cuts any lattice model into the slices of a quasi-one-dimensional bar ({@link BarSlices}), from
 * the model's own clean Hamiltonian, so that no model needs a hand-written slice form.
 *
 * <p><b>Method.</b> Slices are stacked along the model's last lattice direction (x in d = 1, y in d
 * = 2, z in d = 3). A site's cell coordinates are the floors of its positions (positions are in
 * cell units: integer coordinates on the hypercubic lattices and custom models, oblique cell
 * coordinates on the honeycomb lattice, where the B site sits at +1/3); the last one is its slice
 * index. A reference sample of L_ref cells per direction is built with {@link Model#lattice} and
 * {@link Model#addClean}:
 *
 * <ul>
 *   <li>d = 1: an open chain of {@value #REFERENCE_SLICES} cells (the cross-section is one cell;
 *       the spec's boundary plays no role).
 *   <li>open cross-section: an open sample of L_ref = max(M, {@value #REFERENCE_SLICES}) cells,
 *       keeping only the sites with transverse cell coordinates &lt; M. An open sample cut to a
 *       smaller box is the open sample of that box, so this is exact.
 *   <li>periodic cross-section: a periodic sample of L_ref = the smallest multiple of M that is ≥
 *       {@value #REFERENCE_SLICES} and ≥ 2M, folded transversally modulo M: every matrix entry
 *       whose column lies in the cells 0 ≤ x &lt; M is kept, its row's transverse coordinates taken
 *       modulo M (the Bloch fold at transverse momentum 0 of the L_ref torus onto the M torus). For
 *       M ≥ 3 this is the model's own periodic sample of width M; for M ≤ 2 hoppings that wrap onto
 *       the same pair of cells add up (so e.g. the M = 2 anderson strip would get a doubled
 *       transverse bond). The clean model must be periodic with period M across the bar (e.g.
 *       flux-square needs q | M, which its validation already demands on periodic samples): the
 *       blocks read from the copy of the strip shifted by M along each transverse direction must
 *       equal those of the first copy, else the cut is rejected.
 * </ul>
 *
 * H and T are read from the entries whose column lies in slice 1 (on-slice: row in slice 1;
 * coupling: row in slice 2), and again from slice 2; the two copies must agree (translation
 * invariance along the bar; flux-square's Landau gauge A = (0, Bx) depends on x only, so slicing
 * along y qualifies). An entry that joins slices two or more apart (modulo L_ref on the periodic
 * reference) makes the model not sliceable.
 *
 * <p>Cost: one clean reference sample, O(L_ref^d) terms, plus O(K²) for the blocks; once per
 * realisation.
 */
public final class BarSliceOps {

  /**
   * Cells of the reference sample along the bar, at least: slices 1 and 2 are read with both
   * neighbours present.
   */
  public static final int REFERENCE_SLICES = 5;

  /**
   * Relative tolerance for the translation-invariance and Hermiticity checks of the extracted
   * blocks.
   */
  static final double TOLERANCE = 1e-12;

  private BarSliceOps() {}

  /**
   * Why {@code model} cannot be cut into nearest-neighbour slices whatever its parameters, or
   * empty. Zero-dimensional models have no bar; custom models must not hop or pair across more than
   * one cell along their last direction. Built-in models of d ≥ 1 all couple neighbouring slices
   * only (checked by a test over the catalog); {@link #extract} re-checks every run.
   */
  public static Optional<String> whyNotSliceable(Model model) {
    if (model.dimension() < 1) {
      return Optional.of(model.name() + " is zero-dimensional: there is no bar to grow");
    }
    if (model instanceof CustomModel custom) {
      CustomModelDefinition def = custom.definition();
      int last = def.dimension() - 1;
      for (List<CustomModelDefinition.Term> terms : List.of(def.hoppings(), def.pairings())) {
        for (CustomModelDefinition.Term t : terms) {
          int step = t.cell().get(last);
          if (Math.abs(step) > 1) {
            return Optional.of(
                "the custom lattice has a term "
                    + step
                    + " cells apart along its last direction; the transfer-matrix"
                    + " bar needs terms between neighbouring slices only (|offset| <= 1 along the last direction)");
          }
        }
      }
    }
    return Optional.empty();
  }

  /**
   * Extracts the clean slice form.
   *
   * @param model read
   * @param parameters read (the model's resolved parameters)
   * @param crossSection M ≥ 1 (ignored in d = 1)
   * @param boundary transverse boundary (ignored in d = 1)
   * @throws IllegalArgumentException with a readable reason if the model couples slices further
   *     apart, is not translation invariant along the bar, has cells with different numbers of
   *     sites, or is not M-periodic across a periodic bar
   */
  public static BarSlices extract(
      Model model, ParameterValues parameters, int crossSection, Boundary boundary) {
    int d = model.dimension();
    whyNotSliceable(model)
        .ifPresent(
            reason -> {
              throw new IllegalArgumentException(reason);
            });
    if (crossSection < 1) {
      throw new IllegalArgumentException("cross-section must be >= 1: " + crossSection);
    }
    int m = d == 1 ? 1 : crossSection;
    boolean periodic = d > 1 && boundary == Boundary.PERIODIC;
    int lRef =
        d == 1
            ? REFERENCE_SLICES
            : periodic
                ? m * Math.max(2, (REFERENCE_SLICES + m - 1) / m)
                : Math.max(m, REFERENCE_SLICES);
    Boundary refBoundary = periodic ? Boundary.PERIODIC : Boundary.OPEN;
    Lattice ref = model.lattice(lRef, refBoundary);
    if (ref.dimension() != d) {
      throw new IllegalArgumentException(
          model.name()
              + ": lattice dimension "
              + ref.dimension()
              + " differs from the model's "
              + d);
    }
    HamiltonianBuilder clean = new HamiltonianBuilder();
    clean.reset(ref.orbitals());
    model.addClean(parameters, ref, clean);

    int sites = ref.sites();
    int orbs = ref.orbitalsPerSite();
    long cells = 1;
    for (int k = 0; k < d; k++) {
      cells *= lRef;
    }
    if (sites % cells != 0) {
      throw new IllegalArgumentException(
          model.name() + ": " + sites + " sites on " + cells + " cells; cannot cut it into slices");
    }
    int perCell = (int) (sites / cells);
    // slice index, local site index within the (folded) slice, and whether the site's transverse
    // cell coordinates are < M
    int[] slice = new int[sites];
    int[] local = new int[sites];
    boolean[] inDomain = new boolean[sites];
    // periodic fold: which transverse copy of the strip a site lies in (-1: none of those read)
    int[] copy = new int[sites];
    int[] ordinal = new int[(int) cells];
    int transverseCells = 1;
    for (int k = 0; k < d - 1; k++) {
      transverseCells *= m;
    }
    int sliceSites = transverseCells * perCell;
    double[][] slicePositions = new double[d][sliceSites];
    for (int s = 0; s < sites; s++) {
      int cellIndex = 0;
      int stride = 1;
      int transverse = 0;
      int tStride = 1;
      boolean in = true;
      int shiftedAlong = -1;
      int shifts = 0;
      for (int k = 0; k < d; k++) {
        int c = (int) Math.floor(ref.position(k, s) + 1e-9);
        if (c < 0 || c >= lRef) {
          throw new IllegalArgumentException(
              model.name()
                  + ": site "
                  + s
                  + " has cell coordinate "
                  + c
                  + " outside 0.."
                  + (lRef - 1));
        }
        cellIndex += c * stride;
        stride *= lRef;
        if (k == d - 1) {
          slice[s] = c;
        } else {
          in &= c < m;
          if (c >= m) {
            shifts++;
            shiftedAlong = c < 2 * m ? k : -2;
          }
          transverse += (c % m) * tStride;
          tStride *= m;
        }
      }
      int o = ordinal[cellIndex]++;
      if (o >= perCell) {
        throw new IllegalArgumentException(
            model.name() + ": cells hold different numbers of sites; cannot cut it into slices");
      }
      inDomain[s] = in;
      copy[s] = in ? 0 : shifts == 1 && shiftedAlong >= 0 ? 1 + shiftedAlong : -1;
      local[s] = transverse * perCell + o;
      if (in && slice[s] == 1) {
        for (int k = 0; k < d; k++) {
          slicePositions[k][local[s]] = k == d - 1 ? 0.0 : ref.position(k, s);
        }
      }
    }
    // Blocks read at slices 1 and 2: h[0], t[0] from slice 1, h[1], t[1] from slice 2.
    int kk = sliceSites * orbs;
    // variants: 0 = slice 1, 1 = slice 2, 2 + k = slice 1 of the strip copy shifted by M along
    // transverse direction k (periodic)
    int variants = 2 + (periodic ? d - 1 : 0);
    ZMatrixRMaj[] h = new ZMatrixRMaj[variants];
    ZMatrixRMaj[] t = new ZMatrixRMaj[variants];
    for (int v = 0; v < variants; v++) {
      h[v] = new ZMatrixRMaj(kk, kk);
      t[v] = new ZMatrixRMaj(kk, kk);
    }
    for (int term = 0; term < clean.termCount(); term++) {
      int i = clean.row(term);
      int j = clean.column(term);
      double re = clean.realPart(term);
      double im = clean.imaginaryPart(term);
      addEntry(model, i, j, re, im, orbs, lRef, periodic, slice, local, inDomain, copy, h, t);
      if (i != j) {
        addEntry(model, j, i, re, -im, orbs, lRef, periodic, slice, local, inDomain, copy, h, t);
      }
    }
    double scale = Math.max(maxAbs(h[0]), maxAbs(t[0]));
    double tol = TOLERANCE * Math.max(scale, Double.MIN_NORMAL);
    if (maxDifference(h[0], h[1]) > tol || maxDifference(t[0], t[1]) > tol) {
      throw new IllegalArgumentException(
          model.name()
              + ": the clean Hamiltonian is not translation invariant along the bar"
              + " (its last lattice direction), so it has no single slice form");
    }
    for (int v = 2; v < variants; v++) {
      if (maxDifference(h[0], h[v]) > tol || maxDifference(t[0], t[v]) > tol) {
        throw new IllegalArgumentException(
            model.name()
                + ": the clean Hamiltonian is not periodic with period M = "
                + m
                + " across the bar, so the periodic cross-section is not defined");
      }
    }
    if (hermiticityDefect(h[0]) > tol) {
      throw new IllegalArgumentException(
          model.name()
              + ": the clean Hamiltonian is not periodic with period M = "
              + m
              + " across the bar (the folded slice is not Hermitian)");
    }
    Lattice sliceLattice =
        new Lattice(
            d,
            m,
            sliceSites,
            orbs,
            slicePositions,
            extent(d, m, 1),
            d == 1 ? Boundary.OPEN : boundary);
    Lattice window =
        d == 1
            ? ChainLattices.chain(2, orbs, Boundary.OPEN)
            : windowLattice(d, m, sliceSites, orbs, slicePositions, boundary);
    if (window.orbitals() != 2 * kk) {
      throw new IllegalArgumentException(
          model.name()
              + ": a cell of a one-dimensional model must hold one site to be cut into slices");
    }
    return new BarSlices(kk, m, h[0], t[0], sliceLattice, window);
  }

  /**
   * Adds matrix entry (row, col) = re + i·im to the block it belongs to. Only columns in the strip
   * (transverse cell coordinates &lt; M) are read; on an open reference the row must lie in the
   * strip too (truncation), on a periodic one the row is folded (its local index is already taken
   * modulo M).
   */
  private static void addEntry(
      Model model,
      int row,
      int col,
      double re,
      double im,
      int orbs,
      int lRef,
      boolean periodic,
      int[] slice,
      int[] local,
      boolean[] inDomain,
      int[] copy,
      ZMatrixRMaj[] h,
      ZMatrixRMaj[] t) {
    int sr = row / orbs;
    int sc = col / orbs;
    int distance = slice[sr] - slice[sc];
    if (periodic) {
      distance = Math.floorMod(distance, lRef);
      if (distance > lRef / 2) {
        distance -= lRef;
      }
    }
    if (Math.abs(distance) > 1) {
      throw new IllegalArgumentException(
          model.name()
              + ": a term couples slices "
              + Math.abs(distance)
              + " apart along the bar;"
              + " the transfer-matrix bar needs couplings between neighbouring slices only");
    }
    if (distance < 0 || !(periodic || inDomain[sr])) {
      return;
    }
    int block;
    if (inDomain[sc]) {
      block = slice[sc] - 1;
      if (block != 0 && block != 1) {
        return;
      }
    } else if (periodic && copy[sc] > 0 && slice[sc] == 1) {
      block = 1 + copy[sc];
    } else {
      return;
    }
    ZMatrixRMaj target = distance == 0 ? h[block] : t[block];
    int r = local[sr] * orbs + row % orbs;
    int c = local[sc] * orbs + col % orbs;
    int idx = target.getIndex(r, c);
    target.data[idx] += re;
    target.data[idx + 1] += im;
  }

  private static double[] extent(int d, int m, int along) {
    double[] e = new double[d];
    Arrays.fill(e, m);
    e[d - 1] = along;
    return e;
  }

  private static Lattice windowLattice(
      int d, int m, int sliceSites, int orbs, double[][] slicePositions, Boundary boundary) {
    double[][] pos = new double[d][2 * sliceSites];
    for (int k = 0; k < d; k++) {
      for (int s = 0; s < sliceSites; s++) {
        pos[k][s] = slicePositions[k][s];
        pos[k][s + sliceSites] = k == d - 1 ? 1.0 : slicePositions[k][s];
      }
    }
    return new Lattice(d, m, 2 * sliceSites, orbs, pos, extent(d, m, 2), boundary);
  }

  private static double maxAbs(ZMatrixRMaj a) {
    double max = 0;
    for (int i = 0; i < a.getDataLength(); i++) {
      max = Math.max(max, Math.abs(a.data[i]));
    }
    return max;
  }

  private static double maxDifference(ZMatrixRMaj a, ZMatrixRMaj b) {
    double max = 0;
    for (int i = 0; i < a.getDataLength(); i++) {
      max = Math.max(max, Math.abs(a.data[i] - b.data[i]));
    }
    return max;
  }

  private static double hermiticityDefect(ZMatrixRMaj a) {
    int n = a.numRows;
    double max = 0;
    for (int i = 0; i < n; i++) {
      for (int j = 0; j <= i; j++) {
        int ij = a.getIndex(i, j);
        int ji = a.getIndex(j, i);
        max = Math.max(max, Math.abs(a.data[ij] - a.data[ji]));
        max = Math.max(max, Math.abs(a.data[ij + 1] + a.data[ji + 1]));
      }
    }
    return max;
  }
}
