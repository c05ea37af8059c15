package org.wordclass.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.BufferedWriter;
import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.io.StringReader;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.apache.lucene.analysis.tokenattributes.SentenceAttribute;
import org.wordclass.analysis.WordClassAttribute;
import org.wordclass.analysis.WordClassExplanationAttribute;
import org.wordclass.analysis.WordClassOptions;
import org.wordclass.corpus.StrictUtf8Reader;
import org.wordclass.model.DefaultModel;
import org.wordclass.model.HmmModel;
import org.wordclass.model.ModelFile;
import org.wordclass.model.ShippedModels;
import org.wordclass.model.TagSet;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;

/**
 * {@code wordclass tag}: runs text through the analysis chain an index would run, the word-class
 * filter last, and prints what the filter wrote for each token; with {@code --explain} or {@code
 * --json}, also why, as the filter's own {@link WordClassExplanationAttribute} says (see
 * docs/user-lexicon.md). The input is one field value, read as a stream: memory stays bounded by
 * the tokenizer's buffer and the filter's window, whatever the input's length.
 */
@Command(name = "tag", mixinStandardHelpOptions = true,
    description = "Tags text given as arguments, in a file (--text) or, without either, read from standard input "
        + "(strict UTF-8), through the analysis chain an index runs, the word-class filter last: the whole input is "
        + "one field value. Prints token<TAB>start<TAB>end<TAB>class<TAB>confidence per token (offsets in characters "
        + "of the input) and a blank line where the tokenizer starts a sentence; with --explain, also <TAB>how<TAB>"
        + "next best classes.")
final class TagCommand extends BaseCommand {
  /** The field name the chain is asked for; the chains the builder makes treat every field alike. */
  private static final String FIELD = "text";
  /** How messages name standard input. */
  static final String STANDARD_INPUT = "standard input";

  @Mixin
  ModelOption model;

  @Option(names = "--language", paramLabel = "CODE",
      description = "A model shipped in the jar, by ISO 639-1 code, as the filter's language argument takes it "
          + "(en is the bundled model); not together with --model.")
  String language;

  @Mixin
  LexiconOption lexicon;

  @Mixin
  ChainOptions chain;

  // the fallback value makes --confidence mean true and --no-confidence false
  @Option(names = "--confidence", negatable = true, defaultValue = "true", fallbackValue = "true",
      description = "Print the probability of each chosen class given its whole sentence "
          + "(forward-backward; a little slower). Default: ${DEFAULT-VALUE}.")
  boolean confidence;

  @Option(names = "--explain",
      description = "Also print, per token, how its candidate classes were chosen (known word, lower-cased "
          + "first word, unknown word with the matched ending and shape, or user lexicon) and the next "
          + "best classes with their probabilities, as the filter decided them.")
  boolean explain;

  @Option(names = "--json",
      description = "Print what --explain prints as one JSON document, for tools (implies --explain).")
  boolean json;

  @Mixin
  BoundariesOption boundaries;

  @Option(names = "--text", paramLabel = "FILE",
      description = "A UTF-8 text file to tag instead of arguments or standard input.")
  Path file;

  @Parameters(paramLabel = "TEXT", arity = "0..*",
      description = "Text to tag, the arguments joined by spaces.")
  List<String> text;

  @Override
  public Integer call() throws Exception {
    if (language != null && model.path != null) {
      throw new ParameterException(spec.commandLine(), "--model and --language cannot both be given");
    }
    if (file != null && text != null && !text.isEmpty()) {
      throw new ParameterException(spec.commandLine(), "give the text as arguments or with --text FILE, not both");
    }
    chain.chain(); // a chain Lucene cannot build is refused before any file is read
    new CommandFiles().input("--model", model.path).input("--lexicon", lexicon.path).input("--text", file).check();
    HmmModel loaded = lexicon.applyTo(loadModel());
    boolean explained = explain || json;
    WordClassOptions options = WordClassOptions.of(loaded).withConfidence(confidence || explained).withExplain(explained)
        .withBoundaries(boundaries.value());
    // the picocli writer flushes at every line; one flush at the end costs a system call instead of one per token
    Writer buffered = new BufferedWriter(out(), 1 << 16);
    try (Analyzer analyzer = chain.chain().buildWithWordClass(options);
        TokenStream stream = analyzer.tokenStream(FIELD, input())) {
      Printer printer = json ? new JsonPrinter(buffered, loaded.tags()) : new TextPrinter(buffered, loaded.tags(), explained);
      tag(stream, printer);
      // only a complete input completes the output: a JSON document cut by an input error stays unclosed
      printer.finish();
    } finally {
      buffered.flush();
      out().flush();
    }
    return OK;
  }

