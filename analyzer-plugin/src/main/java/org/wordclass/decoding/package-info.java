/**
 * Decoding a sentence under a model: {@link org.wordclass.decoding.Lattice} holds the candidate
 * states of each token with their emissions (the lexicon's states for a known word, the open
 * classes scored by the unknown-word model otherwise); {@link org.wordclass.decoding.Decoder}
 * runs exact Viterbi and forward-backward over it at order 1 or 2, on the trellis laid out by
 * {@code Trellis}; {@link org.wordclass.decoding.Tagger} is the String-level convenience over
 * both. How the trellis is indexed and where each cost goes: {@code docs/decoder.md}.
 *
 * <p>Everything here is what a search engine needs at run time; expectations for training
 * (Baum-Welch counts, latent sub-states) are computed in the model builder from the decoder's
 * read-only view. Lattices and decoders reuse their buffers and allocate nothing in steady state;
 * one per thread.
 */
package org.wordclass.decoding;
