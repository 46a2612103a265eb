package hopstat.spectrum;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.linalg.InertiaResult;
import java.util.Arrays;
import org.ejml.data.ZMatrixRMaj;

/**
 * Inertia (eigenvalue sign counts) of H − E and of the spectral localizer of a d ≥ 1 sample with
 * open boundaries, without diagonalisation, by a block LDLᴴ sweep over slices of the sample.
 *
 * <p><b>Slices.</b> Sites are grouped by their first coordinate x (equal x within 1e-9 = one
 * slice); adjacent slices are then merged, left to right, until every Hamiltonian term connects
 * sites of the same or of neighbouring groups, so the matrix is block tridiagonal in the groups
 * (square lattices with nearest-neighbour hopping: one group per column, n_g = orbitals × L).
 *
 * <p><b>Sweep.</b> For M block tridiagonal with diagonal blocks A_g and couplings B_g, Haynsworth's
 * inertia additivity In(M) = In(A) + In(M/A) (Haynsworth, Linear Algebra Appl. 1, 73 (1968)) gives
 * In(M) = Σ_g In(S_g) with S_0 = A_0 and S_{g+1} = A_{g+1} − B_gᴴ S_g⁻¹ B_g. Each S_g is factored
 * by Bunch–Kaufman ({@link hopstat.linalg.HermitianLdltSolver}); B_gᴴ (S_g⁻¹ B_g) uses the sparsity
 * of B_g (each nonzero updates one row). An exactly singular S_g stops the sweep and is reported as
 * a zero count (the caller treats it as a failed realisation); near-singular S_g are not detected
 * here — the localizer gap observable measures the distance of the spectrum from the shift.
 *
 * <p><b>Localizer.</b> With {@code doubled}, M is L_κ − δ = [[H − E, κ(X − x0 − i(Y − y0))], [κ(X −
 * x0 + i(Y − y0)), −(H − E)]] − δ (Loring, Ann. Phys. 356, 383 (2015)), each orbital carrying two
 * localizer components, both in its slice. X, Y are the orbital positions ({@link
 * Lattice#orbitalPosition}; d ≥ 2; for d = 1 Y = 0).
 *
 * <p>Cost O(Σ_g n_g³) ≈ L · n_slice³ (factorisation n³/3 plus the solve with n_{g+1} right-hand
 * sides ≈ n³ complex multiply–adds per slice); memory O(n_slice²) plus O(N) integers. Only valid
 * for open boundaries: a periodic wrap couples the first and the last slice (checked).
 */
public final class SliceInertiaKernel {

  /** Positions closer than this (lattice units) share a slice. */
  static final double SLICE_TOLERANCE = 1e-9;

  private SliceInertiaKernel() {}

  /**
   * Inertia of H − energy·1.
   *
   * @param terms read, not modified: the Hamiltonian's term list
   * @param lattice read: positions define the slices; must have open boundaries along x
   * @param energy the shift E
   * @param workspace scratch
   * @return negative count = number of eigenvalues below E (Sylvester)
   */
  public static InertiaResult hamiltonianInertia(
      HamiltonianBuilder terms, Lattice lattice, double energy, SliceInertiaWorkspace workspace) {
    return sweep(terms, lattice, energy, false, 0, 0, 0, 0, workspace);
  }

  /**
   * Inertia of the spectral localizer L_κ(x0, y0, E) − δ·1 (2N × 2N).
   *
   * @param terms read, not modified
   * @param lattice read; d ≥ 1
   * @param energy E (the Fermi energy)
   * @param kappa κ &gt; 0, in energy per lattice unit
   * @param x0 centre x (lattice units)
   * @param y0 centre y (ignored for d = 1)
   * @param shift δ
   * @param workspace scratch
   */
  public static InertiaResult localizerInertia(
      HamiltonianBuilder terms,
      Lattice lattice,
      double energy,
      double kappa,
      double x0,
      double y0,
      double shift,
      SliceInertiaWorkspace workspace) {
    if (!(kappa > 0) || !Double.isFinite(kappa)) {
      throw new IllegalArgumentException("kappa must be positive and finite: " + kappa);
    }
    if (lattice.dimension() < 1) {
      throw new IllegalArgumentException("the localizer needs positions (d >= 1)");
    }
    return sweep(terms, lattice, energy, true, kappa, x0, y0, shift, workspace);
  }

