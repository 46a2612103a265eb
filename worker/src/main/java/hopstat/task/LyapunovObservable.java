package hopstat.task;

import hopstat.disorder.DisorderCatalog;
import hopstat.disorder.DisorderKind;
import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.lattice.Lattice;
import hopstat.localisation.LyapunovResult;
import hopstat.localisation.LyapunovSpec;
import hopstat.localisation.TransferMatrixKernel;
import hopstat.localisation.TransferMatrixWorkspace;
import hopstat.model.Model;
import hopstat.model.ParameterInfo;
import hopstat.model.ParameterValues;
import hopstat.model.SliceHamiltonian;
import hopstat.model.SymmetryClass;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.random.RandomGenerator;

/**
 * {@code lyapunov}: the smallest positive Lyapunov exponent of a long quasi-1D bar of cross-section
 * M = L (M^{d−1} sites) at energy {@code energy}, by the transfer-matrix method (MacKinnon &amp;
 * Kramer, PRL 47, 1546 (1981); Z. Phys. B 53, 1 (1983)); see {@link TransferMatrixKernel} for the
 * iteration, the error estimate and the stopping rule.
 *
 * <p>The bar is not the L^d sample the runner built: it grows slice by slice until the target
 * error is reached. Transverse boundary = the spec's boundary. Each slice's Hamiltonian is the
 * model's clean slice plus the spec's disorder terms applied, in spec order, to the slice lattice,
 * drawing from the realisation's generator ({@link RealisationContext#random()}) slice after
 * slice, after the draws made for the L^d sample. Supported models: those implementing {@link
 * SliceHamiltonian} (today {@code anderson-1d/2d/3d}).
 *
 * <p>Quantities: {@code lyapunov} = γ_min per lattice spacing (amplitude convention |ψ| ~ e^{−γx}),
 * {@code lambda} = Λ = 1/(γ_min·M) (MacKinnon–Kramer's normalised localisation length, with M = 1
 * for d = 1), {@code lyapunov-error} = estimated relative standard error of γ_min. A run that hits
 * the length guard (e.g. a clean bar inside the band, where γ_min = 0) is a ConvergenceFailure.
 */
final class LyapunovObservable implements Observable {

  static final String NAME = "lyapunov";
  static final double DEFAULT_ERROR = 0.01;
  static final double DEFAULT_MAX_LENGTH = 1e7;

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Transfer-matrix Lyapunov exponents of a quasi-1D bar of cross-section M = L (MacKinnon & Kramer, PRL 47,"
        + " 1546 (1981)) at energy 'energy': lyapunov = smallest positive exponent gamma (inverse amplitude localisation"
        + " length per lattice spacing, |psi| ~ exp(-gamma x)), lambda = 1/(gamma M) (M = 1 in d = 1), lyapunov-error ="
        + " relative standard error from the variance of the QR-block increments. The bar grows until lyapunov-error <="
        + " lyapunovError (default 0.01) or lyapunovMaxLength slices (default 1e7, then the realisation fails)."
        + " Disorder is drawn slice by slice. Models with a slice form: anderson-1d, anderson-2d, anderson-3d.";
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo("energy", null, "energy E at which the exponents are computed (model energy unit)"),
        new ParameterInfo("lyapunovError", DEFAULT_ERROR, "target relative standard error of the smallest exponent"),
        new ParameterInfo("lyapunovMaxLength", DEFAULT_MAX_LENGTH, "length guard in slices; longer runs fail as not converged"));
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity("lyapunov", false, "1/a", "smallest positive Lyapunov exponent gamma per lattice spacing a (amplitude)"),
        new Quantity("lambda", false, "1", "normalised localisation length Lambda = 1/(gamma M)"),
        new Quantity("lyapunov-error", false, "1", "estimated relative standard error of gamma"));
  }

  @Override
  public boolean needsOccupiedStates() {
    return false;
  }

  @Override
  public Optional<String> whyNotApplicable(Model model, Boundary boundary, SymmetryClass effectiveClass) {
    if (!(model instanceof SliceHamiltonian)) {
      return Optional.of("the transfer-matrix observable 'lyapunov' needs a model with a slice form (anderson-1d,"
          + " anderson-2d, anderson-3d); " + model.name() + " has none");
    }
    return Optional.empty();
  }

  @Override
  public Optional<String> whyNotApplicableWith(hopstat.disorder.DisorderKind kind, Map<String, List<Double>> parameters) {
    return kind.isSliceLocal() ? Optional.empty()
        : Optional.of("the transfer-matrix observable 'lyapunov' applies the disorder slice by slice; " + kind.name()
            + " changes bonds between sites or cancels terms, which a slice cannot see");
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    Model model = context.model();
    if (!(model instanceof SliceHamiltonian sliced)) {
      throw new IllegalStateException("model " + model.name() + " has no slice form");
    }
    ParameterValues parameters = context.point().parameters();
    if (!parameters.has("energy")) {
      throw new InvalidInputException("parameters.energy", null, "the observable 'lyapunov' needs the parameter 'energy'");
    }
    LyapunovSpec spec = new LyapunovSpec(
        parameters.get("energy"),
        parameters.has("lyapunovError") ? parameters.get("lyapunovError") : DEFAULT_ERROR,
        (long) (parameters.has("lyapunovMaxLength") ? parameters.get("lyapunovMaxLength") : DEFAULT_MAX_LENGTH));
    int crossSection = context.point().linearSize();
    Lattice slice = sliced.sliceLattice(crossSection, context.point().boundary());
    int k = slice.orbitals();
    double[] hopping = new double[k * k];
    sliced.interSliceHopping(parameters, slice, hopping);

    List<DisorderTerm> terms = context.point().disorder();
    List<DisorderKind> kinds = new ArrayList<>(terms.size());
    for (DisorderTerm term : terms) {
      kinds.add(DisorderCatalog.find(term.type()).orElseThrow(() -> new IllegalStateException("unknown disorder " + term.type())));
    }
    RandomGenerator random = context.random();
    TransferMatrixKernel.SliceSource source = h -> {
      sliced.addCleanSlice(parameters, slice, h);
      for (int i = 0; i < terms.size(); i++) {
        kinds.get(i).apply(terms.get(i), model, parameters, slice, random, h);
      }
    };
    TransferMatrixWorkspace workspace = context.workspace().scratch(TransferMatrixWorkspace.class, TransferMatrixWorkspace::new);
    LyapunovResult r = TransferMatrixKernel.run(hopping, k, spec, source, workspace);
    if (!r.converged() || !(r.smallestPositive() > 0)) {
      throw new ConvergenceFailure("transfer matrix: relative error " + r.relativeError() + " after " + r.slices()
          + " slices (target " + spec.targetRelativeError() + ", gamma " + r.smallestPositive() + ")");
    }
    int m = model.dimension() == 1 ? 1 : crossSection;
    out.put("lyapunov", r.smallestPositive());
    out.put("lambda", 1.0 / (r.smallestPositive() * m));
    out.put("lyapunov-error", r.relativeError());
  }
}
