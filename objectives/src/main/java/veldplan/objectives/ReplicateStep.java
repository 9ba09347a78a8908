package veldplan.objectives;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.interval.ConfidenceInterval;
import org.apache.commons.math3.stat.interval.WilsonScoreInterval;

/**
 * Aggregation step 1: the runs of one climate path (its replicates) to one estimate.
 */
public enum ReplicateStep {
  /**
   * Share of runs with statistic 1 (each run scores 0 or 1), with the Wilson (1927) score
   * interval, which Brown, Cai &amp; DasGupta (2001) recommend over the Wald interval for the
   * small numbers of replicates used here.
   */
  PROBABILITY,
  /** Mean of the runs, with the Student-t interval of the mean. */
  MEAN;

  /** Confidence level of every interval. */
  public static final double CONFIDENCE = 0.95;

  /** The estimate from one path's runs. */
  public Estimate summarise(double[] runs) {
    return summarise(runs, 0, runs.length);
  }

  /** The estimate from {@code runs[from, from + n)}. */
  public Estimate summarise(double[] runs, int from, int n) {
    if (n < 1) {
      throw new IllegalArgumentException("no runs to summarise");
    }
    if (this == PROBABILITY) {
      int successes = 0;
      for (int i = from; i < from + n; i++) {
        if (runs[i] != 0 && runs[i] != 1) {
          throw new IllegalArgumentException("a probability needs 0/1 runs, found " + runs[i]);
        }
        successes += (int) runs[i];
      }
      ConfidenceInterval ci = new WilsonScoreInterval().createInterval(n, successes, CONFIDENCE);
      return new Estimate(successes / (double) n, Math.max(0, ci.getLowerBound()),
          Math.min(1, ci.getUpperBound()), n);
    }
    double mean = 0;
    for (int i = from; i < from + n; i++) {
      mean += runs[i];
    }
    mean /= n;
    if (n < 2) {
      return new Estimate(mean, Double.NaN, Double.NaN, n);
    }
    double ss = 0;
    for (int i = from; i < from + n; i++) {
      double d = runs[i] - mean;
      ss += d * d;
    }
    double se = Math.sqrt(ss / (n - 1) / n);
    double t = new TDistribution(null, n - 1)
        .inverseCumulativeProbability(0.5 + CONFIDENCE / 2);
    return new Estimate(mean, mean - t * se, mean + t * se, n);
  }
}
