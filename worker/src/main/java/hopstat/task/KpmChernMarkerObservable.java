package hopstat.task;

import hopstat.invariant.KpmChernMarkerKernel;
import hopstat.invariant.KpmChernMarkerResult;
import hopstat.invariant.KpmChernMarkerWorkspace;
import hopstat.lattice.Boundary;
import hopstat.model.Model;
import hopstat.model.ParameterInfo;
import hopstat.model.ParameterValues;
import hopstat.model.SymmetryClass;
import hopstat.spectrum.CsrHermitianMatrix;
import hopstat.spectrum.KpmKernel;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code kpm-chern-marker}: the bulk-averaged Bianco–Resta local Chern marker with the projector
 * expanded in Chebyshev polynomials and a stochastic trace over the bulk ({@link
 * KpmChernMarkerKernel}); same region and sign as {@code chern-marker}. Random vectors come from
 * the realisation's generator after the disorder and after observables listed earlier in the spec.
 */
final class KpmChernMarkerObservable implements KpmObservable {

  static final String NAME = "kpm-chern-marker";

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public String description() {
    return "Bianco-Resta local Chern marker (PRB 84, 241106(R) (2011)) -4 pi Im <r|P X Q Y P|r> per unit cell, averaged"
        + " over the central half (in each direction) of the open sample, same region and sign as chern-marker (qwz: +1"
        + " for -2<m<0), without diagonalisation: P = theta(E_F - H) as a kpmMoments-term Chebyshev series with the Jackson"
        + " kernel (Weisse et al., RMP 78, 275 (2006)), the bulk trace estimated with kpmVectors random-phase vectors on the"
        + " bulk orbitals (drawn after the disorder). kpm-chern-marker-error: standard error over the vectors (stochastic"
        + " part only; the polynomial's truncation error, small when the gap at E_F exceeds ~pi a / kpmMoments, is not"
        + " included). Cost 2 kpmVectors kpmMoments sparse products.";
  }

  @Override
  public List<ParameterInfo> parameters() {
    return List.of(KpmSupport.MOMENTS_PARAMETER, KpmSupport.VECTORS_PARAMETER);
  }

  @Override
  public List<Quantity> quantities() {
    return List.of(
        new Quantity(
            "kpm-chern-marker",
            true,
            "1",
            "bulk-averaged local Chern marker (KPM, stochastic trace), unrounded"),
        new Quantity(
            "kpm-chern-marker-error",
            false,
            "1",
            "standard error of kpm-chern-marker over the random vectors"));
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
    return new ChernMarkerObservable().whyNotApplicable(model, boundary, effectiveClass);
  }

  @Override
  public Optional<String> whyNotApplicableWith(
      hopstat.disorder.DisorderKind kind, Map<String, List<Double>> parameters) {
    return KpmSupport.whyNotWith(NAME, kind);
  }

  @Override
  public void compute(RealisationContext context, Map<String, Double> out) {
    ParameterValues p = context.point().parameters();
    int moments = KpmSupport.integer(p, KpmSupport.MOMENTS_PARAMETER, 2, KpmSupport.MAX_MOMENTS);
    int vectors = KpmSupport.integer(p, KpmSupport.VECTORS_PARAMETER, 2, KpmSupport.MAX_VECTORS);
    CsrHermitianMatrix h = context.sparseHamiltonian();
    KpmChernMarkerWorkspace ws =
        context
            .workspace()
            .scratch(KpmChernMarkerWorkspace.class, linalg -> new KpmChernMarkerWorkspace());
    KpmChernMarkerResult r =
        KpmChernMarkerKernel.compute(
            h,
            context.lattice(),
            KpmKernel.scale(h),
            context.fermiEnergy(),
            moments,
            vectors,
            context.random(),
            ws);
    if (r.bulkSites() == 0) {
      throw new IllegalStateException("the bulk region of the sample holds no site (L too small)");
    }
    out.put("kpm-chern-marker", r.bulkAverage());
    out.put("kpm-chern-marker-error", r.standardError());
  }
}
