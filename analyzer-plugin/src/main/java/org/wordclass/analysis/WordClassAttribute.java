package org.wordclass.analysis;

import org.apache.lucene.util.Attribute;

/**
 * The word class (part of speech) decoded for a token: the class name, its index in the model's
 * tag set, and how sure the model is of it. Set by {@link WordClassFilter}; read by filters and
 * consumers that want the class without parsing the token type or the payload.
 */
public interface WordClassAttribute extends Attribute {
  /** Index meaning "no class": the token was not tagged. */
  int NO_CLASS = -1;

  /** Name of the class, such as {@code NOUN}, or null when the token has none. */
  String getWordClass();

  /** Index of the class in the model's tag set, or {@link #NO_CLASS}. */
  int getWordClassIndex();

  /**
   * Posterior probability of the chosen class given the whole decoded window, in [0, 1]; NaN when
   * it was not computed (it costs a forward-backward pass).
   */
  double getConfidence();

  /** Sets all three values at once; {@code name} must be the name of {@code index}. */
  void setWordClass(String name, int index, double confidence);

  /**
   * Name of the model that tagged the token ({@link org.wordclass.model.HmmModel#name()}, such as
   * {@code fr-gsd-upos}), shown in analysis screens; null when the token was not tagged.
   */
  String getModelName();

  /** Sets the name of the model that tagged the token. */
  void setModelName(String modelName);
}