  /**
   * A bound on the spectral radius of H: max_i (|H_ii| + Σ_{j≠i} |H_ij|) (Gershgorin, derived).
   *
   * @param terms read, not modified
   * @param scratch length ≥ 2N; overwritten
   */
  public static double gershgorinRadius(HamiltonianBuilder terms, double[] scratch) {
    int n = terms.dimension();
    if (scratch.length < 2 * n) {
      throw new IllegalArgumentException("scratch needs length " + 2 * n);
    }
    Arrays.fill(scratch, 0, 2 * n, 0.0);
    for (int k = 0; k < terms.termCount(); k++) {
      int r = terms.row(k);
      int c = terms.column(k);
      if (r == c) {
        scratch[n + r] += terms.realPart(k);
      } else {
        double a = Math.hypot(terms.realPart(k), terms.imaginaryPart(k));
        scratch[r] += a;
        scratch[c] += a;
      }
    }
    double max = 0;
    for (int i = 0; i < n; i++) {
      max = Math.max(max, scratch[i] + Math.abs(scratch[n + i]));
    }
    return max;
  }

  private static InertiaResult sweep(
      HamiltonianBuilder terms,
      Lattice lattice,
      double energy,
      boolean doubled,
      double kappa,
      double x0,
      double y0,
      double shift,
      SliceInertiaWorkspace ws) {
    int n = terms.dimension();
    if (n != lattice.orbitals()) {
      throw new IllegalArgumentException("terms of dimension " + n + " do not match " + lattice);
    }
    partition(terms, lattice, doubled ? 2 : 1, ws);
    int pos = 0;
    int neg = 0;
    int zero = 0;
    int groups = ws.groups;
    buildDiagonalBlock(0, terms, lattice, energy, doubled, kappa, x0, y0, shift, ws, ws.schur);
    for (int g = 0; g < groups; g++) {
      boolean ok = ws.solver.factor(ws.schur);
      pos += ws.solver.positiveCount();
      neg += ws.solver.negativeCount();
      zero += ws.solver.zeroCount();
      if (!ok) {
        // Singular Schur complement: the remaining slices cannot be eliminated in this order.
        int rest = 0;
        for (int h = g + 1; h < groups; h++) {
          rest += ws.groupSize[h];
        }
        return new InertiaResult(pos, neg, zero + rest);
      }
      if (g + 1 < groups) {
        buildCoupling(g, terms, doubled, ws);
        ws.solver.solve(ws.coupling);
        buildDiagonalBlock(
            g + 1, terms, lattice, energy, doubled, kappa, x0, y0, shift, ws, ws.schur);
        subtractCouplingProduct(g, terms, doubled, ws);
      }
    }
    return new InertiaResult(pos, neg, zero);
  }

