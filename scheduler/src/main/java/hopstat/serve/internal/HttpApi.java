package hopstat.serve.internal;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.sun.net.httpserver.Headers;
import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;
import hopstat.serve.BatchService;
import hopstat.serve.InputErrors;
import hopstat.serve.JobIds;
import hopstat.serve.JobRecord;
import hopstat.serve.JobStore;
import hopstat.serve.ServiceSpec;
import hopstat.task.BuildInfo;
import hopstat.task.InvalidInputException;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Inet6Address;
import java.net.InetSocketAddress;
import java.net.URI;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The service's HTTP API and dashboard on the JDK's built-in server. Every request passes, in
 * order: the Host check (on a loopback bind the Host header must name the loopback address, which
 * stops DNS-rebinding pages), the token check when a token is configured (401 before anything is
 * read or changed), the Origin check and JSON content type on POST (a cross-site form cannot post),
 * the body limit (413), then strict path parsing: job ids must match {@link JobIds#isValid} and any
 * other path is refused, so no request names a file outside the root.
 */
public final class HttpApi implements AutoCloseable {

  /** Largest request body (bytes). */
  public static final int MAX_BODY_BYTES = 1 << 20;

  /** Cookie the dashboard uses to carry the token after {@code /?token=...}. */
  public static final String TOKEN_COOKIE = "hopstat-token";

  /** Oversized bodies are drained up to this many bytes before the 413 (see readBody). */
  static final long MAX_DRAIN_BYTES = 8L << 20;

  /** HTTP worker threads. */
  static final int HTTP_THREADS = 8;

  private static final Logger LOG = LoggerFactory.getLogger(HttpApi.class);
  private static final ObjectMapper JSON = new ObjectMapper();
  private static final Map<String, String[]> STATIC =
      Map.of(
          "/", new String[] {"dashboard.html", "text/html; charset=utf-8"},
          "/index.html", new String[] {"dashboard.html", "text/html; charset=utf-8"},
          "/dashboard.js", new String[] {"dashboard.js", "text/javascript; charset=utf-8"},
          "/dashboard.css", new String[] {"dashboard.css", "text/css; charset=utf-8"});
  private static final Set<String> ACTIONS = Set.of("cancel", "pause", "resume");

  private final BatchService service;
  private final ServiceSpec spec;
  private final HttpServer server;
  private final ExecutorService executor;
  private final byte[] tokenHash;
  private final URI uri;

  private HttpApi(BatchService service, ServiceSpec spec) throws IOException {
    this.service = service;
    this.spec = spec;
    this.tokenHash = spec.hasToken() ? sha256(spec.token()) : null;
    this.server = HttpServer.create(new InetSocketAddress(spec.bind(), spec.port()), 64);
    AtomicInteger n = new AtomicInteger();
    this.executor =
        Executors.newFixedThreadPool(
            HTTP_THREADS,
            r -> {
              Thread t = new Thread(r, "hopstat-serve-http-" + n.incrementAndGet());
              t.setDaemon(true);
              return t;
            });
    server.setExecutor(executor);
    server.createContext("/", this::handle);
    String host =
        spec.bind() instanceof Inet6Address
            ? "[" + spec.bind().getHostAddress() + "]"
            : spec.bind().getHostAddress();
    this.uri = URI.create("http://" + host + ":" + server.getAddress().getPort() + "/");
  }

  /** Binds and starts serving. */
  public static HttpApi start(BatchService service, ServiceSpec spec) throws IOException {
    HttpApi api = new HttpApi(service, spec);
    api.server.start();
    return api;
  }

  /** Base URI, with the port actually bound. */
  public URI uri() {
    return uri;
  }

  private void handle(HttpExchange x) throws IOException {
    try (x) {
      try {
        route(x);
      } catch (InvalidInputException e) {
        send(x, 400, InputErrors.json(e));
      } catch (IllegalStateException e) {
        send(x, 409, error("conflict", e.getMessage()));
      } catch (Exception e) { // the HTTP boundary: one bad request must not take the server down
        LOG.error(
            "{} {} failed: {}", x.getRequestMethod(), x.getRequestURI().getRawPath(), e.toString());
        send(x, 500, error("internal", e.getClass().getSimpleName() + ": " + e.getMessage()));
      }
    }
  }

  private void route(HttpExchange x) throws IOException {
    String method = x.getRequestMethod();
    String rawPath = x.getRequestURI().getRawPath();
    Headers h = x.getRequestHeaders();
    if (spec.bind().isLoopbackAddress() && !isLoopbackHost(h.getFirst("Host"))) {
      send(
          x,
          403,
          error(
              "forbidden",
              "the Host header must name the loopback address this service listens on"));
      return;
    }
    if (tokenHash != null && !hasToken(x)) {
      x.getResponseHeaders().set("WWW-Authenticate", "Bearer realm=\"hopstat\"");
      send(
          x,
          401,
          error(
              "unauthorized",
              "this service needs its token: header 'Authorization: Bearer TOKEN'"));
      return;
    }
    if (method.equals("POST")) {
      String origin = h.getFirst("Origin");
      if (origin != null && !origin.equals("http://" + h.getFirst("Host"))) {
        send(x, 403, error("forbidden", "cross-origin request"));
        return;
      }
      String type = h.getFirst("Content-Type");
      if (type == null || !type.toLowerCase(Locale.ROOT).startsWith("application/json")) {
        send(
            x,
            415,
            error(
                "unsupported-media-type",
                "POST bodies must be sent as Content-Type: application/json"));
        return;
      }
    }
    if (!isCleanPath(rawPath)) {
      send(x, 400, error("bad-path", "malformed or unsafe path"));
      return;
    }
    if (method.equals("GET") && STATIC.containsKey(rawPath)) {
      if (rawPath.equals("/")
          && tokenHash != null
          && queryParam(x, "token").filter(t -> t.matches("[A-Za-z0-9._~+/=-]+")).isPresent()) {
        // the token arrived in the URL (checked above): keep it in a cookie and drop it from the
        // address bar
        x.getResponseHeaders()
            .add(
                "Set-Cookie",
                TOKEN_COOKIE
                    + "="
                    + queryParam(x, "token").get()
                    + "; Path=/; HttpOnly; SameSite=Strict");
        x.getResponseHeaders().set("Location", "/");
        send(x, 303, new byte[0], "text/plain");
        return;
      }
      String[] res = STATIC.get(rawPath);
      byte[] bytes = resource(res[0]);
      x.getResponseHeaders()
          .set(
              "Content-Security-Policy",
              "default-src 'self'; img-src 'self' data:; frame-ancestors 'none'");
      send(x, 200, bytes, res[1]);
      return;
    }
    List<String> seg = List.of(rawPath.substring(1).split("/", -1));
    if (seg.size() < 2 || !seg.get(0).equals("api")) {
      send(x, 404, error("not-found", "no such resource"));
      return;
    }
    if (seg.size() == 2 && seg.get(1).equals("service")) {
      requireMethod(x, "GET");
      ObjectNode o = JSON.createObjectNode();
      o.put("format", 1);
      o.put("version", BuildInfo.toolVersion());
      o.put("threads", spec.threads());
      o.put("tokenRequired", spec.hasToken());
      o.put("maxBodyBytes", MAX_BODY_BYTES);
      send(x, 200, o);
      return;
    }
    if (!seg.get(1).equals("jobs")) {
      send(x, 404, error("not-found", "no such resource"));
      return;
    }
    if (seg.size() == 2) {
      if (method.equals("GET")) {
        ObjectNode o = JSON.createObjectNode();
        o.put("format", 1);
        ArrayNode jobs = o.putArray("jobs");
        for (JobRecord j : service.jobs()) {
          jobs.add(service.brief(j));
        }
        send(x, 200, o);
      } else if (method.equals("POST")) {
        submit(x);
      } else {
        send(x, 405, error("method-not-allowed", "use GET or POST"));
      }
      return;
    }
    String id = seg.get(2);
    if (!JobIds.isValid(id)) {
      send(x, 400, error("bad-id", "not a job id"));
      return;
    }
    Optional<JobRecord> job = service.job(id);
    if (job.isEmpty()) {
      send(x, 404, error("not-found", "no job " + id));
      return;
    }
    if (seg.size() == 3) {
      if (requireMethod(x, "GET")) {
        ObjectNode status = service.status(id).orElseThrow();
        status.put("stopping", service.isStopping(id));
        send(x, 200, status);
      }
      return;
    }
    if (seg.size() != 4) {
      send(x, 404, error("not-found", "no such resource"));
      return;
    }
    String leaf = seg.get(3);
    if (ACTIONS.contains(leaf)) {
      if (!requireMethod(x, "POST")) {
        return;
      }
      readBody(x); // bounded; an action takes no body
      JobRecord after =
          switch (leaf) {
            case "cancel" -> service.cancel(id);
            case "pause" -> service.pause(id);
            default -> service.resume(id);
          };
      ObjectNode o = JSON.createObjectNode();
      o.put("format", 1);
      o.set("job", JobStore.toJson(after));
      o.put("stopping", service.isStopping(id));
      send(x, service.isStopping(id) ? 202 : 200, o);
      return;
    }
    if (!requireMethod(x, "GET")) {
      return;
    }
    switch (leaf) {
      case "summary.csv" ->
          sendText(
              x,
              service.summaryText(id, "csv").orElseThrow(),
              "text/csv; charset=utf-8",
              job.get());
      case "summary.json" ->
          sendText(
              x,
              service.summaryText(id, "json").orElseThrow(),
              "application/json; charset=utf-8",
              job.get());
      case "report" -> {
        Path report = service.runDir(id).resolve("report.html");
        if (Files.isRegularFile(report)) {
          x.getResponseHeaders()
              .set(
                  "Content-Security-Policy",
                  "default-src 'self' 'unsafe-inline' data:; frame-ancestors 'none'");
          send(x, 200, Files.readAllBytes(report), "text/html; charset=utf-8");
        } else {
          send(
              x,
              404,
              error(
                  "not-found",
                  "job "
                      + id
                      + " has no report.html (run `hopstat report` on "
                      + service.runDir(id)
                      + ")"));
        }
      }
      default -> send(x, 404, error("not-found", "no such resource"));
    }
  }

  private void submit(HttpExchange x) throws IOException {
    byte[] body = readBody(x);
    if (body == null) {
      return;
    }
    int priority = 0;
    Optional<String> p = queryParam(x, "priority");
    if (p.isPresent()) {
      try {
        priority = Integer.parseInt(p.get());
      } catch (NumberFormatException e) {
        throw new InvalidInputException("priority", p.get(), "must be an integer");
      }
    }
    String text;
    try {
      text =
          StandardCharsets.UTF_8
              .newDecoder()
              .onMalformedInput(CodingErrorAction.REPORT)
              .onUnmappableCharacter(CodingErrorAction.REPORT)
              .decode(ByteBuffer.wrap(body))
              .toString();
    } catch (CharacterCodingException e) {
      throw new InvalidInputException("", null, "the spec is not UTF-8 text");
    }
    JobRecord job = service.submit(text, priority, "api", null);
    ObjectNode o = JSON.createObjectNode();
    o.put("format", 1);
    o.set("job", JobStore.toJson(job));
    x.getResponseHeaders().set("Location", "/api/jobs/" + job.id());
    send(x, 201, o);
  }

  /**
   * The body, or null after answering 413 when it is larger than {@link #MAX_BODY_BYTES}. An
   * oversized body is read and discarded up to {@link #MAX_DRAIN_BYTES} first, so the client is not
   * reset while still sending and gets the 413; beyond that the connection is simply closed.
   */
  private static byte[] readBody(HttpExchange x) throws IOException {
    String length = x.getRequestHeaders().getFirst("Content-Length");
    try (InputStream in = x.getRequestBody()) {
      if (length != null) {
        long n;
        try {
          n = Long.parseLong(length.trim());
        } catch (NumberFormatException e) {
          n = Long.MAX_VALUE;
        }
        if (n > MAX_BODY_BYTES) {
          if (discard(in, MAX_DRAIN_BYTES) > 0) {
            x.getResponseHeaders()
                .set("Connection", "close"); // body left unread: the connection cannot be reused
          }
          send(
              x,
              413,
              error("too-large", "request bodies are limited to " + MAX_BODY_BYTES + " bytes"));
          return null;
        }
      }
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      byte[] buf = new byte[8192];
      int r;
      while ((r = in.read(buf)) > 0) {
        out.write(buf, 0, r);
        if (out.size() > MAX_BODY_BYTES) {
          if (discard(in, MAX_DRAIN_BYTES - out.size()) > 0) {
            x.getResponseHeaders().set("Connection", "close");
          }
          send(
              x,
              413,
              error("too-large", "request bodies are limited to " + MAX_BODY_BYTES + " bytes"));
          return null;
        }
      }
      return out.toByteArray();
    }
  }

  /**
   * Reads and drops up to {@code max} bytes; returns 0 if the body ended, else a positive number
   * (more is left).
   */
  private static int discard(InputStream in, long max) throws IOException {
    byte[] buf = new byte[8192];
    long total = 0;
    int r;
    while (total < max && (r = in.read(buf, 0, (int) Math.min(buf.length, max - total))) > 0) {
      total += r;
    }
    return in.read() < 0 ? 0 : 1;
  }

  private boolean requireMethod(HttpExchange x, String method) throws IOException {
    if (x.getRequestMethod().equals(method)) {
      return true;
    }
    x.getResponseHeaders().set("Allow", method);
    send(x, 405, error("method-not-allowed", "use " + method));
    return false;
  }

  private boolean hasToken(HttpExchange x) {
    Headers h = x.getRequestHeaders();
    String auth = h.getFirst("Authorization");
    if (auth != null
        && auth.startsWith("Bearer ")
        && matches(auth.substring("Bearer ".length()).trim())) {
      return true;
    }
    for (String cookies : h.getOrDefault("Cookie", List.of())) {
      for (String c : cookies.split(";")) {
        String t = c.trim();
        if (t.startsWith(TOKEN_COOKIE + "=") && matches(t.substring(TOKEN_COOKIE.length() + 1))) {
          return true;
        }
      }
    }
    if (x.getRequestMethod().equals("GET") && x.getRequestURI().getRawPath().equals("/")) {
      Optional<String> q = queryParam(x, "token");
      return q.isPresent() && matches(q.get());
    }
    return false;
  }

  /**
   * Constant-time: both sides are hashed to 32 bytes first, so neither content nor length leaks
   * through timing.
   */
  private boolean matches(String presented) {
    return MessageDigest.isEqual(sha256(presented.getBytes(StandardCharsets.UTF_8)), tokenHash);
  }

  private boolean isLoopbackHost(String host) {
    if (host == null) {
      return false;
    }
    int port = server.getAddress().getPort();
    return host.equals("127.0.0.1:" + port)
        || host.equals("localhost:" + port)
        || host.equals("[::1]:" + port);
  }

  /**
   * Only {@code /} followed by segments of {@code [A-Za-z0-9._-]} that are not {@code .} or {@code
   * ..}.
   */
  static boolean isCleanPath(String rawPath) {
    if (rawPath == null || !rawPath.startsWith("/")) {
      return false;
    }
    if (rawPath.equals("/")) {
      return true;
    }
    for (String s : rawPath.substring(1).split("/", -1)) {
      if (s.isEmpty() || s.equals(".") || s.equals("..") || !s.matches("[A-Za-z0-9._-]+")) {
        return false;
      }
    }
    return true;
  }

  private static Optional<String> queryParam(HttpExchange x, String name) {
    String q = x.getRequestURI().getRawQuery();
    if (q == null) {
      return Optional.empty();
    }
    for (String kv : q.split("&")) {
      int eq = kv.indexOf('=');
      String k = eq < 0 ? kv : kv.substring(0, eq);
      if (k.equals(name)) {
        try {
          return Optional.of(
              java.net.URLDecoder.decode(
                  eq < 0 ? "" : kv.substring(eq + 1), StandardCharsets.UTF_8));
        } catch (IllegalArgumentException e) {
          throw new InvalidInputException(name, kv.substring(eq + 1), "malformed query parameter");
        }
      }
    }
    return Optional.empty();
  }

  private static byte[] resource(String name) throws IOException {
    try (InputStream in = HttpApi.class.getResourceAsStream("/hopstat/serve/" + name)) {
      if (in == null) {
        throw new IOException("missing resource hopstat/serve/" + name);
      }
      return in.readAllBytes();
    }
  }

  private void sendText(HttpExchange x, String text, String type, JobRecord job)
      throws IOException {
    x.getResponseHeaders().set("X-Hopstat-Job-State", job.state().name());
    send(x, 200, text.getBytes(StandardCharsets.UTF_8), type);
  }

  private static ObjectNode error(String code, String message) {
    ObjectNode o = JSON.createObjectNode();
    o.put("error", code);
    o.put("message", message);
    return o;
  }

  private static void send(HttpExchange x, int status, ObjectNode body) throws IOException {
    send(x, status, JSON.writeValueAsBytes(body), "application/json; charset=utf-8");
  }

  private static void send(HttpExchange x, int status, byte[] body, String type)
      throws IOException {
    Headers r = x.getResponseHeaders();
    r.set("Content-Type", type);
    r.set("Cache-Control", "no-store");
    r.set("X-Content-Type-Options", "nosniff");
    x.sendResponseHeaders(status, body.length == 0 ? -1 : body.length);
    if (body.length > 0) {
      try (OutputStream out = x.getResponseBody()) {
        out.write(body);
      }
    }
  }

  private static byte[] sha256(byte[] bytes) {
    try {
      return MessageDigest.getInstance("SHA-256").digest(bytes);
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("SHA-256 is required of every JVM", e);
    }
  }

  @Override
  public void close() {
    server.stop(0);
    executor.shutdownNow();
    try {
      executor.awaitTermination(5, TimeUnit.SECONDS);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
  }
}
