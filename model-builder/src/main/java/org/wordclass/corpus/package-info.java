/**
 * Reading tagged corpora (CoNLL-U and word/tag text, {@link org.wordclass.corpus.Corpus}) into
 * sentences, strictly, with errors naming file and line; and aligning a Lucene analysis chain's
 * tokens with a treebank's words ({@link org.wordclass.corpus.AnalyzerAlignment}) so that
 * models are trained and evaluated on what a search engine's chain produces.
 */
package org.wordclass.corpus;
