package hopstat.model;

import java.util.Objects;

/**
 * A named model parameter.
 *
 * @param name the key used in the job spec's {@code parameters} block
 * @param defaultValue value used when the spec omits it; {@code null} means the spec must give it
 * @param description meaning, units and convention, shown by {@code hopstat models}
 */
public record ParameterInfo(String name, Double defaultValue, String description) {
  public ParameterInfo {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(description, "description");
  }

  public boolean isRequired() {
    return defaultValue == null;
  }
}
