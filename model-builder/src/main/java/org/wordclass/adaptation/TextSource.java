package org.wordclass.adaptation;

import java.io.IOException;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

/**
 * Untagged text to adapt a model to, as a stream of token sequences (sentences). Each call of
 * {@link #forEachSentence} reads the text anew from its source, since re-estimation passes over
 * it once per iteration; nothing is held in memory between sentences.
 */
public interface TextSource {
  /** One full pass: hands every non-empty sentence, as its tokens, to {@code sink} in order. */
  void forEachSentence(Consumer<List<String>> sink) throws IOException;

  /** What was read (files and checksums, or index, field and document count); complete after a pass. */
  Map<String, String> describe();
}
