package org.wordclass.adaptation;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.wordclass.corpus.AnalysisChain;
import org.wordclass.corpus.Utf8LineReader;

/**
 * Plain UTF-8 text files ({@code .gz} read on the fly), cut into sentences as {@link
 * SentenceTokenizer} describes and tokenized by an analysis chain. One document or paragraph per
 * line, or paragraphs separated by blank lines, both work.
 */
public final class TextFileSource implements TextSource {
  private final List<Path> files;
  private final AnalysisChain chain;
  private final Map<String, String> described = new LinkedHashMap<>();

  public TextFileSource(List<Path> files, AnalysisChain chain) {
    if (files.isEmpty()) {
      throw new IllegalArgumentException("no text file given");
    }
    this.files = List.copyOf(files);
    this.chain = chain;
  }

  @Override
  public void forEachSentence(Consumer<List<String>> sink) throws java.io.IOException {
    described.clear();
    described.put("adapt.input.analysis", chain.toString());
    for (int i = 0; i < files.size(); i++) {
      Path file = files.get(i);
      try (Utf8LineReader lines = new Utf8LineReader(file);
          SentenceTokenizer sentences = new SentenceTokenizer(chain, sink)) {
        for (String line = lines.readLine(); line != null; line = lines.readLine()) {
          sentences.line(line);
        }
        sentences.endParagraph();
        described.put("adapt.input.file." + i, file.getFileName() + " sha256:" + lines.sha256());
      }
    }
  }

  @Override
  public Map<String, String> describe() {
    return described;
  }
}
