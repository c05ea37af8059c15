/**
 * What every search-engine integration of the word-class filter shares, so that an engine plugin
 * (OpenSearch, Elasticsearch, ...) is a thin adapter that only translates between the engine's
 * types and these:
 *
 * <ul>
 *   <li>{@link org.wordclass.engine.FilterArguments}: an engine's flat settings (lists and objects
 *       flattened to dotted keys) to the argument map of {@link
 *       org.wordclass.analysis.WordClassFilterFactory}, which stays the one parser and checker of
 *       the arguments;
 *   <li>{@link org.wordclass.engine.ConfigDirResourceLoader}: model and lexicon files found under
 *       the node's configuration directory, refusing names that lead outside it;
 *   <li>{@link org.wordclass.engine.EngineFilters}: a ready (informed) factory from those two,
 *       with every failure, whether a bad argument, a missing, unreadable, corrupt or wrong kind
 *       of file, or a class the model does not know, turned into an {@link
 *       java.lang.IllegalArgumentException} naming the filter, the argument or file and the reason.
 *       Engines answer that exception with HTTP 400;
 *   <li>{@link org.wordclass.engine.ClassRestrictedQuerySpec} and {@link
 *       org.wordclass.engine.ClassWeightedQuerySpec} (shared parameter names in {@link
 *       org.wordclass.engine.QueryParameters}): the parameters of the two query types an
 *       engine registers, their checks and their Lucene queries, built over {@link
 *       org.wordclass.query.WordClassQueries};
 *   <li>{@link org.wordclass.engine.WordClassFilterHolder} and {@link
 *       org.wordclass.engine.IndexedClasses}: how a query finds, from a field's analysis chain,
 *       the model and payload encoding the field was indexed with.
 * </ul>
 *
 * Nothing here depends on an engine; models are shared per JVM (so per node) by {@link
 * org.wordclass.analysis.ModelCache}, keyed by file content.
 */
package org.wordclass.engine;
