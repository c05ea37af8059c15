package org.wordclass.examples.solr;

import java.io.Closeable;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.lucene.analysis.TokenFilterFactory;
import org.apache.solr.analysis.TokenizerChain;
import org.apache.solr.client.solrj.embedded.EmbeddedSolrServer;
import org.apache.solr.core.CoreContainer;
import org.apache.solr.core.SolrCore;
import org.wordclass.analysis.WordClassFilterFactory;
import org.wordclass.examples.ExampleFiles;
import org.wordclass.model.HmmModel;

/**
 * A standalone Solr node in a temporary Solr home, with one core made from the demo config set
 * exactly as a user would: the config set copied as the core's instance folder, their model file
 * put into {@code conf/models/en.wcm}, a {@code core.properties} naming the core.
 */
final class DemoSolr implements Closeable {
  static final String CORE = "cookbook";
  /** Where the demo schema's {@code model} argument points, relative to {@code conf/}. */
  static final String MODEL_IN_CONF = "models/en.wcm";

  final Path home;
  final CoreContainer container;
  final EmbeddedSolrServer client;

  private DemoSolr(Path home, CoreContainer container) {
    this.home = home;
    this.container = container;
    this.client = new EmbeddedSolrServer(container, CORE);
  }

  /** Starts a node in the empty folder {@code home}. */
  static DemoSolr start(Path home) throws IOException {
    writeHome(home, true);
    CoreContainer container = CoreContainer.createAndLoad(home);
    if (container.getCoreInitFailures().containsKey(CORE)) {
      Exception failure = container.getCoreInitFailures().get(CORE).exception;
      container.shutdown();
      throw new IOException("the demo core did not start", failure);
    }
    return new DemoSolr(home, container);
  }

  /** Lays out the Solr home; {@code withModel} false forgets the user's step of copying the model. */
  static void writeHome(Path home, boolean withModel) throws IOException {
    Files.writeString(home.resolve("solr.xml"), "<solr/>\n", StandardCharsets.UTF_8);
    Path instance = home.resolve(CORE);
    ExampleFiles.copyTree(ExampleFiles.solrConfigSet(), instance);
    if (withModel) {
      ExampleFiles.copyBundledModel(instance.resolve("conf").resolve(MODEL_IN_CONF));
    }
    Files.writeString(instance.resolve("core.properties"), "name=" + CORE + "\n", StandardCharsets.UTF_8);
  }

  /** The messages of {@code failure} and all its causes, one a line. */
  static String causes(Throwable failure) {
    StringBuilder out = new StringBuilder();
    for (Throwable t = failure; t != null; t = t.getCause()) {
      out.append(t.getMessage()).append('\n');
    }
    return out.toString();
  }

  /** The model the word-class filter of {@code fieldType} decodes with, in the current core. */
  HmmModel modelOf(String fieldType) {
    try (SolrCore core = container.getCore(CORE)) {
      return modelOf(core, fieldType);
    }
  }

  /** The model the word-class filter of {@code fieldType} decodes with in {@code core}. */
  static HmmModel modelOf(SolrCore core, String fieldType) {
    TokenizerChain chain = (TokenizerChain) core.getLatestSchema().getFieldTypeByName(fieldType).getIndexAnalyzer();
    for (TokenFilterFactory factory : chain.getTokenFilterFactories()) {
      if (factory instanceof WordClassFilterFactory) {
        return ((WordClassFilterFactory) factory).options().model();
      }
    }
    throw new AssertionError(fieldType + " has no word-class filter");
  }

  @Override
  public void close() throws IOException {
    client.close();
    container.shutdown();
  }
}
