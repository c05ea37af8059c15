/**
 * Lucene queries over fields indexed with the word-class filter: terms restricted to some
 * classes, or weighted by the class the filter stored in the payload ({@link
 * org.wordclass.query.WordClassQueries}, payloads read by {@link
 * org.wordclass.query.ClassWeightPayloadDecoder}). The engine adapters build their queries from
 * these.
 */
package org.wordclass.query;
