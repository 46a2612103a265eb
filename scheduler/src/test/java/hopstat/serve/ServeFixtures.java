package hopstat.serve;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import hopstat.linalg.LinalgKind;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.Socket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.function.BooleanSupplier;

/** Shared test data and helpers for the service tests. */
final class ServeFixtures {

  static final ObjectMapper JSON = new ObjectMapper();
  static final String TOKEN = "test-token-0123456789abcdef";

  private ServeFixtures() {}

  /**
   * A small QWZ study: L = 6, three disorder strengths, {@code realisations} per point, Bott index
   * and gap. Runs in well under a second on one thread.
   */
  static String smallQwz(String name, int realisations) {
    return """
        {"name": "%s", "seed": 20261202, "model": "qwz",
         "parameters": {"m": 1.0, "W": [0, 2, 4], "L": 6, "fermiEnergy": 0.0},
         "disorder": [{"type": "onsite-box", "strength": "W"}],
         "boundary": "periodic", "observables": ["gap", "bott"], "realisations": %d}
        """
        .formatted(name, realisations);
  }

  /** A spec with two problems the CLI reports with field paths. */
  static String badSpec() {
    return """
        {"name": "bad", "seed": 1, "model": "qwz",
         "parameters": {"m": 1.0, "L": -3},
         "boundary": "periodic", "observables": ["bott", "no-such-observable"], "realisations": 5}
        """;
  }

  static ServiceSpec spec(Path root, byte[] token, Duration pace) {
    return new ServiceSpec(
        root,
        InetAddress.getLoopbackAddress(),
        0,
        1,
        LinalgKind.JAVA,
        token,
        pace,
        Duration.ofMillis(100));
  }

  static BatchService start(Path root, byte[] token, Duration pace) throws IOException {
    return BatchService.start(spec(root, token, pace), Clock.systemUTC());
  }

  /** Polls until the condition holds; fails after {@code timeout}. */
  static void await(String what, Duration timeout, BooleanSupplier condition)
      throws InterruptedException {
    long end = System.nanoTime() + timeout.toNanos();
    while (!condition.getAsBoolean()) {
      if (System.nanoTime() > end) {
        throw new AssertionError("timed out waiting for " + what);
      }
      Thread.sleep(20);
    }
  }

  /** A small HTTP client for the API. */
  static final class Client {
    final URI base;
    final String token;
    final HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();

    Client(URI base, String token) {
      this.base = base;
      this.token = token;
    }

    HttpResponse<String> get(String path) throws IOException, InterruptedException {
      return http.send(request(path).GET().build(), HttpResponse.BodyHandlers.ofString());
    }

    HttpResponse<String> post(String path, String body) throws IOException, InterruptedException {
      return http.send(
          request(path)
              .header("Content-Type", "application/json")
              .POST(HttpRequest.BodyPublishers.ofString(body))
              .build(),
          HttpResponse.BodyHandlers.ofString());
    }

    HttpRequest.Builder request(String path) {
      HttpRequest.Builder b =
          HttpRequest.newBuilder(base.resolve(path)).timeout(Duration.ofSeconds(20));
      if (token != null) {
        b.header("Authorization", "Bearer " + token);
      }
      return b;
    }

    JsonNode json(HttpResponse<String> r) throws IOException {
      return JSON.readTree(r.body());
    }

    JsonNode status(String id) throws IOException, InterruptedException {
      HttpResponse<String> r = get("api/jobs/" + id);
      assertThat(r.statusCode()).as(r.body()).isEqualTo(200);
      return json(r);
    }

    String state(String id) {
      try {
        return status(id).path("job").path("state").asText();
      } catch (IOException | InterruptedException e) {
        throw new AssertionError(e);
      }
    }

    /**
     * Sends one request exactly as written (no client-side path normalisation) and returns the
     * status code: for the path-traversal tests.
     */
    int raw(String method, String rawTarget, String extraHeaders) throws IOException {
      try (Socket s = new Socket(base.getHost(), base.getPort())) {
        s.setSoTimeout(10_000);
        String req =
            method
                + " "
                + rawTarget
                + " HTTP/1.1\r\nHost: "
                + base.getHost()
                + ":"
                + base.getPort()
                + "\r\n"
                + (token == null ? "" : "Authorization: Bearer " + token + "\r\n")
                + extraHeaders
                + "Content-Length: 0\r\nConnection: close\r\n\r\n";
        OutputStream out = s.getOutputStream();
        out.write(req.getBytes(StandardCharsets.ISO_8859_1));
        out.flush();
        InputStream in = s.getInputStream();
        String head = new String(in.readAllBytes(), StandardCharsets.ISO_8859_1);
        String statusLine = head.substring(0, head.indexOf("\r\n"));
        return Integer.parseInt(statusLine.split(" ")[1]);
      }
    }
  }
}