  /**
   * Slices by x, merged into groups so that terms connect only equal or neighbouring groups;
   * buckets the terms.
   */
  private static void partition(
      HamiltonianBuilder terms, Lattice lattice, int copies, SliceInertiaWorkspace ws) {
    int sites = lattice.sites();
    int per = lattice.orbitalsPerSite();
    int n = terms.dimension();
    ws.sortedX = grow(ws.sortedX, sites);
    for (int s = 0; s < sites; s++) {
      ws.sortedX[s] = lattice.dimension() == 0 ? 0.0 : lattice.position(0, s);
    }
    Arrays.sort(ws.sortedX, 0, sites);
    int distinct = 0;
    for (int s = 0; s < sites; s++) {
      if (distinct == 0 || ws.sortedX[s] - ws.sortedX[distinct - 1] > SLICE_TOLERANCE) {
        ws.sortedX[distinct++] = ws.sortedX[s];
      }
    }
    ws.sliceOfSite = grow(ws.sliceOfSite, sites);
    for (int s = 0; s < sites; s++) {
      double x = lattice.dimension() == 0 ? 0.0 : lattice.position(0, s);
      int i = Arrays.binarySearch(ws.sortedX, 0, distinct, x);
      if (i < 0) {
        int ins = -i - 1;
        i = ins < distinct && Math.abs(ws.sortedX[ins] - x) <= SLICE_TOLERANCE ? ins : ins - 1;
      }
      ws.sliceOfSite[s] = i;
    }
    ws.reach = grow(ws.reach, distinct);
    for (int i = 0; i < distinct; i++) {
      ws.reach[i] = i;
    }
    for (int k = 0; k < terms.termCount(); k++) {
      int a = ws.sliceOfSite[terms.row(k) / per];
      int b = ws.sliceOfSite[terms.column(k) / per];
      int lo = Math.min(a, b);
      ws.reach[lo] = Math.max(ws.reach[lo], Math.max(a, b));
    }
    for (int i = 1; i < distinct; i++) {
      ws.reach[i] = Math.max(ws.reach[i], ws.reach[i - 1]);
    }
    // Group 0 = slice 0; group k+1 = slices (end_k, max(reach(end_k), end_k + 1)].
    ws.groupOfSlice = grow(ws.groupOfSlice, distinct);
    int groups = 0;
    int start = 0;
    int end = 0;
    while (start < distinct) {
      for (int i = start; i <= end; i++) {
        ws.groupOfSlice[i] = groups;
      }
      groups++;
      int nextEnd = Math.min(distinct - 1, Math.max(ws.reach[end], end + 1));
      start = end + 1;
      end = nextEnd;
    }
    ws.groups = groups;
    ws.groupSize = grow(ws.groupSize, groups);
    Arrays.fill(ws.groupSize, 0, groups, 0);
    ws.groupOfOrbital = grow(ws.groupOfOrbital, n);
    ws.localIndex = grow(ws.localIndex, n);
    for (int i = 0; i < n; i++) {
      int g = ws.groupOfSlice[ws.sliceOfSite[i / per]];
      ws.groupOfOrbital[i] = g;
      ws.localIndex[i] = ws.groupSize[g];
      ws.groupSize[g]++;
    }
    for (int g = 0; g < groups; g++) {
      ws.groupSize[g] *= copies;
    }
    // Bucket terms by the lower group of their two ends (a coupling term goes with its left group).
    ws.termStart = grow(ws.termStart, groups + 1);
    Arrays.fill(ws.termStart, 0, groups + 1, 0);
    int count = terms.termCount();
    for (int k = 0; k < count; k++) {
      int ga = ws.groupOfOrbital[terms.row(k)];
      int gb = ws.groupOfOrbital[terms.column(k)];
      if (Math.abs(ga - gb) > 1) {
        throw new IllegalArgumentException(
            "a term couples slice groups "
                + ga
                + " and "
                + gb
                + ": the sample must have open boundaries along x for the slice sweep");
      }
      ws.termStart[Math.min(ga, gb) + 1]++;
    }
    for (int g = 0; g < groups; g++) {
      ws.termStart[g + 1] += ws.termStart[g];
    }
    ws.termOrder = grow(ws.termOrder, count);
    int[] fill = ws.reach.length >= groups ? ws.reach : new int[groups];
    System.arraycopy(ws.termStart, 0, fill, 0, groups);
    for (int k = 0; k < count; k++) {
      int g = Math.min(ws.groupOfOrbital[terms.row(k)], ws.groupOfOrbital[terms.column(k)]);
      ws.termOrder[fill[g]++] = k;
    }
  }

  /** Writes the diagonal block A_g (localizer or H − E, minus the shift) into {@code out}. */
  private static void buildDiagonalBlock(
      int g,
      HamiltonianBuilder terms,
      Lattice lattice,
      double energy,
      boolean doubled,
      double kappa,
      double x0,
      double y0,
      double shift,
      SliceInertiaWorkspace ws,
      ZMatrixRMaj out) {
    int size = ws.groupSize[g];
    out.reshape(size, size);
    out.zero();
    double[] a = out.data;
    int stride = 2 * size;
    int copies = doubled ? 2 : 1;
    // Terms inside group g live in bucket g (both ends in g) or bucket g-1 (no: those couple g-1
    // and g).
    for (int b = ws.termStart[g]; b < ws.termStart[g + 1]; b++) {
      int k = ws.termOrder[b];
      int r = terms.row(k);
      int c = terms.column(k);
      if (ws.groupOfOrbital[r] != g || ws.groupOfOrbital[c] != g) {
        continue;
      }
      double re = terms.realPart(k);
      double im = terms.imaginaryPart(k);
      int lr = copies * ws.localIndex[r];
      int lc = copies * ws.localIndex[c];
      for (int part = 0; part < copies; part++) {
        double sign = part == 0 ? 1.0 : -1.0;
        int ij = (lr + part) * stride + 2 * (lc + part);
        a[ij] += sign * re;
        a[ij + 1] += sign * im;
        if (r != c) {
          int ji = (lc + part) * stride + 2 * (lr + part);
          a[ji] += sign * re;
          a[ji + 1] -= sign * im;
        }
      }
    }
    int n = terms.dimension();
    // Diagonal shifts and the position terms, orbital by orbital of this group.
    for (int i = 0; i < n; i++) {
      if (ws.groupOfOrbital[i] != g) {
        continue;
      }
      int li = copies * ws.localIndex[i];
      if (!doubled) {
        a[li * stride + 2 * li] -= energy;
        continue;
      }
      a[li * stride + 2 * li] -= energy + shift;
      a[(li + 1) * stride + 2 * (li + 1)] += energy - shift;
      // Orbital positions (site position + intra-cell offset); the slices stay whole sites.
      double dx = kappa * (lattice.orbitalPosition(0, i) - x0);
      double dy = lattice.dimension() >= 2 ? kappa * (lattice.orbitalPosition(1, i) - y0) : 0.0;
      // upper-right κ(X − iY), lower-left κ(X + iY)
      int ur = li * stride + 2 * (li + 1);
      a[ur] += dx;
      a[ur + 1] -= dy;
      int ll = (li + 1) * stride + 2 * li;
      a[ll] += dx;
      a[ll + 1] += dy;
    }
  }

