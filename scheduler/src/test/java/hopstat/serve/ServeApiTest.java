package hopstat.serve;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import hopstat.queue.RunDirectoryException;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every endpoint of the API on one service bound to 127.0.0.1 with a token configured, so the token
 * path is exercised too. Jobs are paced (40 ms per realisation on one thread) so a running job can
 * be caught, paused and cancelled.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class ServeApiTest {

  @TempDir static Path root;
  @TempDir static Path scratch;
  BatchService service;
  ServeFixtures.Client api;

  @BeforeAll
  void start() throws Exception {
    service =
        ServeFixtures.start(
            root, ServeFixtures.TOKEN.getBytes(StandardCharsets.UTF_8), Duration.ofMillis(40));
    api = new ServeFixtures.Client(service.uri(), ServeFixtures.TOKEN);
  }

  @AfterAll
  void stop() throws Exception {
    service.close();
  }

  private String submit(String spec, int priority) throws Exception {
    HttpResponse<String> r = api.post("api/jobs?priority=" + priority, spec);
    assertThat(r.statusCode()).as(r.body()).isEqualTo(201);
    String id = api.json(r).path("job").path("id").asText();
    assertThat(r.headers().firstValue("Location")).hasValue("/api/jobs/" + id);
    return id;
  }

  private List<String> fileTree() throws Exception {
    try (Stream<Path> s = Files.walk(root)) {
      return s.map(p -> root.relativize(p).toString())
          .filter(p -> !p.contains("journal"))
          .sorted()
          .toList();
    }
  }

  @Test
  void lifecycleThroughTheApi() throws Exception {
    String a =
        submit(
            ServeFixtures.smallQwz("api-a", 20),
            0); // 60 tasks: >= 2.4 s paced, still running while b..e are handled
    ServeFixtures.await(
        "job a to run", Duration.ofSeconds(20), () -> api.state(a).equals("RUNNING"));
    // queued behind a: b (priority 0), c (priority 5), d (priority 0); c must start first, then b,
    // d
    String b = submit(ServeFixtures.smallQwz("api-b", 3), 0);
    String c = submit(ServeFixtures.smallQwz("api-c", 3), 5);
    String d = submit(ServeFixtures.smallQwz("api-d", 3), 0);
    String e = submit(ServeFixtures.smallQwz("api-e", 3), 0);

    // pause / resume / cancel a queued job
    assertThat(api.post("api/jobs/" + e + "/pause", "{}").statusCode()).isEqualTo(200);
    assertThat(api.state(e)).isEqualTo("PAUSED");
    assertThat(api.post("api/jobs/" + e + "/resume", "{}").statusCode()).isEqualTo(200);
    assertThat(api.state(e)).isEqualTo("QUEUED");
    assertThat(api.post("api/jobs/" + e + "/cancel", "{}").statusCode()).isEqualTo(200);
    assertThat(api.state(e)).isEqualTo("CANCELLED");
    HttpResponse<String> again = api.post("api/jobs/" + e + "/resume", "{}");
    assertThat(again.statusCode()).isEqualTo(409);
    assertThat(api.json(again).path("error").asText()).isEqualTo("conflict");

    // pause the running job: 202, then PAUSED once its in-flight realisation is journaled
    HttpResponse<String> pause = api.post("api/jobs/" + a + "/pause", "{}");
    assertThat(pause.statusCode()).as(pause.body()).isEqualTo(202);
    assertThat(api.json(pause).path("stopping").asBoolean()).isTrue();
    ServeFixtures.await(
        "job a to pause", Duration.ofSeconds(20), () -> api.state(a).equals("PAUSED"));
    JsonNode paused = api.status(a);
    long doneAtPause = paused.path("progress").path("finished").asLong();
    assertThat(doneAtPause).isLessThan(60);
    assertThat(api.post("api/jobs/" + a + "/resume", "{}").statusCode()).isEqualTo(200);

    for (String id : List.of(a, b, c, d)) {
      ServeFixtures.await(
          id + " to finish", Duration.ofSeconds(60), () -> api.state(id).equals("DONE"));
    }
    assertThat(started(c)).isBefore(started(b));
    assertThat(started(b)).isBefore(started(d));

    // status: per-point progress and estimates
    JsonNode s = api.status(a);
    assertThat(
            s.path("progress").path("done").asLong() + s.path("progress").path("failed").asLong())
        .isEqualTo(60);
    assertThat(s.path("grid")).extracting(JsonNode::asText).containsExactly("W", "L");
    assertThat(s.path("points")).hasSize(3);
    JsonNode clean = s.path("points").get(0);
    assertThat(clean.path("coordinates").path("W").asDouble()).isEqualTo(0.0);
    assertThat(clean.path("done").asInt()).isEqualTo(20);
    // Clean QWZ at m = 1 with this sign convention: Bott index -1 (see /work/shared/REFERENCE.md,
    // Qi, Wu, Zhang, Phys. Rev. B 74, 085308 (2006): |C| = 1 for 0 < |m| < 2); without disorder
    // every sample agrees.
    assertThat(clean.path("quantities").path("bott").path("mean").asDouble())
        .isCloseTo(-1.0, org.assertj.core.data.Offset.offset(1e-9));
    assertThat(clean.path("quantities").path("bott").path("nonQuantised").asInt()).isZero();
    assertThat(s.path("job").path("history").size())
        .isGreaterThanOrEqualTo(5); // queued, running, paused, queued, running, done

    // list
    JsonNode list = api.json(api.get("api/jobs"));
    assertThat(list.path("jobs"))
        .extracting(j -> j.path("job").path("id").asText())
        .containsExactly(a, b, c, d, e);

    // summaries: byte for byte the files the run wrote
    HttpResponse<String> csv = api.get("api/jobs/" + a + "/summary.csv");
    assertThat(csv.statusCode()).isEqualTo(200);
    assertThat(csv.headers().firstValue("Content-Type").orElseThrow()).startsWith("text/csv");
    assertThat(csv.body()).isEqualTo(Files.readString(service.runDir(a).resolve("summary.csv")));
    assertThat(api.get("api/jobs/" + a + "/summary.json").body())
        .isEqualTo(Files.readString(service.runDir(a).resolve("summary.json")));

    // report: 404 until report.html exists, then served
    assertThat(api.get("api/jobs/" + a + "/report").statusCode()).isEqualTo(404);
    Files.writeString(
        service.runDir(a).resolve("report.html"), "<html><body>report of a</body></html>");
    HttpResponse<String> report = api.get("api/jobs/" + a + "/report");
    assertThat(report.statusCode()).isEqualTo(200);
    assertThat(report.body()).contains("report of a");

    // cancel while running
    String f = submit(ServeFixtures.smallQwz("api-f", 10), 0);
    ServeFixtures.await(
        "job f to run", Duration.ofSeconds(20), () -> api.state(f).equals("RUNNING"));
    assertThat(api.post("api/jobs/" + f + "/cancel", "{}").statusCode()).isEqualTo(202);
    ServeFixtures.await(
        "job f to cancel", Duration.ofSeconds(20), () -> api.state(f).equals("CANCELLED"));
    assertThat(api.status(f).path("progress").path("finished").asLong()).isLessThan(30);
  }

  private Instant started(String id) throws Exception {
    for (JsonNode e : api.status(id).path("job").path("history")) {
      if (e.path("to").asText().equals("RUNNING")) {
        return Instant.parse(e.path("at").asText());
      }
    }
    throw new AssertionError(id + " never ran");
  }

  @Test
  void invalidSpecsGet400WithTheCliMessages() throws Exception {
    HttpResponse<String> r = api.post("api/jobs", ServeFixtures.badSpec());
    assertThat(r.statusCode()).isEqualTo(400);
    JsonNode body = api.json(r);
    assertThat(body.path("error").asText()).isEqualTo("invalid-input");
    List<String> messages = new ArrayList<>();
    body.path("violations").forEach(v -> messages.add("  " + v.path("message").asText()));
    List<String> cli = CliErrors.runErrorLines(scratch, ServeFixtures.badSpec());
    assertThat(messages).isEqualTo(cli.subList(1, cli.size()));
    assertThat(body.path("violations").get(0).path("field").asText()).isNotEmpty();

    HttpResponse<String> notJson = api.post("api/jobs", "{ nope");
    assertThat(notJson.statusCode()).isEqualTo(400);
    assertThat(api.json(notJson).path("violations").get(0).path("reason").asText())
        .startsWith("not valid JSON");
    HttpResponse<String> badPriority =
        api.post("api/jobs?priority=high", ServeFixtures.smallQwz("p", 2));
    assertThat(badPriority.statusCode()).isEqualTo(400);
    assertThat(api.json(badPriority).path("violations").get(0).path("field").asText())
        .isEqualTo("priority");
    assertThat(api.post("api/jobs?priority=100000", ServeFixtures.smallQwz("p", 2)).statusCode())
        .isEqualTo(400);
  }

  @Test
  void requestsWithoutTheTokenGet401AndChangeNothing() throws Exception {
    List<String> before = fileTree();
    int jobsBefore = service.jobs().size();
    ServeFixtures.Client anonymous = new ServeFixtures.Client(service.uri(), null);
    ServeFixtures.Client wrong =
        new ServeFixtures.Client(service.uri(), "test-token-0123456789abcdeX");
    ServeFixtures.Client shorter = new ServeFixtures.Client(service.uri(), "test");
    for (ServeFixtures.Client c : List.of(anonymous, wrong, shorter)) {
      assertThat(c.post("api/jobs", ServeFixtures.smallQwz("sneaky", 2)).statusCode())
          .isEqualTo(401);
      assertThat(c.get("api/jobs").statusCode()).isEqualTo(401);
      assertThat(c.get("").statusCode()).isEqualTo(401);
      assertThat(c.get("dashboard.js").statusCode()).isEqualTo(401);
      assertThat(c.post("api/jobs/000001-api-a/cancel", "{}").statusCode()).isEqualTo(401);
      assertThat(c.get("api/service").statusCode()).isEqualTo(401);
    }
    assertThat(anonymous.get("api/jobs").headers().firstValue("WWW-Authenticate")).isPresent();
    assertThat(service.jobs()).hasSize(jobsBefore);
    assertThat(fileTree()).isEqualTo(before);
    // the token in a cookie (what the dashboard uses after /?token=...) is accepted
    HttpResponse<String> viaCookie =
        anonymous.http.send(
            anonymous
                .request("api/service")
                .header("Cookie", "hopstat-token=" + ServeFixtures.TOKEN)
                .build(),
            HttpResponse.BodyHandlers.ofString());
    assertThat(viaCookie.statusCode()).isEqualTo(200);
    HttpResponse<String> login = anonymous.get("?token=" + ServeFixtures.TOKEN);
    assertThat(login.statusCode()).isEqualTo(303);
    assertThat(login.headers().firstValue("Set-Cookie").orElseThrow())
        .contains("HttpOnly")
        .contains("SameSite=Strict");
  }

  @Test
  void oversizedBodiesGet413() throws Exception {
    String big = "{\"name\": \"big\", \"description\": \"" + "x".repeat((1 << 20) + 10) + "\"}";
    ServeFixtures.Client api =
        new ServeFixtures.Client(service.uri(), ServeFixtures.TOKEN); // own connections
    HttpResponse<String> r = api.post("api/jobs", big);
    assertThat(r.statusCode()).isEqualTo(413);
    assertThat(api.json(r).path("error").asText()).isEqualTo("too-large");
    // a body just under the limit is read and validated (and rejected as a spec, not for its size)
    String under = "{\"name\": \"big\", \"description\": \"" + "x".repeat((1 << 20) - 100) + "\"}";
    assertThat(api.post("api/jobs", under).statusCode()).isEqualTo(400);
    // far beyond the drain limit the service stops reading: the client sees the 413 or a closed
    // connection, never a job
    String huge = "x".repeat(12 << 20);
    try {
      assertThat(api.post("api/jobs", huge).statusCode()).isEqualTo(413);
    } catch (java.io.IOException closed) {
      // the server closed the connection while the client was still sending: also a refusal
    }
    assertThat(service.jobs()).noneMatch(j -> j.name().equals("big"));
  }

  @Test
  void traversalAndMalformedPathsAreRefused() throws Exception {
    List<String> before = fileTree();
    String[] gets = {
      "/api/jobs/..%2F..%2Fservice.lock",
      "/api/jobs/../service.lock",
      "/api/jobs/%2e%2e/summary.csv",
      "/../../etc/passwd",
      "/api/jobs/000001-api-a/../../../service.json",
      "/api/jobs/000001-api-a/summary.csv/..",
      "/api/jobs/.%2e/report",
      "/dashboard.js/../../pom.xml",
      "/api/jobs//summary.csv",
      "/api/jobs/000001-a%00/report",
      "/api/jobs/..\\..\\x"
    };
    for (String target : gets) {
      int code = api.raw("GET", target, "");
      assertThat(code).as(target).isIn(400, 404);
    }
    assertThat(api.raw("GET", "/api/jobs/000001-a.b", "")).isEqualTo(400);
    assertThat(api.raw("GET", "/api/jobs/999999-nobody", "")).isEqualTo(404);
    assertThat(
            api.raw("POST", "/api/jobs/..%2F..%2Fx/cancel", "Content-Type: application/json\r\n"))
        .isEqualTo(400);
    assertThat(fileTree()).isEqualTo(before);
  }

  @Test
  void crossSiteAndRebindingRequestsAreRefused() throws Exception {
    // a page on another origin posting a form, or a rebound DNS name: refused before anything is
    // read
    assertThat(api.raw("POST", "/api/jobs", "Content-Type: text/plain\r\n")).isEqualTo(415);
    assertThat(
            api.raw(
                "POST",
                "/api/jobs",
                "Content-Type: application/json\r\nOrigin: http://evil.example\r\n"))
        .isEqualTo(403);
    HttpResponse<String> rebound =
        api.http.send(
            HttpRequest.newBuilder(service.uri().resolve("api/jobs"))
                .header("Authorization", "Bearer " + ServeFixtures.TOKEN)
                .build(),
            HttpResponse.BodyHandlers.ofString());
    assertThat(rebound.statusCode()).isEqualTo(200);
    assertThat(hostHeaderStatus("evil.example:" + service.uri().getPort())).isEqualTo(403);
  }

  private int hostHeaderStatus(String host) throws Exception {
    try (java.net.Socket s =
        new java.net.Socket(service.uri().getHost(), service.uri().getPort())) {
      s.getOutputStream()
          .write(
              ("GET /api/jobs HTTP/1.1\r\nHost: "
                      + host
                      + "\r\nAuthorization: Bearer "
                      + ServeFixtures.TOKEN
                      + "\r\nConnection: close\r\n\r\n")
                  .getBytes(StandardCharsets.ISO_8859_1));
      String head = new String(s.getInputStream().readAllBytes(), StandardCharsets.ISO_8859_1);
      return Integer.parseInt(head.split(" ")[1]);
    }
  }

  @Test
  void dashboardAndServiceInfoAreServed() throws Exception {
    HttpResponse<String> page = api.get("");
    assertThat(page.statusCode()).isEqualTo(200);
    assertThat(page.headers().firstValue("Content-Type").orElseThrow()).startsWith("text/html");
    assertThat(page.body()).contains("<script src=\"/dashboard.js\">");
    assertThat(api.get("dashboard.js").body()).contains("drawFigure");
    assertThat(api.get("dashboard.css").statusCode()).isEqualTo(200);
    JsonNode info = api.json(api.get("api/service"));
    assertThat(info.path("tokenRequired").asBoolean()).isTrue();
    assertThat(info.path("threads").asInt()).isEqualTo(1);
    assertThat(api.get("api/nothing").statusCode()).isEqualTo(404);
    assertThat(api.post("api/service", "{}").statusCode()).isEqualTo(405);
  }

  @Test
  void oneServicePerRoot() {
    assertThatThrownBy(() -> ServeFixtures.start(root, null, Duration.ZERO))
        .isInstanceOf(RunDirectoryException.class)
        .hasMessageContaining("already runs on");
  }
}
