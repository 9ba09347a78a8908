package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Tests for {@link MaximumGrowthRate} against methods.md §9.1. */
class MaximumGrowthRateTest {

  @ParameterizedTest(name = "{0} kg -> {1}")
  @CsvSource({
      // Caughley & Krebs (1983) as Table 6.1 of the Sinclair, Fryxell & Caughley textbook
      // [V2, secondary source], printed to 2 decimals; tolerance 0.005 (methods §9.1).
      "1,   1.50",
      "10,  0.65",
      "100, 0.29"})
  void caughleyKrebs_textbookTable_matchesPrintedValues(double mass, double expected) {
    assertEquals(expected, MaximumGrowthRate.caughleyKrebs(mass), 0.005);
  }

  @ParameterizedTest(name = "{0} kg -> {1}")
  @CsvSource({
      // [D] methods §9.1, arithmetic from 1.5 W^-0.36 (the 1000 kg value replaces the textbook
      // cell, whose OCR reads 0.08 and looks misread).
      "1000, 0.1248",
      "180,  0.2313",
      "500,  0.1601",
      "3000, 0.0840"})
  void caughleyKrebs_sheetArithmetic_matches(double mass, double expected) {
    assertEquals(expected, MaximumGrowthRate.caughleyKrebs(mass), 5e-5);
  }

  @ParameterizedTest(name = "{0} kg -> {1}")
  @CsvSource({
      // Sinclair (2003) via a documented R package's example output [V2]; tol 1e-4 (§9.1).
      "55,  0.3891",
      "127, 0.2990"})
  void sinclair_packageExample_matchesPrintedValues(double mass, double expected) {
    assertEquals(expected, MaximumGrowthRate.sinclair(mass), 1e-4);
  }

  @Test
  void sinclair_elephant3000Kg_is0point1104() {
    // [D] methods §9.1: 1.375 x 3000^-0.315.
    assertEquals(0.1104, MaximumGrowthRate.sinclair(3000), 5e-5);
  }

  @Test
  void caughleyKrebs_massInGramsForm_isTheSameRelation() {
    // [V2] the textbook figure writes rm = 18 W^-0.36 with W in grams: 1.5 x 1000^0.36 = 18.0.
    assertEquals(18 * Math.pow(250_000, -0.36), MaximumGrowthRate.caughleyKrebs(250), 0.002);
  }

  @Test
  void bothForms_nonPositiveMass_throw() {
    assertThrows(IllegalArgumentException.class, () -> MaximumGrowthRate.caughleyKrebs(0));
    assertThrows(IllegalArgumentException.class, () -> MaximumGrowthRate.sinclair(Double.NaN));
  }
}
