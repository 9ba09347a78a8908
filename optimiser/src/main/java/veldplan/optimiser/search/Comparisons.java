package veldplan.optimiser.search;

import org.apache.commons.math3.stat.inference.MannWhitneyUTest;

/**
 * Statistics for comparing optimiser configurations over seeds (decision-methods §3.7): the
 * Vargha &amp; Delaney (2000) effect size A12 and the Mann-Whitney U test (Mann &amp; Whitney
 * 1947), two-sided, with the normal approximation of Apache Commons Math.
 */
public final class Comparisons {
  private Comparisons() {}

  /**
   * A12 = P(X &gt; Y) + 0.5 P(X = Y) over all pairs: 0.5 means no tendency, above 0.5 that X
   * tends to be larger.
   */
  public static double a12(double[] x, double[] y) {
    if (x.length == 0 || y.length == 0) {
      throw new IllegalArgumentException("both samples need at least one value");
    }
    double wins = 0;
    for (double a : x) {
      for (double b : y) {
        wins += a > b ? 1 : a == b ? 0.5 : 0;
      }
    }
    return wins / ((double) x.length * y.length);
  }

  /** The Mann-Whitney U statistic of X: the number of pairs with X larger, ties counting half. */
  public static double mannWhitneyU(double[] x, double[] y) {
    return a12(x, y) * x.length * y.length;
  }

  /** Two-sided p-value of the Mann-Whitney U test (normal approximation). */
  public static double mannWhitneyP(double[] x, double[] y) {
    return new MannWhitneyUTest().mannWhitneyUTest(x, y);
  }
}
