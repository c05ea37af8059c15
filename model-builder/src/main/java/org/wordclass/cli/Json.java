package org.wordclass.cli;

import org.wordclass.model.AtomicFiles;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.ObjectWriter;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
import java.io.IOException;
import java.io.Writer;
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

  /** For records written one after another into a generator: flushing after each would cost a system call per token. */
  private static final ObjectWriter PIECES = MAPPER.writer().without(SerializationFeature.FLUSH_AFTER_WRITE_VALUE);

  private Json() {}

  static void write(Path target, Object value) throws IOException {
    AtomicFiles.write(target, out -> MAPPER.writeValue(out, value));
  }

  /**
   * A pretty-printing generator on {@code out}, for output written piece by piece (one token at a
   * time) rather than built whole; {@link #write(JsonGenerator, Object)} writes records into it.
   * Closing it flushes {@code out} but leaves it open.
   */
  static JsonGenerator generator(Writer out) throws IOException {
    return MAPPER.getFactory().createGenerator(out).useDefaultPrettyPrinter();
  }

  /** Writes {@code value} at the generator's current place, with the same conventions as the reports. */
  static void write(JsonGenerator generator, Object value) throws IOException {
    PIECES.writeValue(generator, value);
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
