/**
 * Measuring a model against gold tags: accuracy overall and on known and unknown words, per-tag
 * precision and recall, the confusion matrix ({@link org.wordclass.evaluation.Evaluation},
 * {@link org.wordclass.evaluation.EvaluationReport}), and the most-frequent-tag baseline.
 */
package org.wordclass.evaluation;
