package veldplan.optimiser.park;

import java.util.List;
import veldplan.objectives.Estimate;
import veldplan.objectives.Objective;

/**
 * A threshold on one measure: its value must lie in [atLeast, atMost] (either end may be
 * infinite).
 *
 * @param measure index of the measure in the evaluator's list
 * @param atLeast smallest acceptable value, -infinity if none
 * @param atMost  largest acceptable value, +infinity if none
 */
public record Limit(int measure, double atLeast, double atMost) {

  /**
   * Sum of normalised violations of the limits by a score (0 = meets every limit): "at least L"
   * adds max(0, L - v) / |worst - best|, "at most U" adds max(0, v - U) / |worst - best|, with
   * the measure's fixed normalisation bounds (constrained domination, Deb et al. 2002, uses
   * this sum).
   *
   * @param values   one value per measure
   * @param limits   the limits
   * @param measures the measures
   */
  public static double violation(double[] values, List<Limit> limits, List<Objective> measures) {
    double violation = 0;
    for (Limit limit : limits) {
      Objective o = measures.get(limit.measure());
      double v = values[limit.measure()];
      double scale = Math.abs(o.worst() - o.best());
      if (v < limit.atLeast()) {
        violation += (limit.atLeast() - v) / scale;
      }
      if (v > limit.atMost()) {
        violation += (v - limit.atMost()) / scale;
      }
    }
    return violation;
  }

  /** The estimates' values, one per measure. */
  public static double[] values(Estimate[] estimates) {
    double[] v = new double[estimates.length];
    for (int i = 0; i < v.length; i++) {
      v[i] = estimates[i].value();
    }
    return v;
  }

  /** The cautious ends of the estimates' intervals (the value where there is no interval). */
  public static double[] cautious(Estimate[] estimates, List<Objective> measures) {
    double[] v = new double[estimates.length];
    for (int i = 0; i < v.length; i++) {
      double c = estimates[i].cautious(measures.get(i).direction());
      v[i] = Double.isNaN(c) ? estimates[i].value() : c;
    }
    return v;
  }
}