  private HmmModel loadModel() throws IOException {
    if (language == null) {
      return model.load();
    }
    String resource = ShippedModels.resource(language);
    if (resource == null) {
      throw new ParameterException(spec.commandLine(), "--language: no model is shipped for '" + language
          + "'; shipped: " + ShippedModels.describe() + " (or name a model file with --model)");
    }
    return resource.equals(DefaultModel.RESOURCE) ? DefaultModel.get() : ModelFile.read(ShippedModels.readBytes(language), resource);
  }

  /** How messages and the JSON name the model. */
  private String modelName() {
    return language == null ? model.name() : "shipped model " + ShippedModels.resource(language);
  }

  /** The text: the arguments, the file or standard input, the last two decoded strictly as UTF-8. */
  private Reader input() throws IOException {
    if (text != null && !text.isEmpty()) {
      return new StringReader(String.join(" ", text));
    }
    if (file != null) {
      return new StrictUtf8Reader(Files.newInputStream(file), file.toString());
    }
    // closing the chain must not close this process's standard input
    return new StrictUtf8Reader(new FilterInputStream(System.in) {
      @Override
      public void close() {}
    }, STANDARD_INPUT);
  }

  /** Hands every token of {@code stream} to {@code printer}, with a sentence break where the sentence index changes. */
  private static void tag(TokenStream stream, Printer printer) throws IOException {
    CharTermAttribute term = stream.getAttribute(CharTermAttribute.class);
    OffsetAttribute offsets = stream.getAttribute(OffsetAttribute.class);
    SentenceAttribute sentence = stream.getAttribute(SentenceAttribute.class);
    WordClassAttribute wordClass = stream.getAttribute(WordClassAttribute.class);
    WordClassExplanationAttribute why = stream.hasAttribute(WordClassExplanationAttribute.class)
        ? stream.getAttribute(WordClassExplanationAttribute.class) : null;
    stream.reset();
    boolean first = true;
    int previous = 0;
    while (stream.incrementToken()) {
      if (!first && sentence.getSentenceIndex() != previous) {
        printer.sentenceBreak();
      }
      first = false;
      previous = sentence.getSentenceIndex();
      printer.token(term.toString(), offsets.startOffset(), offsets.endOffset(), wordClass, why);
    }
    stream.end();
  }

  /** Writes the tokens in one of the output formats. */
  private interface Printer {
    void token(String token, int start, int end, WordClassAttribute wordClass, WordClassExplanationAttribute why)
        throws IOException;

    void sentenceBreak() throws IOException;

    /** After the last token. */
    void finish() throws IOException;
  }

  /** One line per token, a blank line between sentences. */
  private static final class TextPrinter implements Printer {
    private final Writer out;
    private final TagSet tags;
    private final boolean explained;
    private final StringBuilder line = new StringBuilder(128);

    TextPrinter(Writer out, TagSet tags, boolean explained) {
      this.out = out;
      this.tags = tags;
      this.explained = explained;
    }

    @Override
    public void token(String token, int start, int end, WordClassAttribute wordClass, WordClassExplanationAttribute why)
        throws IOException {
      line.setLength(0);
      if (explained) {
        ExplainedTokens.appendExplained(line, ExplainedTokens.of(token, start, end, wordClass.getWordClassIndex(),
            wordClass.getConfidence(), why, tags));
      } else {
        ExplainedTokens.appendPlain(line, token, start, end, wordClass.getWordClass(), wordClass.getConfidence());
      }
      out.append(line).append(System.lineSeparator());
    }

    @Override
    public void sentenceBreak() throws IOException {
      out.append(System.lineSeparator());
    }

    @Override
    public void finish() {}
  }

  /** One JSON document, written token by token: {@code {model, lexicon, chain, sentences: [{tokens: [...]}]}}. */
  private final class JsonPrinter implements Printer {
    private final JsonGenerator json;
    private final TagSet tags;
    private boolean inSentence;

    JsonPrinter(Writer out, TagSet tags) throws IOException {
      this.json = Json.generator(out);
      this.tags = tags;
      json.writeStartObject();
      json.writeStringField("model", modelName());
      json.writeStringField("lexicon", lexicon.path == null ? null : lexicon.path.toString());
      json.writeStringField("chain", chain.chain().toString());
      json.writeArrayFieldStart("sentences");
    }

    @Override
    public void token(String token, int start, int end, WordClassAttribute wordClass, WordClassExplanationAttribute why)
        throws IOException {
      if (!inSentence) {
        json.writeStartObject();
        json.writeArrayFieldStart("tokens");
        inSentence = true;
      }
      Json.write(json, ExplainedTokens.of(token, start, end, wordClass.getWordClassIndex(), wordClass.getConfidence(), why, tags));
    }

    @Override
    public void sentenceBreak() throws IOException {
      endSentence();
    }

    private void endSentence() throws IOException {
      if (inSentence) {
        json.writeEndArray();
        json.writeEndObject();
        inSentence = false;
      }
    }

    @Override
    public void finish() throws IOException {
      endSentence();
      json.writeEndArray();
      json.writeEndObject();
      json.writeRaw(System.lineSeparator());
      json.close();
    }
  }
}
