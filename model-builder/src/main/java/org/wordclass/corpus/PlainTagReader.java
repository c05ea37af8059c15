package org.wordclass.corpus;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * Reads the plain tagged format: one {@code token<TAB>tag} per line, a blank line between
 * sentences. Tokens may contain spaces but not tabs; there is no raw text, so every token is
 * taken to be followed by a space.
 */
public final class PlainTagReader extends SentenceReader {
  public PlainTagReader(Path path, TagColumn column) throws IOException {
    super(path, column);
  }

  @Override
  protected Sentence readSentence() {
    List<String> words = newList();
    List<String> tags = newList();
    List<Boolean> spaces = newList();
    long first = 0;
    String line;
    while ((line = lines.readLine()) != null) {
      if (line.isBlank()) {
        if (!words.isEmpty()) {
          break;
        }
        continue;
      }
      String[] fields = line.split("\t", -1);
      if (fields.length != 2) {
        throw error("expected 2 tab-separated columns (token, tag) but found " + fields.length);
      }
      if (fields[0].isEmpty()) {
        throw error("empty token");
      }
      if (first == 0) {
        first = lines.lineNumber();
      }
      words.add(fields[0]);
      tags.add(checkedTag(fields[1].strip()));
      spaces.add(true);
    }
    return words.isEmpty() ? null : sentence(words, tags, null, spaces, first);
  }
}
