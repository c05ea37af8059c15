package org.wordclass.testing;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import org.apache.lucene.codecs.CodecUtil;
import org.apache.lucene.store.IndexOutput;
import org.apache.lucene.store.OutputStreamIndexOutput;
import org.wordclass.model.HmmModel;
import org.wordclass.model.Lexicon;
import org.wordclass.model.LowerCaseFormCue;
import org.wordclass.model.ModelFile;
import org.wordclass.model.StateSpace;
import org.wordclass.model.AffixTrie;
import org.wordclass.model.TagSet;
import org.wordclass.model.UnknownWordModel;
import org.wordclass.model.WordShape;

/**
 * Small models built straight through the public constructors, shared by the decoding and the
 * model-file tests: random ones for property tests and one fixed one for file-format tests. All
 * data is invented.
 */
public final class TestModels {
  /** Words the random models may know. */
  public static final List<String> KNOWN_POOL = List.of("ab", "cd", "ef", "gh", "ij");
  /** Words no random model knows, one per spelling shape the unknown-word model tells apart. */
  public static final List<String> UNKNOWN_POOL = List.of("zzq", "Xyz", "42", "QRS", "%%");

  private TestModels() {}

  /** A random model with 2 to 4 tags, random normalised transitions and a lexicon of a few words. */
  public static HmmModel random(Random rnd, int order) {
    int tagCount = 2 + rnd.nextInt(3);
    int states = tagCount + 1;
    double[] bigram = randomLogRows(rnd, states, states);
    double[] trigram = randomLogRows(rnd, states * states, states);
    Lexicon lexicon = new Lexicon(randomEntries(rnd, tagCount));
    return new HmmModel(order, tagNames(tagCount), bigram, trigram, lexicon, randomUnknownWords(rnd, tagCount), Map.of());
  }

  /** Tags "T0", "T1", ... */
  public static TagSet tagNames(int tagCount) {
    List<String> names = new ArrayList<>();
    for (int t = 0; t < tagCount; t++) {
      names.add("T" + t);
    }
    return new TagSet(names);
  }

  /**
   * {@code rows} distributions over {@code width} next states, as logs; about one entry in ten is
   * zero (log -Infinity), so forbidden transitions are exercised too.
   */
  public static double[] randomLogRows(Random rnd, int rows, int width) {
    double[] out = new double[rows * width];
    for (int r = 0; r < rows; r++) {
      double[] p = randomDistribution(rnd, width, 0.1);
      for (int c = 0; c < width; c++) {
        out[r * width + c] = Math.log(p[c]);
      }
    }
    return out;
  }

  /** A probability vector of {@code n} entries, each zero with probability {@code zeroRate} (never all). */
  public static double[] randomDistribution(Random rnd, int n, double zeroRate) {
    double[] p = new double[n];
    double sum = 0;
    while (sum == 0) {
      for (int i = 0; i < n; i++) {
        p[i] = rnd.nextDouble() < zeroRate ? 0 : 0.01 + rnd.nextDouble();
        sum += p[i];
      }
    }
    for (int i = 0; i < n; i++) {
      p[i] /= sum;
    }
    return p;
  }

  private static List<Lexicon.Entry> randomEntries(Random rnd, int tagCount) {
    List<Lexicon.Entry> entries = new ArrayList<>();
    int words = 2 + rnd.nextInt(KNOWN_POOL.size() - 1);
    for (int w = 0; w < words; w++) {
      int[] tags = randomSubset(rnd, tagCount);
      float[] emissions = new float[tags.length];
      for (int k = 0; k < tags.length; k++) {
        emissions[k] = (float) Math.log(0.05 + 0.95 * rnd.nextDouble());
      }
      entries.add(new Lexicon.Entry(KNOWN_POOL.get(w), tags, emissions));
    }
    return entries;
  }

  /** A non-empty ascending subset of {@code 0..n-1}. */
  public static int[] randomSubset(Random rnd, int n) {
    int[] picked;
    do {
      picked = java.util.stream.IntStream.range(0, n).filter(i -> rnd.nextBoolean()).toArray();
    } while (picked.length == 0);
    return picked;
  }

  /** A simple unknown-word model over a random set of open tags, with a one-trie suffix table. */
  public static UnknownWordModel randomUnknownWords(Random rnd, int tagCount) {
    int[] open = randomSubset(rnd, tagCount);
    double[] prior = randomDistribution(rnd, tagCount, 0);
    double[] logPrior = Arrays.stream(prior).map(Math::log).toArray();
    AffixTrie.Builder trie = new AffixTrie.Builder();
    trie.add("zzq", open[rnd.nextInt(open.length)], 1 + rnd.nextInt(5), 3);
    trie.add("xyz", open[rnd.nextInt(open.length)], 1 + rnd.nextInt(5), 3);
    return UnknownWordModel.builder().theta(1.0).openTags(open, randomDistribution(rnd, open.length, 0)).logPrior(logPrior)
        .endings(3, new int[WordShape.values().length], new AffixTrie[] {trie.build()}).build();
  }

