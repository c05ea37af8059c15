package org.wordclass.analysis;

import org.apache.lucene.util.Attribute;
import org.wordclass.decoding.CandidateSource;
import org.wordclass.model.WordShape;

/**
 * Why {@link WordClassFilter} gave a token its class: how the token's candidate classes were
 * chosen and the probability of every class of the model's tag set given the whole decoded
 * window. Set only when the filter is asked for it ({@link WordClassOptions#explain()}), for
 * tools that show what the filter decided, such as {@code wordclass tag --explain}; an index
 * never needs it. Read it from the token stream after each {@code incrementToken()}.
 */
public interface WordClassExplanationAttribute extends Attribute {
  /** How the candidate classes were chosen, or null when the token was not explained. */
  CandidateSource getSource();

  /** For {@link CandidateSource#LOWERCASED_FIRST_WORD}, the lower-case form found in the lexicon; else null. */
  String getLookedUpAs();

  /**
   * For {@link CandidateSource#UNKNOWN}, the ending of the token the suffix model had counts for
   * (empty when it had none and the shape alone decided); else null.
   */
  String getEnding();

  /** For {@link CandidateSource#UNKNOWN}, the spelling shape whose ending counts scored the token; else null. */
  WordShape getShape();

  /**
   * Whether the decoder found that the token opens a sentence the tokenizer did not mark (decoded
   * sentence boundaries, {@link WordClassOptions#boundaries()}): it was read as the first word of a
   * new sentence, not in mid-sentence. False for the first token of a marked sentence.
   */
  boolean opensSentence();

  /** Sets {@link #opensSentence()}. */
  void setOpensSentence(boolean opensSentence);

  /** Number of classes {@link #getClassProbability} answers for: the model's tag-set size, 0 when not explained. */
  int getClassCount();

  /** Probability of the class with index {@code classIndex} (0 for a class that was no candidate). */
  double getClassProbability(int classIndex);

  /** Sets how the candidates were chosen; see the getters for which values apply to which source. */
  void setSource(CandidateSource source, String lookedUpAs, String ending, WordShape shape);

  /**
   * The attribute's array of class probabilities, grown to at least {@code classCount} entries,
   * with {@link #getClassCount()} set to {@code classCount}: the caller writes the probabilities
   * into its first {@code classCount} entries. Allocates only when it must grow.
   */
  double[] classProbabilities(int classCount);
}
