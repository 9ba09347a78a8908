package veldplan.shared.scenario;

import java.util.List;

/**
 * How the {@code optimise} command searches policies for this scenario: the objectives, how
 * each is aggregated over climate paths, the thresholds a policy must meet, the levers and their
 * bounds, and the size of the search.
 *
 * <p>Every objective is computed in two named steps: first over the replicates of one climate
 * path (a probability for the persistence measures, a mean for the others, each with a 95 %
 * interval), then over the paths as {@code overPaths} says.
 *
 * @param objectives            what to trade off (one to four)
 * @param overPaths             how path values combine into one
 * @param pathPercentile        with {@code overPaths: percentile}: the percentile on the worse
 *                              side (100 = the worst path, 50 = the median path)
 * @param constraints           thresholds a policy must meet (may be empty)
 * @param largeTreeTargetPerHa  trees above 5 m per ha the park should keep, area-weighted; needed
 *                              by {@code large-tree-target-met}
 * @param elephantBandPerKm2    density band for {@code elephants-in-band}
 * @param levers                the levers searched and their bounds
 * @param search                size of the search
 */
public record Optimisation(
    List<ObjectiveChoice> objectives,
    OverPaths overPaths,
    @Optional @Range(min = 0, max = 100, unit = "percentile, worse side") Double pathPercentile,
    List<Threshold> constraints,
    @Optional @Range(min = 0, max = 10000, unit = "trees/ha") Double largeTreeTargetPerHa,
    @Optional ElephantBand elephantBandPerKm2,
    Levers levers,
    SearchSettings search) {

  public Optimisation {
    objectives = List.copyOf(objectives);
    constraints = List.copyOf(constraints);
  }

  /** The same with other search settings (command-line overrides). */
  public Optimisation withSearch(SearchSettings other) {
    return new Optimisation(objectives, overPaths, pathPercentile, constraints,
        largeTreeTargetPerHa, elephantBandPerKm2, levers, other);
  }

  /** The same with another path aggregation (command-line override). */
  public Optimisation withOverPaths(OverPaths aggregation, Double percentile) {
    return new Optimisation(objectives, aggregation, percentile, constraints,
        largeTreeTargetPerHa, elephantBandPerKm2, levers, search);
  }
}
