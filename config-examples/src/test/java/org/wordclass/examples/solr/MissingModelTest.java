package org.wordclass.examples.solr;

import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.solr.SolrTestCaseJ4;
import org.apache.solr.core.CoreContainer;
import org.apache.solr.core.CoreContainer.CoreLoadFailure;
import org.junit.Test;

/** What an operator sees who forgot to copy the model file into the config set. */
public class MissingModelTest extends SolrTestCaseJ4 {
  @Test
  public void coreFailsNamingTheModelArgumentAndFile() throws Exception {
    Path home = createTempDir("solr-home");
    DemoSolr.writeHome(home, false);
    ignoreException("cannot read the model resource");
    CoreContainer container = CoreContainer.createAndLoad(home);
    try {
      CoreLoadFailure failure = container.getCoreInitFailures().get(DemoSolr.CORE);
      assertNotNull("the core should not load without its model", failure);
      String messages = DemoSolr.causes(failure.exception);
      assertTrue(messages, messages.contains("'model': cannot read the model resource " + DemoSolr.MODEL_IN_CONF));
      assertFalse(Files.exists(home.resolve(DemoSolr.CORE).resolve("conf").resolve(DemoSolr.MODEL_IN_CONF)));
    } finally {
      container.shutdown();
    }
  }
}
