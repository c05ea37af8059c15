package org.wordclass.benchmarks;

import java.nio.ByteBuffer;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import org.wordclass.corpus.Sentence;
import org.wordclass.decoding.Decoder;
import org.wordclass.decoding.Lattice;
import org.wordclass.model.DefaultModel;

/**
 * A SHA-256 over everything the decoder computes with the bundled model at both orders on the
 * EWT test sentences (standard tokenizer) and the first training sentences (treebank words):
 * every chosen candidate, the bits of every best log-probability, likelihood and posterior. A
 * speed change must leave it unchanged; run it against the jar built before and after the
 * change, e.g. {@code java -cp OLD.jar DecodingFingerprint.java}.
 */
public final class DecodingFingerprint {
  private static final int TRAIN_SENTENCES = 3000;

  private DecodingFingerprint() {}

  public static void main(String[] args) throws NoSuchAlgorithmException {
    List<char[][]> sentences = new ArrayList<>(Ewt.testTokens());
    for (Sentence s : Ewt.trainSentences().subList(0, TRAIN_SENTENCES)) {
      sentences.add(s.words().stream().map(String::toCharArray).toArray(char[][]::new));
    }
    MessageDigest digest = MessageDigest.getInstance("SHA-256");
    for (int order = 1; order <= 2; order++) {
      Decoder decoder = new Decoder(DefaultModel.get(), order);
      for (char[][] sentence : sentences) {
        digestSentence(decoder, sentence, digest);
      }
    }
    System.out.println(sentences.size() + " sentences, both orders: " + HexFormat.of().formatHex(digest.digest()));
  }

  private static void digestSentence(Decoder decoder, char[][] sentence, MessageDigest digest) {
    Lattice lattice = decoder.lattice();
    lattice.clear();
    for (char[] token : sentence) {
      lattice.add(token, 0, token.length);
    }
    int[] best = new int[sentence.length];
    decoder.viterbi(best);
    ByteBuffer bytes = ByteBuffer.allocate(16 + 4 * best.length + 8 * lattice.totalCandidates());
    bytes.putDouble(decoder.bestLogProbability()).putDouble(decoder.forwardBackward());
    for (int i = 0; i < best.length; i++) {
      bytes.putInt(best[i]);
      for (int k = 0; k < lattice.candidateCount(i); k++) {
        bytes.putDouble(decoder.posterior(i, k));
      }
    }
    digest.update(bytes.array());
  }
}
