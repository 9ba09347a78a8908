package veldplan.shared.scenario;

import com.fasterxml.jackson.annotation.JsonProperty;

/**
 * The second aggregation step of every objective: how the values of the climate paths (each
 * already aggregated over its replicates) make one value.
 */
public enum OverPaths {
  /** The mean over paths: every path counts the same. */
  @JsonProperty("mean") MEAN,
  /** The worst path for this objective: lowest for a quantity to maximise, highest for one to
   * minimise. */
  @JsonProperty("worst") WORST,
  /** A stated percentile on the worse side ({@code pathPercentile}): 100 = worst, 50 = median. */
  @JsonProperty("percentile") PERCENTILE
}
