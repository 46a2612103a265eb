package hopstat.spec;

import java.util.Collections;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * One entry of the spec's {@code disorder} list after validation.
 *
 * @param type disorder kind name
 * @param strengthValue the strength when the spec gave a number, else NaN
 * @param strengthParameter the parameter name when the spec gave a name, else null
 * @param options the remaining keys of the entry, as text
 */
public record DisorderSpec(
    String type, double strengthValue, String strengthParameter, Map<String, String> options) {
  public DisorderSpec {
    Objects.requireNonNull(type, "type");
    if ((strengthParameter == null) == Double.isNaN(strengthValue)) {
      throw new IllegalArgumentException("a strength is either a number or a parameter name");
    }
    options = Collections.unmodifiableMap(new TreeMap<>(options));
  }
}
