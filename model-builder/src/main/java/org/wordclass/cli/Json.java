package org.wordclass.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.nio.file.Path;

/** Pretty-printed JSON of the reports (records), to a file or to a string. */
final class Json {
  private static final ObjectMapper MAPPER = new ObjectMapper()
      .enable(SerializationFeature.INDENT_OUTPUT)
      .disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);

  private Json() {}

  static void write(Path target, Object value) throws IOException {
    AtomicOutput.write(target, out -> MAPPER.writeValue(out, value));
  }

  static String toString(Object value) throws IOException {
    return MAPPER.writeValueAsString(value) + System.lineSeparator();
  }
}
