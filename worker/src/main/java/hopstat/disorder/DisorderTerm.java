package hopstat.disorder;

import java.util.Collections;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * One disorder term of a grid point, strength already resolved to a number.
 *
 * @param type disorder type name as in the spec, e.g. {@code onsite-box}
 * @param strength W, in the model's energy unit (≥ 0)
 * @param options type-specific options as text (e.g. {@code orbitals = independent}); copied
 */
public record DisorderTerm(String type, double strength, Map<String, String> options) {
  public DisorderTerm {
    Objects.requireNonNull(type, "type");
    if (!(strength >= 0) || Double.isInfinite(strength)) {
      throw new IllegalArgumentException("strength must be finite and >= 0: " + strength);
    }
    options = Collections.unmodifiableMap(new TreeMap<>(options));
  }
}
