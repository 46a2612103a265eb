package hopstat.serve;

import hopstat.linalg.LinalgKind;
import hopstat.task.InvalidInputException;
import java.net.InetAddress;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Arrays;
import java.util.Objects;

/**
 * How a batch service runs, validated.
 *
 * @param root the service root (jobs, inbox, rejected, service.lock, service.json)
 * @param bind address the HTTP API listens on; anything but a loopback address needs a token
 * @param port TCP port, 0 for any free port (the port taken is written to service.json)
 * @param threads worker threads; the running job gets all of them (one job at a time)
 * @param linalg dense linear algebra for the jobs
 * @param token the API token (UTF-8 bytes), or {@code null} for none; at least {@value
 *     #MIN_TOKEN_BYTES} bytes
 * @param pace extra time each worker waits after a realisation (zero in normal use; slows jobs for
 *     demonstrations and for tests that must catch a job in flight)
 * @param inboxPoll how often the inbox is scanned
 */
public record ServiceSpec(
    Path root,
    InetAddress bind,
    int port,
    int threads,
    LinalgKind linalg,
    byte[] token,
    Duration pace,
    Duration inboxPoll) {

  /** Shortest accepted token. */
  public static final int MIN_TOKEN_BYTES = 16;

  public ServiceSpec {
    Objects.requireNonNull(root, "root");
    Objects.requireNonNull(bind, "bind");
    Objects.requireNonNull(linalg, "linalg");
    Objects.requireNonNull(pace, "pace");
    Objects.requireNonNull(inboxPoll, "inboxPoll");
    InvalidInputException.Collector bad = new InvalidInputException.Collector();
    if (port < 0 || port > 65535) {
      bad.add("--port", port, "must be from 0 to 65535");
    }
    if (threads < 1 || threads > 4096) {
      bad.add("--threads", threads, "must be from 1 to 4096");
    }
    if (token != null && token.length < MIN_TOKEN_BYTES) {
      bad.add(
          "--token-file",
          token.length + " bytes",
          "the token must be at least " + MIN_TOKEN_BYTES + " bytes");
    }
    if (token == null && !bind.isLoopbackAddress()) {
      bad.add(
          "--bind",
          bind.getHostAddress(),
          "binding an address other than loopback needs a token (--token-file)");
    }
    if (pace.isNegative() || inboxPoll.isNegative() || inboxPoll.isZero()) {
      bad.add("--pace-ms", pace.toMillis(), "pace must be >= 0 and the inbox poll interval > 0");
    }
    bad.throwIfAny();
    root = root.toAbsolutePath().normalize();
    token = token == null ? null : token.clone();
  }

  @Override
  public byte[] token() {
    return token == null ? null : token.clone();
  }

  /** True if every request must present the token. */
  public boolean hasToken() {
    return token != null;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof ServiceSpec s
        && root.equals(s.root)
        && bind.equals(s.bind)
        && port == s.port
        && threads == s.threads
        && linalg == s.linalg
        && Arrays.equals(token, s.token)
        && pace.equals(s.pace)
        && inboxPoll.equals(s.inboxPoll);
  }

  @Override
  public int hashCode() {
    return Objects.hash(root, bind, port, threads, linalg, Arrays.hashCode(token), pace, inboxPoll);
  }

  @Override
  public String toString() {
    return "ServiceSpec[root="
        + root
        + ", bind="
        + bind.getHostAddress()
        + ", port="
        + port
        + ", threads="
        + threads
        + ", linalg="
        + linalg
        + ", token="
        + (token == null ? "none" : "set")
        + ", pace="
        + pace
        + ", inboxPoll="
        + inboxPoll
        + "]";
  }
}
