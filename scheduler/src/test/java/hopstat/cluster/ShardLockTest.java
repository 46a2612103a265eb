package hopstat.cluster;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import hopstat.pool.Shard;
import hopstat.queue.RunDirectoryException;
import hopstat.queue.RunLock;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ShardLockTest {

  @TempDir Path dir;

  @Test
  void shardsRunSideBySideButExcludeALocalSessionAndTheirOwnTwin() throws Exception {
    try (ShardLock zero = ShardLock.acquire(dir, new Shard(0, 3));
        ShardLock two = ShardLock.acquire(dir, new Shard(2, 3))) {
      assertThat(ShardLock.held(dir, 3)).containsExactly(0, 2);
      assertThat(Files.readString(ShardLock.file(dir, 2)))
          .startsWith("pid " + ProcessHandle.current().pid());
      assertThatThrownBy(() -> ShardLock.acquire(dir, new Shard(2, 3)))
          .isInstanceOf(RunDirectoryException.class)
          .hasMessageContaining("already being worked on");
      assertThatThrownBy(() -> RunLock.acquire(dir))
          .isInstanceOf(RunDirectoryException.class)
          .hasMessageContaining("in use");
    }
    assertThat(ShardLock.held(dir, 3)).isEmpty();
    try (RunLock local = RunLock.acquire(dir)) {
      assertThatThrownBy(() -> ShardLock.acquire(dir, new Shard(1, 3)))
          .isInstanceOf(RunDirectoryException.class)
          .hasMessageContaining("local hopstat session");
    }
  }
}
