package org.wordclass.corpus;

import java.util.Set;

/** Which tags a corpus is read with. */
public enum TagColumn {
  /** Universal Dependencies part-of-speech tags (CoNLL-U column 4); values are checked against the 17 UD tags. */
  UPOS,
  /** Language-specific tags (CoNLL-U column 5), such as Penn Treebank tags for English. */
  XPOS;

  /** The 17 universal part-of-speech tags of Universal Dependencies v2 (an open standard). */
  public static final Set<String> UNIVERSAL_TAGS = Set.of(
      "ADJ", "ADP", "ADV", "AUX", "CCONJ", "DET", "INTJ", "NOUN", "NUM", "PART", "PRON", "PROPN",
      "PUNCT", "SCONJ", "SYM", "VERB", "X");

  /** Why {@code tag} is not a valid value of this column, or null if it is. */
  public String problemWith(String tag) {
    if (tag.isEmpty() || tag.equals("_")) {
      return "missing tag";
    }
    if (tag.chars().anyMatch(Character::isWhitespace)) {
      return "tag '" + tag + "' contains white space";
    }
    if (this == UPOS && !UNIVERSAL_TAGS.contains(tag)) {
      return "unknown UPOS tag '" + tag + "' (expected one of the 17 Universal Dependencies tags)";
    }
    return null;
  }
}
