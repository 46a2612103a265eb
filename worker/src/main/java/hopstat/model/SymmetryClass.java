package hopstat.model;

import java.util.Locale;
import java.util.Optional;

/**
 * The ten Altland–Zirnbauer classes with the squares of time reversal T, particle–hole C and the
 * presence of chiral S, and the periodic table of strong invariants for d = 0..3 (Kitaev, AIP Conf.
 * Proc. 1134, 22 (2009); Schnyder, Ryu, Furusaki, Ludwig, PRB 78, 195125 (2008)).
 *
 * <p>{@code timeReversalSquare}/{@code particleHoleSquare}: +1, −1, or 0 when absent.
 */
public enum SymmetryClass {
  A(0, 0, false, "Z", "0", "Z", "0"),
  AIII(0, 0, true, "0", "Z", "0", "Z"),
  AI(1, 0, false, "Z", "0", "0", "0"),
  BDI(1, 1, true, "Z2", "Z", "0", "0"),
  D(0, 1, false, "Z2", "Z2", "Z", "0"),
  DIII(-1, 1, true, "0", "Z2", "Z2", "Z"),
  AII(-1, 0, false, "2Z", "0", "Z2", "Z2"),
  CII(-1, -1, true, "0", "2Z", "0", "Z2"),
  C(0, -1, false, "0", "0", "2Z", "0"),
  CI(1, -1, true, "0", "0", "0", "2Z");

  private final int timeReversalSquare;
  private final int particleHoleSquare;
  private final boolean chiral;
  private final String[] invariantGroups;

  SymmetryClass(
      int timeReversalSquare, int particleHoleSquare, boolean chiral, String... invariantGroups) {
    this.timeReversalSquare = timeReversalSquare;
    this.particleHoleSquare = particleHoleSquare;
    this.chiral = chiral;
    this.invariantGroups = invariantGroups;
  }

  public int timeReversalSquare() {
    return timeReversalSquare;
  }

  public int particleHoleSquare() {
    return particleHoleSquare;
  }

  public boolean hasTimeReversal() {
    return timeReversalSquare != 0;
  }

  public boolean hasParticleHole() {
    return particleHoleSquare != 0;
  }

  public boolean hasChiral() {
    return chiral;
  }

  /**
   * The group of strong invariants of gapped free-fermion phases in dimension d: "0", "Z", "2Z" or
   * "Z2".
   *
   * @param dimension 0..3
   */
  public String invariantGroup(int dimension) {
    if (dimension < 0 || dimension > 3) {
      throw new IllegalArgumentException("the table covers d = 0..3, not " + dimension);
    }
    return invariantGroups[dimension];
  }

  /**
   * The class that remains when only the symmetries in {@code kept} survive. Keeping T and C
   * implies S = TC; a chiral class that loses T and C but keeps S becomes AIII.
   */
  public SymmetryClass restrictTo(
      boolean keepTimeReversal, boolean keepParticleHole, boolean keepChiral) {
    int t = keepTimeReversal ? timeReversalSquare : 0;
    int c = keepParticleHole ? particleHoleSquare : 0;
    boolean s = (t != 0 && c != 0) || (chiral && keepChiral && t == 0 && c == 0);
    return of(t, c, s);
  }

  /** The class with these symmetry data. */
  public static SymmetryClass of(int timeReversalSquare, int particleHoleSquare, boolean chiral) {
    for (SymmetryClass k : values()) {
      if (k.timeReversalSquare == timeReversalSquare
          && k.particleHoleSquare == particleHoleSquare
          && k.chiral == chiral) {
        return k;
      }
    }
    throw new IllegalArgumentException(
        "no AZ class with T^2="
            + timeReversalSquare
            + ", C^2="
            + particleHoleSquare
            + ", S="
            + chiral);
  }

  /** Parses a class label such as {@code "BDI"} (case-insensitive). */
  public static Optional<SymmetryClass> parse(String label) {
    try {
      return Optional.of(valueOf(label.toUpperCase(Locale.ROOT)));
    } catch (IllegalArgumentException e) {
      return Optional.empty();
    }
  }
}
