package hopstat.model;

/** The three generic symmetries of the tenfold way. */
public enum Symmetry {
  /** Antiunitary T commuting with H. */
  TIME_REVERSAL,
  /** Antiunitary C anticommuting with H (BdG particle–hole). */
  PARTICLE_HOLE,
  /** Unitary S anticommuting with H (sublattice). */
  CHIRAL
}
