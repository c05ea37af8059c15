package org.wordclass.cli;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.wordclass.demo.DemoPrinter;
import org.wordclass.demo.DemoQuery;
import org.wordclass.demo.DemoReport;
import org.wordclass.demo.Notice;
import org.wordclass.demo.NoticeIndex;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/**
 * {@code wordclass demo}: indexes the bundled notices of an invented ferry office in memory and
 * shows plain searches next to class-restricted and class-boosted ones. Writes no file and needs
 * no network, so it is the first thing to run after a build.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
    description = {
      "Indexes a small invented collection (notices of an island ferry office) in memory, with and without "
          + "the word-class filter and the bundled English model, and shows plain queries next to class-restricted "
          + "and noun-boosted ones: the hits, the class the tagger gave the word in each, and what that gained or lost.",
      "Writes no file and uses no network."})
final class DemoCommand extends BaseCommand {
  @Option(names = "--query", paramLabel = "WORD[:CLASS]",
      description = "Compare a plain query for WORD with WORD restricted to CLASS (a UPOS tag such as VERB), "
          + "or, without CLASS, with nouns weighted over the other classes. Repeat for more. "
          + "Default: the showcase board:VERB, book:VERB, return.")
  List<String> queries = new ArrayList<>();

  @Option(names = "--show-tags", description = "Also print every notice with the class of each of its words.")
  boolean showTags;

  @Option(names = "--json", description = "Print the comparisons as JSON instead of tables.")
  boolean json;

  @Override
  public Integer call() throws IOException {
    try (NoticeIndex index = new NoticeIndex(Notice.bundled())) {
      DemoReport report = DemoReport.of(index, parsedQueries(index), showTags);
      if (json) {
        out().print(Json.toString(report));
        out().flush();
      } else {
        new DemoPrinter(out()).print(report);
      }
    }
    return OK;
  }

  /** The queries asked for, or the showcase; a malformed one is a command-line mistake. */
  private List<DemoQuery> parsedQueries(NoticeIndex index) throws IOException {
    List<DemoQuery> parsed = new ArrayList<>();
    for (String asked : queries.isEmpty() ? List.of(DemoQuery.SHOWCASE) : queries) {
      try {
        DemoQuery query = DemoQuery.parse(asked, index.tags());
        index.indexedForm(query.word());
        parsed.add(query);
      } catch (IllegalArgumentException e) {
        throw new ParameterException(spec.commandLine(), "--query " + asked + ": " + e.getMessage());
      }
    }
    return parsed;
  }
}
