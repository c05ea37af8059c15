package org.wordclass.examples.solr;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.solr.SolrTestCaseJ4;
import org.apache.solr.core.CoreContainer;
import org.apache.solr.core.CoreContainer.CoreLoadFailure;
import org.junit.Test;

/** What an operator sees who mistyped a class in the config set's user lexicon. */
public class BrokenLexiconTest extends SolrTestCaseJ4 {
  static final String LEXICON_IN_CONF = "lexicons/cookbook.txt";

  @Test
  public void coreFailsNamingTheLexiconLineAndReason() throws Exception {
    Path home = createTempDir("solr-home");
    DemoSolr.writeHome(home, true);
    Path lexicon = home.resolve(DemoSolr.CORE).resolve("conf").resolve(LEXICON_IN_CONF);
    Files.writeString(lexicon, "cook NOUN VERB\nroast NOUN VREB\n", StandardCharsets.UTF_8);
    ignoreException("unknown class");
    CoreContainer container = CoreContainer.createAndLoad(home);
    try {
      CoreLoadFailure failure = container.getCoreInitFailures().get(DemoSolr.CORE);
      assertNotNull("the core should not load with a malformed lexicon", failure);
      String messages = DemoSolr.causes(failure.exception);
      assertTrue(messages, messages.contains(LEXICON_IN_CONF + ":2: unknown class 'VREB'; the model's classes are ADJ ADP"));
    } finally {
      container.shutdown();
    }
  }
}
