package org.wordclass.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Instant;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.wordclass.testing.TestModels;

/**
 * A model file is never left half-written (common practice: write a temporary file, then rename
 * it over the target): a failed write leaves no temporary file and the previous file as it was.
 */
class ModelFileWriteSafetyTest {
  @TempDir Path dir;
  private Path target;
  private byte[] previous;

  @BeforeEach
  void writePreviousModel() throws IOException {
    target = dir.resolve("model.wcm");
    ModelFile.write(TestModels.small(), target);
    previous = Files.readAllBytes(target);
  }

  /** A model whose writing fails half-way: a provenance value that cannot be written. */
  private static HmmModel modelWhoseWriteFails() {
    Map<String, String> provenance = new HashMap<>(TestModels.small().provenance());
    provenance.put("zz-last", null);
    return ModelFileRoundTripTest.withProvenance(TestModels.small(), provenance);
  }

  @Test
  void failedWriteKeepsThePreviousFileAndLeavesNoTemporaryFile() throws IOException {
    assertThrows(NullPointerException.class, () -> ModelFile.write(modelWhoseWriteFails(), target));
    assertEquals(List.of("model.wcm"), fileNames(dir));
    assertArrayEquals(previous, Files.readAllBytes(target));
  }

  @Test
  void failedWriteOfANewFileLeavesNothing() throws IOException {
    assertThrows(NullPointerException.class, () -> ModelFile.write(modelWhoseWriteFails(), dir.resolve("new.wcm")));
    assertEquals(List.of("model.wcm"), fileNames(dir));
  }

  /** The target is a directory holding a file: the move fails, after the whole model was written. */
  @Test
  void targetThatIsADirectoryIsLeftAloneAndNoTemporaryFileRemains() throws IOException {
    Path folder = Files.createDirectory(dir.resolve("folder.wcm"));
    Files.write(folder.resolve("keep.txt"), new byte[] {1, 2, 3});
    assertThrows(IOException.class, () -> ModelFile.write(TestModels.small(), folder));
    assertEquals(List.of("folder.wcm", "model.wcm"), fileNames(dir));
    assertEquals(List.of("keep.txt"), fileNames(folder));
  }

  @Test
  void successfulWriteReplacesThePreviousFileAndLeavesNoTemporaryFile() throws IOException {
    HmmModel other = TestModels.random(new java.util.Random(3L), 1);
    ModelFile.write(other, target);
    assertEquals(List.of("model.wcm"), fileNames(dir));
    assertArrayEquals(TestModels.bytes(other), Files.readAllBytes(target));
  }

  /** Needs a user whom file permissions bind; root writes into read-only folders regardless. */
  @Test
  void readOnlyDirectoryIsRefusedAndThePreviousFileKept() throws IOException {
    assumeFalse("root".equals(System.getProperty("user.name")), "skipped: permissions do not bind root");
    Files.setPosixFilePermissions(dir, PosixFilePermissions.fromString("r-xr-xr-x"));
    try {
      assertThrows(IOException.class, () -> ModelFile.write(TestModels.random(new java.util.Random(4L), 1), target));
    } finally {
      Files.setPosixFilePermissions(dir, PosixFilePermissions.fromString("rwxr-xr-x"));
    }
    assertEquals(List.of("model.wcm"), fileNames(dir));
    assertArrayEquals(previous, Files.readAllBytes(target));
  }

  @Test
  void previousFileIsStillAValidModel() throws IOException {
    assertThrows(NullPointerException.class, () -> ModelFile.write(modelWhoseWriteFails(), target));
    ModelFileRoundTripTest.assertSameModel(TestModels.small(), ModelFile.read(target));
    assertTrue(Files.isRegularFile(target));
  }

