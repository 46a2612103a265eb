package hopstat.cli;

import hopstat.spec.JobSpec;
import hopstat.spec.SpecParser;
import hopstat.task.InvalidInputException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Reads spec files for the commands. */
final class SpecFiles {

  private SpecFiles() {}

  /** The file's text; a missing or unreadable file is bad input naming the path. */
  static String read(Path file) {
    try {
      return Files.readString(file, StandardCharsets.UTF_8);
    } catch (IOException e) {
      throw new InvalidInputException(
          "SPEC",
          file.toString(),
          "cannot read the spec file (" + e.getClass().getSimpleName() + ")");
    }
  }

  static JobSpec parse(String text) {
    return SpecParser.parse(text);
  }
}
