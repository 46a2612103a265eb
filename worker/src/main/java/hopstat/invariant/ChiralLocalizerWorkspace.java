package hopstat.invariant;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.linalg.Linalg;
import hopstat.spectrum.SliceInertiaWorkspace;

/**
 * Scratch of {@link ChiralLocalizerKernel}: a term list for L_κ = H + κ(X − x0)S and the slice
 * sweep's workspace. Grows to the largest chain seen; one per worker thread.
 */
public final class ChiralLocalizerWorkspace {

  final HamiltonianBuilder localizer = new HamiltonianBuilder();
  final SliceInertiaWorkspace sweep;

  /**
   * @param linalg read; picks the native or Java LDLᴴ solver of the sweep
   */
  public ChiralLocalizerWorkspace(Linalg linalg) {
    this.sweep = new SliceInertiaWorkspace(linalg);
  }
}
