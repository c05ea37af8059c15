package org.wordclass.corpus;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;
import java.util.function.Consumer;

/**
 * One or more corpus files read as one stream of sentences. Each iteration reads the files anew
 * (nothing is held in memory), so a corpus can be passed over more than once.
 */
public final class Corpus implements Iterable<Sentence> {
  private final List<Path> files;
  private final CorpusFormat format;
  private final TagColumn column;
  private final Map<String, String> sha256 = new LinkedHashMap<>();
  private int maxTags;
  private long passBytesDone;
  private SentenceReader passReader;

  /**
   * @param format the format of every file, or null to guess it from each file's name
   */
  public Corpus(List<Path> files, CorpusFormat format, TagColumn column) {
    if (files.isEmpty()) {
      throw new IllegalArgumentException("no corpus file given");
    }
    this.files = List.copyOf(files);
    this.format = format;
    this.column = column;
  }

  /**
   * Makes every pass refuse, at its line, a tag beyond the first {@code max} distinct ones: a
   * corpus meant for training is stopped while it is read, not after it was counted.
   */
  public Corpus limitTags(int max) {
    this.maxTags = max;
    return this;
  }

  public List<Path> files() {
    return files;
  }

  public TagColumn column() {
    return column;
  }

  /** SHA-256 of each file by name, filled in once a pass has read it to the end. */
  public Map<String, String> sha256ByFile() {
    return sha256;
  }

  /**
   * Bytes of the files (as stored) read so far by the pass started last, for progress display;
   * compare with the sum of the files' sizes.
   */
  public long bytesRead() {
    SentenceReader current = passReader;
    return passBytesDone + (current == null ? 0 : current.bytesRead());
  }

  /** Reads every sentence of every file in order. */
  public void forEachSentence(Consumer<Sentence> action) {
    for (Sentence s : this) {
      action.accept(s);
    }
  }

  @Override
  public Iterator<Sentence> iterator() {
    passBytesDone = 0;
    passReader = null;
    return new Iterator<>() {
      private final Set<String> tagsSeen = new HashSet<>();
      private int fileIndex = -1;
      private SentenceReader reader;

      @Override
      public boolean hasNext() {
        try {
          while (reader == null || !reader.hasNext()) {
            if (reader != null) {
              sha256.put(files.get(fileIndex).getFileName().toString(), reader.sha256());
              passBytesDone += reader.bytesRead();
              passReader = null;
              reader.close();
              reader = null;
            }
            if (fileIndex + 1 >= files.size()) {
              return false;
            }
            fileIndex++;
            Path path = files.get(fileIndex);
            reader = SentenceReader.open(path, format != null ? format : CorpusFormat.guess(path), column);
            passReader = reader;
            if (maxTags > 0) {
              reader.limitTags(tagsSeen, maxTags);
            }
          }
          return true;
        } catch (IOException e) {
          throw new UncheckedIOException(e);
        } catch (CorpusFormatException e) {
          closeQuietly();
          throw e;
        }
      }

      private void closeQuietly() {
        try {
          if (reader != null) {
            reader.close();
          }
        } catch (IOException ignored) {
          // the format error is what the user needs to see
        }
      }

      @Override
      public Sentence next() {
        if (!hasNext()) {
          throw new NoSuchElementException();
        }
        return reader.next();
      }
    };
  }
}
