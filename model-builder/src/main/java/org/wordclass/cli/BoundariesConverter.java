package org.wordclass.cli;

import org.wordclass.decoding.SentenceBoundaries;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Reads {@code --boundaries} as the filter's {@code boundaries} argument is written: {@code tokenizer} or {@code decoded}. */
final class BoundariesConverter implements ITypeConverter<SentenceBoundaries> {
  @Override
  public SentenceBoundaries convert(String value) {
    try {
      return SentenceBoundaries.parse(value, "--boundaries");
    } catch (IllegalArgumentException e) {
      throw new TypeConversionException(e.getMessage());
    }
  }
}
