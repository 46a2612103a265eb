package hopstat.model;

import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/** The built-in models, by spec name. */
public final class ModelCatalog {

  private static final Map<String, Model> MODELS = build();

  private ModelCatalog() {}

  private static Map<String, Model> build() {
    Map<String, Model> m = new LinkedHashMap<>();
    register(m, new QwzModel());
    register(m, new HaldaneModel());
    register(m, new FluxSquareModel());
    register(m, new PipSquareModel());
    register(m, new BhzModel());
    register(m, new PWaveWireModel());
    register(m, new DiiiWireModel());
    register(m, new IsingChainModel());
    register(m, new SshModel());
    register(m, new MajoranaClusterModel());
    for (int d = 1; d <= 3; d++) register(m, new AndersonModel(d));
    return Collections.unmodifiableMap(m);
  }

  private static void register(Map<String, Model> m, Model model) {
    if (m.put(model.name(), model) != null) {
      throw new IllegalStateException("duplicate model name " + model.name());
    }
  }

  public static Optional<Model> find(String name) {
    return Optional.ofNullable(MODELS.get(name));
  }

  /**
   * The model a point runs: the user's {@link CustomModel} when {@code name} is {@value
   * CustomModel#NAME}, else the built-in model of that name. The one lookup every worker and
   * scheduler path uses.
   *
   * @param definition the spec's lattice block; required for {@code custom}, must be null otherwise
   * @throws IllegalStateException for an unknown name or a definition that does not match the name
   *     (validation runs first)
   */
  public static Model resolve(String name, CustomModelDefinition definition) {
    if (CustomModel.NAME.equals(name)) {
      if (definition == null) {
        throw new IllegalStateException("model custom needs its lattice definition");
      }
      return new CustomModel(definition);
    }
    if (definition != null) {
      throw new IllegalStateException(
          "a lattice definition is only read by model custom, not " + name);
    }
    return find(name).orElseThrow(() -> new IllegalStateException("unknown model " + name));
  }

  /** The built-in models (without {@code custom}, which needs a definition). */
  public static Collection<Model> all() {
    return MODELS.values();
  }
}
