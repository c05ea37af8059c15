package org.wordclass.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * What every subcommand shares: its output streams, which are those of the command line so that
 * tests can capture them. Failures are thrown, and {@link Failures} turns them into exit codes.
 */
abstract class BaseCommand implements Callable<Integer> {
  static final int OK = 0;

  /**
   * Model files from 1 MiB up may not fit a configuration store: ZooKeeper, where SolrCloud keeps
   * config sets, refuses a request over its {@code jute.maxbuffer}, by default 1,048,575 bytes
   * (common practice; measured in config-examples' SolrCloud test, see docs/solr.md).
   */
  static final long CONFIG_STORE_LIMIT_BYTES = 1L << 20;

  @Spec
  CommandSpec spec;

  PrintWriter out() {
    return spec.commandLine().getOut();
  }

  PrintWriter err() {
    return spec.commandLine().getErr();
  }

  /** One line on standard error when the model file {@code name} is too big for a config store. */
  void warnIfTooBigForConfigStores(Object name, long bytes) {
    if (bytes >= CONFIG_STORE_LIMIT_BYTES) {
      err().printf(Locale.ROOT, "%s: warning: %s is %,d bytes, 1 MiB or more: ZooKeeper refuses it in a Solr config set"
          + " unless jute.maxbuffer is raised everywhere; put it on each node's disk instead (docs/solr.md)%n",
          spec.name(), name, bytes);
      err().flush();
    }
  }
}
