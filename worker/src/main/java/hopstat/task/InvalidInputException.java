package hopstat.task;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The one exception type for bad user input. It carries every violation found, each with the field
 * path from the root of the user's file (e.g. {@code parameters.L[1]}), the rejected value and what
 * is allowed. Validation collects all violations and throws once.
 */
public final class InvalidInputException extends RuntimeException {

  private static final long serialVersionUID = 1L;

  /**
   * One problem in the input.
   *
   * @param fieldPath path from the root of the user's file, e.g. {@code disorder[0].strength}
   * @param rejectedValue the offending value as text, or {@code null} when the field is missing
   * @param reason what is wrong and what is allowed
   */
  public record Violation(String fieldPath, String rejectedValue, String reason) {
    public Violation {
      Objects.requireNonNull(fieldPath, "fieldPath");
      Objects.requireNonNull(reason, "reason");
    }

    /** One readable line: {@code path: reason (got value)}. */
    public String describe() {
      String path = fieldPath.isEmpty() ? "(root)" : fieldPath;
      return rejectedValue == null
          ? path + ": " + reason
          : path + ": " + reason + " (got " + rejectedValue + ")";
    }
  }

  private final List<Violation> violations;

  public InvalidInputException(List<Violation> violations) {
    super(render(violations));
    if (violations.isEmpty()) {
      throw new IllegalArgumentException("an InvalidInputException needs at least one violation");
    }
    this.violations = List.copyOf(violations);
  }

  public InvalidInputException(String fieldPath, Object rejectedValue, String reason) {
    this(
        List.of(
            new Violation(
                fieldPath, rejectedValue == null ? null : String.valueOf(rejectedValue), reason)));
  }

  /** All violations, in the order they were found. */
  public List<Violation> violations() {
    return violations;
  }

  private static String render(List<Violation> violations) {
    List<String> lines = new ArrayList<>();
    for (Violation v : violations) {
      lines.add(v.describe());
    }
    return String.join("; ", lines);
  }

  /** Collects violations during validation; {@link #throwIfAny()} throws them all at once. */
  public static final class Collector {
    private final List<Violation> found = new ArrayList<>();

    public void add(String fieldPath, Object rejectedValue, String reason) {
      found.add(
          new Violation(
              fieldPath, rejectedValue == null ? null : String.valueOf(rejectedValue), reason));
    }

    public void addAll(InvalidInputException e) {
      found.addAll(e.violations());
    }

    public boolean isEmpty() {
      return found.isEmpty();
    }

    public void throwIfAny() {
      if (!found.isEmpty()) {
        throw new InvalidInputException(found);
      }
    }
  }
}
