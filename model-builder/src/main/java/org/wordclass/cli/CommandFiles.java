package org.wordclass.cli;

import java.io.IOException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.wordclass.model.AtomicFiles;

/**
 * The files a command reads and writes, declared before it does any work and checked all at
 * once, so that a mistake in a path is refused in a second rather than after minutes of
 * counting, and no output can destroy an input:
 *
 * <ul>
 *   <li>every input exists; a file named twice in an option that counts its files (two {@code
 *       --corpus} that are one file) is refused, since it would be counted twice;
 *   <li>every output passes {@link AtomicFiles#checkTarget} (an ordinary file or absent, in a
 *       folder that exists and can be written; a link stands for its target);
 *   <li>no output is the same file as an input or as another output, by file identity ({@link
 *       Files#isSameFile}), so links, {@code ./} and other spellings of a path count too, and no
 *       output lies inside an input folder (an index); the one exception is a pair declared
 *       {@link #replacing} ({@code adapt --out} over its {@code --model}).
 * </ul>
 *
 * Costs a few file-system calls per file.
 */
final class CommandFiles {
  private record Named(String option, Path path) {
    String describe() {
      return option + " " + path;
    }
  }

  private final List<Named> inputs = new ArrayList<>();
  private final List<List<Named>> countedOnce = new ArrayList<>();
  private final List<Named> outputs = new ArrayList<>();
  private final Set<String> replaceable = new HashSet<>();

  /** An input file or folder; null (an option not given) is ignored. */
  CommandFiles input(String option, Path path) {
    if (path != null) {
      inputs.add(new Named(option, path));
    }
    return this;
  }

  /** Input files that are each counted, so none may be given twice; null is ignored. */
  CommandFiles countedInputs(String option, List<Path> paths) {
    if (paths != null) {
      List<Named> group = new ArrayList<>();
      for (Path p : paths) {
        Named named = new Named(option, p);
        inputs.add(named);
        group.add(named);
      }
      countedOnce.add(group);
    }
    return this;
  }

  /** An output file; null (an option not given) is ignored. */
  CommandFiles output(String option, Path path) {
    if (path != null) {
      outputs.add(new Named(option, path));
    }
    return this;
  }

  /** Lets the output of {@code outputOption} replace the input of {@code inputOption} (atomically). */
  CommandFiles replacing(String outputOption, String inputOption) {
    replaceable.add(outputOption + "\0" + inputOption);
    return this;
  }

  /** Checks every declared file; the first problem is thrown, naming the path as the user gave it. */
  void check() throws IOException {
    for (Named in : inputs) {
      if (!Files.exists(in.path())) {
        throw new NoSuchFileException(in.path().toString());
      }
    }
    for (List<Named> group : countedOnce) {
      for (int i = 0; i < group.size(); i++) {
        for (int j = 0; j < i; j++) {
          if (Files.isSameFile(group.get(i).path(), group.get(j).path())) {
            throw refused(group.get(i).path(), "given twice (" + group.get(j).describe() + " and " + group.get(i).describe()
                + " are the same file); each is counted once per mention, so give it once");
          }
        }
      }
    }
    List<Path> written = new ArrayList<>();
    for (Named out : outputs) {
      Path target = AtomicFiles.checkTarget(out.path());
      // the real folder, so that outputs and input folders compare whatever links lead to them
      Path file = target.getParent().toRealPath().resolve(target.getFileName());
      for (int k = 0; k < written.size(); k++) {
        if (written.get(k).equals(file) || Files.exists(file) && Files.isSameFile(written.get(k), file)) {
          throw refused(out.path(), outputs.get(k).describe() + " and " + out.describe() + " are the same file");
        }
      }
      written.add(file);
      for (Named in : inputs) {
        checkNotOver(out, file, in);
      }
    }
  }

  private void checkNotOver(Named out, Path file, Named in) throws IOException {
    if (Files.isDirectory(in.path())) {
      if (file.startsWith(in.path().toRealPath())) {
        throw refused(out.path(), out.option() + " lies inside the folder of " + in.describe()
            + ", an input; refusing to write into it");
      }
      return;
    }
    if (Files.exists(file) && Files.isSameFile(file, in.path()) && !replaceable.contains(out.option() + "\0" + in.option())) {
      throw refused(out.path(), out.option() + " is the same file as " + in.describe()
          + ", an input; refusing to write over it (choose another output file)");
    }
  }

  private static FileSystemException refused(Path path, String reason) {
    return new FileSystemException(path.toString(), null, reason);
  }
}
