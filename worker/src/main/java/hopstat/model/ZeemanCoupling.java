package hopstat.model;

import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;

/**
 * Capability of a spinful model with a Zeeman coupling along its spin quantisation axis z: adds h
 * (n_↑ − n_↓) on one site (for BdG models in particle–hole symmetric form, so C is kept while time
 * reversal T = i s_y K is broken). Used by the {@code zeeman-box} disorder.
 */
public interface ZeemanCoupling {

  /**
   * Adds h (n_{site,↑} − n_{site,↓}).
   *
   * @param lattice read: the model's lattice
   * @param site 0 ≤ site &lt; lattice.sites()
   * @param field h in the energy unit
   * @param out terms appended
   */
  void addZeemanField(Lattice lattice, int site, double field, HamiltonianBuilder out);
}
