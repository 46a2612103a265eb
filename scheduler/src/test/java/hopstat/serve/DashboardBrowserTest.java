package hopstat.serve;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.io.OutputStream;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.logging.Level;
import java.util.logging.Logger;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;

/**
 * The dashboard in a real headless browser (Debian chromium + chromium-driver, driven by Selenium
 * with explicit binary and driver paths: Selenium Manager never runs, nothing is downloaded). Runs
 * when /usr/bin/chromium exists; under CI=true a missing browser is a failure.
 */
class DashboardBrowserTest {

  static final Path CHROMIUM = Path.of("/usr/bin/chromium");
  static final Path CHROMEDRIVER = Path.of("/usr/bin/chromedriver");
  // Selenium logs through java.util.logging (e.g. a CDP version notice); keep tests silent
  private static final Logger SELENIUM_LOG = Logger.getLogger("org.openqa.selenium");

  @TempDir Path root;
  @TempDir Path profile;

  @Test
  void dashboardShowsAJobProgressingToCompletionWithAFigure() throws Exception {
    boolean present = Files.isExecutable(CHROMIUM) && Files.isExecutable(CHROMEDRIVER);
    if (!present && "true".equalsIgnoreCase(System.getenv("CI"))) {
      Assertions.fail(
          "CI=true but "
              + CHROMIUM
              + " or "
              + CHROMEDRIVER
              + " is missing: apt-get install chromium chromium-driver");
    }
    Assumptions.assumeTrue(present, "no chromium/chromedriver here");
    SELENIUM_LOG.setLevel(Level.OFF);

    try (BatchService service =
        ServeFixtures.start(
            root, ServeFixtures.TOKEN.getBytes(StandardCharsets.UTF_8), Duration.ofMillis(60))) {
      ServeFixtures.Client api = new ServeFixtures.Client(service.uri(), ServeFixtures.TOKEN);
      ChromeOptions options = new ChromeOptions();
      options.setBinary(CHROMIUM.toFile());
      options.addArguments(
          "--headless=new",
          "--no-sandbox",
          "--disable-gpu",
          "--disable-background-networking",
          "--disable-component-update",
          "--disable-sync",
          "--no-first-run",
          "--disable-dev-shm-usage",
          "--user-data-dir=" + profile);
      ChromeDriverService driverService =
          new ChromeDriverService.Builder()
              .usingDriverExecutable(new File(CHROMEDRIVER.toString()))
              .usingAnyFreePort()
              .withLogOutput(OutputStream.nullOutputStream())
              .build();
      WebDriver browser = new ChromeDriver(driverService, options);
      try {
        // log in the way a user does on a token-protected service: the token once in the URL, then
        // a cookie
        browser.get(service.uri() + "?token=" + ServeFixtures.TOKEN);
        assertThat(browser.getCurrentUrl()).isEqualTo(service.uri().toString());
        assertThat(browser.getTitle()).isEqualTo("hopstat service");

        HttpResponse<String> r = api.post("api/jobs", ServeFixtures.smallQwz("browser-qwz", 10));
        assertThat(r.statusCode()).as(r.body()).isEqualTo(201);
        String id = api.json(r).path("job").path("id").asText();

        Set<String> seen = new LinkedHashSet<>();
        By row = By.cssSelector("tr[data-job='" + id + "']");
        long end = System.nanoTime() + Duration.ofSeconds(60).toNanos();
        String state = "";
        while (!state.equals("DONE")) {
          assertThat(System.nanoTime())
              .as("the dashboard should show the job DONE within 60 s; saw " + seen)
              .isLessThan(end);
          List<WebElement> rows = browser.findElements(row);
          if (!rows.isEmpty()) {
            try {
              state = rows.get(0).getAttribute("data-state");
              seen.add(
                  state
                      + " "
                      + rows.get(0).findElement(By.cssSelector("td.progress")).getText().trim());
            } catch (org.openqa.selenium.StaleElementReferenceException redrawn) {
              // the table is redrawn every poll; read it again
            }
          }
          Thread.sleep(100);
        }
        // progress moved through intermediate values to completion
        assertThat(seen)
            .anyMatch(
                s -> s.startsWith("RUNNING") && !s.endsWith(" 0 / 30") && !s.endsWith("30 / 30"));
        String last = "";
        long figureEnd = System.nanoTime() + Duration.ofSeconds(10).toNanos();
        while (System.nanoTime() < figureEnd) {
          try {
            last =
                browser
                    .findElement(row)
                    .findElement(By.cssSelector("td.progress"))
                    .getText()
                    .trim();
            WebElement figure = browser.findElement(By.id("figure-svg"));
            if (last.equals("30 / 30") && "3".equals(figure.getAttribute("data-points"))) {
              break;
            }
          } catch (org.openqa.selenium.NoSuchElementException
              | org.openqa.selenium.StaleElementReferenceException redrawn) {
            // redrawn between polls
          }
          Thread.sleep(100);
        }
        assertThat(last).isEqualTo("30 / 30");
        // the figure: Bott index (the first integer-valued quantity) against W, one point and error
        // bar per W
        WebElement figure = browser.findElement(By.id("figure-svg"));
        assertThat(figure.findElements(By.cssSelector("circle.point"))).hasSize(3);
        assertThat(figure.findElements(By.cssSelector("line.errorbar"))).hasSize(3);
        assertThat(figure.getText()).contains("bott").contains("W");
        assertThat(browser.findElement(By.id("quantity")).getAttribute("value")).isEqualTo("bott");
        assertThat(browser.findElements(By.cssSelector("#points tbody tr"))).hasSize(3);
        assertThat(browser.findElement(By.id("connection")).getText()).startsWith("updated");
      } finally {
        browser.quit();
      }
    }
  }
}
