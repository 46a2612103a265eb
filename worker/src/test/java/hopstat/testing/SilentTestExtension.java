package hopstat.testing;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.extension.AfterEachCallback;
import org.junit.jupiter.api.extension.BeforeEachCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * Fails any test that writes to stdout or stderr: tests must be silent (house style). Registered
 * for every test class by service-loader autodetection (see junit-platform.properties); shipped in
 * the worker test-jar so the other modules' tests are held to it too.
 */
public final class SilentTestExtension implements BeforeEachCallback, AfterEachCallback {

  private static final ExtensionContext.Namespace NS =
      ExtensionContext.Namespace.create(SilentTestExtension.class);

  @Override
  public void beforeEach(ExtensionContext context) {
    ByteArrayOutputStream captured = new ByteArrayOutputStream();
    PrintStream stream = new PrintStream(captured, true, StandardCharsets.UTF_8);
    ExtensionContext.Store store = context.getStore(NS);
    store.put("out", System.out);
    store.put("err", System.err);
    store.put("captured", captured);
    System.setOut(stream);
    System.setErr(stream);
  }

  @Override
  public void afterEach(ExtensionContext context) {
    ExtensionContext.Store store = context.getStore(NS);
    System.setOut(store.get("out", PrintStream.class));
    System.setErr(store.get("err", PrintStream.class));
    String text =
        store.get("captured", ByteArrayOutputStream.class).toString(StandardCharsets.UTF_8);
    if (!text.isEmpty()) {
      throw new AssertionError(
          "tests must be silent, but this one wrote to stdout/stderr:\n" + text);
    }
  }
}
