package veldplan.model.ecology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Tests for {@link ThornthwaiteMather}, the monthly bucket of methods.md §2.2. The storage values
 * are the sheet's arithmetic from the exponential retention function [D]; the rest are
 * properties of the bucket equations.
 */
class ThornthwaiteMatherTest {

  static LongStream seeds() {
    return LongStream.range(0, 100);
  }

  @Test
  void storageFromAccumulatedLoss_capacity100Loss100_is36point79() {
    // [D] methods §2.2: 100 exp(-1) = 36.79 mm. (The TM 1957 table entry, about 37 mm, is from
    // memory [M] and is not used as a check.)
    assertEquals(36.79, ThornthwaiteMather.storageFromAccumulatedLossMm(100, 100), 0.005);
  }

  @Test
  void storageFromAccumulatedLoss_capacity150Loss50_is107point48() {
    // [D] methods §2.2: 150 exp(-1/3) = 107.48 mm.
    assertEquals(107.48, ThornthwaiteMather.storageFromAccumulatedLossMm(150, 50), 0.005);
  }

  @Test
  void storageAfterMonth_dryMonthsFromFull_matchesAccumulatedLossForm() {
    // [D] methods §2.2: ST_{t-1} exp((P - PET)/STmax) month by month equals
    // STmax exp(-APWL/STmax) with APWL the running sum of PET - P.
    double capacity = 120;
    double storage = capacity;
    double accumulatedLoss = 0;
    double[][] months = {{10, 60}, {0, 90}, {25, 70}, {5, 110}};
    for (double[] month : months) {
      storage = ThornthwaiteMather.storageAfterMonth(capacity, storage, month[0], month[1]);
      accumulatedLoss += month[1] - month[0];
      assertEquals(ThornthwaiteMather.storageFromAccumulatedLossMm(capacity, accumulatedLoss),
          storage, 1e-12);
    }
  }

  @Test
  void storageAfterMonth_wetMonth_addsSurplusUpToCapacity() {
    // [D] wetting rule min(STmax, ST + P - PET), with the excess as surplus.
    assertEquals(70, ThornthwaiteMather.storageAfterMonth(100, 40, 110, 80), 1e-12);
    assertEquals(0, ThornthwaiteMather.surplusMm(100, 40, 110, 80), 1e-12);
    assertEquals(100, ThornthwaiteMather.storageAfterMonth(100, 90, 200, 80), 1e-12);
    assertEquals(110, ThornthwaiteMather.surplusMm(100, 90, 200, 80), 1e-12);
    assertEquals(80, ThornthwaiteMather.actualEvapotranspirationMm(90, 100, 200, 80), 0);
  }

  @Test
  void actualEvapotranspiration_dryMonth_isRainPlusWaterDrawn() {
    // [D] AET = P + (ST' - ST) when P < PET, and no surplus.
    double after = ThornthwaiteMather.storageAfterMonth(100, 80, 20, 120);
    assertEquals(80 * Math.exp(-1), after, 1e-12);
    assertEquals(20 + 80 - after, ThornthwaiteMather.actualEvapotranspirationMm(80, after, 20, 120),
        1e-12);
    assertEquals(0, ThornthwaiteMather.surplusMm(100, 80, 20, 120), 0);
  }

  @ParameterizedTest
  @MethodSource("seeds")
  void bucket_anyYearOfMonths_conservesWater(long seed) {
    // Consistency check, not a reference value: the months are arbitrary draws, not data.
    // Over any sequence, ΣP = ΣAET + Σsurplus + ΔST (methods §2.2) to 1e-9.
    SplittableRandom random = new SplittableRandom(seed);
    double capacity = 20 + 200 * random.nextDouble();
    double start = capacity * random.nextDouble();
    double storage = start;
    double rain = 0;
    double aet = 0;
    double surplus = 0;
    for (int month = 0; month < 12; month++) {
      double p = random.nextDouble() < 0.3 ? 0 : 250 * random.nextDouble();
      double pet = 40 + 160 * random.nextDouble();
      double after = ThornthwaiteMather.storageAfterMonth(capacity, storage, p, pet);
      double monthAet = ThornthwaiteMather.actualEvapotranspirationMm(storage, after, p, pet);
      surplus += ThornthwaiteMather.surplusMm(capacity, storage, p, pet);
      // [D] 0 <= AET <= PET and 0 <= ST <= STmax in every month.
      assertTrue(monthAet >= 0 && monthAet <= pet + 1e-12, "AET " + monthAet + " PET " + pet);
      assertTrue(after >= 0 && after <= capacity, "storage " + after);
      aet += monthAet;
      rain += p;
      storage = after;
    }
    assertEquals(rain, aet + surplus + (storage - start), 1e-9);
  }

  @Test
  void storageAfterMonth_storageAboveCapacity_throws() {
    assertThrows(IllegalArgumentException.class,
        () -> ThornthwaiteMather.storageAfterMonth(100, 101, 50, 50));
  }

  @Test
  void storageAfterMonth_zeroCapacity_throws() {
    assertThrows(IllegalArgumentException.class,
        () -> ThornthwaiteMather.storageAfterMonth(0, 0, 50, 50));
  }

  @Test
  void actualEvapotranspiration_negativePet_throws() {
    assertThrows(IllegalArgumentException.class,
        () -> ThornthwaiteMather.actualEvapotranspirationMm(10, 10, 50, -1));
  }
}
