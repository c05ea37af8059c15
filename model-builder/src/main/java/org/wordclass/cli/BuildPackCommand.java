package org.wordclass.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.wordclass.model.AtomicFiles;
import org.wordclass.model.ShippedModels;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/**
 * {@code wordclass build-pack}: trains every model of the language pack named in a recipe file
 * ({@link PackRecipe}, {@code models/pack.properties}) and writes the models and the index the
 * analyzer finds them by ({@link ShippedModels}) into one folder. Each model is trained by the
 * {@code train} command line the command prints, through the recipe's analysis chain; the output
 * depends only on the recipe, the corpora and the builder (no time stamps, no paths), so the
 * pack is rebuilt byte for byte. About a minute for the whole pack on one core.
 */
@Command(name = "build-pack", mixinStandardHelpOptions = true,
    description = "Trains every model of a language-pack recipe through its analysis chain and writes the "
        + "models and their language index into one folder.")
final class BuildPackCommand extends BaseCommand {
  private static final String INDEX_FILE = Paths.get(ShippedModels.INDEX).getFileName().toString();

  @Option(names = "--recipe", required = true, paramLabel = "FILE",
      description = "The pack's recipe (models/pack.properties in the source tree).")
  Path recipe;

  @Option(names = "--corpora", paramLabel = "DIR", defaultValue = "../shared/corpora",
      description = "Folder the recipe's training files are read from. Default: ${DEFAULT-VALUE}.")
  Path corpora;

  @Option(names = "--out", required = true, paramLabel = "DIR",
      description = "Folder to write the models and their index (languages.properties) into.")
  Path out;

  @Option(names = "--language", paramLabel = "CODE",
      description = "Build only this language (repeat for more); default every language of the recipe. "
          + "The index lists every language either way.")
  List<String> only = new ArrayList<>();

  @Override
  public Integer call() throws Exception {
    PackRecipe pack;
    try {
      pack = PackRecipe.read(recipe);
    } catch (IllegalArgumentException e) {
      throw new ParameterException(spec.commandLine(), e.getMessage());
    }
    for (String code : only) {
      if (pack.entries().stream().noneMatch(e -> e.language().equals(code))) {
        throw new ParameterException(spec.commandLine(), "--language " + code + ": not in " + recipe);
      }
    }
    Files.createDirectories(out);
    for (PackRecipe.Entry entry : pack.entries()) {
      if (only.isEmpty() || only.contains(entry.language())) {
        train(entry, pack.trainArgs(entry, corpora, out));
      }
    }
    byte[] index = pack.index().getBytes(StandardCharsets.UTF_8);
    AtomicFiles.write(out.resolve(INDEX_FILE), stream -> stream.write(index));
    out().printf(Locale.ROOT, "build-pack: %d models, index %s%n", pack.entries().size(), out.resolve(INDEX_FILE));
    return OK;
  }

  private void train(PackRecipe.Entry entry, List<String> args) {
    out().println("build-pack: " + entry.language() + ": wordclass " + String.join(" ", args));
    out().flush();
    CommandLine train = WordclassCommand.newCommandLine();
    train.setOut(out());
    train.setErr(err());
    int code = train.execute(args.toArray(String[]::new));
    if (code != OK) {
      throw new IllegalStateException("build-pack: training the '" + entry.language() + "' model failed (exit code " + code + ")");
    }
  }
}
