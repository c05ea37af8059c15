package org.wordclass.adaptation;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.wordclass.corpus.Corpus;
import org.wordclass.corpus.Sentence;

/**
 * The words of a tagged corpus with the tags ignored: untagged text with the corpus's own
 * (gold) tokenization and sentence breaks. For experiments that compare with the tags afterwards;
 * a range of sentences can be chosen, so one file can give both a tagged and an untagged part.
 */
public final class CorpusWordsSource implements TextSource {
  private final Corpus corpus;
  private final long skip;
  private final long limit;
  private final Map<String, String> described = new LinkedHashMap<>();

  /** Sentences {@code skip .. skip + limit - 1} of the corpus (0-based). */
  public CorpusWordsSource(Corpus corpus, long skip, long limit) {
    this.corpus = corpus;
    this.skip = skip;
    this.limit = limit;
  }

  @Override
  public void forEachSentence(Consumer<List<String>> sink) {
    long index = 0;
    long used = 0;
    for (Sentence sentence : corpus) {
      // read on past the range rather than stop, so the file is closed and its checksum known
      if (index++ < skip || sentence.size() == 0 || used >= limit) {
        continue;
      }
      sink.accept(sentence.words());
      used++;
    }
    described.clear();
    corpus.sha256ByFile().forEach((file, sha) -> described.put("adapt.input.corpus." + file, "sha256:" + sha));
    described.put("adapt.input.tokens", "gold words of the corpus, tags ignored");
    described.put("adapt.input.sentences", skip + ".." + (skip + used - 1));
  }

  @Override
  public Map<String, String> describe() {
    return described;
  }
}
