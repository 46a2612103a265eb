package hopstat.invariant;

/**
 * Majorana number of a closed BdG chain.
 *
 * @param q sign Pf(A_periodic) · sign Pf(A_antiperiodic): −1 non-trivial, +1 trivial, 0 when a
 *     Pfaffian vanishes (a fermion zero mode under one closure: the number is undefined)
 * @param logAbsPeriodic ln|Pf(A)| with periodic closure (−∞ if zero)
 * @param logAbsAntiperiodic ln|Pf(A)| with antiperiodic closure (−∞ if zero)
 */
public record MajoranaNumberResult(int q, double logAbsPeriodic, double logAbsAntiperiodic) {
  public MajoranaNumberResult {
    if (q < -1 || q > 1) {
      throw new IllegalArgumentException("q must be -1, 0 or +1: " + q);
    }
  }
}
