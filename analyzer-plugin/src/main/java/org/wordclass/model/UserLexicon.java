package org.wordclass.model;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Pattern;

/**
 * A user's corrections of a model's lexicon for their own domain, kept in a small UTF-8 text file
 * and applied without retraining (by {@link LexiconOverlay}; the format is described in {@code
 * docs/user-lexicon.md}):
 *
 * <pre>
 * # word   classes, optionally weighted    options
 * Gearbox  PROPN
 * cook     NOUN:3 VERB
 * zest     VERB NOUN                       case=any
 * </pre>
 *
 * A listed word may take only its listed classes. Fields are separated by spaces or tabs; a field
 * starting with {@code #} begins a comment. {@code case=exact} (the default) applies an entry to
 * the word exactly as written; {@code case=any} to its lower-case, Capitalised and UPPER-CASE
 * forms as well.
 *
 * <p>The whole file is parsed and every line checked against the model's tag set before anything
 * is built from it, so a bad file is refused whole, never half-applied: a {@link
 * LexiconFormatException} names the file, the line and the reason. Parsing costs time linear in
 * the file (under 20 ms for a thousand lines) and holds one small object per entry.
 * Immutable.
 */
public final class UserLexicon {
  /** Largest file read; a user lexicon is meant to be small, so anything bigger is a mistake. */
  public static final int MAX_FILE_BYTES = 16 << 20;

  static final String CASE_OPTION = "case=";
  private static final String EXAMPLE = "such as 'cook NOUN VERB:2'";
  private static final Pattern FIELD_SEPARATOR = Pattern.compile("[ \t]+");

  /**
   * One listed word.
   *
   * @param word the word as written in the file
   * @param line the 1-based line it was listed on
   * @param tags its classes (tag indexes), in the file's order
   * @param weights the relative weight of each class, positive; 1 where none was given
   * @param anyCase whether the entry applies to the word's other case forms too
   */
  public record Entry(String word, int line, int[] tags, double[] weights, boolean anyCase) {
    /**
     * The written forms the entry applies to: the word itself and, for {@code case=any}, its
     * lower-case, Capitalised and UPPER-CASE forms (each once).
     */
    public Set<String> forms() {
      Set<String> forms = new LinkedHashSet<>();
      forms.add(word);
      if (anyCase) {
        forms.add(Spelling.lowerCase(word));
        forms.add(Spelling.capitalised(word));
        forms.add(Spelling.upperCase(word));
      }
      return forms;
    }
  }

  private final String name;
  private final String sha256;
  private final List<Entry> entries;

  private UserLexicon(String name, String sha256, List<Entry> entries) {
    this.name = name;
    this.sha256 = sha256;
    this.entries = List.copyOf(entries);
  }

  /** Reads and parses {@code file}; messages name it as given. */
  public static UserLexicon read(Path file, TagSet tags) throws IOException {
    try (InputStream in = Files.newInputStream(file)) {
      return parse(readBytes(in, file.toString()), file.toString(), tags);
    }
  }

  /** The bytes of a lexicon, refusing a stream longer than {@link #MAX_FILE_BYTES}. */
  public static byte[] readBytes(InputStream in, String name) throws IOException {
    byte[] bytes = in.readNBytes(MAX_FILE_BYTES + 1);
    if (bytes.length > MAX_FILE_BYTES) {
      throw new LexiconFormatException(name, 0, "larger than any user lexicon (" + MAX_FILE_BYTES + " bytes)");
    }
    return bytes;
  }

  /**
   * Parses a whole lexicon file, checking its classes against {@code tags}.
   *
   * @param name how messages name the file
   * @throws LexiconFormatException at the first malformed line, unknown class or duplicate entry
   */
  public static UserLexicon parse(byte[] bytes, String name, TagSet tags) throws LexiconFormatException {
    return new UserLexicon(name, Checksums.sha256(bytes), new Parser(name, tags).parse(bytes));
  }

  /** How messages name the file. */
  public String name() {
    return name;
  }

  public String sha256() {
    return sha256;
  }

  /** The entries in file order. */
  public List<Entry> entries() {
    return entries;
  }

  /**
   * What a model built with this lexicon records about it: {@code lexicon.file} (the file name
   * without folders, so that a rebuild elsewhere gives the same model), {@code lexicon.sha256}
   * and {@code lexicon.entries}.
   */
  public Map<String, String> provenance() {
    Map<String, String> p = new TreeMap<>();
    p.put("lexicon.file", name.substring(Math.max(name.lastIndexOf('/'), name.lastIndexOf('\\')) + 1));
    p.put("lexicon.sha256", sha256);
    p.put("lexicon.entries", Integer.toString(entries.size()));
    return p;
  }

  /** Reads lines into entries; one per parse. */
  private static final class Parser {
    private final String name;
    private final TagSet tags;
    private final CharsetDecoder utf8 = StandardCharsets.UTF_8.newDecoder()
        .onMalformedInput(CodingErrorAction.REPORT)
        .onUnmappableCharacter(CodingErrorAction.REPORT);
    private final List<Entry> entries = new ArrayList<>();
    /** Line of each exactly written word, and of each written form of a case=any word. */
    private final Map<String, Integer> exactLines = new HashMap<>();
    private final Map<String, Integer> anyCaseLines = new HashMap<>();

