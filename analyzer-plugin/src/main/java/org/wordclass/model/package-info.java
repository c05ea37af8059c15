/**
 * A trained model and its parts, immutable and shared between threads: {@link
 * org.wordclass.model.HmmModel} (tag set, states, transition tables, decoding cues), {@link
 * org.wordclass.model.Lexicon} (known words and their states, one char-keyed hash table that also
 * finds lower-case forms), {@link org.wordclass.model.UnknownWordModel} (tries of word endings and
 * beginnings, {@link org.wordclass.model.AffixTrie}, and the cue of lower-case forms), the user
 * lexicon that overrides a model without retraining ({@link org.wordclass.model.UserLexicon},
 * {@link org.wordclass.model.LexiconOverlay}), and the file format ({@link
 * org.wordclass.model.ModelFile}, written through {@link org.wordclass.model.AtomicFiles}).
 *
 * <p>{@link org.wordclass.model.Spelling} holds the spelling rules (capitals, lower-casing) that
 * training and decoding must apply alike. The format is described in {@code docs/model-format.md}.
 */
package org.wordclass.model;
