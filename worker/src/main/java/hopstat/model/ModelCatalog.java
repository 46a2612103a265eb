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

  public static Collection<Model> all() {
    return MODELS.values();
  }
}
