package veldplan.model.ecology;

/**
 * Length of growing period (LGP) after the FAO Agro-ecological Zones project [1], computed from
 * monthly precipitation and potential evapotranspiration.
 *
 * <p><b>The FAO definition</b> [1]: LGP is the number of days in the year when precipitation
 * exceeds half the potential evapotranspiration, plus the days needed to evapotranspire an
 * assumed 100 mm of water stored in the soil profile from excess precipitation (less if less was
 * stored). The period begins when P rises to 0.5 PET; the humid period, P &gt; PET, refills the
 * soil; the period ends when P falls below 0.5 PET plus the time needed to use up the stored water.
 *
 * <p><b>Our monthly implementation</b> (the choices are ours; FAO interpolated monthly data to
 * days):
 * <ol>
 *   <li>A month counts fully as growing when P &ge; 0.5 PET. No temperature criterion is applied
 *       (FAO used one for cold climates; it does not bind in lowland savanna). A month with
 *       P = PET = 0 therefore counts as growing.</li>
 *   <li>One bucket of capacity {@code reserveCapMm} (100 mm in [1]) carries the stored water from
 *       month to month: S ← min(cap, max(0, S + P − PET)). It fills in humid months, and it is
 *       drawn down at PET − P wherever P &lt; PET, that is in growing months with
 *       0.5 PET &le; P &lt; PET (the plants use the stored water there too) and in dry months.</li>
 *   <li>A dry month (P &lt; 0.5 PET) adds the days the water stored at its start lasts at its daily
 *       deficit, {@link #reserveDays}, capped at the month's length. What is left spills into the
 *       following dry months, so the reserve after the last growing month of a run may extend the
 *       period over more than one month. Storage is never positive in a dry month unless it comes
 *       from the preceding growing run, because storage only falls in dry months.</li>
 *   <li>The year is treated as cyclic, so a wet season spanning December–January counts in full,
 *       and the storage on 1 January is the periodic steady state of the bucket. Each monthly
 *       update is x ↦ clamp(x + P − PET, 0, cap), and a composition of such maps is again of the
 *       form x ↦ clamp(x + c, lo, hi) with c = Σ(P − PET). Its fixed point is hi when c &gt; 0,
 *       reached by one pass started full, and lo when c &lt; 0, reached by one pass started
 *       empty. When c = 0 every value in [lo, hi] is periodic and we take the smallest. So the
 *       computation is exactly two passes over the twelve months: one to find the storage on
 *       1 January, one to count the days.</li>
 *   <li>The year has 365 days (February has 28).</li>
 * </ol>
 *
 * <p>References:
 * <ol>
 *   <li>FAO (1978). Report on the Agro-ecological Zones Project. Vol. 1: Methodology and results
 *       for Africa. World Soil Resources Report 48/1. FAO, Rome.</li>
 * </ol>
 */
public final class GrowingPeriod {
  /** Water stored in the soil profile that can extend the growing period, 100 mm [1]. */
  public static final double FAO_RESERVE_CAP_MM = 100;

  /** A month is part of the growing period when P &ge; this fraction of PET [1]. */
  public static final double GROWING_FRACTION_OF_PET = 0.5;

  /** Months in a year; the monthly arrays have this length, January first. */
  public static final int MONTHS = 12;

  /** Days in each month of a 365-day year, January first. */
  private static final int[] DAYS_IN_MONTH = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};

  private GrowingPeriod() {}

  /**
   * Days for which stored water lasts at a constant daily deficit, S / (PET − P): the reserve
   * period after the end of the rains [1]. Returns {@link Double#POSITIVE_INFINITY} when there is
   * no deficit (P &ge; PET), since the store is then never drawn down; callers cap the result at
   * the length of the month.
   *
   * @param storedMm              stored plant-available water S (mm), &ge; 0 (at most 100 mm in
   *                              [1]; not capped here)
   * @param precipitationMmPerDay precipitation P (mm/day), &ge; 0
   * @param petMmPerDay           potential evapotranspiration PET (mm/day), &ge; 0
   * @return days (may be infinite), &ge; 0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double reserveDays(double storedMm, double precipitationMmPerDay,
      double petMmPerDay) {
    Arguments.nonNegative(storedMm, "storedMm");
    Arguments.nonNegative(precipitationMmPerDay, "precipitationMmPerDay");
    Arguments.nonNegative(petMmPerDay, "petMmPerDay");
    double deficit = petMmPerDay - precipitationMmPerDay;
    if (!(deficit > 0)) {
      return Double.POSITIVE_INFINITY;
    }
    return storedMm / deficit;
  }

  /**
   * Length of growing period of one year from monthly totals, as described in the class comment.
   * Allocates nothing.
   *
   * @param monthlyPrecipitationMm precipitation of each month, January first (mm/month), 12
   *                               finite values &ge; 0
   * @param monthlyPetMm           potential evapotranspiration of each month, January first
   *                               (mm/month), 12 finite values &ge; 0
   * @param reserveCapMm           most water the soil can store for the reserve period (mm),
   *                               &ge; 0; {@link #FAO_RESERVE_CAP_MM} in [1]
   * @return LGP (days), in [0, 365]
   * @throws IllegalArgumentException if an argument is out of range
   * @throws NullPointerException     if an array is null
   */
  public static double lengthOfGrowingPeriodDays(double[] monthlyPrecipitationMm,
      double[] monthlyPetMm, double reserveCapMm) {
    Arguments.length(monthlyPrecipitationMm, MONTHS, "monthlyPrecipitationMm");
    Arguments.length(monthlyPetMm, MONTHS, "monthlyPetMm");
    Arguments.nonNegative(reserveCapMm, "reserveCapMm");
    double annualNet = 0;
    for (int month = 0; month < MONTHS; month++) {
      checkMonth(monthlyPrecipitationMm, month, "monthlyPrecipitationMm");
      checkMonth(monthlyPetMm, month, "monthlyPetMm");
      annualNet += monthlyPrecipitationMm[month] - monthlyPetMm[month];
    }

    // Pass 1: the periodic storage on 1 January (class comment, item 4).
    double storage = annualNet > 0 ? reserveCapMm : 0;
    for (int month = 0; month < MONTHS; month++) {
      storage = nextStorage(storage, monthlyPrecipitationMm[month], monthlyPetMm[month],
          reserveCapMm);
    }

    // Pass 2: count growing days, with the reserve spilling into dry months.
    double days = 0;
    for (int month = 0; month < MONTHS; month++) {
      double p = monthlyPrecipitationMm[month];
      double pet = monthlyPetMm[month];
      int length = DAYS_IN_MONTH[month];
      if (p >= GROWING_FRACTION_OF_PET * pet) {
        days += length;
      } else {
        days += Math.min(length, reserveDays(storage, p / length, pet / length));
      }
      storage = nextStorage(storage, p, pet, reserveCapMm);
    }
    return days;
  }

  private static void checkMonth(double[] values, int month, String name) {
    double value = values[month];
    if (!(value >= 0 && value <= Double.MAX_VALUE)) {
      throw new IllegalArgumentException(
          name + "[" + month + "] is not a finite value >= 0: " + value);
    }
  }

  private static double nextStorage(double storage, double p, double pet, double cap) {
    return Math.min(cap, Math.max(0, storage + p - pet));
  }
}
