package hopstat.spec;

import java.util.List;
import java.util.Objects;

/**
 * One entry of the spec's {@code parameters} block after validation.
 *
 * @param name parameter name as written in the spec
 * @param values the values, in the order given (one value for a plain number)
 * @param swept true when the spec gave a list or a range: the parameter is a grid axis
 */
public record ParameterSpec(String name, List<Double> values, boolean swept) {
  public ParameterSpec {
    Objects.requireNonNull(name, "name");
    values = List.copyOf(values);
    if (values.isEmpty()) {
      throw new IllegalArgumentException("a parameter needs at least one value");
    }
  }
}
