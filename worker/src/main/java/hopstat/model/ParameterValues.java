package hopstat.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The resolved numeric parameters of one grid point (model parameters, disorder strengths, L,
 * fermiEnergy, …), defaults already applied. Immutable; iteration order is the spec's order.
 */
public record ParameterValues(Map<String, Double> values) {

  public ParameterValues {
    values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
  }

  /** The value of {@code name}; a missing name is a programming error (validation ran before). */
  public double get(String name) {
    Double v = values.get(name);
    if (v == null) {
      throw new IllegalStateException("parameter '" + name + "' was not resolved for this point");
    }
    return v;
  }

  public boolean has(String name) {
    return values.containsKey(name);
  }
}
