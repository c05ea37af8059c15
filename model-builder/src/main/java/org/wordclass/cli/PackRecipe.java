package org.wordclass.cli;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Properties;
import java.util.SortedMap;
import java.util.TreeMap;
import org.wordclass.corpus.AnalysisChain;

/**
 * The recipe of the language pack ({@code models/pack.properties}), read by {@code build-pack} and
 * by the tests that check the shipped models against it. A properties file: {@code
 * chain.tokenizer} and {@code chain.filters} (specs separated by {@code |}) name the analysis
 * chain once for every language; per language code {@code xx}: {@code xx.model} (file name),
 * {@code xx.train} (corpus file below the corpora folder), {@code xx.options} (training options,
 * separated by spaces), {@code xx.treebank}, {@code xx.source}, {@code xx.licence} (recorded in
 * the model's provenance as notes), and optionally {@code xx.aliases}, codes that ask for the
 * same model.
 */
final class PackRecipe {
  /** One language of the pack. */
  record Entry(String language, String model, String train, List<String> options, SortedMap<String, String> notes,
      List<String> aliases) {
    /** The file this entry trains on, below {@code corpora}. */
    Path trainFile(Path corpora) {
      return corpora.resolve(train);
    }

    /** The test file of the same treebank, by the UD naming convention ({@code -ud-test.conllu}). */
    Path testFile(Path corpora) {
      return corpora.resolve(train.replaceFirst("-ud-(train|dev)\\.conllu$", "-ud-test.conllu"));
    }

    /** The dev file of the same treebank. */
    Path devFile(Path corpora) {
      return corpora.resolve(train.replaceFirst("-ud-(train|dev)\\.conllu$", "-ud-dev.conllu"));
    }
  }

  private final Path file;
  private final Properties properties = new Properties();
  private final List<Entry> entries = new ArrayList<>();

  private PackRecipe(Path file) throws IOException {
    this.file = file;
    try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
      properties.load(in);
    }
    for (String key : new TreeMap<>(properties).keySet().stream().map(Object::toString).toList()) {
      if (key.endsWith(".train")) {
        entries.add(entry(key.substring(0, key.length() - ".train".length())));
      }
    }
    if (entries.isEmpty()) {
      throw new IllegalArgumentException(file + ": names no language (no xx.train entry)");
    }
    chain(); // fails now, naming the file, if the chain is missing
  }

  /** Reads and checks a recipe; a missing entry fails naming the file and the key. */
  static PackRecipe read(Path file) throws IOException {
    return new PackRecipe(file);
  }

  private Entry entry(String code) {
    SortedMap<String, String> notes = new TreeMap<>();
    String model = required(code + ".model");
    notes.put("language", code);
    notes.put("model", model.replaceFirst("\\.wcm$", ""));
    for (String note : List.of("treebank", "source", "licence")) {
      notes.put(note, required(code + "." + note));
    }
    return new Entry(code, model, required(code + ".train"), words(properties.getProperty(code + ".options", "")), notes,
        words(properties.getProperty(code + ".aliases", "")));
  }

  private String required(String key) {
    String value = properties.getProperty(key);
    if (value == null || value.isBlank()) {
      throw new IllegalArgumentException(file + ": '" + key + "' is missing");
    }
    return value.strip();
  }

  private static List<String> words(String text) {
    return text.isBlank() ? List.of() : Arrays.asList(text.strip().split("\\s+"));
  }

  /** The languages, sorted by code. */
  List<Entry> entries() {
    return entries;
  }

  /** The analysis chain every model is trained through. */
  AnalysisChain chain() {
    List<String> filters = new ArrayList<>();
    for (String filter : properties.getProperty("chain.filters", "").split("\\|")) {
      if (!filter.isBlank()) {
        filters.add(filter.strip());
      }
    }
    return AnalysisChain.of(required("chain.tokenizer"), filters);
  }

  /** The {@code train} options that name the chain. */
  List<String> chainArgs() {
    AnalysisChain chain = chain();
    List<String> args = new ArrayList<>(List.of("--through-analyzer", "--tokenizer", chain.tokenizer().toString()));
    for (AnalysisChain.Component filter : chain.filters()) {
      args.add("--filter");
      args.add(filter.toString());
    }
    return args;
  }

  /** The {@code train} command line that builds {@code entry} into {@code out}. */
  List<String> trainArgs(Entry entry, Path corpora, Path out) {
    List<String> args = new ArrayList<>(List.of("train", "--corpus", entry.trainFile(corpora).toString()));
    args.addAll(chainArgs());
    args.addAll(entry.options());
    entry.notes().forEach((k, v) -> args.add("--note=" + k + "=" + v));
    args.add("--out");
    args.add(out.resolve(entry.model()).toString());
    return args;
  }

  /** The index the analyzer reads: {@code code=file} per language, {@code alias=code} per alias, sorted. */
  String index() {
    SortedMap<String, String> index = new TreeMap<>();
    for (Entry entry : entries) {
      index.put(entry.language(), entry.model());
      for (String alias : entry.aliases()) {
        index.put(alias, entry.language());
      }
    }
    StringBuilder text = new StringBuilder("# The language pack: ISO 639-1 code = model file, or alias = code.\n"
        + "# Written by wordclass build-pack from models/pack.properties; do not edit.\n");
    index.forEach((k, v) -> text.append(k).append('=').append(v).append('\n'));
    return text.toString();
  }
}
