/**
 * The OpenSearch plugin: the {@code wordClass} token filter and the two word-class queries, as
 * thin adapters over {@link org.wordclass.engine}; settings errors answer HTTP 400. See {@code
 * docs/opensearch.md}.
 */
package org.wordclass.opensearch;
