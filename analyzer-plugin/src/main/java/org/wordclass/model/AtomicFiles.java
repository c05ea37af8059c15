package org.wordclass.model;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;
import org.apache.lucene.util.IOUtils;

/**
 * Writes files (models, reports) through a temporary file in the same folder that is moved into
 * place, so a failed or interrupted run never leaves a half-written file where a whole one was
 * expected, and a previous file stays untouched until the new one is complete.
 */
public final class AtomicFiles {
  /** Writes the content to a stream. */
  public interface Content {
    void writeTo(OutputStream out) throws IOException;
  }

  private AtomicFiles() {}

  public static void write(Path target, Content content) throws IOException {
    Path dir = target.toAbsolutePath().getParent();
    Files.createDirectories(dir);
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
