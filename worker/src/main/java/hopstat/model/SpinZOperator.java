package hopstat.model;

import java.util.Arrays;

/**
 * A local, diagonal spin operator S_z (in units of ħ/2): orbital o of every site has S_z = {@code
 * orbitalSpins[o]} = +1 (up) or −1 (down). Models with a spin degree of freedom declare it through
 * {@link Model#spinZ()}; spin-resolved invariants use it, and check themselves whether the
 * Hamiltonian of a realisation conserves it.
 *
 * @param orbitalSpins +1 or −1 per orbital of a site; copied in and out
 */
public record SpinZOperator(int[] orbitalSpins) {
  public SpinZOperator {
    int up = 0;
    for (int s : orbitalSpins) {
      if (s != 1 && s != -1) {
        throw new IllegalArgumentException("orbital spins must be +1 or -1: " + s);
      }
      up += s > 0 ? 1 : 0;
    }
    if (up == 0 || up == orbitalSpins.length) {
      throw new IllegalArgumentException("a spin operator needs both up and down orbitals");
    }
    orbitalSpins = orbitalSpins.clone();
  }

  @Override
  public int[] orbitalSpins() {
    return orbitalSpins.clone();
  }

  /** S_z of orbital o (±1). */
  public int spinOf(int orbital) {
    return orbitalSpins[orbital];
  }

  /** Number of orbitals per site. */
  public int orbitalsPerSite() {
    return orbitalSpins.length;
  }

  /** Number of orbitals with the given spin (±1) per site. */
  public int count(int spin) {
    int c = 0;
    for (int s : orbitalSpins) {
      c += s == spin ? 1 : 0;
    }
    return c;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof SpinZOperator s && Arrays.equals(orbitalSpins, s.orbitalSpins);
  }

  @Override
  public int hashCode() {
    return Arrays.hashCode(orbitalSpins);
  }

  @Override
  public String toString() {
    return "SpinZOperator" + Arrays.toString(orbitalSpins);
  }
}
