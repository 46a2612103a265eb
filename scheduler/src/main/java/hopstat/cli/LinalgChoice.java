package hopstat.cli;

import hopstat.linalg.LinalgFactory;
import hopstat.linalg.LinalgKind;
import hopstat.task.InvalidInputException;

/**
 * The {@code --linalg} option: {@code auto} (native where it loads), {@code native}, {@code java}.
 */
final class LinalgChoice {

  static final String DEFAULT = "auto";

  private LinalgChoice() {}

  static LinalgKind resolve(String value) {
    return switch (value) {
      case "auto" -> LinalgFactory.isNativeAvailable() ? LinalgKind.NATIVE : LinalgKind.JAVA;
      case "native" -> LinalgKind.NATIVE;
      case "java" -> LinalgKind.JAVA;
      default -> throw new InvalidInputException("--linalg", value, "allowed: auto, native, java");
    };
  }
}
