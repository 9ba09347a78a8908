package veldplan.objectives;

import java.util.Arrays;
import veldplan.shared.scenario.OverPaths;

/**
 * Aggregation step 2: the per-path estimates of one objective to one value.
 *
 * <ul>
 *   <li>{@code MEAN}: every path counts the same;</li>
 *   <li>{@code WORST}: the path that is worst for this objective (lowest for a quantity to
 *       maximise, highest for one to minimise);</li>
 *   <li>{@code PERCENTILE q}: the q-th percentile counted from the better side, i.e. q = 100 is
 *       the worst path and q = 50 the median path, with linear interpolation between the sorted
 *       path values (the "type 7" rule of Hyndman &amp; Fan 1996).</li>
 * </ul>
 * The interval ends are aggregated the same way as the values. For {@code WORST} that is the
 * worst path's own interval; for the mean it is the mean of the ends, which is wider than the
 * interval of the pooled mean (cautious).
 *
 * @param kind       the rule
 * @param percentile for {@code PERCENTILE}: q in [0, 100]; ignored otherwise
 */
public record PathStep(OverPaths kind, double percentile) {

  public PathStep {
    if (kind == OverPaths.PERCENTILE && !(percentile >= 0 && percentile <= 100)) {
      throw new IllegalArgumentException("percentile not in [0, 100]: " + percentile);
    }
  }

  /** The mean over paths. */
  public static final PathStep MEAN = new PathStep(OverPaths.MEAN, Double.NaN);
  /** The worst path. */
  public static final PathStep WORST = new PathStep(OverPaths.WORST, Double.NaN);

  /** One estimate from the per-path estimates of an objective with this direction. */
  public Estimate combine(Estimate[] perPath, Direction direction) {
    int n = 0;
    double[] values = new double[perPath.length];
    double[] lower = new double[perPath.length];
    double[] upper = new double[perPath.length];
    for (int i = 0; i < perPath.length; i++) {
      values[i] = perPath[i].value();
      lower[i] = perPath[i].lower();
      upper[i] = perPath[i].upper();
      n += perPath[i].n();
    }
    return new Estimate(combine(values, direction), combine(lower, direction),
        combine(upper, direction), n);
  }

  /** One value from the per-path values of an objective with this direction. */
  public double combine(double[] perPath, Direction direction) {
    if (perPath.length == 0) {
      throw new IllegalArgumentException("no paths");
    }
    switch (kind) {
      case MEAN: {
        double sum = 0;
        for (double v : perPath) {
          sum += v;
        }
        return sum / perPath.length;
      }
      case WORST: {
        double worst = perPath[0];
        for (double v : perPath) {
          worst = direction.worse(worst, v);
        }
        return worst;
      }
      default: {
        double[] sorted = perPath.clone();
        Arrays.sort(sorted);
        // Sorted from better to worse: descending for a maximised quantity.
        if (direction == Direction.MAXIMISE) {
          for (int i = 0, j = sorted.length - 1; i < j; i++, j--) {
            double t = sorted[i];
            sorted[i] = sorted[j];
            sorted[j] = t;
          }
        }
        double h = (sorted.length - 1) * percentile / 100.0;
        int lo = (int) Math.floor(h);
        int hi = Math.min(lo + 1, sorted.length - 1);
        return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
      }
    }
  }

  /** How the rule is written in reports: "mean", "worst path", "90th percentile". */
  public String describe() {
    switch (kind) {
      case MEAN:
        return "mean over paths";
      case WORST:
        return "worst path";
      default:
        return ordinal(percentile) + " percentile of paths (worse side)";
    }
  }

  private static String ordinal(double q) {
    if (q != Math.rint(q)) {
      return q + "th";
    }
    int n = (int) q;
    String suffix = (n % 100 >= 11 && n % 100 <= 13) ? "th"
        : n % 10 == 1 ? "st" : n % 10 == 2 ? "nd" : n % 10 == 3 ? "rd" : "th";
    return n + suffix;
  }
}
