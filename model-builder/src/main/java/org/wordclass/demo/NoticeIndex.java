package org.wordclass.demo;

import java.io.Closeable;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.miscellaneous.PerFieldAnalyzerWrapper;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.StoredField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.apache.lucene.store.Directory;
import org.wordclass.analysis.ClassWeights;
import org.wordclass.analysis.PayloadEncoding;
import org.wordclass.analysis.WordClassAttribute;
import org.wordclass.corpus.AnalysisChain;
import org.wordclass.corpus.AnalysisChain.Component;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.TagSet;
import org.wordclass.query.ClassWeightPayloadDecoder;
import org.wordclass.query.WordClassQueries;

/**
 * The notices in an in-memory Lucene index, each text in two fields: {@value #PLAIN}, analyzed
 * without word classes, and {@value #CLASSED}, analyzed through the word-class filter with the
 * class name as payload and a class-qualified twin of every term ({@code board_verb}). Builds the
 * demo's three kinds of query over them, so that every caller asks the same questions.
 */
public final class NoticeIndex implements Closeable {
  static final String ID = "id";
  static final String PLAIN = "plain";
  static final String CLASSED = "classed";
  static final String SEPARATOR = "_";
  /** Weight of nouns in the class-boosted query; every other class weighs the default 1. */
  public static final float NOUN_WEIGHT = 2.0f;

  /** The chains by Lucene SPI names, as a CustomAnalyzer or a Solr schema would name them. */
  public static final AnalysisChain PLAIN_CHAIN = chain(component("lowercase"));
  public static final AnalysisChain CLASSED_CHAIN = chain(
      component("wordClass", "payload", "tag", "qualifiedTerms", "true", "separator", SEPARATOR),
      component("lowercase"));
  /** Tags only, the case kept: what {@code --show-tags} prints. */
  static final AnalysisChain TAGGING_CHAIN = chain(component("wordClass"));

  private final Directory directory = new ByteBuffersDirectory();
  private final Analyzer plain = PLAIN_CHAIN.build();
  private final Analyzer tagging = TAGGING_CHAIN.build();
  private final TagSet tags = DefaultModel.get().tags();
  private final Map<String, Notice> byId = new LinkedHashMap<>();
  private final DirectoryReader reader;
  private final IndexSearcher searcher;

  /** A hit: the notice and its score. */
  public record Hit(Notice notice, float score) {}

  /** Indexes {@code notices} in memory; nothing touches the disk. */
  public NoticeIndex(List<Notice> notices) throws IOException {
    try (Analyzer classed = CLASSED_CHAIN.build();
        IndexWriter writer = new IndexWriter(directory, new IndexWriterConfig(perField(classed)))) {
      for (Notice notice : notices) {
        if (byId.put(notice.id(), notice) != null) {
          throw new IOException(Notice.RESOURCE + ": the id " + notice.id() + " is used twice");
        }
        writer.addDocument(document(notice));
      }
    }
    reader = DirectoryReader.open(directory);
    searcher = new IndexSearcher(reader);
  }

  private static AnalysisChain chain(Component... filters) {
    return new AnalysisChain(component("sentenceStandard"), List.of(filters));
  }

  private static Component component(String name, String... keyValues) {
    Map<String, String> args = new LinkedHashMap<>();
    for (int i = 0; i < keyValues.length; i += 2) {
      args.put(keyValues[i], keyValues[i + 1]);
    }
    return new Component(name, args);
  }

  private Analyzer perField(Analyzer classed) {
    return new PerFieldAnalyzerWrapper(plain, Map.of(CLASSED, classed));
  }

  private static Document document(Notice notice) {
    Document doc = new Document();
    doc.add(new StoredField(ID, notice.id()));
    doc.add(new TextField(PLAIN, notice.text(), Field.Store.NO));
    doc.add(new TextField(CLASSED, notice.text(), Field.Store.NO));
    return doc;
  }

  public TagSet tags() {
    return tags;
  }

  public List<Notice> notices() {
    return List.copyOf(byId.values());
  }

  public Map<String, Notice> noticesById() {
    return Collections.unmodifiableMap(byId);
  }

  /**
   * {@code word} as the index holds it (through the plain chain, so lowercased); fails unless it
   * is exactly one token, since every query here is about a single word.
   */
  public String indexedForm(String word) throws IOException {
    List<String> terms = new ArrayList<>();
    try (TokenStream stream = plain.tokenStream(PLAIN, word)) {
      CharTermAttribute term = stream.addAttribute(CharTermAttribute.class);
      stream.reset();
      while (stream.incrementToken()) {
        terms.add(term.toString());
      }
      stream.end();
    }
    if (terms.size() != 1) {
      throw new IllegalArgumentException("'" + word + "' is not one word to the standard tokenizer but " + terms);
    }
    return terms.get(0);
  }

  /** {@code word} in any class, in the field without classes. */
  public Query plainQuery(String word) {
    return new TermQuery(new Term(PLAIN, word));
  }

  /** {@code word} only where the tagger gave it {@code wordClass}: one qualified-term query. */
  public Query restrictedQuery(String word, String wordClass) {
    return WordClassQueries.byQualifiedTerm(CLASSED, word, SEPARATOR, wordClass.toLowerCase(Locale.ROOT));
  }

  /**
   * {@code word} in any class, each hit's score multiplied by {@link #NOUN_WEIGHT} where it is a
   * noun; the payloads name classes, so the weights are chosen here at query time.
   */
  public Query nounBoostedQuery(String word) {
    ClassWeights weights = ClassWeights.of(tags, Map.of("NOUN", NOUN_WEIGHT), ClassWeights.DEFAULT_WEIGHT, "weights");
    return WordClassQueries.classWeighted(CLASSED, word, new ClassWeightPayloadDecoder(PayloadEncoding.TAG, weights));
  }

  /** Every hit of {@code query}, best first (ties in index order). */
  public List<Hit> search(Query query) throws IOException {
    StoredFields stored = searcher.storedFields();
    List<Hit> hits = new ArrayList<>();
    for (ScoreDoc hit : searcher.search(query, Math.max(1, reader.maxDoc())).scoreDocs) {
      hits.add(new Hit(byId.get(stored.document(hit.doc).get(ID)), hit.score));
    }
    return hits;
  }

  /**
   * The classes {@code word} was given in each notice that has it, by notice id, read back from
   * the index through its qualified terms: what the index really holds, not a fresh tagging.
   */
  public Map<String, List<String>> classesOf(String word) throws IOException {
    Map<String, List<String>> classes = new TreeMap<>();
    for (String wordClass : tags.names()) {
      for (Hit hit : search(restrictedQuery(word, wordClass))) {
        classes.computeIfAbsent(hit.notice().id(), id -> new ArrayList<>()).add(wordClass);
      }
    }
    return classes;
  }

  /** Each token of {@code notice} with its class, as the word-class filter sees them. */
  public List<String> tagging(Notice notice) throws IOException {
    List<String> tokens = new ArrayList<>();
    try (TokenStream stream = tagging.tokenStream(CLASSED, notice.text())) {
      CharTermAttribute term = stream.addAttribute(CharTermAttribute.class);
      WordClassAttribute wordClass = stream.addAttribute(WordClassAttribute.class);
      stream.reset();
      while (stream.incrementToken()) {
        tokens.add(term + "/" + wordClass.getWordClass());
      }
      stream.end();
    }
    return tokens;
  }

  @Override
  public void close() throws IOException {
    try (directory; reader; plain; tagging) {
      // closes all four, in reverse order, even if one fails
    }
  }
}
