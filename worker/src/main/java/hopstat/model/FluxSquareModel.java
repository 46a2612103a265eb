package hopstat.model;

import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import java.util.List;
import java.util.Optional;

/**
 * The square-lattice tight-binding model in a uniform magnetic field (Harper–Hofstadter), flux α =
 * p/q flux quanta per plaquette, Landau gauge A = (0, B x):
 *
 * <pre>  H = −t Σ_r [ c†_{r+x} c_r + e^{2πi α x} c†_{r+y} c_r + h.c. ],</pre>
 *
 * one orbital per site, r = (x, y) with 0 ≤ x, y &lt; L. Going counter-clockwise around any
 * plaquette collects the phase e^{2πi α}. On the torus e^{2πi α x} must be periodic in x, so L must
 * be a multiple of q ({@link #whyNotValid}). For coprime p, q the spectrum has q bands; the Chern
 * number of the r lowest bands (E_F in the r-th gap) solves the Diophantine equation r = q s_r + p
 * t_r, |t_r| ≤ q/2 (Thouless, Kohmoto, Nightingale, den Nijs, PRL 49, 405 (1982)) up to a
 * convention-dependent sign; with this sign of the phase the Bott index (and hence C in the
 * convention of {@link QwzModel}) of the r lowest bands is −t_r, e.g. C = −1 for the lowest band at
 * flux 1/3 (fixed by a test; flipping the sign of p flips it).
 */
public final class FluxSquareModel implements Model {

  public static final String NAME = "flux-square";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "square lattice with flux p/q per plaquette (Harper-Hofstadter), Landau gauge:"
        + " H = -t sum_r [c+_{r+x} c_r + exp(2 pi i (p/q) x) c+_{r+y} c_r + h.c.]; periodic samples need L a multiple of q;"
        + " Chern number (bott convention) of the r lowest bands = -t_r with r = q s_r + p t_r, |t_r| <= q/2 (Thouless,"
        + " Kohmoto, Nightingale, den Nijs, PRL 49, 405 (1982)); e.g. -1 for the lowest band at flux 1/3.";
  }

  @Override
  public SymmetryClass symmetryClass() {
    return SymmetryClass.A;
  }

  @Override
  public int dimension() {
    return 2;
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo(
            "p", null, "flux numerator p (integer): flux per plaquette p/q flux quanta"),
        new ParameterInfo("q", null, "flux denominator q (integer >= 1)"),
        new ParameterInfo("t", 1.0, "hopping t (energy unit)"));
  }

  @Override
  public Lattice lattice(int linearSize, Boundary boundary) {
    return Lattice.square(linearSize, 1, boundary);
  }

  @Override
  public Optional<String> whyNotValid(
      ParameterValues parameters, int linearSize, Boundary boundary) {
    double p = parameters.get("p");
    double q = parameters.get("q");
    if (p != Math.rint(p)
        || q != Math.rint(q)
        || Math.abs(p) > Integer.MAX_VALUE
        || q > Integer.MAX_VALUE) {
      return Optional.of("flux-square needs integer p and q, got p = " + p + ", q = " + q);
    }
    if (q < 1) {
      return Optional.of("flux-square needs q >= 1, got q = " + q);
    }
    if (boundary == Boundary.PERIODIC && linearSize % (int) q != 0) {
      return Optional.of(
          "a periodic flux-square sample needs L to be a multiple of q = "
              + (int) q
              + ", got L = "
              + linearSize);
    }
    return Optional.empty();
  }

  @Override
  public void addClean(ParameterValues parameters, Lattice lattice, HamiltonianBuilder out) {
    double alpha = parameters.get("p") / parameters.get("q");
    double t = parameters.get("t");
    int size = lattice.linearSize();
    boolean periodic = lattice.boundary() == Boundary.PERIODIC;
    for (int y = 0; y < size; y++) {
      for (int x = 0; x < size; x++) {
        int s = x + size * y;
        if (x + 1 < size || (periodic && size > 1)) {
          out.addHopping((x + 1) % size + size * y, s, -t, 0.0);
        }
        if (y + 1 < size || (periodic && size > 1)) {
          double angle = 2.0 * Math.PI * alpha * x;
          out.addHopping(
              x + size * ((y + 1) % size), s, -t * Math.cos(angle), -t * Math.sin(angle));
        }
      }
    }
  }
}
