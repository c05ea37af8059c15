package org.wordclass.model;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.apache.lucene.util.IOUtils;

/**
 * Writes files (models, reports) through a temporary file in the same folder that is moved into
 * place, so a failed or interrupted run never leaves a half-written file where a whole one was
 * expected, and a previous file stays untouched until the new one is complete.
 *
 * <p>A process killed outright (SIGKILL, power loss) while writing cannot delete its temporary
 * file, {@code <target name><digits>.tmp}. The next write to the same target removes such files
 * once they have not changed for {@link #STALE_AFTER}: no write in progress leaves its file
 * untouched that long, so a concurrent writer's file is never taken away.
 */
public final class AtomicFiles {
  /** Writes the content to a stream. */
  public interface Content {
    void writeTo(OutputStream out) throws IOException;
  }

  /** Age after which a left-over temporary file of a target is taken to be abandoned. */
  public static final Duration STALE_AFTER = Duration.ofMinutes(10);

  private AtomicFiles() {}

  public static void write(Path target, Content content) throws IOException {
    Path dir = target.toAbsolutePath().getParent();
    Files.createDirectories(dir);
    removeStaleTemporaryFiles(dir, target.getFileName().toString());
    Path tmp = Files.createTempFile(dir, target.getFileName().toString(), ".tmp");
    try {
      try (OutputStream out = Files.newOutputStream(tmp)) {
        content.writeTo(out);
      }
      makeReadable(tmp);
      // on disk before it takes the target's name, so a crash cannot leave the name on a partial file
      IOUtils.fsync(tmp, false);
      try {
        Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
      }
      IOUtils.fsync(dir, true);
    } finally {
      Files.deleteIfExists(tmp);
    }
  }

  /** Deletes, where allowed, the temporary files of {@code name} in {@code dir} that killed writers abandoned. */
  static void removeStaleTemporaryFiles(Path dir, String name) throws IOException {
    Pattern own = Pattern.compile(Pattern.quote(name) + "\\d+\\.tmp");
    FileTime staleBefore = FileTime.from(Instant.now().minus(STALE_AFTER));
    List<Path> stale;
    try (Stream<Path> files = Files.list(dir)) {
      stale = files.filter(f -> own.matcher(f.getFileName().toString()).matches())
          .filter(f -> isOlder(f, staleBefore))
          .toList();
    }
    for (Path f : stale) {
      try {
        Files.deleteIfExists(f);
      } catch (IOException e) {
        // clean-up is a courtesy: a file we may not delete must not stop the write
      }
    }
  }

  private static boolean isOlder(Path file, FileTime time) {
    try {
      return Files.isRegularFile(file) && Files.getLastModifiedTime(file).compareTo(time) < 0;
    } catch (IOException e) {
      return false; // gone meanwhile, or not ours to judge
    }
  }

  /**
   * Temporary files are created readable by their owner only; a report or model is meant to be
   * shared, so it gets the usual rw-r--r-- where the file system has POSIX permissions.
   */
  private static void makeReadable(Path file) throws IOException {
    if (Files.getFileAttributeView(file, PosixFileAttributeView.class) != null) {
      Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-r--r--"));
    }
  }
}
