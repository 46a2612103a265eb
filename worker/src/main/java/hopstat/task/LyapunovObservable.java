package hopstat.task;

import hopstat.disorder.DisorderCatalog;
import hopstat.disorder.DisorderKind;
import hopstat.disorder.DisorderTerm;
import hopstat.disorder.SliceDisorder;
import hopstat.lattice.Boundary;
import hopstat.lattice.HamiltonianBuilder;
import hopstat.lattice.Lattice;
import hopstat.localisation.BarSliceOps;
import hopstat.localisation.BarSlices;
import hopstat.localisation.GreenRecursionKernel;
import hopstat.localisation.GreenRecursionWorkspace;
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
import org.ejml.data.ZMatrixRMaj;

/**
 * {@code lyapunov}: the smallest positive Lyapunov exponent of a long quasi-1D bar of cross-section
 * M = L (M^{d−1} cells) at energy {@code energy} (MacKinnon &amp; Kramer, PRL 47, 1546 (1981); Z.
 * Phys. B 53, 1 (1983)).
 *
 * <p><b>Engines.</b> Models implementing {@link SliceHamiltonian} (the {@code anderson-1d/2d/3d}
 * models: real slices, invertible T = −t·1) run the real transfer-matrix QR iteration {@link
 * TransferMatrixKernel}, kept because it is tested against Kappus–Wegner and closed forms and costs
 * O(K²) per slice for their diagonal T. Every other model with d ≥ 1 runs {@link
 * GreenRecursionKernel} (a QR-stabilised solution-frame recursion that never inverts a coupling) on
 * slices cut from the model's own clean Hamiltonian by {@link BarSliceOps} (complex slices,
 * singular couplings allowed, e.g. BdG wires at Δ = t and the QWZ hopping): qwz, haldane,
 * flux-square, pip-square, bhz, pwave-wire, ising-chain, ssh and custom models whose terms join
 * neighbouring cells along their last direction only. Both engines agree on the anderson models
 * within their errors (tested). {@code majorana-cluster} (d = 0) has no bar.
 *
 * <p>The bar is not the L^d sample the runner built: it grows slice by slice along the last lattice
 * direction until the target error is reached; memory is independent of its length. Transverse
 * boundary = the spec's boundary (see {@link BarSliceOps} for periodic M ≤ 2). Disorder: each slice
 * gets the spec's disorder terms in spec order, drawn from the realisation's generator ({@link
 * RealisationContext#random()}, after the draws made for the L^d sample) slice after slice: for
 * slice n = 1, 2, …, every term in spec order draws slice n's values ({@link SliceDisorder}: onsite
 * kinds one value per site of the slice in slice order; the chain bond kinds the bonds of cell n,
 * including bond n → n+1). Disorder kinds without a slice-wise form make the observable not
 * applicable.
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
    return "Lyapunov exponent of a quasi-1D bar of cross-section M = L grown along the last lattice direction (MacKinnon & Kramer,"
        + " PRL 47, 1546 (1981); Z. Phys. B 53, 1 (1983)) at energy 'energy': lyapunov = smallest positive exponent gamma (inverse"
        + " amplitude localisation length per lattice spacing, |psi| ~ exp(-gamma x)), lambda = 1/(gamma M) (M = 1 in d = 1),"
        + " lyapunov-error = relative standard error from the variance of 4-slice block increments. The bar grows until"
        + " lyapunov-error <= lyapunovError (default 0.01) or lyapunovMaxLength slices (default 1e7, then the realisation fails)."
        + " Disorder is drawn slice by slice. anderson-*: real transfer-matrix QR; every other model with d >= 1 (qwz, haldane,"
        + " flux-square, pip-square, bhz, pwave-wire, ising-chain, ssh, custom with nearest-cell terms along the last direction):"
        + " QR-stabilised solution-frame recursion (no coupling inverted), complex and BdG slices allowed, several zero modes per end"
        + " (E = 0 in topological phases) handled. Disorder kinds: onsite-box, onsite-gauss, field-box,"
        + " coupling-box, pairing-box, bond-box.";
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(
        new ParameterInfo(
            "energy", null, "energy E at which the exponents are computed (model energy unit)"),
        new ParameterInfo(
            "lyapunovError",
            DEFAULT_ERROR,
            "target relative standard error of the smallest exponent"),
        new ParameterInfo(
            "lyapunovMaxLength",
            DEFAULT_MAX_LENGTH,
            "length guard in slices; longer runs fail as not converged"));
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "lyapunov",
            false,
            "1/a",
            "smallest positive Lyapunov exponent gamma per lattice spacing a (amplitude)"),
        new Quantity("lambda", false, "1", "normalised localisation length Lambda = 1/(gamma M)"),
        new Quantity("lyapunov-error", false, "1", "estimated relative standard error of gamma"));
  }

  @Override
  public boolean needsOccupiedStates() {
    return false;
  }

  /** The bar is grown slice by slice; the L^d sample's dense matrix is never built. */
  @Override
  public boolean needsDenseMatrix() {
    return false;
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass) {
    if (model instanceof SliceHamiltonian) {
      return Optional.empty();
    }
    return BarSliceOps.whyNotSliceable(model)
        .map(
            reason -> "the transfer-matrix observable 'lyapunov' needs a bar of slices: " + reason);
  }

  @Override
  public Optional<String> whyNotApplicable(
      Model model, Boundary boundary, SymmetryClass effectiveClass, List<String> disorderTypes) {
    Optional<String> base = whyNotApplicable(model, boundary, effectiveClass);
    if (base.isPresent()) {
      return base;
    }
    for (String type : disorderTypes) {
      Optional<DisorderKind> kind = DisorderCatalog.find(type);
      if (kind.isEmpty()) {
        continue; // reported by the disorder validation
      }
      Optional<String> reason = whyNotSliceable(kind.get(), model);
      if (reason.isPresent()) {
        return reason;
      }
    }
    return Optional.empty();
  }

  private static Optional<String> whyNotSliceable(DisorderKind kind, Model model) {
    if (!(kind instanceof SliceDisorder slice)) {
      return Optional.of(
          "the observable 'lyapunov' draws disorder slice by slice, which disorder '"
              + kind.name()
              + "' does not support (supported: onsite-box, onsite-gauss, field-box, coupling-box, pairing-box, bond-box)");
    }
    return slice
        .whyNotSliceable(model)
        .map(r -> "the observable 'lyapunov' cannot use disorder '" + kind.name() + "': " + r);
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    Model model = context.model();
    ParameterValues parameters = context.point().parameters();
    if (!parameters.has("energy")) {
      throw new InvalidInputException(
          "parameters.energy", null, "the observable 'lyapunov' needs the parameter 'energy'");
    }
    LyapunovSpec spec =
        new LyapunovSpec(
            parameters.get("energy"),
            parameters.has("lyapunovError") ? parameters.get("lyapunovError") : DEFAULT_ERROR,
            (long)
                (parameters.has("lyapunovMaxLength")
                    ? parameters.get("lyapunovMaxLength")
                    : DEFAULT_MAX_LENGTH));
    int crossSection = context.point().linearSize();
    List<DisorderTerm> terms = context.point().disorder();
    List<DisorderKind> kinds = new ArrayList<>(terms.size());
    for (DisorderTerm term : terms) {
      kinds.add(
          DisorderCatalog.find(term.type())
              .orElseThrow(() -> new IllegalStateException("unknown disorder " + term.type())));
    }
    LyapunovResult r =
        model instanceof SliceHamiltonian sliced
            ? runTransferMatrix(context, sliced, parameters, crossSection, spec, terms, kinds)
            : runGreenRecursion(context, parameters, crossSection, spec, terms, kinds);
    if (!r.converged() || !(r.smallestPositive() > 0)) {
      throw new ConvergenceFailure(
          "transfer matrix: relative error "
              + r.relativeError()
              + " after "
              + r.slices()
              + " slices (target "
              + spec.targetRelativeError()
              + ", gamma "
              + r.smallestPositive()
              + ")");
    }
    int m = model.dimension() == 1 ? 1 : crossSection;
    out.put("lyapunov", r.smallestPositive());
    out.put("lambda", 1.0 / (r.smallestPositive() * m));
    out.put("lyapunov-error", r.relativeError());
  }

  /** The anderson models' real transfer-matrix route (unchanged). */
  private static LyapunovResult runTransferMatrix(
      RealisationContext context,
      SliceHamiltonian sliced,
      ParameterValues parameters,
      int crossSection,
      LyapunovSpec spec,
      List<DisorderTerm> terms,
      List<DisorderKind> kinds) {
    Model model = context.model();
    Lattice slice = sliced.sliceLattice(crossSection, context.point().boundary());
    int k = slice.orbitals();
    double[] hopping = new double[k * k];
    sliced.interSliceHopping(parameters, slice, hopping);
    RandomGenerator random = context.random();
    TransferMatrixKernel.SliceSource source =
        h -> {
          sliced.addCleanSlice(parameters, slice, h);
          for (int i = 0; i < terms.size(); i++) {
            kinds.get(i).apply(terms.get(i), model, parameters, slice, random, h);
          }
        };
    TransferMatrixWorkspace workspace =
        context.workspace().scratch(TransferMatrixWorkspace.class, TransferMatrixWorkspace::new);
    return TransferMatrixKernel.run(hopping, k, spec, source, workspace);
  }

  /** Every other model: slices cut from the clean Hamiltonian, {@link GreenRecursionKernel}. */
  private static LyapunovResult runGreenRecursion(
      RealisationContext context,
      ParameterValues parameters,
      int crossSection,
      LyapunovSpec spec,
      List<DisorderTerm> terms,
      List<DisorderKind> kinds) {
    Model model = context.model();
    List<SliceDisorder> sliceKinds = new ArrayList<>(kinds.size());
    for (DisorderKind kind : kinds) {
      whyNotSliceable(kind, model)
          .ifPresent(
              reason -> {
                throw new InvalidInputException("disorder", kind.name(), reason);
              });
      sliceKinds.add((SliceDisorder) kind);
    }
    BarSlices bar;
    try {
      bar = BarSliceOps.extract(model, parameters, crossSection, context.point().boundary());
    } catch (IllegalArgumentException e) {
      throw new InvalidInputException("observables", NAME, e.getMessage());
    }
    int k = bar.orbitals();
    int sliceSites = bar.sliceSites();
    Lattice window = bar.window();
    RandomGenerator random = context.random();
    HamiltonianBuilder drawn = new HamiltonianBuilder();
    GreenRecursionKernel.SliceSource source =
        (h, t) -> {
          bar.copyOnSlice(h);
          bar.copyCoupling(t);
          if (terms.isEmpty()) {
            return;
          }
          drawn.reset(2 * k);
          for (int i = 0; i < terms.size(); i++) {
            sliceKinds
                .get(i)
                .applyToSlice(terms.get(i), model, parameters, window, sliceSites, random, drawn);
          }
          addWindowTerms(drawn, k, h, t);
        };
    GreenRecursionWorkspace workspace =
        context.workspace().scratch(GreenRecursionWorkspace.class, GreenRecursionWorkspace::new);
    return GreenRecursionKernel.run(k, spec, source, workspace);
  }

  /**
   * Adds a window's terms (slice n: 0..K−1, slice n+1: K..2K−1; each term also stands for its
   * conjugate) to H_n and T_n = H_{n+1,n}.
   */
  static void addWindowTerms(HamiltonianBuilder drawn, int k, ZMatrixRMaj h, ZMatrixRMaj t) {
    for (int term = 0; term < drawn.termCount(); term++) {
      int i = drawn.row(term);
      int j = drawn.column(term);
      double re = drawn.realPart(term);
      double im = drawn.imaginaryPart(term);
      if (i < k && j < k) {
        add(h, i, j, re, im);
        if (i != j) {
          add(h, j, i, re, -im);
        }
      } else if (i >= k && j < k) {
        add(t, i - k, j, re, im);
      } else if (i < k) {
        add(t, j - k, i, re, -im);
      } else {
        throw new IllegalStateException(
            "slice disorder added a term inside the next slice (" + i + ", " + j + ")");
      }
    }
  }

  private static void add(ZMatrixRMaj m, int row, int col, double re, double im) {
    int idx = m.getIndex(row, col);
    m.data[idx] += re;
    m.data[idx + 1] += im;
  }
}
