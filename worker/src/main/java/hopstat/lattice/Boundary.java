package hopstat.lattice;

import java.util.Locale;

/** Boundary condition of the finite sample, applied along every lattice direction. */
public enum Boundary {
  /** Torus: bonds wrap around. Needed for the Bott index. */
  PERIODIC,
  /** Open sample with edges. */
  OPEN;

  /** The spelling used in job specs: {@code periodic}, {@code open}. */
  public String specName() {
    return name().toLowerCase(Locale.ROOT);
  }
}
