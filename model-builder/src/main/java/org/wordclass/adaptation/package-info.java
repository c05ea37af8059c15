/**
 * Adapting a trained model to unlabelled text of a domain by Baum-Welch (forward-backward)
 * re-estimation: text sources, the expectation pass over them ({@code ExpectedCounts}, with the
 * expected transitions of {@link org.wordclass.adaptation.ExpectedTransitions} computed from the
 * decoder's read-only view), re-estimation and its stopping rule ({@link
 * org.wordclass.adaptation.Adaptation}). Training only: nothing here is in the search engine's jar.
 * See {@code docs/adaptation.md}.
 */
package org.wordclass.adaptation;
