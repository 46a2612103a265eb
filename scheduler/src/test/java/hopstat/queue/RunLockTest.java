package hopstat.queue;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RunLockTest {

  @TempDir Path dir;

  @Test
  void secondOwnerIsRefusedWithTheFirstOwnersName() throws IOException {
    try (RunLock first = RunLock.acquire(dir)) {
      assertThatThrownBy(() -> RunLock.acquire(dir))
          .isInstanceOf(RunDirectoryException.class)
          .hasMessageContaining("in use by another hopstat process")
          .hasMessageContaining("pid " + ProcessHandle.current().pid());
    }
    try (RunLock again = RunLock.acquire(dir)) {
      assertThat(Files.readString(dir.resolve("lock"))).contains("pid ");
    }
  }

  @Test
  void lockFileLeftByADeadProcessIsTakenOver() throws IOException {
    Files.writeString(dir.resolve("lock"), "pid 999999 on elsewhere since 2020-01-01T00:00:00Z\n");
    try (RunLock lock = RunLock.acquire(dir)) {
      assertThat(Files.readString(dir.resolve("lock")))
          .contains("pid " + ProcessHandle.current().pid());
    }
  }
}
