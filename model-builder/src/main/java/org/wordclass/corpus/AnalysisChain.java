package org.wordclass.corpus;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.AnalyzerWrapper;
import org.apache.lucene.analysis.custom.CustomAnalyzer;
import org.wordclass.analysis.SentenceStandardTokenizerFactory;
import org.wordclass.analysis.WordClassFilter;
import org.wordclass.analysis.WordClassOptions;

/**
 * A Lucene analysis chain named the way {@link CustomAnalyzer} takes it: a tokenizer and token
 * filters by their SPI names, each with {@code key=value} arguments. Written on the command line
 * as {@code NAME} or {@code NAME:key=value,key=value}, for example {@code standard},
 * {@code lowercase} or {@code stop:ignoreCase=true}. These are the components that come before
 * the word-class filter at index time; the builder reproduces them so that a model learns the
 * token sequences it will really see.
 */
public final class AnalysisChain {
  /** One component: SPI name and arguments. */
  public record Component(String name, Map<String, String> args) {
    @Override
    public String toString() {
      if (args.isEmpty()) {
        return name;
      }
      StringBuilder s = new StringBuilder(name).append(':');
      args.forEach((k, v) -> s.append(k).append('=').append(v).append(','));
      return s.substring(0, s.length() - 1);
    }
  }

  /**
   * The chain used when none is given, the one the bundled model is trained through and the docs
   * recommend: the standard tokenizer's tokens with sentences marked ({@code sentenceStandard}),
   * nothing else before the word-class filter.
   */
  public static final AnalysisChain DEFAULT = new AnalysisChain(parse(SentenceStandardTokenizerFactory.NAME), List.of());

  private final Component tokenizer;
  private final List<Component> filters;

  public AnalysisChain(Component tokenizer, List<Component> filters) {
    this.tokenizer = tokenizer;
    this.filters = List.copyOf(filters);
  }

  /** Parses {@code NAME} or {@code NAME:key=value,...}. */
  public static Component parse(String spec) {
    String trimmed = spec.strip();
    int colon = trimmed.indexOf(':');
    String name = colon < 0 ? trimmed : trimmed.substring(0, colon);
    if (name.isEmpty()) {
      throw new IllegalArgumentException("analysis component '" + spec + "' has no name");
    }
    Map<String, String> args = new LinkedHashMap<>();
    if (colon >= 0 && colon + 1 < trimmed.length()) {
      for (String pair : trimmed.substring(colon + 1).split(",")) {
        int eq = pair.indexOf('=');
        if (eq <= 0) {
          throw new IllegalArgumentException("argument '" + pair + "' of '" + spec + "' is not key=value");
        }
        args.put(pair.substring(0, eq).strip(), pair.substring(eq + 1).strip());
      }
    }
    return new Component(name, args);
  }

  /** A chain from command-line specs: one tokenizer, any number of filters. */
  public static AnalysisChain of(String tokenizer, List<String> filters) {
    List<Component> parsed = new ArrayList<>();
    for (String f : filters) {
      parsed.add(parse(f));
    }
    return new AnalysisChain(parse(tokenizer), parsed);
  }

  /** Builds the analyzer; an unknown name or argument fails with Lucene's own message. */
  public Analyzer build() {
    try {
      CustomAnalyzer.Builder builder = CustomAnalyzer.builder()
          .withTokenizer(tokenizer.name(), new LinkedHashMap<>(tokenizer.args()));
      for (Component f : filters) {
        builder.addTokenFilter(f.name(), new LinkedHashMap<>(f.args()));
      }
      return builder.build();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /**
   * The chain with a {@link WordClassFilter} of {@code options} after its last component: the
   * whole chain as an index runs it, for showing what the index gets. Closing it closes the chain.
   */
  public Analyzer buildWithWordClass(WordClassOptions options) {
    Analyzer chain = build();
    return new AnalyzerWrapper(chain.getReuseStrategy()) {
      @Override
      protected Analyzer getWrappedAnalyzer(String fieldName) {
        return chain;
      }

      @Override
      protected TokenStreamComponents wrapComponents(String fieldName, TokenStreamComponents components) {
        return new TokenStreamComponents(components.getSource(), new WordClassFilter(components.getTokenStream(), options));
      }

      @Override
      public void close() {
        super.close();
        chain.close();
      }
    };
  }

  public Component tokenizer() {
    return tokenizer;
  }

  public List<Component> filters() {
    return filters;
  }

  /** {@code tokenizer | filter | filter}, for reports and provenance. */
  @Override
  public String toString() {
    StringBuilder s = new StringBuilder(tokenizer.toString());
    for (Component f : filters) {
      s.append(" | ").append(f);
    }
    return s.toString();
  }
}
