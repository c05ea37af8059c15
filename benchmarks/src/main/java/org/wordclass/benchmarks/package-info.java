/**
 * JMH benchmarks of analysis, indexing, decoding, model loading and training on the UD English
 * EWT treebank, and the before/after tools: {@link org.wordclass.benchmarks.SideBySide} (builds
 * timed in one JVM), {@link org.wordclass.benchmarks.DecodingFingerprint} (a hash of every
 * decoded bit) and {@link org.wordclass.benchmarks.CpuTime}. Method and figures: {@code
 * docs/performance.md}.
 */
package org.wordclass.benchmarks;