  /** Dense B_g (rows: group g, columns: group g+1) into ws.coupling. */
  private static void buildCoupling(
      int g, HamiltonianBuilder terms, boolean doubled, SliceInertiaWorkspace ws) {
    int rows = ws.groupSize[g];
    int cols = ws.groupSize[g + 1];
    ZMatrixRMaj out = ws.coupling;
    out.reshape(rows, cols);
    out.zero();
    double[] b = out.data;
    int stride = 2 * cols;
    int copies = doubled ? 2 : 1;
    for (int t = ws.termStart[g]; t < ws.termStart[g + 1]; t++) {
      int k = ws.termOrder[t];
      int r = terms.row(k);
      int c = terms.column(k);
      double re = terms.realPart(k);
      double im = terms.imaginaryPart(k);
      if (ws.groupOfOrbital[r] == ws.groupOfOrbital[c]) {
        continue;
      }
      if (ws.groupOfOrbital[r] != g) {
        // H[r][c] = v with r in g+1: the entry in B is H[c][r] = conj(v)
        int tmp = r;
        r = c;
        c = tmp;
        im = -im;
      }
      int lr = copies * ws.localIndex[r];
      int lc = copies * ws.localIndex[c];
      for (int part = 0; part < copies; part++) {
        double sign = part == 0 ? 1.0 : -1.0;
        int ij = (lr + part) * stride + 2 * (lc + part);
        b[ij] += sign * re;
        b[ij + 1] += sign * im;
      }
    }
  }

  /** S_{g+1} −= B_gᴴ X with X = S_g⁻¹ B_g in ws.coupling: row c of S −= conj(B_rc) · row r of X. */
  private static void subtractCouplingProduct(
      int g, HamiltonianBuilder terms, boolean doubled, SliceInertiaWorkspace ws) {
    int cols = ws.groupSize[g + 1];
    double[] s = ws.schur.data;
    double[] x = ws.coupling.data;
    int stride = 2 * cols;
    int copies = doubled ? 2 : 1;
    for (int t = ws.termStart[g]; t < ws.termStart[g + 1]; t++) {
      int k = ws.termOrder[t];
      int r = terms.row(k);
      int c = terms.column(k);
      double re = terms.realPart(k);
      double im = terms.imaginaryPart(k);
      if (ws.groupOfOrbital[r] == ws.groupOfOrbital[c]) {
        continue;
      }
      if (ws.groupOfOrbital[r] != g) {
        int tmp = r;
        r = c;
        c = tmp;
        im = -im;
      }
      int lr = copies * ws.localIndex[r];
      int lc = copies * ws.localIndex[c];
      for (int part = 0; part < copies; part++) {
        double sign = part == 0 ? 1.0 : -1.0;
        // conj(B_rc) = sign · (re − i im)
        double br = sign * re;
        double bi = -sign * im;
        int srow = (lc + part) * stride;
        int xrow = (lr + part) * stride;
        for (int j = 0; j < stride; j += 2) {
          double xr = x[xrow + j];
          double xi = x[xrow + j + 1];
          s[srow + j] -= br * xr - bi * xi;
          s[srow + j + 1] -= br * xi + bi * xr;
        }
      }
    }
  }

  private static int[] grow(int[] a, int n) {
    return a.length >= n ? a : new int[Math.max(n, 1)];
  }

  private static double[] grow(double[] a, int n) {
    return a.length >= n ? a : new double[Math.max(n, 1)];
  }
}
