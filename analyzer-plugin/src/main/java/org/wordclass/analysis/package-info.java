/**
 * The Lucene analysis components: {@link org.wordclass.analysis.WordClassFilter}, the token
 * filter {@code wordClass} that tags each sentence it buffers and sets {@link
 * org.wordclass.analysis.WordClassAttribute} (and optionally a payload, {@link
 * org.wordclass.analysis.PayloadEncoding}) on every token; its factory and arguments ({@link
 * org.wordclass.analysis.WordClassFilterFactory}, {@link org.wordclass.analysis.WordClassOptions});
 * {@link org.wordclass.analysis.WordClassSelectFilter}, which keeps or drops tokens by class; the
 * tokenizer {@code sentenceStandard}, which marks sentence ends for the filter; and {@link
 * org.wordclass.analysis.ModelCache}, which shares a loaded model between every filter of a JVM.
 *
 * <p>Cost: the filter holds one sentence of tokens and one decoder per analysis thread; the model
 * is shared. Decoding itself is in {@link org.wordclass.decoding}.
 */
package org.wordclass.analysis;
