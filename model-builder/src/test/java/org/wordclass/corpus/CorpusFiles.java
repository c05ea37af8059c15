package org.wordclass.corpus;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.GZIPOutputStream;

/** Invented corpus files for the reader tests, written to a temporary folder. */
final class CorpusFiles {
  private CorpusFiles() {}

  /** One CoNLL-U word line: ID, FORM, LEMMA (= form), UPOS, XPOS, four empty columns, MISC. */
  static String row(String id, String form, String upos, String xpos, String misc) {
    return String.join("\t", id, form, form, upos, xpos, "_", "_", "_", "_", misc);
  }

  static String row(String id, String form, String upos) {
    return row(id, form, upos, "_", "_");
  }

  /** Lines joined with LF and ended by one. */
  static String lines(String... lines) {
    return String.join("\n", lines) + "\n";
  }

  static Path write(Path dir, String name, String text) {
    return write(dir, name, text.getBytes(StandardCharsets.UTF_8));
  }

  static Path write(Path dir, String name, byte[] bytes) {
    try {
      Path file = dir.resolve(name);
      if (name.endsWith(".gz")) {
        try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(file))) {
          out.write(bytes);
        }
      } else {
        Files.write(file, bytes);
      }
      return file;
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** All sentences of one file, read with {@code column}. */
  static List<Sentence> read(Path file, TagColumn column) throws IOException {
    List<Sentence> out = new ArrayList<>();
    try (SentenceReader reader = SentenceReader.open(file, CorpusFormat.guess(file), column)) {
      reader.forEachRemaining(out::add);
    }
    return out;
  }

  /** {@code count} one-word CoNLL-U sentences, "w&lt;i&gt; NOUN", as lines (three per sentence). */
  static List<String> manySentences(int count) {
    List<String> lines = new ArrayList<>(count * 3);
    for (int i = 0; i < count; i++) {
      lines.add("# sent_id = s" + i);
      lines.add(row("1", "w" + i, "NOUN"));
      lines.add("");
    }
    return lines;
  }

  /** Concatenation of byte arrays. */
  static byte[] concat(byte[]... parts) {
    int length = 0;
    for (byte[] p : parts) {
      length += p.length;
    }
    byte[] out = new byte[length];
    int at = 0;
    for (byte[] p : parts) {
      System.arraycopy(p, 0, out, at, p.length);
      at += p.length;
    }
    return out;
  }

  static byte[] utf8(String text) {
    return text.getBytes(StandardCharsets.UTF_8);
  }
}
