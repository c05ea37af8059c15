package org.wordclass.model;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFileAttributes;
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
 * <p>A user's file is never harmed by the replacement: a symbolic link is followed and its
 * target replaced, the link left as it was; a file replaced keeps its permissions (and, where
 * the process may set them, its owner and group); anything but an ordinary file (a device such
 * as {@code /dev/null}, a folder, a pipe) is refused, as is a folder that does not exist, which
 * is never created. {@link #checkTarget} makes the same checks without writing, so a command
 * can refuse a bad output before it starts its work. Every message names the path the caller
 * gave, never the temporary file.
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

  /** Links followed at most, as the usual operating-system limit (common practice: Linux's 40). */
  private static final int MAX_LINKS = 40;

  private static final String NEW_FILE_PERMISSIONS = "rw-r--r--";

  private AtomicFiles() {}

  public static void write(Path target, Content content) throws IOException {
    Path file = checkTarget(target);
    Path dir = file.getParent();
    removeStaleTemporaryFiles(dir, file.getFileName().toString());
    Path tmp;
    try {
      tmp = Files.createTempFile(dir, file.getFileName().toString(), ".tmp");
    } catch (IOException e) {
      throw cannotWrite(target, e);
    }
    try {
      try (OutputStream out = Files.newOutputStream(tmp)) {
        content.writeTo(out);
      }
      copyOwnershipAndPermissions(file, tmp);
      // on disk before it takes the target's name, so a crash cannot leave the name on a partial file
      IOUtils.fsync(tmp, false);
      try {
        Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
      }
      IOUtils.fsync(dir, true);
    } catch (FileSystemException e) {
      throw cannotWrite(target, e);
    } finally {
      Files.deleteIfExists(tmp);
    }
  }

  /**
   * Checks that {@code target} may be written by {@link #write}, and returns the file that would
   * be written: the target of a symbolic link (absolute), or {@code target} made absolute. The
   * file must be an ordinary file or not yet exist, writable if it exists, in a folder that
   * exists and can be written.
   *
   * @throws FileSystemException naming {@code target} as given, with the reason
   */
  public static Path checkTarget(Path target) throws IOException {
    Path file = followLinks(target);
    BasicFileAttributes attributes = attributesOrNull(file);
    if (attributes != null && !attributes.isRegularFile()) {
      throw refused(target, attributes.isDirectory()
          ? "is a folder; give a file name" : "is not an ordinary file (a device, pipe or socket); refusing to replace it");
    }
    if (attributes != null && !Files.isWritable(file)) {
      throw refused(target, "is read-only; refusing to replace it");
    }
    Path dir = file.getParent();
    if (!Files.isDirectory(dir)) {
      throw refused(target, "folder " + dir + " does not exist (folders are not created; create it first)");
    }
    if (!Files.isWritable(dir)) {
      throw refused(target, "folder " + dir + " cannot be written (permission denied)");
    }
    return file;
  }

  /** The file a chain of symbolic links ends at, absolute; {@code path} itself if it is not a link. */
  private static Path followLinks(Path path) throws IOException {
    Path file = path.toAbsolutePath();
    for (int links = 0; Files.isSymbolicLink(file); links++) {
      if (links == MAX_LINKS) {
        throw refused(path, "is a chain of more than " + MAX_LINKS + " symbolic links");
      }
      file = file.getParent().resolve(Files.readSymbolicLink(file)).toAbsolutePath();
    }
    return file.normalize();
  }

  private static BasicFileAttributes attributesOrNull(Path file) throws IOException {
    try {
      return Files.readAttributes(file, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
    } catch (NoSuchFileException e) {
      return null;
    }
  }

  private static FileSystemException refused(Path target, String reason) {
    return new FileSystemException(target.toString(), null, reason);
  }

  /** The failure of a write, naming the caller's path instead of the temporary file's. */
  private static FileSystemException cannotWrite(Path target, IOException e) {
    String reason = e instanceof FileSystemException f && f.getReason() != null ? f.getReason() : e.getClass().getSimpleName();
    FileSystemException named = refused(target, "cannot be written (" + reason + ")");
    named.initCause(e);
    return named;
  }

  /**
   * Gives the new file the permissions of the file it replaces (a model kept private stays
   * private), or, for a new file, the usual rw-r--r-- (temporary files are created readable by
   * their owner only; a report or model is meant to be shared). The owner and group are copied
   * where the process may set them (as root it may), so a replaced file keeps its owner.
   */
  private static void copyOwnershipAndPermissions(Path previous, Path tmp) throws IOException {
    PosixFileAttributeView view = Files.getFileAttributeView(tmp, PosixFileAttributeView.class);
    if (view == null) {
      return;
    }
    PosixFileAttributes old = null;
    try {
      old = Files.readAttributes(previous, PosixFileAttributes.class);
    } catch (NoSuchFileException e) {
      // a new file
    }
    if (old == null) {
      view.setPermissions(PosixFilePermissions.fromString(NEW_FILE_PERMISSIONS));
      return;
    }
    try {
      if (!old.owner().equals(view.readAttributes().owner())) {
        view.setOwner(old.owner());
      }
      if (!old.group().equals(view.readAttributes().group())) {
        view.setGroup(old.group());
      }
    } catch (IOException e) {
      // only the owner's permissions can be kept then, which the next line does
    }
    view.setPermissions(old.permissions());
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
}