  /**
   * What a writer killed by SIGKILL leaves (see InterruptedTrainTest in the model builder): its
   * temporary file. The next write to the same target removes it once stale, and keeps a fresh
   * one (a concurrent writer's) and those of other targets.
   */
  @Test
  void nextWriteRemovesStaleTemporaryFilesOfItsOwnTargetOnly() throws IOException {
    FileTime old = FileTime.from(Instant.now().minus(AtomicFiles.STALE_AFTER).minusSeconds(60));
    Path stale = Files.setLastModifiedTime(Files.write(dir.resolve("model.wcm8812734.tmp"), new byte[] {1}), old);
    Path fresh = Files.write(dir.resolve("model.wcm5521.tmp"), new byte[] {2});
    Path otherTarget = Files.setLastModifiedTime(Files.write(dir.resolve("other.wcm77.tmp"), new byte[] {3}), old);
    Path notATemporary = Files.setLastModifiedTime(Files.write(dir.resolve("model.wcm.tmp"), new byte[] {4}), old);
    ModelFile.write(TestModels.random(new java.util.Random(5L), 1), target);
    assertFalse(Files.exists(stale));
    assertEquals(List.of("model.wcm", "model.wcm.tmp", "model.wcm5521.tmp", "other.wcm77.tmp"), fileNames(dir));
    assertTrue(Files.exists(fresh) && Files.exists(otherTarget) && Files.exists(notATemporary));
  }

  /** A link given as the target: the file it points to is replaced, the link stays a link. */
  @Test
  void symbolicLinkIsWrittenThroughToItsTarget() throws IOException {
    Path elsewhere = Files.createDirectory(dir.resolve("elsewhere"));
    Path real = elsewhere.resolve("real.wcm");
    Files.write(real, new byte[] {9});
    Path link = Files.createSymbolicLink(dir.resolve("link.wcm"), Paths.get("elsewhere", "real.wcm"));
    HmmModel other = TestModels.random(new java.util.Random(6L), 1);
    ModelFile.write(other, link);
    assertTrue(Files.isSymbolicLink(link));
    assertArrayEquals(TestModels.bytes(other), Files.readAllBytes(real));
    assertEquals(List.of("real.wcm"), fileNames(elsewhere));
  }

  /** A model kept private (rw-------) stays private when replaced; a new file gets rw-r--r--. */
  @Test
  void replacedFileKeepsItsPermissions() throws IOException {
    Files.setPosixFilePermissions(target, PosixFilePermissions.fromString("rw-------"));
    ModelFile.write(TestModels.random(new java.util.Random(7L), 1), target);
    assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(target)));
    Path fresh = dir.resolve("fresh.wcm");
    ModelFile.write(TestModels.small(), fresh);
    assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(fresh)));
  }

  /** A device is never replaced by an ordinary file (as root, /dev/null was); checked without writing. */
  @Test
  void deviceIsRefusedAsTarget() {
    Path devNull = Paths.get("/dev/null");
    assumeTrue(Files.exists(devNull), "skipped: no /dev/null");
    IOException e = assertThrows(IOException.class, () -> AtomicFiles.checkTarget(devNull));
    assertEquals("/dev/null: is not an ordinary file (a device, pipe or socket); refusing to replace it", e.getMessage());
  }

  @Test
  void namedPipeIsRefusedAndLeftInPlace() throws Exception {
    Path fifo = dir.resolve("pipe.wcm");
    assumeTrue(new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor() == 0, "skipped: mkfifo unavailable");
    IOException e = assertThrows(IOException.class, () -> ModelFile.write(TestModels.small(), fifo));
    assertEquals(fifo + ": is not an ordinary file (a device, pipe or socket); refusing to replace it", e.getMessage());
    assertTrue(Files.exists(fifo) && !Files.isRegularFile(fifo));
    assertEquals(List.of("model.wcm", "pipe.wcm"), fileNames(dir));
  }

  /** A typo in a folder name must not create a new tree of folders. */
  @Test
  void missingFolderIsRefusedAndNotCreated() {
    Path typo = dir.resolve("mdoels").resolve("en.wcm");
    IOException e = assertThrows(IOException.class, () -> ModelFile.write(TestModels.small(), typo));
    assertEquals(typo + ": folder " + typo.getParent() + " does not exist (folders are not created; create it first)", e.getMessage());
    assertFalse(Files.exists(typo.getParent()));
  }

  private static List<String> fileNames(Path folder) throws IOException {
    try (Stream<Path> files = Files.list(folder)) {
      return files.map(p -> p.getFileName().toString()).sorted().toList();
    }
  }
}
