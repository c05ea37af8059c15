package org.wordclass.corpus;

import java.io.Closeable;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Set;

/**
 * Streams the sentences of one corpus file, one at a time, so a corpus larger than memory can be
 * counted. Malformed input raises a {@link CorpusFormatException} naming file, line and problem.
 */
public abstract class SentenceReader implements Iterator<Sentence>, Closeable {
  protected final Utf8LineReader lines;
  protected final String fileName;
  protected final TagColumn column;
  private Sentence next;
  private boolean finished;
  private long sentences;
  private Set<String> tagsSeen;
  private int maxTags;

  protected SentenceReader(Path path, TagColumn column) throws IOException {
    this.lines = new Utf8LineReader(path);
    this.fileName = path.toString();
    this.column = column;
  }

  /** Opens {@code path} in {@code format}. */
  public static SentenceReader open(Path path, CorpusFormat format, TagColumn column) throws IOException {
    return format == CorpusFormat.CONLLU ? new ConlluReader(path, column) : new PlainTagReader(path, column);
  }

  /** Reads the next sentence, or returns null at the end of the file. */
  protected abstract Sentence readSentence();

  @Override
  public boolean hasNext() {
    if (next == null && !finished) {
      next = readSentence();
      if (next == null) {
        finished = true;
        if (sentences == 0) {
          throw new CorpusFormatException(fileName, 0, lines.sawAnyByte() ? "holds no tagged sentence" : "is empty");
        }
      } else {
        sentences++;
      }
    }
    return next != null;
  }

  @Override
  public Sentence next() {
    if (!hasNext()) {
      throw new NoSuchElementException();
    }
    Sentence s = next;
    next = null;
    return s;
  }

  /** Bytes of the file read so far, for progress display (see {@link Utf8LineReader#bytesRead}). */
  public long bytesRead() {
    return lines.bytesRead();
  }

  /** SHA-256 of the file, once it has been read to the end. */
  public String sha256() {
    return lines.sha256();
  }

  protected CorpusFormatException error(String problem) {
    return new CorpusFormatException(fileName, lines.lineNumber(), problem);
  }

  protected String checkedTag(String tag) {
    String problem = column.problemWith(tag);
    if (problem != null) {
      throw error(problem);
    }
    if (tagsSeen != null && tagsSeen.size() >= maxTags && !tagsSeen.contains(tag)) {
      throw error("tag '" + tag + "' is one more distinct tag than the " + maxTags + " a model can hold");
    }
    if (tagsSeen != null) {
      tagsSeen.add(tag);
    }
    return tag;
  }

  /** Refuses, at its line, the first tag beyond {@code max} distinct ones in {@code seen} (shared by a corpus's files). */
  void limitTags(Set<String> seen, int max) {
    this.tagsSeen = seen;
    this.maxTags = max;
  }

  protected Sentence sentence(List<String> words, List<String> tags, String text, List<Boolean> spaceAfter, long firstLine) {
    return sentence(words, tags, text, spaceAfter, firstLine, List.of());
  }

  protected Sentence sentence(List<String> words, List<String> tags, String text, List<Boolean> spaceAfter, long firstLine,
      List<Sentence.MultiwordToken> multiwordTokens) {
    boolean[] spaces = new boolean[spaceAfter.size()];
    for (int i = 0; i < spaces.length; i++) {
      spaces[i] = spaceAfter.get(i);
    }
    return new Sentence(List.copyOf(words), List.copyOf(tags), text, spaces, fileName, firstLine, List.copyOf(multiwordTokens));
  }

  protected static <T> List<T> newList() {
    return new ArrayList<>();
  }

  @Override
  public void close() throws IOException {
    lines.close();
  }
}
