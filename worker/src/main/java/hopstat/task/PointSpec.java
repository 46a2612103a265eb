package hopstat.task;

import hopstat.disorder.DisorderTerm;
import hopstat.lattice.Boundary;
import hopstat.model.CustomModelDefinition;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.ParameterValues;
import java.util.List;
import java.util.Objects;

/**
 * Everything a worker needs to compute one realisation at a grid point, apart from the
 * realisation's seed. Shared by all realisations of the point.
 *
 * @param model model name (validated against the catalogue)
 * @param parameters all resolved numeric parameters, including {@code L} and {@code fermiEnergy}
 * @param linearSize L, unit cells per direction
 * @param boundary boundary condition
 * @param fermiEnergy E_F in the model's energy unit
 * @param disorder disorder terms in spec order (random draws follow this order)
 * @param observables observable names in spec order
 * @param customModel the user's model definition when {@code model} is {@code custom}, else null
 */
public record PointSpec(
    String model,
    ParameterValues parameters,
    int linearSize,
    Boundary boundary,
    double fermiEnergy,
    List<DisorderTerm> disorder,
    List<String> observables,
    CustomModelDefinition customModel) {

  /** A point of a built-in model. */
  public PointSpec(
      String model,
      ParameterValues parameters,
      int linearSize,
      Boundary boundary,
      double fermiEnergy,
      List<DisorderTerm> disorder,
      List<String> observables) {
    this(model, parameters, linearSize, boundary, fermiEnergy, disorder, observables, null);
  }

  public PointSpec {
    Objects.requireNonNull(model, "model");
    Objects.requireNonNull(parameters, "parameters");
    Objects.requireNonNull(boundary, "boundary");
    if (linearSize < 1) {
      throw new IllegalArgumentException("L must be positive: " + linearSize);
    }
    if (!Double.isFinite(fermiEnergy)) {
      throw new IllegalArgumentException("fermiEnergy must be finite");
    }
    disorder = List.copyOf(disorder);
    observables = List.copyOf(observables);
  }

  /** The model to run, through {@link ModelCatalog#resolve} (the one lookup for every path). */
  public Model resolveModel() {
    return ModelCatalog.resolve(model, customModel);
  }
}
