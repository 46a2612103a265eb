package hopstat.serve;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import hopstat.task.InvalidInputException;
import java.util.ArrayList;
import java.util.List;

/** Bad-input messages of the service, worded exactly as the CLI's exit-2 errors. */
public final class InputErrors {

  private static final ObjectMapper JSON = new ObjectMapper();

  private InputErrors() {}

  /** The lines {@code hopstat run} prints on stderr for this exception. */
  public static List<String> lines(InvalidInputException e) {
    List<String> lines = new ArrayList<>();
    int n = e.violations().size();
    lines.add("hopstat: invalid input (" + n + " problem" + (n == 1 ? "" : "s") + "):");
    for (InvalidInputException.Violation v : e.violations()) {
      lines.add("  " + v.describe());
    }
    return lines;
  }

  /**
   * The API's 400 body: {@code
   * {"error":"invalid-input","violations":[{"field","value","reason","message"}]}}, where {@code
   * message} is the CLI's line for the violation.
   */
  public static ObjectNode json(InvalidInputException e) {
    ObjectNode o = JSON.createObjectNode();
    o.put("error", "invalid-input");
    ArrayNode list = o.putArray("violations");
    for (InvalidInputException.Violation v : e.violations()) {
      ObjectNode x = list.addObject();
      x.put("field", v.fieldPath());
      if (v.rejectedValue() == null) {
        x.putNull("value");
      } else {
        x.put("value", v.rejectedValue());
      }
      x.put("reason", v.reason());
      x.put("message", v.describe());
    }
    return o;
  }
}
