package hopstat.spec;

import hopstat.lattice.Boundary;
import hopstat.model.CustomModelDefinition;
import hopstat.model.Model;
import hopstat.model.ModelCatalog;
import hopstat.model.SymmetryClass;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A validated job spec.
 *
 * @param name job name (letters, digits, '.', '_', '-')
 * @param description free text, may be empty
 * @param seed the job seed every random number derives from
 * @param model model name
 * @param parameters the parameters block in spec order, model defaults filled in after the user's
 *     entries
 * @param disorder disorder terms in spec order
 * @param boundary boundary condition
 * @param observables observable names in spec order
 * @param realisations realisations per grid point (the maximum when sampling is adaptive)
 * @param sampling adaptive sampling rule, or null for a fixed number of realisations
 * @param effectiveClass the model's class restricted by what the disorder keeps
 * @param specHash SHA-256 (hex) of the spec's canonical JSON (keys sorted, no whitespace)
 * @param customModel the {@code lattice} block of a {@code custom} model, else null
 */
public record JobSpec(
    String name,
    String description,
    long seed,
    String model,
    List<ParameterSpec> parameters,
    List<DisorderSpec> disorder,
    Boundary boundary,
    List<String> observables,
    int realisations,
    SamplingSpec sampling,
    SymmetryClass effectiveClass,
    String specHash,
    CustomModelDefinition customModel) {

  /** A spec of a built-in model. */
  public JobSpec(
      String name,
      String description,
      long seed,
      String model,
      List<ParameterSpec> parameters,
      List<DisorderSpec> disorder,
      Boundary boundary,
      List<String> observables,
      int realisations,
      SamplingSpec sampling,
      SymmetryClass effectiveClass,
      String specHash) {
    this(
        name,
        description,
        seed,
        model,
        parameters,
        disorder,
        boundary,
        observables,
        realisations,
        sampling,
        effectiveClass,
        specHash,
        null);
  }

  public JobSpec {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(model, "model");
    Objects.requireNonNull(boundary, "boundary");
    Objects.requireNonNull(specHash, "specHash");
    parameters = List.copyOf(parameters);
    disorder = List.copyOf(disorder);
    observables = List.copyOf(observables);
    if (realisations < 1) {
      throw new IllegalArgumentException("realisations must be positive");
    }
  }

  /** The parameter of that name, if the spec (or a default) defines it. */
  public Optional<ParameterSpec> parameter(String name) {
    for (ParameterSpec p : parameters) {
      if (p.name().equals(name)) {
        return Optional.of(p);
      }
    }
    return Optional.empty();
  }

  /** The model the spec runs, through {@link ModelCatalog#resolve}. */
  public Model resolveModel() {
    return ModelCatalog.resolve(model, customModel);
  }

  /** Adaptive sampling, if the spec asks for it. */
  public Optional<SamplingSpec> adaptiveSampling() {
    return Optional.ofNullable(sampling);
  }
}
