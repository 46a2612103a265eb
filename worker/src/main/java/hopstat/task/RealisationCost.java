package hopstat.task;

import hopstat.lattice.Lattice;
import hopstat.model.Model;

/**
 * Memory one realisation of a point needs, for sizing runs before they start.
 *
 * <p>Dense path (any observable with {@link Observable#needsDenseMatrix()}): the N×N Hamiltonian
 * and, with eigenvectors, the vector matrices. Sparse path (every observable dense-free, e.g.
 * {@code chern-localizer}, {@code gap-inertia}): the slice sweep's two dense blocks of the largest
 * slice, n_slice = 2·N/L_x for the doubled localizer (N/L_x orbitals per x-slice of a d-dimensional
 * sample, doubled again as a margin for merged slices), plus the term list; the dense N×N matrix is
 * still counted when the per-realisation symmetry check builds it (N ≤ {@link
 * RealisationRunner#MAX_SYMMETRY_CHECK_DIMENSION} and the model declares symmetry operators).
 * Kernel-polynomial observables ({@code dos}, {@code kpm-chern-marker}) add no slice blocks: the
 * CSR matrix (20 bytes per stored entry, two entries per term with the same term-count margin) and
 * ten complex vectors of length N; when they are the only observables no slice block is counted.
 *
 * @param matrixDimension N, the Hamiltonian's dimension
 * @param heapBytes Java heap held by one worker's workspace
 * @param nativeBytes off-heap memory of the native solvers
 */
public record RealisationCost(long matrixDimension, long heapBytes, long nativeBytes) {

  /**
   * Bytes per term of the Hamiltonian builder (two ints, two doubles) times a term-count margin per
   * orbital.
   */
  private static final long TERM_BYTES_PER_ORBITAL = 24L * 16;

  /** CSR bytes per orbital: 20 bytes per entry, both triangles of the same 16-term margin. */
  private static final long CSR_BYTES_PER_ORBITAL = 20L * 2 * 16;

  /** Bytes per orbital of the kernel-polynomial vectors: ten complex vectors plus an index. */
  private static final long KPM_VECTOR_BYTES_PER_ORBITAL = 10L * 16 + 4;

  /** Estimate for one realisation of {@code point}. */
  public static RealisationCost of(PointSpec point) {
    Model model = point.resolveModel();
    Lattice lattice = model.lattice(point.linearSize(), point.boundary());
    long n = lattice.orbitals();
    boolean vectors = false;
    boolean dense = false;
    boolean slices = false;
    boolean kpm = false;
    for (String name : point.observables()) {
      Observable o = ObservableCatalog.find(name).orElse(null);
      vectors |= o != null && o.needsOccupiedStates();
      dense |= o == null || o.needsDenseMatrix();
      kpm |= o instanceof KpmObservable;
      slices |= o != null && !o.needsDenseMatrix() && !(o instanceof KpmObservable);
    }
    long matrix = 16L * n * n;
    if (dense) {
      long heap = matrix * (vectors ? 4 : 1) + 64L * n;
      long nativeBytes = matrix * (vectors ? 2 : 1) + 256L * n;
      return new RealisationCost(n, heap, nativeBytes);
    }
    long slice = slices ? 4L * n / Math.max(1, lattice.linearSize()) : 0;
    long block = 16L * slice * slice;
    long heap = 3 * block + TERM_BYTES_PER_ORBITAL * n + 64L * n;
    long nativeBytes = 2 * block + 64L * slice;
    if (kpm) {
      heap += (CSR_BYTES_PER_ORBITAL + KPM_VECTOR_BYTES_PER_ORBITAL) * n;
    }
    boolean symmetryCheck =
        n <= RealisationRunner.MAX_SYMMETRY_CHECK_DIMENSION
            && !model.symmetryOperators().on(lattice).isEmpty();
    if (symmetryCheck) {
      heap += matrix;
    }
    return new RealisationCost(n, heap, nativeBytes);
  }
}
