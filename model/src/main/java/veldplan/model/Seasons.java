package veldplan.model;

import java.util.Locale;

/**
 * The park's seasons, from its baseline climatology: when the model year starts and in which
 * months early and late dry-season burns are lit. Months are calendar months, 0 = January.
 *
 * <p>The model year is a hydrological year: it starts with the first month of the rains, the
 * month after the late-dry burning month, so that a year's rain makes that year's grass, which
 * then cures and burns in the same year's dry season.
 *
 * @param firstMonth          calendar month in which the model year starts
 * @param earlyBurnMonth      calendar month of early-dry-season burns
 * @param lateBurnMonth       calendar month of late-dry-season burns
 * @param curedMonthsEarly    months since the growing season ended, at the early burn
 * @param curedMonthsLate     months since the growing season ended, at the late burn
 */
public record Seasons(int firstMonth, int earlyBurnMonth, int lateBurnMonth,
    int curedMonthsEarly, int curedMonthsLate) {

  private static final String[] MONTHS = {"January", "February", "March", "April", "May", "June",
      "July", "August", "September", "October", "November", "December"};

  public Seasons {
    for (int month : new int[] {firstMonth, earlyBurnMonth, lateBurnMonth}) {
      if (month < 0 || month > 11) {
        throw new IllegalArgumentException("month must be 0..11: " + month);
      }
    }
  }

  /** Position of calendar month {@code month0} within the model year (0 = first month). */
  public int indexInYear(int month0) {
    return Math.floorMod(month0 - firstMonth, 12);
  }

  /** Calendar month of position {@code index} within the model year. */
  public int calendarMonth(int index) {
    return (firstMonth + index) % 12;
  }

  /** English name of a calendar month, for reports. */
  public static String monthName(int month0) {
    return MONTHS[month0];
  }

  @Override
  public String toString() {
    return String.format(Locale.ROOT, "year from %s, early burns in %s, late burns in %s",
        MONTHS[firstMonth], MONTHS[earlyBurnMonth], MONTHS[lateBurnMonth]);
  }
}
