package hopstat.task;

import hopstat.model.Model;
import hopstat.model.ModelCatalog;

/**
 * Memory one realisation of a point needs on the dense path, for sizing runs before they start.
 *
 * @param matrixDimension N, the Hamiltonian's dimension
 * @param heapBytes Java heap held by one worker's workspace: the dense N×N complex Hamiltonian
 *     (16 N² bytes), plus with eigenvectors the N×N vectors, the occupied block and its phased copy
 *     (≤ 3 × 16 N², bounded by the full-matrix case)
 * @param nativeBytes off-heap memory of the native eigensolver: a copy of the matrix and, with
 *     eigenvectors, the N×N output (16 N² each) plus O(N) work arrays
 */
public record RealisationCost(long matrixDimension, long heapBytes, long nativeBytes) {

  /** Estimate for one realisation of {@code point} (the dense path of the foundation observables). */
  public static RealisationCost of(PointSpec point) {
    Model model = ModelCatalog.find(point.model()).orElseThrow(() -> new IllegalStateException("unknown model " + point.model()));
    long n = model.lattice(point.linearSize(), point.boundary()).orbitals();
    boolean vectors = false;
    for (String name : point.observables()) {
      vectors |= ObservableCatalog.find(name).map(Observable::needsOccupiedStates).orElse(false);
    }
    long matrix = 16L * n * n;
    long heap = matrix * (vectors ? 4 : 1) + 64L * n;
    long nativeBytes = matrix * (vectors ? 2 : 1) + 256L * n;
    return new RealisationCost(n, heap, nativeBytes);
  }
}
