package org.wordclass.demo;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * One notice of the demo collection: its id, its text, and the class a careful reader gives each
 * word the demo is about. The reader's classes are the yardstick the tagger's choices are measured
 * against; the tagger never sees them.
 */
public record Notice(String id, String text, Map<String, String> readerClasses) {
  /** The invented collection: notices of an island ferry office, one a line. */
  public static final String RESOURCE = "org/wordclass/demo/notices.txt";

  public Notice {
    readerClasses = Map.copyOf(readerClasses);
  }

  /** The collection shipped with the demo. */
  public static List<Notice> bundled() throws IOException {
    try (InputStream in = Notice.class.getClassLoader().getResourceAsStream(RESOURCE)) {
      if (in == null) {
        throw new IOException(RESOURCE + ": missing from the class path");
      }
      return read(new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8)));
    }
  }

  /** Reads {@code ID | TEXT | word=CLASS ...} lines; blank lines and {@code #} comments are skipped. */
  static List<Notice> read(BufferedReader lines) throws IOException {
    List<Notice> notices = new ArrayList<>();
    int number = 0;
    for (String line = lines.readLine(); line != null; line = lines.readLine()) {
      number++;
      if (!line.isBlank() && !line.startsWith("#")) {
        notices.add(parse(line, number));
      }
    }
    return notices;
  }

  private static Notice parse(String line, int number) throws IOException {
    String[] columns = line.split("\\|", -1);
    if (columns.length != 3 || columns[0].isBlank() || columns[1].isBlank()) {
      throw new IOException(RESOURCE + ":" + number + ": expected 'ID | TEXT | word=CLASS ...'");
    }
    Map<String, String> classes = new LinkedHashMap<>();
    for (String judgement : columns[2].trim().split("\\s+")) {
      int eq = judgement.indexOf('=');
      if (eq > 0) {
        classes.put(judgement.substring(0, eq).toLowerCase(Locale.ROOT), judgement.substring(eq + 1));
      } else if (!judgement.isEmpty()) {
        throw new IOException(RESOURCE + ":" + number + ": '" + judgement + "' is not word=CLASS");
      }
    }
    return new Notice(columns[0].trim(), columns[1].trim(), classes);
  }

  /** The reader's class of {@code word} (as indexed, lowercase) here, or null if not judged. */
  public String readerClass(String word) {
    return readerClasses.get(word);
  }
}