  /** {@code length} tokens drawn from the model's lexicon, each unknown with probability {@code unknownRate}. */
  public static List<String> randomTokens(Random rnd, HmmModel model, int length, double unknownRate) {
    List<String> tokens = new ArrayList<>(length);
    Lexicon lexicon = model.lexicon();
    for (int i = 0; i < length; i++) {
      tokens.add(rnd.nextDouble() < unknownRate
          ? UNKNOWN_POOL.get(rnd.nextInt(UNKNOWN_POOL.size()))
          : lexicon.word(rnd.nextInt(lexicon.size())));
    }
    return tokens;
  }

  /**
   * A fixed small model for file-format tests: 3 tags, a lexicon with a non-ASCII word, two
   * suffix tries, provenance entries, order 2. About 1 KB written.
   */
  public static HmmModel small() {
    Random rnd = new Random(20240611L);
    int tagCount = 3;
    int states = tagCount + 1;
    List<Lexicon.Entry> entries = List.of(
        new Lexicon.Entry("the", new int[] {0}, new float[] {-0.5f}),
        new Lexicon.Entry("run", new int[] {1, 2}, new float[] {-3.25f, -4.0f}),
        new Lexicon.Entry("Zürich", new int[] {1}, new float[] {-6.5f}),
        new Lexicon.Entry("walks", new int[] {1, 2}, new float[] {-5.0f, -4.75f}));
    Map<String, String> provenance = new TreeMap<>(Map.of("corpus", "invented.conllu", "tokens", "42", "builder", "test"));
    Lexicon lexicon = new Lexicon(entries);
    return new HmmModel(2, new TagSet(List.of("DET", "NOUN", "VERB")), randomLogRows(rnd, states, states),
        randomLogRows(rnd, states * states, states), lexicon, smallUnknownWords(lexicon), provenance);
  }

  private static UnknownWordModel smallUnknownWords(Lexicon lexicon) {
    AffixTrie.Builder lower = new AffixTrie.Builder();
    lower.add("walked", 2, 3, 4);
    lower.add("talked", 2, 2, 4);
    lower.add("table", 1, 4, 4);
    lower.add("ending", 1, 1, 4);
    AffixTrie.Builder upper = new AffixTrie.Builder();
    upper.add("Bern", 1, 5, 4);
    int[] trieOfShape = {0, 1, 1, 0, 0};
    // words written with a capital are divided by other priors than the rest, as with capitalisation states
    // beginnings, counted lower-cased and reversed ("walked" as "deklaw")
    AffixTrie.Builder lowerBeginnings = new AffixTrie.Builder();
    lowerBeginnings.add("deklaw", 2, 3, 3);
    lowerBeginnings.add("elbat", 1, 4, 3);
    AffixTrie.Builder upperBeginnings = new AffixTrie.Builder();
    upperBeginnings.add("nreb", 1, 5, 3);
        // and capitalised words known in lower case ("Walks", "RUN") are weighed by that form's tag
    LowerCaseFormCue cue = new LowerCaseFormCue(new double[] {Math.log(0.5), Math.log(0.3), Math.log(0.2)},
        new double[] {1, 1, 1.5, 0.5, 0.25, 3}, 3, 2, lexicon, StateSpace.oneStatePerTag(3));
    return UnknownWordModel.builder().theta(0.75).openTags(new int[] {1, 2}, new double[] {0.6, 0.4})
        .logPriors(new double[] {Math.log(0.4), Math.log(0.35), Math.log(0.25)},
            new double[] {Math.log(0.5), Math.log(0.45), Math.log(0.05)})
        .endings(4, trieOfShape, new AffixTrie[] {lower.build(), upper.build()}).lowerCaseForms(cue)
        .beginnings(3, new AffixTrie[] {lowerBeginnings.build(), upperBeginnings.build()}).build();
  }

  /** The bytes {@link ModelFile#write(HmmModel, IndexOutput)} produces for {@code model}. */
  public static byte[] bytes(HmmModel model) {
    return write(out -> ModelFile.write(model, out));
  }

  /** Something written to an in-memory Lucene output. */
  public interface Body {
    void writeTo(IndexOutput out) throws IOException;
  }

  /** Bytes of whatever {@code body} writes. */
  public static byte[] write(Body body) {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    try (IndexOutput out = new OutputStreamIndexOutput("test", "test", bytes, 4096)) {
      body.writeTo(out);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return bytes.toByteArray();
  }

  /** A file with our header and version, {@code body}, and a valid checksum footer. */
  public static byte[] withHeaderAndFooter(int version, Body body) {
    return write(out -> {
      CodecUtil.writeHeader(out, ModelFile.CODEC, version);
      body.writeTo(out);
      CodecUtil.writeFooter(out);
    });
  }
}
