package hopstat.statistics;

/**
 * The three mobility-edge / mobility-gap estimators of {@link MobilityOps}, each with its
 * assumptions and failure modes. Every estimate they give measures disorder-sampling error only
 * (percentile bootstrap over realisations); none includes finite-size drift or the resolution of
 * the energy grid.
 */
public enum MobilityMethod {
  /**
   * Transfer matrix: the normalised localisation length Λ = 1/(γM) of quasi-1D bars of widths M = L
   * (quantity {@code lambda}; MacKinnon and Kramer, PRL 47, 1546 (1981)). A state at energy E is
   * classed localised where Λ decreases with M, extended where it increases, and at a mobility edge
   * where the Λ(M) curves of two widths cross (one-parameter scaling, common practice).
   *
   * <p>Assumptions: one-parameter scaling holds at the widths computed; Λ is monotonic in M at
   * fixed E. Failure modes: corrections to scaling make crossings of small widths drift with M (the
   * crossing of the two largest widths is the best estimate, still not the M → ∞ value);
   * non-monotonic Λ(M) (reported per point as undecided when the sign of Λ(M_large) − Λ(M_small) is
   * not resolved by its bootstrap interval); near band edges Λ is small and the crossing shallow,
   * so its interval is wide; realisations that fail to converge (length guard) are missing, which
   * biases Λ downwards where γ is smallest.
   */
  TRANSFER_MATRIX,
  /**
   * Level statistics: the mean adjacent-gap ratio ⟨r⟩ per energy window ({@code level-ratio.w<k>}
   * at window centres {@code level-ratio.e<k>}), against Poisson 2 ln 2 − 1 (localised) and the
   * Wigner–Dyson value of the study's effective class (extended). With two or more sizes the edge
   * is where the ⟨r⟩(E) curves of the two largest sizes cross (⟨r⟩ moves towards Poisson with size
   * where states are localised, towards Wigner–Dyson where they are extended); with one size it is
   * where ⟨r⟩ passes the midpoint between the two reference values. The gap window from two sizes
   * is where the larger size's ⟨r⟩ stays at or below its value at the robust crossings (not where
   * the size difference is negative: deep in a localised or extended region both sizes sit at the
   * same limit and the sign of their difference is noise).
   *
   * <p>Assumptions: windows are narrow enough that the density of states is nearly constant inside
   * and wide enough to hold many levels; symmetry sectors were resolved by the worker. Failure
   * modes: windows with few levels (band tails) give noisy and biased ⟨r⟩ and are dropped when
   * present in fewer than {@link MobilityOps#MIN_WINDOW_PRESENCE} of the realisations; windows
   * whose edges follow each realisation's spectrum mean slightly different energies in different
   * realisations (use fixed windowMin/windowMax); the midpoint criterion is a convention whose
   * value at a true edge depends on size (the critical ⟨r⟩ lies between the two limits, not at
   * their midpoint); an unknown effective class leaves the Wigner–Dyson value, and so the midpoint
   * criterion, undefined; where both sizes are saturated at one limit, noise produces spurious size
   * crossings (reported, with low existence fractions).
   */
  LEVEL_RATIO,
  /**
   * Invariant plateau: the window of Fermi energies around the reference energy where the
   * invariant's across-realisation distribution stays quantised, i.e. the fraction of realisations
   * within {@link SampleStatisticsOps#QUANTISATION_TOLERANCE} of the plateau integer is at least
   * {@link MobilityOps#QUANTISED_FRACTION}; from {@code <name>@E<k>} quantities (e.g. {@code
   * bott@E<k>} with energies {@code bott@E<k>.energy}) or from an integer invariant on a grid sweep
   * of {@code fermiEnergy}. The plateau integer is the modal value at the energy nearest the
   * reference.
   *
   * <p>Assumptions: inside a mobility gap the invariant of a finite sample is quantised in almost
   * every realisation. Failure modes: the threshold is arbitrary (a stricter threshold gives a
   * narrower window); with few realisations the fraction is coarse (n = 20 resolves only steps of
   * 0.05); in finite samples the window shrinks as localisation lengths near the edges exceed the
   * sample, so it is a finite-size estimate; window ends are linear interpolations between energies
   * of the scan, so the scan spacing limits the resolution; a window reaching the end of the scan
   * is flagged open (the half-width is then a lower bound).
   */
  INVARIANT_PLATEAU
}
