package org.wordclass.model;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Applies a {@link UserLexicon} to a model: the result is a new model whose lexicon gives every
 * listed word exactly its listed classes, and is otherwise the model unchanged (tag set, states,
 * transitions, cues, unknown-word model). The model given is not modified, nor is its file.
 *
 * <p>Emissions of a listed word, per state of each listed class (a class with a second state for
 * capitalised words maps to both):
 *
 * <ul>
 *   <li>a state the model has seen with the word keeps the model's emission, and its
 *       context-dependent emissions;
 *   <li>a state the model never saw with the word gets the smallest emission of that state in the
 *       model's lexicon, that is the probability of a word seen once with it: the least evidence
 *       the model knows, so the transitions, not an invented number, decide between the classes;
 *       a state no word was ever seen with gets the smallest emission of the whole lexicon;
 *   <li>a class's weight w adds {@code log(w / max weight of the entry)}: only relative weights
 *       matter ({@code VERB:2 NOUN} is {@code VERB:4 NOUN:2}), and an entry without weights
 *       leaves the model's emissions as they are.
 * </ul>
 *
 * A word written exactly in the file wins over the case forms of a {@code case=any} entry.
 *
 * <p>Cost: one pass over the model's lexicon and a copy of it and of the transition tables; for
 * the bundled English model (19,842 words) 50 to 140 ms on a busy 2-core machine and about the
 * model's own heap, once per distinct model and lexicon pair (see {@code ModelCache}). Decoding
 * with the result costs what decoding with the model does.
 */
public final class LexiconOverlay {
  private LexiconOverlay() {}

  /** {@code model} with {@code user} applied; its provenance adds {@link UserLexicon#provenance()}. */
  public static HmmModel apply(HmmModel model, UserLexicon user) {
    Map<String, UserLexicon.Entry> byForm = entriesByForm(user);
    float[] floor = smallestEmissions(model);
    List<Lexicon.Entry> merged = new ArrayList<>(model.lexicon().size() + byForm.size());
    boolean[] listed = new boolean[model.lexicon().size() + byForm.size()];
    for (Lexicon.Entry known : model.lexicon().entries()) {
      UserLexicon.Entry entry = byForm.remove(known.word());
      listed[merged.size()] = entry != null;
      merged.add(entry == null ? known : overridden(known.word(), entry, known, floor, model.states()));
    }
    for (Map.Entry<String, UserLexicon.Entry> unseen : new TreeMap<>(byForm).entrySet()) {
      listed[merged.size()] = true;
      merged.add(overridden(unseen.getKey(), unseen.getValue(), null, floor, model.states()));
    }
    Map<String, String> provenance = new TreeMap<>(model.provenance());
    provenance.putAll(user.provenance());
    return model.withParameters(model.logBigramTable(), model.logTrigramTable(),
        new Lexicon(merged, Arrays.copyOf(listed, merged.size())), provenance);
  }

  /** Every written form an entry covers; exact entries first, so they win over case forms. */
  private static Map<String, UserLexicon.Entry> entriesByForm(UserLexicon user) {
    Map<String, UserLexicon.Entry> byForm = new HashMap<>();
    for (UserLexicon.Entry e : user.entries()) {
      if (!e.anyCase()) {
        byForm.put(e.word(), e);
      }
    }
    for (UserLexicon.Entry e : user.entries()) {
      if (e.anyCase()) {
        e.forms().forEach(form -> byForm.putIfAbsent(form, e));
      }
    }
    return byForm;
  }

  /** Per state, the smallest emission any word has in the model's lexicon. */
  static float[] smallestEmissions(HmmModel model) {
    Lexicon lexicon = model.lexicon();
    float[] floor = new float[model.states().size()];
    Arrays.fill(floor, Float.POSITIVE_INFINITY);
    float overall = Float.POSITIVE_INFINITY;
    for (int w = 0; w < lexicon.size(); w++) {
      for (int k = 0; k < lexicon.stateCount(w); k++) {
        int state = lexicon.state(w, k);
        floor[state] = Math.min(floor[state], lexicon.logEmission(w, k));
        overall = Math.min(overall, floor[state]);
      }
    }
    for (int s = 0; s < floor.length; s++) {
      if (floor[s] == Float.POSITIVE_INFINITY) {
        floor[s] = overall == Float.POSITIVE_INFINITY ? 0f : overall;
      }
    }
    return floor;
  }

  /** The entry of {@code form} with the user's classes; {@code known} is the model's entry or null. */
  private static Lexicon.Entry overridden(String form, UserLexicon.Entry user, Lexicon.Entry known, float[] floor,
      StateSpace states) {
    TreeMap<Integer, Double> bonusOfState = new TreeMap<>();
    double maxWeight = Arrays.stream(user.weights()).max().orElse(1);
    for (int i = 0; i < user.tags().length; i++) {
      for (int state : states.statesOf(user.tags()[i])) {
        bonusOfState.put(state, Math.log(user.weights()[i] / maxWeight));
      }
    }
    int n = bonusOfState.size();
    boolean contexts = known != null && known.hasContexts();
    int[] ids = new int[n];
    float[] emissions = new float[n];
    int[][] contextStates = new int[contexts ? n : 0][];
    float[][] contextEmissions = new float[contexts ? n : 0][];
    int k = 0;
    for (Map.Entry<Integer, Double> e : bonusOfState.entrySet()) {
      int state = e.getKey();
      double bonus = e.getValue();
      int j = known == null ? -1 : indexOf(known.states(), state);
      ids[k] = state;
      emissions[k] = (float) ((j >= 0 ? known.logEmissions()[j] : floor[state]) + bonus);
      if (contexts) {
        // a state the model never saw with the word has no contexts: its plain emission applies
        contextStates[k] = j >= 0 ? known.contextStates()[j] : new int[0];
        contextEmissions[k] = j >= 0 ? shifted(known.contextLogEmissions()[j], bonus) : new float[0];
      }
      k++;
    }
    return new Lexicon.Entry(form, ids, emissions, contextStates, contextEmissions);
  }

  private static int indexOf(int[] values, int value) {
    for (int i = 0; i < values.length; i++) {
      if (values[i] == value) {
        return i;
      }
    }
    return -1;
  }

  private static float[] shifted(float[] logs, double by) {
    float[] out = new float[logs.length];
    for (int i = 0; i < logs.length; i++) {
      out[i] = (float) (logs[i] + by);
    }
    return out;
  }
}
