package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Tests for {@link GrowingPeriod}. The definitional cases follow from the FAO (1978) definition of
 * the length of growing period [V, methods.md §2.1]; the reserve-period cases are arithmetic from
 * that definition [D]; the monthly layouts in the other tests exercise our documented
 * implementation choices and are arbitrary inputs, not data.
 */
class GrowingPeriodTest {
  private static final int[] DAYS = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};

  static LongStream seeds() {
    return LongStream.range(0, 100);
  }

  /** Monthly PET of {@code mmPerDay} in every month. */
  private static double[] petAt(double mmPerDay) {
    double[] pet = new double[12];
    for (int month = 0; month < 12; month++) {
      pet[month] = mmPerDay * DAYS[month];
    }
    return pet;
  }

  private static double[] scaled(double[] values, double factor) {
    double[] out = new double[values.length];
    for (int i = 0; i < values.length; i++) {
      out[i] = factor * values[i];
    }
    return out;
  }

  @Test
  void lengthOfGrowingPeriod_rainAtLeastPetAllYear_is365() {
    // Definitional, FAO (1978) [V]: P >= PET every day gives the whole year.
    double[] pet = petAt(5);
    assertEquals(365, GrowingPeriod.lengthOfGrowingPeriodDays(pet, pet, 100), 0);
    assertEquals(365, GrowingPeriod.lengthOfGrowingPeriodDays(scaled(pet, 1.5), pet, 100), 0);
  }

  @Test
  void lengthOfGrowingPeriod_rainBelowHalfPetAllYear_isZero() {
    // Definitional, FAO (1978) [V]: P < 0.5 PET every day, no storage, no growing day.
    double[] pet = petAt(5);
    assertEquals(0, GrowingPeriod.lengthOfGrowingPeriodDays(scaled(pet, 0.45), pet, 100), 0);
    assertEquals(0, GrowingPeriod.lengthOfGrowingPeriodDays(new double[12], pet, 100), 0);
  }

  @Test
  void lengthOfGrowingPeriod_rainSixTenthsOfPetAllYear_is365() {
    // Definitional, FAO (1978) [V]: intermediate type, P = 0.6 PET, no storage, whole year.
    double[] pet = petAt(5);
    assertEquals(365, GrowingPeriod.lengthOfGrowingPeriodDays(scaled(pet, 0.6), pet, 100), 0);
  }

  @Test
  void reserveDays_100MmStoredNoRainPet5_is20Days() {
    // [D] methods §2.1: S = 100 mm, P = 0, PET = 5 mm/d gives 20 days.
    assertEquals(20, GrowingPeriod.reserveDays(100, 0, 5), 1e-12);
  }

  @Test
  void reserveDays_40MmStoredNoRainPet5_is8Days() {
    // [D] methods §2.1: S = 40 mm gives 8 days.
    assertEquals(8, GrowingPeriod.reserveDays(40, 0, 5), 1e-12);
  }

  @Test
  void reserveDays_noDeficit_isInfinite() {
    assertEquals(Double.POSITIVE_INFINITY, GrowingPeriod.reserveDays(40, 5, 5), 0);
    assertEquals(Double.POSITIVE_INFINITY, GrowingPeriod.reserveDays(0, 6, 5), 0);
    assertEquals(0, GrowingPeriod.reserveDays(0, 1, 5), 0);
  }

  /** Wet January-March (P = 2 PET), dry the rest (P = 0), PET 5 mm/day. */
  private static double[][] wetJanuaryToMarch() {
    double[] pet = petAt(5);
    double[] rain = new double[12];
    for (int month = 0; month < 3; month++) {
      rain[month] = 2 * pet[month];
    }
    return new double[][] {rain, pet};
  }

  @Test
  void lengthOfGrowingPeriod_fullStoreThenDryApril_adds20ReserveDays() {
    // [D] the humid season fills the 100 mm store; April P = 0, PET 5 mm/d: 20 reserve days.
    double[][] climate = wetJanuaryToMarch();
    assertEquals(31 + 28 + 31 + 20,
        GrowingPeriod.lengthOfGrowingPeriodDays(climate[0], climate[1], 100), 1e-9);
  }

  @Test
  void lengthOfGrowingPeriod_40MmStoredThenDryApril_adds8ReserveDays() {
    // [D] January leaves 40 mm (P = PET + 40), February and March P = PET keep it: 8 days.
    double[] pet = petAt(5);
    double[] rain = new double[12];
    rain[0] = pet[0] + 40;
    rain[1] = pet[1];
    rain[2] = pet[2];
    assertEquals(31 + 28 + 31 + 8, GrowingPeriod.lengthOfGrowingPeriodDays(rain, pet, 100), 1e-9);
  }

  @Test
  void lengthOfGrowingPeriod_reserveLongerThanMonth_spillsIntoNextDryMonth() {
    // [D] 100 mm stored; April PET 2 mm/d uses 60 mm in its 30 days (30 days), May PET 5 mm/d
    // uses the remaining 40 mm in 8 days.
    double[][] climate = wetJanuaryToMarch();
    double[] pet = climate[1];
    pet[3] = 2 * 30;
    assertEquals(31 + 28 + 31 + 30 + 8,
        GrowingPeriod.lengthOfGrowingPeriodDays(climate[0], pet, 100), 1e-9);
  }

  @Test
  void lengthOfGrowingPeriod_wetSeasonAcrossNewYear_countsDecemberAndItsReserve() {
    // [D] wet December-February, dry otherwise, PET 5 mm/d: the year is cyclic, so December
    // counts and the store filled in December-February gives 20 days in March.
    double[] pet = petAt(5);
    double[] rain = new double[12];
    rain[11] = 2 * pet[11];
    rain[0] = 2 * pet[0];
    rain[1] = 2 * pet[1];
    assertEquals(31 + 31 + 28 + 20, GrowingPeriod.lengthOfGrowingPeriodDays(rain, pet, 100),
        1e-9);
  }

  @Test
  void lengthOfGrowingPeriod_storeFilledOnlyInDecember_carriesIntoJanuary() {
    // [D] only December is humid (P = PET + 100 mm); January-November are dry with PET 5 mm/d.
    // The 100 mm stored in December last 20 days into January, through the cyclic year.
    double[] pet = petAt(5);
    double[] rain = new double[12];
    rain[11] = pet[11] + 100;
    assertEquals(31 + 20, GrowingPeriod.lengthOfGrowingPeriodDays(rain, pet, 100), 1e-9);
  }

  @Test
  void lengthOfGrowingPeriod_intermediateMonthAfterHumidSeason_drawsOnStore() {
    // [D] our documented choice: plants draw on the store wherever P < PET. April P = 0.6 PET
    // (growing, 30 days) uses 60 of the 100 mm; May (dry, PET 5 mm/d) gets 40/5 = 8 days.
    double[][] climate = wetJanuaryToMarch();
    double[] rain = climate[0];
    rain[3] = 0.6 * climate[1][3];
    assertEquals(31 + 28 + 31 + 30 + 8,
        GrowingPeriod.lengthOfGrowingPeriodDays(rain, climate[1], 100), 1e-9);
  }

  @Test
  void lengthOfGrowingPeriod_zeroReserveCap_countsGrowingMonthsOnly() {
    double[][] climate = wetJanuaryToMarch();
    assertEquals(31 + 28 + 31,
        GrowingPeriod.lengthOfGrowingPeriodDays(climate[0], climate[1], 0), 0);
  }

  /** Arbitrary monthly climate (not data) for the property tests. */
  private static double[][] arbitraryClimate(SplittableRandom random) {
    double[] rain = new double[12];
    double[] pet = new double[12];
    for (int month = 0; month < 12; month++) {
      pet[month] = 60 + 140 * random.nextDouble();
      rain[month] = random.nextDouble() < 0.4 ? 0 : 300 * random.nextDouble();
    }
    return new double[][] {rain, pet};
  }

  @ParameterizedTest
  @MethodSource("seeds")
  void lengthOfGrowingPeriod_anyClimate_liesBetweenGrowingMonthsAnd365(long seed) {
    double[][] climate = arbitraryClimate(new SplittableRandom(seed));
    double lgp = GrowingPeriod.lengthOfGrowingPeriodDays(climate[0], climate[1], 100);
    int growingMonthDays = 0;
    for (int month = 0; month < 12; month++) {
      if (climate[0][month] >= 0.5 * climate[1][month]) {
        growingMonthDays += DAYS[month];
      }
    }
    assertTrue(lgp >= growingMonthDays && lgp <= 365, lgp + " vs " + growingMonthDays);
  }

  @ParameterizedTest
  @MethodSource("seeds")
  void lengthOfGrowingPeriod_largerReserveCap_neverShortens(long seed) {
    // [D] every step of the bucket is monotone in the cap, and so is the reserve.
    double[][] climate = arbitraryClimate(new SplittableRandom(seed));
    double previous = -1;
    for (double cap = 0; cap <= 300; cap += 25) {
      double lgp = GrowingPeriod.lengthOfGrowingPeriodDays(climate[0], climate[1], cap);
      assertTrue(lgp >= previous - 1e-9, "cap " + cap + ": " + lgp + " < " + previous);
      previous = lgp;
    }
  }

  @ParameterizedTest
  @MethodSource("seeds")
  void lengthOfGrowingPeriod_moreRainInAnyMonth_neverShortens(long seed) {
    // [D] more rain can only turn a month to growing and raise the store.
    SplittableRandom random = new SplittableRandom(seed);
    double[][] climate = arbitraryClimate(random);
    double before = GrowingPeriod.lengthOfGrowingPeriodDays(climate[0], climate[1], 100);
    double[] wetter = Arrays.copyOf(climate[0], 12);
    wetter[random.nextInt(12)] += 200 * random.nextDouble();
    double after = GrowingPeriod.lengthOfGrowingPeriodDays(wetter, climate[1], 100);
    assertTrue(after >= before - 1e-9, after + " < " + before);
  }

  @ParameterizedTest
  @MethodSource("seeds")
  void lengthOfGrowingPeriod_anyClimate_doesNotChangeItsInputs(long seed) {
    double[][] climate = arbitraryClimate(new SplittableRandom(seed));
    double[] rain = climate[0].clone();
    double[] pet = climate[1].clone();
    GrowingPeriod.lengthOfGrowingPeriodDays(climate[0], climate[1], 100);
    assertTrue(Arrays.equals(rain, climate[0]) && Arrays.equals(pet, climate[1]));
  }

  @Test
  void lengthOfGrowingPeriod_elevenMonths_throws() {
    assertThrows(IllegalArgumentException.class,
        () -> GrowingPeriod.lengthOfGrowingPeriodDays(new double[11], new double[12], 100));
  }

  @Test
  void lengthOfGrowingPeriod_negativeOrNaNMonth_throws() {
    double[] pet = petAt(5);
    double[] rain = new double[12];
    rain[4] = -1;
    assertThrows(IllegalArgumentException.class,
        () -> GrowingPeriod.lengthOfGrowingPeriodDays(rain, pet, 100));
    rain[4] = Double.NaN;
    assertThrows(IllegalArgumentException.class,
        () -> GrowingPeriod.lengthOfGrowingPeriodDays(rain, pet, 100));
  }

  @Test
  void lengthOfGrowingPeriod_nullArray_throws() {
    assertThrows(NullPointerException.class,
        () -> GrowingPeriod.lengthOfGrowingPeriodDays(null, petAt(5), 100));
  }
}
