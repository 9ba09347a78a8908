package veldplan.model.ecology;

/**
 * Present value of management costs with a constant discount rate, costs falling at the end of
 * each year (standard financial arithmetic, common practice, no source):
 *
 * <pre>
 *   PV      = Σ_{t=1..T} C_t / (1 + i)^t
 *   annuity = C (1 − (1 + i)^−T) / i        constant cost C in each of years 1..T
 * </pre>
 *
 * <p>i is the discount rate per year as a fraction (0.05 for 5 %). It is a user parameter; a
 * report should show results at several rates (for example 3 %, 5 % and 8 %).
 */
public final class Discounting {
  private Discounting() {}

  /**
   * Present value of one cost paid at the end of year t, C / (1 + i)^t.
   *
   * @param cost          cost C (any currency), finite
   * @param ratePerYear   discount rate i (fraction per year), &gt; −1
   * @param yearsFromNow  t, years from now to the payment, &ge; 0
   * @return present value (currency of C)
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double presentValue(double cost, double ratePerYear, int yearsFromNow) {
    Arguments.finite(cost, "cost");
    checkRate(ratePerYear);
    Arguments.nonNegative(yearsFromNow, "yearsFromNow");
    return cost / Math.pow(1 + ratePerYear, yearsFromNow);
  }

  /**
   * Present value of a constant cost paid at the end of each of years 1..T,
   * C (1 − (1 + i)^−T) / i, and C T when i = 0.
   *
   * @param cost        cost per year C (any currency), finite
   * @param ratePerYear discount rate i (fraction per year), &gt; −1
   * @param years       T, number of years, &ge; 0
   * @return present value (currency of C)
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double annuity(double cost, double ratePerYear, int years) {
    Arguments.finite(cost, "cost");
    checkRate(ratePerYear);
    Arguments.nonNegative(years, "years");
    if (ratePerYear == 0) {
      return cost * years;
    }
    return cost * (1 - Math.pow(1 + ratePerYear, -years)) / ratePerYear;
  }

  /**
   * Present value of a series of costs, Σ_{t=1..T} C_t / (1 + i)^t, where
   * {@code costs[t - 1]} is paid at the end of year t. Allocates nothing.
   *
   * @param costs       costs C_1..C_T (any currency), each finite; may be empty
   * @param ratePerYear discount rate i (fraction per year), &gt; −1
   * @return present value (currency of the costs)
   * @throws IllegalArgumentException if an argument is out of range
   * @throws NullPointerException     if {@code costs} is null
   */
  public static double presentValueOfSeries(double[] costs, double ratePerYear) {
    checkRate(ratePerYear);
    double discount = 1 / (1 + ratePerYear);
    double factor = 1;
    double sum = 0;
    for (int year = 1; year <= costs.length; year++) {
      double cost = costs[year - 1];
      if (!(Math.abs(cost) <= Double.MAX_VALUE)) {
        throw new IllegalArgumentException("costs[" + (year - 1) + "] is not finite: " + cost);
      }
      factor *= discount;
      sum += cost * factor;
    }
    return sum;
  }

  private static void checkRate(double ratePerYear) {
    if (!(ratePerYear > -1 && ratePerYear <= Double.MAX_VALUE)) {
      throw new IllegalArgumentException(
          "ratePerYear is not a finite value > -1: " + ratePerYear);
    }
  }
}
