package hopstat.task;

/** How a realisation ended. */
public enum Outcome {
  /** All requested observables computed and finite. */
  DONE,
  /** An exception, a non-converged solver, a NaN/Inf or a symmetry violation; see the reason. */
  FAILED
}
