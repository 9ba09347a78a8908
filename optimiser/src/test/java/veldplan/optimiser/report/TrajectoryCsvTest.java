package veldplan.optimiser.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The currency in the names of the park's cost columns: {@link TrajectoryCsv#currencySuffix}
 * turns any currency code into a safe column-name part. The header itself, with a real
 * scenario's parameters, is checked in {@code SimulateCommandTest}.
 */
class TrajectoryCsvTest {

  @Test
  void currencySuffix_isoCode_lowerCase() {
    assertEquals("usd", TrajectoryCsv.currencySuffix("USD"));
    assertEquals("zar", TrajectoryCsv.currencySuffix("zar"));
  }

  @Test
  void currencySuffix_otherCharacters_removed() {
    assertEquals("n2026", TrajectoryCsv.currencySuffix(" N$-2026 "));
    assertEquals("kes", TrajectoryCsv.currencySuffix("K.e.s."));
  }

  @Test
  void currencySuffix_nothingLeft_genericWordRatherThanNoUnit() {
    assertEquals("currency", TrajectoryCsv.currencySuffix("\u20ac"));
    assertEquals("currency", TrajectoryCsv.currencySuffix(""));
    assertEquals("currency", TrajectoryCsv.currencySuffix(null));
  }

  @Test
  void currencySuffix_anyInput_onlyLowerCaseLettersAndDigits() {
    for (String code : List.of("USD", "\u00dc-x_1", "\u00df", "R 10", "\t", "\u0130STANBUL")) {
      String suffix = TrajectoryCsv.currencySuffix(code);
      assertFalse(suffix.isEmpty(), code);
      assertTrue(suffix.chars().allMatch(c -> (c >= 'a' && c <= 'z') || (c >= '0' && c <= '9')),
          code + " gives " + suffix + " " + Arrays.toString(suffix.toCharArray()));
    }
  }
}
