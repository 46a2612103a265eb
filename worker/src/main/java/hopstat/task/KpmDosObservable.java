package hopstat.task;

import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.ParameterInfo;
import hopstat.model.ParameterValues;
import hopstat.model.SymmetryClass;
import hopstat.spectrum.ChebyshevScale;
import hopstat.spectrum.CsrHermitianMatrix;
import hopstat.spectrum.KpmKernel;
import hopstat.spectrum.KpmWorkspace;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code dos}: density of states by the kernel polynomial method (Weiße, Wellein, Alvermann,
 * Fehske, RMP 78, 275 (2006); {@link KpmKernel}) on the sparse Hamiltonian, without a dense matrix.
 *
 * <p>Energies E_k = dosEnergyMin + k·(dosEnergyMax − dosEnergyMin)/(dosEnergies − 1), k =
 * 0..dosEnergies−1 (E_0 = dosEnergyMin when the count is 1). Quantities {@code dos@E<k>} = ρ(E_k)
 * in states per orbital per energy unit, normalised ∫ρ dE = 1 over the whole spectrum, and {@code
 * dos@E<k>.energy} = E_k; names fixed for k &lt; {@link #MAX_ENERGIES}, a realisation writes k &lt;
 * dosEnergies only.
 *
 * <p>Randomness: the R = kpmVectors random-phase vectors are drawn from the realisation's generator
 * ({@link RealisationContext#random()}) after all disorder draws and after the draws of observables
 * listed earlier in the spec, vector after vector, one number per orbital in matrix index order.
 * Resolution: Jackson broadening ≈ π a/M in energy (a = half-width of the rescaled Gershgorin
 * interval, M = kpmMoments); statistical error of each moment ≤ 1/√(N R).
 */
final class KpmDosObservable implements KpmObservable {

  static final String NAME = "dos";
  static final int MAX_ENERGIES = 64;

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "density of states by the kernel polynomial method (Weisse, Wellein, Alvermann, Fehske, RMP 78, 275 (2006)):"
        + " kpmMoments Chebyshev moments with the Jackson kernel, stochastic trace over kpmVectors random-phase vectors"
        + " (drawn after the disorder), spectrum rescaled from its Gershgorin interval to [-0.99, 0.99]; dos@E<k> is the"
        + " density in states per orbital per energy unit (integral over E = 1) at E_k, dosEnergies equally spaced"
        + " energies from dosEnergyMin to dosEnergyMax; dos@E<k>.energy is E_k. Sparse: no dense matrix, cost linear in N.";
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        KpmSupport.MOMENTS_PARAMETER,
        KpmSupport.VECTORS_PARAMETER,
        new ParameterInfo(
            "dosEnergyMin", null, "lowest energy of the density of states (model energy unit)"),
        new ParameterInfo(
            "dosEnergyMax", null, "highest energy of the density of states (model energy unit)"),
        new ParameterInfo(
            "dosEnergies", 33.0, "number of equally spaced energies, 1.." + MAX_ENERGIES));
  }

  @Override
  public List<Quantity> quantities() {
    List<Quantity> q = new ArrayList<>();
    for (int k = 0; k < MAX_ENERGIES; k++) {
      q.add(
          new Quantity(
              "dos@E" + k,
              false,
              "states per orbital per energy unit",
              "KPM density of states at E_" + k + " (Jackson kernel), normalised to integral 1"));
    }
    for (int k = 0; k < MAX_ENERGIES; k++) {
      q.add(new Quantity("dos@E" + k + ".energy", false, "energy", "the energy E_" + k));
    }
    return q;
  }

  @Override
  public boolean needsOccupiedStates() {
    return false;
  }

  @Override
  public boolean needsDenseMatrix() {
    return false;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    return Optional.empty();
  }

  @Override
  public Optional<String> whyNotApplicableWith(
      hopstat.disorder.DisorderKind kind, Map<String, List<Double>> parameters) {
    return KpmSupport.whyNotWith(NAME, kind);
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    ParameterValues p = context.point().parameters();
    for (String name : List.of("dosEnergyMin", "dosEnergyMax")) {
      if (!p.has(name)) {
        throw new InvalidInputException(
            "parameters." + name, null, "the observable '" + NAME + "' needs it");
      }
    }
    int moments = KpmSupport.integer(p, KpmSupport.MOMENTS_PARAMETER, 2, KpmSupport.MAX_MOMENTS);
    int vectors = KpmSupport.integer(p, KpmSupport.VECTORS_PARAMETER, 1, KpmSupport.MAX_VECTORS);
    int count = KpmSupport.integer(p, parameters().get(4), 1, MAX_ENERGIES);
    double min = p.get("dosEnergyMin");
    double max = p.get("dosEnergyMax");
    if (!(max >= min) || !Double.isFinite(min) || !Double.isFinite(max)) {
      throw new InvalidInputException(
          "parameters.dosEnergyMax", max, "must be finite and >= dosEnergyMin (" + min + ")");
    }
    CsrHermitianMatrix h = context.sparseHamiltonian();
    ChebyshevScale scale = KpmKernel.scale(h);
    DosScratch s = context.workspace().scratch(DosScratch.class, linalg -> new DosScratch());
    s.ensure(moments);
    KpmKernel.stochasticMoments(h, scale, moments, vectors, context.random(), s.kpm, s.mu);
    KpmKernel.jacksonKernel(moments, s.jackson);
    for (int k = 0; k < count; k++) {
      double energy = count == 1 ? min : min + k * (max - min) / (count - 1);
      out.put("dos@E" + k, KpmKernel.density(s.mu, s.jackson, moments, scale, energy));
      out.put("dos@E" + k + ".energy", energy);
    }
  }

  /** Per-thread moment arrays and KPM vectors. */
  static final class DosScratch {
    final KpmWorkspace kpm = new KpmWorkspace();
    double[] mu = new double[1];
    double[] jackson = new double[1];

    void ensure(int moments) {
      if (mu.length < moments) {
        mu = new double[moments];
        jackson = new double[moments];
      }
    }
  }
}
