/**
 * Estimating a model from tagged sentences: {@link org.wordclass.training.TagCounts} gathers the
 * counts (with the capitalisation of {@link org.wordclass.model.Spelling}), {@link
 * org.wordclass.training.HmmEstimator} turns them into a model with the options of {@link
 * org.wordclass.training.TrainingOptions}, and {@link org.wordclass.training.LatentStates}
 * optionally splits tags into latent sub-states by expectation-maximisation. Training only:
 * nothing here is in the search engine's jar.
 */
package org.wordclass.training;
