package org.wordclass.cli;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
import org.wordclass.decoding.Tagger;
import org.wordclass.model.TagSet;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code wordclass tag}: tags raw text, one sentence per line, and prints a tag per token. */
@Command(name = "tag", mixinStandardHelpOptions = true,
    description = "Tags text given as arguments or, without arguments, read from standard input (UTF-8), "
        + "one sentence per line. Prints token<TAB>tag<TAB>confidence per token and a blank line "
        + "between sentences.")
final class TagCommand extends BaseCommand {
  @Mixin
  ModelOption model;

  // the fallback value makes --confidence mean true and --no-confidence false
  @Option(names = "--confidence", negatable = true, defaultValue = "true", fallbackValue = "true",
      description = "Print the probability of each chosen tag given the whole sentence "
          + "(forward-backward; a little slower). Default: ${DEFAULT-VALUE}.")
  boolean confidence;

  @Parameters(paramLabel = "TEXT", arity = "0..*",
      description = "Text to tag; the arguments are joined by spaces, and line breaks in them separate sentences.")
  List<String> text;

  private final SimpleTokenizer tokenizer = new SimpleTokenizer();
  private boolean firstSentence = true;

  @Override
  public Integer call() throws Exception {
    Tagger tagger = new Tagger(model.load());
    if (text != null && !text.isEmpty()) {
      String.join(" ", text).lines().forEach(line -> tagLine(tagger, line));
    } else {
      BufferedReader in = new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8));
      in.lines().forEach(line -> tagLine(tagger, line));
    }
    out().flush();
    return OK;
  }

  private void tagLine(Tagger tagger, String line) {
    List<String> tokens = tokenizer.tokens(line);
    if (tokens.isEmpty()) {
      return;
    }
    if (!firstSentence) {
      out().println();
    }
    firstSentence = false;
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
