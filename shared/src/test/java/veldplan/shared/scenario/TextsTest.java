package veldplan.shared.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Message helpers: edit distance, suggestions, pointers, quoting and number formatting. */
class TextsTest {

  @Test
  void editDistance_textbookPairs() {
    // kitten -> sitting: substitute k/s, substitute e/i, insert g (Levenshtein's usual example).
    assertEquals(3, Texts.editDistance("kitten", "sitting"));
    assertEquals(0, Texts.editDistance("", ""));
    assertEquals(4, Texts.editDistance("", "area"));
  }

  @Test
  void editDistance_neighbourSwap_costsOne() {
    assertEquals(1, Texts.editDistance("sandfractoin", "sandfraction"));
  }

  @Test
  void closest_typo_suggestsIgnoringCase_farNames_none() {
    List<String> known = List.of("areaHa", "sandFraction", "clayFraction");

    assertEquals("sandFraction", Texts.closest("SandFraction", known));
    assertEquals("areaHa", Texts.closest("areHa", known));
    assertNull(Texts.closest("altitude", known));
    assertEquals("early-dry", Texts.closest("early", List.of("early-dry", "late-dry")));
    assertNull(Texts.closest("ear", List.of("early-dry", "early-wet")));
    assertEquals("", Texts.didYouMean("altitude", known));
  }

  @Test
  void child_escapesPerRfc6901() {
    assertEquals("/a~1b/m~0n/3", Texts.child(Texts.child(Texts.child("", "a/b"), "m~n"), 3));
  }

  @Test
  void quote_escapesAndShortens() {
    assertEquals("\"say \\\"hi\\\"\\u0009\"", Texts.quote("say \"hi\"\t"));
    assertEquals("\"" + "x".repeat(40) + "...\"", Texts.quote("x".repeat(41)));
  }

  @Test
  void number_plainDecimal() {
    assertEquals("10000000", Texts.number(1e7));
    assertEquals("0.1", Texts.number(0.1));
    assertEquals("-40", Texts.number(-40));
    assertEquals("0", Texts.number(0));
  }
}
