package org.wordclass.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class SimpleTokenizerTest {
  private final SimpleTokenizer tokenizer = new SimpleTokenizer();

  @Test
  void keepsInnerMarksAndSplitsPunctuation() {
    assertEquals(List.of("The", "well-known", "otter", "didn't", "pay", "$", "3.50", "(", "or", "10,000", ")", "!"),
        tokenizer.tokens("The well-known otter didn't pay $3.50 (or 10,000)!"));
  }

  @Test
  void keepsAbbreviationsWhole() {
    assertEquals(List.of("the", "U.S.", "at", "10:30", ",", "e.g.", "by", "ferry", ".", ".", "."),
        tokenizer.tokens("the U.S. at 10:30, e.g. by ferry..."));
  }

  @Test
  void emptyAndBlankLinesHaveNoTokens() {
    assertEquals(List.of(), tokenizer.tokens("   \t "));
  }
}
