package veldplan.model;

import static veldplan.model.LaneState.LANES;

/**
 * The forcing of {@link LaneState#LANES} replicates side by side, lane-innermost (entry i of
 * lane r at {@code i * LANES + r}): only the series the yearly processes read. Built once per
 * batch of replicates and shared by every policy run on it, like {@link Forcing} itself.
 */
final class LaneForcing {
  final int years;
  final int blocks;
  final int noiseSlots;
  /** The replicates' own forcing, lane by lane (for recording trajectories). */
  final Forcing[] replicates;

  final double[] aetMm;
  final double[] grassPotentialKgPerHa;
  final double[] treeGrowthIndex;
  final double[] humidityTermEarly;
  final double[] humidityTermLate;
  final double[] curedSeasonFactor;
  final double[] ignitionDraw;
  final double[] ignitionLitAbove;
  final double[] ignitionUnlitBelow;
  final double[] extentDraw;
  final double[] demographicNoise;
  final double[] moistureTermEarly = new double[LANES];
  final double[] moistureTermLate = new double[LANES];

  /**
   * @param replicates exactly {@link LaneState#LANES} forcings of the same park and horizon
   * @throws IllegalArgumentException if there are not {@code LANES} of them or they differ in shape
   */
  LaneForcing(Forcing... replicates) {
    if (replicates.length != LANES) {
      throw new IllegalArgumentException(
          replicates.length + " forcings for " + LANES + " lanes");
    }
    Forcing first = replicates[0];
    for (Forcing f : replicates) {
      if (f.years != first.years || f.blocks != first.blocks
          || f.noiseSlots != first.noiseSlots) {
        throw new IllegalArgumentException("forcings of different shapes in one batch");
      }
    }
    this.replicates = replicates.clone();
    years = first.years;
    blocks = first.blocks;
    noiseSlots = first.noiseSlots;
    aetMm = transpose(f -> f.aetMm);
    grassPotentialKgPerHa = transpose(f -> f.grassPotentialKgPerHa);
    treeGrowthIndex = transpose(f -> f.treeGrowthIndex);
    humidityTermEarly = transpose(f -> f.humidityTermEarly);
    humidityTermLate = transpose(f -> f.humidityTermLate);
    curedSeasonFactor = transpose(f -> f.curedSeasonFactor);
    ignitionDraw = transpose(f -> f.ignitionDraw);
    ignitionLitAbove = transpose(f -> f.ignitionLitAbove);
    ignitionUnlitBelow = transpose(f -> f.ignitionUnlitBelow);
    extentDraw = transpose(f -> f.extentDraw);
    demographicNoise = transpose(f -> f.demographicNoise);
    for (int r = 0; r < LANES; r++) {
      moistureTermEarly[r] = replicates[r].moistureTermEarly;
      moistureTermLate[r] = replicates[r].moistureTermLate;
    }
  }

  private double[] transpose(java.util.function.Function<Forcing, double[]> series) {
    int n = series.apply(replicates[0]).length;
    double[] out = new double[n * LANES];
    for (int r = 0; r < LANES; r++) {
      double[] from = series.apply(replicates[r]);
      for (int i = 0; i < n; i++) {
        out[i * LANES + r] = from[i];
      }
    }
    return out;
  }
}
