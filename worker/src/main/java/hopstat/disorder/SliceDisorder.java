package hopstat.disorder;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.model.Model;
import hopstat.model.ParameterValues;
import java.util.Optional;
import java.util.random.RandomGenerator;

/**
 * Optional capability of a {@link DisorderKind}: drawing its random terms one slice at a time, for
 * the transfer-matrix bar of the {@code lyapunov} observable, whose length is not known in advance
 * and whose memory must not grow with it. A kind without this capability cannot be combined with
 * {@code lyapunov}.
 *
 * <p>The caller passes a <i>window</i>: a lattice holding the sites of slice n (indices 0..S−1) and
 * of slice n+1 (S..2S−1), in the bar's slice order (see {@code hopstat.localisation.BarSlices}); in
 * d = 1 it is an open chain of two cells. The kind adds the terms that belong to slice n: terms
 * inside slice n (onsite or on-slice) and terms between slice n and slice n+1 (the random part of
 * the bonds leaving slice n forward). It must not add terms inside slice n+1: those are drawn with
 * slice n+1.
 */
public interface SliceDisorder {

  /** Why this kind cannot be drawn slice by slice on {@code model}, or empty. Default: it can. */
  default Optional<String> whyNotSliceable(Model model) {
    return Optional.empty();
  }

  /**
   * Adds slice n's random terms, drawing from {@code random} in a fixed, documented order.
   *
   * @param term read
   * @param model read
   * @param parameters read
   * @param window read: slices n and n+1 (see the interface Javadoc)
   * @param sliceSites S, the sites of one slice
   * @param random consumed
   * @param out terms appended; reset to {@code window.orbitals()} by the caller
   */
  void applyToSlice(
      DisorderTerm term,
      Model model,
      ParameterValues parameters,
      Lattice window,
      int sliceSites,
      RandomGenerator random,
      HamiltonianBuilder out);
}
