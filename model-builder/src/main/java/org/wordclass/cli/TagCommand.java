package org.wordclass.cli;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import org.wordclass.decoding.Tagger;
import org.wordclass.model.HmmModel;
import org.wordclass.model.TagSet;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code wordclass tag}: tags raw text, one sentence per line, and prints a tag per token; with
 * {@code --explain} or {@code --json}, also why (see docs/user-lexicon.md).
 */
@Command(name = "tag", mixinStandardHelpOptions = true,
    description = "Tags text given as arguments or, without arguments, read from standard input (UTF-8), "
        + "one sentence per line. Prints token<TAB>tag<TAB>confidence per token and a blank line "
        + "between sentences; with --explain, token<TAB>tag<TAB>confidence<TAB>how<TAB>next best classes.")
final class TagCommand extends BaseCommand {
  @Mixin
  ModelOption model;

  @Mixin
  LexiconOption lexicon;

  // the fallback value makes --confidence mean true and --no-confidence false
  @Option(names = "--confidence", negatable = true, defaultValue = "true", fallbackValue = "true",
      description = "Print the probability of each chosen tag given the whole sentence "
          + "(forward-backward; a little slower). Default: ${DEFAULT-VALUE}.")
  boolean confidence;

  @Option(names = "--explain",
      description = "Also print, per token, how its candidate classes were chosen (known word, lower-cased "
          + "first word, unknown word with the matched ending and shape, or user lexicon) and the next "
          + "best classes with their probabilities.")
  boolean explain;

  @Option(names = "--json",
      description = "Print what --explain prints as one JSON document, for tools (implies --explain).")
  boolean json;

  @Parameters(paramLabel = "TEXT", arity = "0..*",
      description = "Text to tag; the arguments are joined by spaces, and line breaks in them separate sentences.")
  List<String> text;

  private final SimpleTokenizer tokenizer = new SimpleTokenizer();
  private boolean firstSentence = true;

  @Override
  public Integer call() throws Exception {
    HmmModel loaded = lexicon.applyTo(model.load());
    Tagger tagger = new Tagger(loaded);
    if (json) {
      List<ExplainedTokens.Sentence> sentences = new ArrayList<>();
      forEachLine(line -> tokens(line, tokens -> sentences.add(explained(tagger, tokens))));
      String lexiconName = lexicon.path == null ? null : lexicon.path.toString();
      out().print(Json.toString(new ExplainedTokens.Report(model.name(), lexiconName, sentences)));
    } else {
      forEachLine(line -> tokens(line, tokens -> printSentence(tagger, tokens)));
    }
    out().flush();
    return OK;
  }

  private void forEachLine(Consumer<String> action) {
    if (text != null && !text.isEmpty()) {
      String.join(" ", text).lines().forEach(action);
    } else {
      new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8)).lines().forEach(action);
    }
  }

  /** Hands the tokens of a line that has any to {@code action}. */
  private void tokens(String line, Consumer<List<String>> action) {
    List<String> tokens = tokenizer.tokens(line);
    if (!tokens.isEmpty()) {
      action.accept(tokens);
    }
  }

  private static ExplainedTokens.Sentence explained(Tagger tagger, List<String> tokens) {
    TagSet tags = tagger.decoder().model().tags();
    return new ExplainedTokens.Sentence(tagger.explain(tokens).stream().map(e -> ExplainedTokens.of(e, tags)).toList());
  }

  private void printSentence(Tagger tagger, List<String> tokens) {
    if (!firstSentence) {
      out().println();
    }
    firstSentence = false;
    if (explain) {
      explained(tagger, tokens).tokens().forEach(t -> out().println(ExplainedTokens.text(t)));
      return;
    }
    Tagger.Tagging tagging = tagger.tag(tokens, confidence);
    TagSet tags = tagger.decoder().model().tags();
    for (int i = 0; i < tokens.size(); i++) {
      String tag = tags.name(tagging.tags()[i]);
      if (confidence) {
        out().printf(Locale.ROOT, "%s\t%s\t%.4f%n", tokens.get(i), tag, tagging.confidences()[i]);
      } else {
        out().printf("%s\t%s%n", tokens.get(i), tag);
      }
    }
  }
}
