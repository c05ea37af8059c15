package org.wordclass.engine;

import org.wordclass.analysis.WordClassFilterFactory;

/**
 * Implemented by an engine's token filter factory that wraps a {@link WordClassFilterFactory},
 * so that {@link IndexedClasses} can find, in a field's analysis chain, the model and payload
 * encoding the field was indexed with.
 */
public interface WordClassFilterHolder {
  /** The informed factory this engine factory makes its filters with. */
  WordClassFilterFactory wordClassFactory();
}
