package org.wordclass.cli;

import java.lang.reflect.Field;
import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;
import org.wordclass.model.EndingAlphabet;
import org.wordclass.training.TrainingOptions;
import picocli.CommandLine.IDefaultValueProvider;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * One option per {@link TrainingOptions} field (a mixin). The defaults are those of {@link
 * TrainingOptions#DEFAULTS}, supplied at run time by {@link Defaults} so that help and behaviour
 * follow any change made there.
 */
final class TrainingOptionsMixin {
  @Spec(Spec.Target.MIXEE)
  CommandSpec mixee;

  @Option(names = "--order", paramLabel = "1|2",
      description = "1 for a first-order (bigram) model, 2 for a second-order (trigram) one. Default: ${DEFAULT-VALUE}.")
  int order;

  @Option(names = "--max-suffix-length", paramLabel = "N",
      description = "Longest word ending the unknown-word model counts. Default: ${DEFAULT-VALUE}.")
  int maxSuffixLength;

  @Option(names = "--max-prefix-length", paramLabel = "N",
      description = "Longest word beginning whose classes weigh an unknown word's classes beside its ending; "
          + "0 to look at endings only. Default: ${DEFAULT-VALUE}.")
  int maxPrefixLength;

  @Option(names = "--rare-word-max-count", paramLabel = "N",
      description = "Words seen at most this often teach the unknown-word model. Default: ${DEFAULT-VALUE}.")
  int rareWordMaxCount;

  @Option(names = "--suffix-weight", paramLabel = "W|held-out|tag-spread",
      description = "Weight of shorter endings when longer ones are combined with them: a positive number; "
          + "held-out to choose it by scoring each rare training word as if unseen; tag-spread for the "
          + "standard deviation of the tag probabilities. Default: ${DEFAULT-VALUE}.")
  String suffixWeight;

  @Option(names = "--open-class-min-share", paramLabel = "SHARE",
      description = "A tag may be given to unknown words when at least this share (0 to 1) of the words "
          + "seen once carry it; a share no tag reaches leaves the tag most of them carry. Default: ${DEFAULT-VALUE}.")
  double openClassMinShare;

  // the fallback value makes --shape-classes mean true and --no-shape-classes false whatever the default
  @Option(names = "--shape-classes", negatable = true, fallbackValue = "true",
      description = "Keep separate ending counts per spelling shape (lower case, capitalised, all capitals, "
          + "with digits, no letters); --no-shape-classes tells only capitalised from other words. "
          + "Default: ${DEFAULT-VALUE}.")
  boolean shapeClasses;

  @Option(names = "--capitalisation-states", negatable = true, fallbackValue = "true",
      description = "Give each class a second state for words written with a capital in mid-sentence, "
          + "so that transitions can tell names from other words. Default: ${DEFAULT-VALUE}.")
  boolean capitalisationStates;

  @Option(names = "--context-emissions", negatable = true, fallbackValue = "true",
      description = "Let a known word's probability depend on the previous class too, where the training "
          + "data shows it. Default: ${DEFAULT-VALUE}.")
  boolean contextEmissions;

  @Option(names = "--lowercase-first-word", negatable = true, fallbackValue = "true",
      description = "Look an unknown capitalised first word of a sentence up in lower case. "
          + "Default: ${DEFAULT-VALUE}.")
  boolean lowercaseFirstWord;

  @Option(names = "--lowercase-mid-sentence-first-word", negatable = true, fallbackValue = "true",
      description = "Look a capitalised first word of a sentence up in lower case also when it is known only "
          + "from mid-sentence (Book, seen only in titles, as book). Default: ${DEFAULT-VALUE}.")
  boolean lowercaseMidSentenceFirstWord;

  @Option(names = "--context-min-count", paramLabel = "N",
      description = "Keep a word's context-dependent probability only for contexts seen at least N times. "
          + "Default: ${DEFAULT-VALUE}.")
  int contextMinCount;

  @Option(names = "--latent-rounds", paramLabel = "N",
      description = "Rounds of split-merge training: each splits every hidden state of a class in two, fits "
          + "the halves to the tagged corpus by EM and merges back the splits that help least; 0 for none. "
          + "Context-dependent emissions and the lower-case forms of unknown words are then left out. Slower "
          + "decoding and a larger model; best with "
          + "--order 1 (see docs/latent-states.md). Default: ${DEFAULT-VALUE}.")
  int latentRounds;

  @Option(names = "--unknown-word-prior", paramLabel = "tag|state|lower-case-state|rare-tag|rare-state",
      description = "What an unknown word's class probability from its ending is divided by to score it: the "
          + "class's share of all training words (tag), the share of its hidden state, which also says "
          + "whether the word is written with a capital (state), the state's for words written without a "
          + "capital and the class's for the others (lower-case-state), or either share among rare words only "
          + "(rare-tag, rare-state). Default: ${DEFAULT-VALUE}.")
  String unknownWordPrior;

  @Option(names = "--lower-case-forms", negatable = true, fallbackValue = "true",
      description = "Weigh the classes of an unknown word written with a capital by what its lower-case form "
          + "mostly is, where that form is a known word (Customer by customer, a noun). Default: ${DEFAULT-VALUE}.")
  boolean lowerCaseForms;

  @Option(names = "--min-tag-share", paramLabel = "SHARE",
      description = "Leave a word/tag pair out of the lexicon when fewer than this share of the word's "
          + "training occurrences carry the tag (annotation slips in frequent words); 0 keeps all, and every "
          + "word keeps its most frequent tag. "
          + "Default: ${DEFAULT-VALUE}.")
  double minTagShare;

  @Option(names = "--ending-alphabet", paramLabel = "as-written|turkish-vowel-harmony|finnish-vowel-harmony",
      description = "How the unknown-word model spells the endings it counts: as written, or with the vowels "
          + "a language's suffixes alternate by vowel harmony folded together, so that the variants of one "
          + "suffix share their counts: Turkish e with a; i, u, ü with ı; ö with o (-da and -de, -ın, -in, "
          + "-un and -ün); Finnish ä with a, ö with o, y with u (-ssa and -ssä). Default: ${DEFAULT-VALUE}.")
  String endingAlphabet;

  /** The options given; a value the estimator refuses is reported as a usage error. */
  TrainingOptions toOptions() {
    try {
      TrainingOptions options = TrainingOptions.builder().order(order).maxSuffixLength(maxSuffixLength)
          .rareWordMaxCount(rareWordMaxCount).suffixWeightRule(TrainingOptions.SuffixWeightRule.HELD_OUT)
          .openClassMinShare(openClassMinShare).shapeClasses(shapeClasses).capitalisationStates(capitalisationStates)
          .contextEmissions(contextEmissions).lowercaseFirstWord(lowercaseFirstWord).contextMinCount(contextMinCount)
          .latentRounds(latentRounds).unknownWordPrior(unknownWordPrior(unknownWordPrior)).lowerCaseForms(lowerCaseForms)
          .maxPrefixLength(maxPrefixLength).minTagShare(minTagShare)
          .lowercaseMidSentenceFirstWord(lowercaseMidSentenceFirstWord).endingAlphabet(endingAlphabet(endingAlphabet))
          .build();
      return withSuffixWeight(options, suffixWeight);
    } catch (IllegalArgumentException e) {
      throw new ParameterException(mixee.commandLine(), "Invalid training option: " + e.getMessage());
    }
  }

  /** Reads an alphabet's name as {@link TrainingOptions#describe()} writes it. */
  private EndingAlphabet endingAlphabet(String value) {
    return named("--ending-alphabet", value, EndingAlphabet.values());
  }

  /** Reads a prior's name as {@link TrainingOptions#describe()} writes it. */
  private TrainingOptions.UnknownWordPrior unknownWordPrior(String value) {
    return named("--unknown-word-prior", value, TrainingOptions.UnknownWordPrior.values());
  }

  /** The value of {@code values} whose option name ({@link #optionName}) is {@code value}, in any case. */
  private <E extends Enum<E>> E named(String option, String value, E[] values) {
    for (E e : values) {
      if (value.equalsIgnoreCase(optionName(e))) {
        return e;
      }
    }
    throw new ParameterException(mixee.commandLine(), "Invalid value for " + option + ": '" + value
        + "' is not one of " + Arrays.stream(values).map(TrainingOptionsMixin::optionName).collect(Collectors.joining(", ")));
  }

  /** How an option value names a constant: lower case, words joined by hyphens ({@code lower-case-state}). */
  private static String optionName(Enum<?> constant) {
    return constant.name().toLowerCase(Locale.ROOT).replace('_', '-');
  }

  /** Reads a rule name or a number. */
  private TrainingOptions withSuffixWeight(TrainingOptions options, String value) {
    for (TrainingOptions.SuffixWeightRule rule : TrainingOptions.SuffixWeightRule.values()) {
      if (rule != TrainingOptions.SuffixWeightRule.FIXED && value.equalsIgnoreCase(optionName(rule))) {
        return options.withSuffixWeightRule(rule);
      }
    }
    try {
      return options.withSuffixWeight(Double.parseDouble(value));
    } catch (NumberFormatException e) {
      throw new ParameterException(mixee.commandLine(),
          "Invalid value for --suffix-weight: '" + value + "' is neither a number nor held-out or tag-spread");
    }
  }

  /**
   * Defaults of the options above, taken from {@link TrainingOptions#describeAll()} of the defaults:
   * {@code --max-suffix-length} reads {@code option.maxSuffixLength}, and so on.
   */
  static final class Defaults implements IDefaultValueProvider {
    @Override
    public String defaultValue(ArgSpec arg) {
      if (!(arg instanceof OptionSpec option)
          || !(arg.userObject() instanceof Field field)
          || field.getDeclaringClass() != TrainingOptionsMixin.class) {
        return null;
      }
      return TrainingOptions.DEFAULTS.describeAll().get("option." + camelCase(option.longestName()));
    }

    /** {@code --max-suffix-length} to {@code maxSuffixLength}. */
    static String camelCase(String optionName) {
      String[] parts = optionName.replaceFirst("^-+", "").split("-");
      StringBuilder s = new StringBuilder(parts[0]);
      for (int i = 1; i < parts.length; i++) {
        s.append(parts[i].substring(0, 1).toUpperCase(Locale.ROOT)).append(parts[i].substring(1));
      }
      return s.toString();
    }
  }
}
