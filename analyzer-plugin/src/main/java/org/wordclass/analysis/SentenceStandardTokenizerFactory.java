package org.wordclass.analysis;

import java.util.Map;
import org.apache.lucene.analysis.TokenizerFactory;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.util.AttributeFactory;

/**
 * Factory for {@link SentenceStandardTokenizer}, SPI name {@value #NAME}: the tokenizer to put
 * before {@link WordClassFilter} on fields that hold running text of several sentences.
 *
 * <pre class="prettyprint">
 * &lt;analyzer&gt;
 *   &lt;tokenizer name="sentenceStandard"/&gt;
 *   &lt;filter name="wordClass"/&gt;
 *   &lt;filter name="lowercase"/&gt;
 * &lt;/analyzer&gt;</pre>
 *
 * Argument, optional: {@code maxTokenLength}, as for the standard tokenizer (default {@value
 * StandardAnalyzer#DEFAULT_MAX_TOKEN_LENGTH}; longer tokens are split). Unknown arguments fail
 * when the factory is constructed.
 */
public class SentenceStandardTokenizerFactory extends TokenizerFactory {
  /** SPI name. */
  public static final String NAME = "sentenceStandard";

  private final int maxTokenLength;

  public SentenceStandardTokenizerFactory(Map<String, String> args) {
    super(args);
    String given = args.get("maxTokenLength");
    try {
      maxTokenLength = getInt(args, "maxTokenLength", StandardAnalyzer.DEFAULT_MAX_TOKEN_LENGTH);
    } catch (NumberFormatException e) {
      throw new IllegalArgumentException("maxTokenLength must be a whole number, not '" + given + "'", e);
    }
    if (maxTokenLength < 1 || maxTokenLength > 1024 * 1024) {
      throw new IllegalArgumentException("maxTokenLength must be between 1 and 1048576, not " + maxTokenLength);
    }
    if (!args.isEmpty()) {
      throw new IllegalArgumentException("Unknown parameters: " + args);
    }
  }

  /** Default ctor for compatibility with SPI. */
  public SentenceStandardTokenizerFactory() {
    throw defaultCtorException();
  }

  @Override
  public SentenceStandardTokenizer create(AttributeFactory factory) {
    return new SentenceStandardTokenizer(factory, maxTokenLength);
  }
}
