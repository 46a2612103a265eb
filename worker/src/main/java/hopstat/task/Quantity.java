package hopstat.task;

import java.util.Objects;

/**
 * One number an observable produces per realisation.
 *
 * @param name column name in journals and summaries
 * @param integerValued true for invariants whose exact value is an integer (their distribution of
 *     rounded values and distance from the nearest integer are reported)
 * @param unit unit text, e.g. {@code "t"} (model energy unit) or {@code "1"}
 * @param description meaning, convention and source
 */
public record Quantity(String name, boolean integerValued, String unit, String description) {
  public Quantity {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(unit, "unit");
    Objects.requireNonNull(description, "description");
  }
}