    Parser(String name, TagSet tags) {
      this.name = name;
      this.tags = tags;
    }

    List<Entry> parse(byte[] bytes) throws LexiconFormatException {
      int start = startsWithByteOrderMark(bytes) ? 3 : 0;
      for (int line = 1; start <= bytes.length; line++) {
        int end = start;
        while (end < bytes.length && bytes[end] != '\n') {
          end++;
        }
        int stop = end > start && bytes[end - 1] == '\r' ? end - 1 : end;
        parseLine(decode(bytes, start, stop, line), line);
        start = end + 1;
      }
      return entries;
    }

    private static boolean startsWithByteOrderMark(byte[] b) {
      return b.length >= 3 && (b[0] & 0xFF) == 0xEF && (b[1] & 0xFF) == 0xBB && (b[2] & 0xFF) == 0xBF;
    }

    private String decode(byte[] bytes, int from, int to, int line) throws LexiconFormatException {
      try {
        return utf8.decode(ByteBuffer.wrap(bytes, from, to - from)).toString();
      } catch (CharacterCodingException e) {
        throw error(line, "not valid UTF-8");
      }
    }

    private void parseLine(String text, int line) throws LexiconFormatException {
      String[] fields = withoutComment(FIELD_SEPARATOR.split(text.strip()));
      if (fields.length == 0) {
        return;
      }
      List<Integer> lineTags = new ArrayList<>();
      List<Double> lineWeights = new ArrayList<>();
      Boolean anyCase = null;
      for (int i = 1; i < fields.length; i++) {
        if (fields[i].startsWith(CASE_OPTION)) {
          anyCase = caseOption(fields[i], anyCase, line);
        } else {
          addClass(fields[i], lineTags, lineWeights, line);
        }
      }
      if (lineTags.isEmpty()) {
        throw error(line, "expected a word and one or more classes, " + EXAMPLE + ", not '" + String.join(" ", fields) + "'");
      }
      Entry entry = new Entry(fields[0], line, lineTags.stream().mapToInt(Integer::intValue).toArray(),
          lineWeights.stream().mapToDouble(Double::doubleValue).toArray(), anyCase != null && anyCase);
      checkNotListedBefore(entry);
      entries.add(entry);
    }

    /** The fields before the first one that starts a comment. */
    private static String[] withoutComment(String[] fields) {
      int n = 0;
      while (n < fields.length && !fields[n].isEmpty() && fields[n].charAt(0) != '#') {
        n++;
      }
      return Arrays.copyOf(fields, n);
    }

    private boolean caseOption(String field, Boolean before, int line) throws LexiconFormatException {
      if (before != null) {
        throw error(line, "the case option is given twice");
      }
      String value = field.substring(CASE_OPTION.length());
      if (!value.equals("exact") && !value.equals("any")) {
        throw error(line, "unknown option '" + field + "'; the case option is case=exact or case=any");
      }
      return value.equals("any");
    }

    /** Reads {@code CLASS} or {@code CLASS:weight}; a class whose own name holds a colon is taken whole. */
    private void addClass(String field, List<Integer> lineTags, List<Double> lineWeights, int line)
        throws LexiconFormatException {
      int colon = field.lastIndexOf(':');
      boolean weighted = tags.indexOf(field) < 0 && colon > 0;
      String className = weighted ? field.substring(0, colon) : field;
      int tag = tags.indexOf(className);
      if (tag < 0) {
        throw error(line, "unknown class '" + className + "'; the model's classes are " + tags);
      }
      if (lineTags.contains(tag)) {
        throw error(line, "class " + className + " is given twice");
      }
      lineTags.add(tag);
      lineWeights.add(weighted ? weight(className, field.substring(colon + 1), line) : 1.0);
    }

    private double weight(String className, String text, int line) throws LexiconFormatException {
      try {
        double weight = Double.parseDouble(text);
        if (weight > 0 && Double.isFinite(weight)) {
          return weight;
        }
      } catch (NumberFormatException e) {
        // reported below, naming the class
      }
      throw error(line, "the weight of " + className + " must be a positive number, not '" + text + "'");
    }

    /**
     * Exact entries may not repeat a word; case=any entries may not share a written form, which
     * catches a word listed twice in different cases whichever case each was written in.
     */
    private void checkNotListedBefore(Entry entry) throws LexiconFormatException {
      Map<String, Integer> seen = entry.anyCase() ? anyCaseLines : exactLines;
      for (String form : entry.anyCase() ? entry.forms() : Set.of(entry.word())) {
        Integer first = seen.get(form);
        if (first != null) {
          throw error(entry.line(), "'" + entry.word() + "' is listed twice" + (entry.anyCase() ? " in any case" : "")
              + " (first on line " + first + ")");
        }
      }
      for (String form : entry.anyCase() ? entry.forms() : Set.of(entry.word())) {
        seen.put(form, entry.line());
      }
    }

    private LexiconFormatException error(int line, String reason) {
      return new LexiconFormatException(name, line, reason);
    }
  }
}
