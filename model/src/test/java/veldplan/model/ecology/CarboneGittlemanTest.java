package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Tests for {@link CarboneGittleman} against methods.md §10.3. */
class CarboneGittlemanTest {

  @Test
  void carnivoreBiomass_10000KgPrey_isAbout90Kg() {
    // Carbone & Gittleman (2002), abstract [V]: 10,000 kg of prey supports "about 90 kg" of a
    // given carnivore species. Tolerance ±0.5 kg: "about 90" read as 90 to the nearest kg.
    assertEquals(90, CarboneGittleman.carnivoreBiomassKg(10_000), 0.5);
  }

  @Test
  void carnivoreBiomass_10000KgPrey_isTheFittedConstant90point1() {
    // The fitted constant 90.1 is from memory [M] (methods §10.3); this pins the constant used.
    assertEquals(90.1, CarboneGittleman.carnivoreBiomassKg(10_000), 1e-9);
  }

  @Test
  void carnivoreNumber_150KgCarnivore_is0point60PerTenTonnesOfPrey() {
    // [D] methods §10.3: 90.1 / 150 = 0.60 individuals.
    assertEquals(0.60, CarboneGittleman.carnivoreNumber(10_000, 150), 0.005);
  }

  @Test
  void carnivoreNumber_doubleCarnivoreMass_halvesNumber() {
    // Carbone & Gittleman (2002) [V]: number per prey biomass scales as 1 / carnivore mass.
    assertEquals(2, CarboneGittleman.carnivoreNumber(50_000, 40)
        / CarboneGittleman.carnivoreNumber(50_000, 80), 1e-12);
  }

  @Test
  void invalidArguments_throw() {
    assertThrows(IllegalArgumentException.class, () -> CarboneGittleman.carnivoreBiomassKg(-1));
    assertThrows(IllegalArgumentException.class,
        () -> CarboneGittleman.carnivoreNumber(10_000, 0));
  }
}
