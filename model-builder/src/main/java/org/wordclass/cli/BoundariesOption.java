package org.wordclass.cli;

import org.wordclass.decoding.SentenceBoundaries;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Option;
import picocli.CommandLine.TypeConversionException;

/**
 * {@code --boundaries}, the filter's {@code boundaries} argument on the command line, for the
 * commands that decode ({@code evaluate}, {@code tag}), so that they decode as the filter does.
 */
final class BoundariesOption {
  @Option(names = "--boundaries", paramLabel = "WHERE", converter = Converter.class, defaultValue = "decoded",
      description = "The filter's boundaries argument: tokenizer decodes each sentence the chain's tokenizer marks "
          + "as one; decoded lets the decoder find sentence boundaries inside it as well, before capitalised "
          + "tokens. Default: ${DEFAULT-VALUE}.")
  private SentenceBoundaries where;

  SentenceBoundaries value() {
    return where;
  }

  /** Reads the value as the filter's argument is written: {@code tokenizer} or {@code decoded}. */
  static final class Converter implements ITypeConverter<SentenceBoundaries> {
    @Override
    public SentenceBoundaries convert(String value) {
      try {
        return SentenceBoundaries.parse(value, "--boundaries");
      } catch (IllegalArgumentException e) {
        throw new TypeConversionException(e.getMessage());
      }
    }
  }
}
