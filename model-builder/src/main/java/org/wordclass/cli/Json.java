package org.wordclass.cli;

import org.wordclass.model.AtomicFiles;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
import java.io.IOException;
import java.nio.file.Path;

/**
 * Pretty-printed JSON of the reports (records), to a file or to a string. A figure that is not
 * defined (NaN, such as the accuracy on unknown words when there were none) is written as {@code
 * null}, since JSON has no number for it.
 */
final class Json {
  private static final ObjectMapper MAPPER = new ObjectMapper()
      .enable(SerializationFeature.INDENT_OUTPUT)
      .disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET)
      .registerModule(new SimpleModule().addSerializer(Double.class, new UndefinedAsNull()))
      .registerModule(new SimpleModule().addSerializer(double.class, new UndefinedAsNull()));

  private Json() {}

  static void write(Path target, Object value) throws IOException {
    AtomicFiles.write(target, out -> MAPPER.writeValue(out, value));
  }

  static String toString(Object value) throws IOException {
    return MAPPER.writeValueAsString(value) + System.lineSeparator();
  }

  private static final class UndefinedAsNull extends StdSerializer<Double> {
    UndefinedAsNull() {
      super(Double.class);
    }

    @Override
    public void serialize(Double value, JsonGenerator gen, SerializerProvider provider) throws IOException {
      if (value.isNaN() || value.isInfinite()) {
        gen.writeNull();
      } else {
        gen.writeNumber(value);
      }
    }
  }
}
