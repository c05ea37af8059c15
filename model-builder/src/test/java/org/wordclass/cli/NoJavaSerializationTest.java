package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * No Java serialization anywhere: models are read by the checked parser of ModelFile, never by
 * deserializing objects, and nothing of ours can be deserialized either. Scans the main sources
 * and the compiled main classes of both modules for the serialization stream classes and the
 * Serializable interface.
 */
class NoJavaSerializationTest {
  private static final List<Path> MODULES = List.of(Paths.get("..", "analyzer-plugin"), Paths.get("..", "model-builder"));
  /** Spelled in pieces, so that this file does not hold the words it looks for. */
  private static final List<String> CLASSES = List.of("Object" + "InputStream", "Object" + "OutputStream", "Serial" + "izable",
      "Extern" + "alizable");
  private static final Pattern IN_SOURCE = Pattern.compile("\\b(" + String.join("|", CLASSES) + "|read" + "Object|write" + "Object)\\b");

  @Test
  void mainSourcesDoNotUseSerialization() throws IOException {
    List<Path> sources = files("src/main/java", ".java");
    assertTrue(sources.size() > 50, "found only " + sources.size() + " sources");
    for (Path source : sources) {
      assertFalse(IN_SOURCE.matcher(Files.readString(source, StandardCharsets.UTF_8)).find(), source::toString);
    }
    System.out.println("no serialization in " + sources.size() + " main sources");
  }

  @Test
  void compiledClassesDoNotReferenceSerialization() throws IOException {
    List<Path> classes = files("target/classes", ".class");
    assertTrue(classes.size() > 50, "found only " + classes.size() + " classes");
    for (Path c : classes) {
      assertEquals(List.of(), references(Files.readAllBytes(c)), c::toString);
    }
    System.out.println("no serialization in " + classes.size() + " compiled main classes");
  }

  /** The class scan itself finds what it looks for: a JDK class that is serializable. */
  @Test
  void scanFindsSerializationInASerializableClass() throws IOException {
    try (InputStream in = Object.class.getResourceAsStream("/java/util/ArrayList.class")) {
      assertEquals(CLASSES.subList(0, 3).stream().map(c -> "java/io/" + c).toList(), references(in.readAllBytes()));
    }
  }

  /** Serialization types named in a class file's constant pool (as internal names, java/io/...). */
  private static List<String> references(byte[] classFile) {
    String text = new String(classFile, StandardCharsets.ISO_8859_1);
    return CLASSES.stream().map(c -> "java/io/" + c).filter(text::contains).toList();
  }

  private static List<Path> files(String folder, String suffix) throws IOException {
    List<Path> out = new java.util.ArrayList<>();
    for (Path module : MODULES) {
      try (Stream<Path> walk = Files.walk(module.resolve(folder))) {
        walk.filter(p -> p.toString().endsWith(suffix)).forEach(out::add);
      }
    }
    return out;
  }
}
