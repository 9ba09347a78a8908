package veldplan.model;

import java.util.List;
import veldplan.model.climate.BaselineClimate;
import veldplan.model.climate.ClimatePathModel;
import veldplan.model.climate.Weather;
import veldplan.model.climate.WeatherGenerator;
import veldplan.shared.rng.Seeds;

/**
 * A park under a set of climate paths and stochastic replicates: the parameters, and the
 * policy-independent forcing of every (path, replicate), computed once and shared read-only by
 * every policy (common random numbers). Immutable after construction; thread-safe.
 *
 * <p>Seeds form a tree: scenario seed &rarr; path &rarr; replicate &rarr; one key per process
 * ({@link Seeds}). Adding replicates or paths leaves the others' random numbers unchanged.
 */
public final class Study {
  private final ModelParameters params;
  private final List<ClimatePathModel> paths;
  private final int replicates;
  private final long seed;
  private final Forcing[] forcing;
  private final Seasons seasons;
  private final java.util.concurrent.ConcurrentHashMap<Long, LaneForcing> laneForcing =
      new java.util.concurrent.ConcurrentHashMap<>();

  /**
   * Builds the forcing of every path and replicate.
   *
   * @param params             model parameters
   * @param baseline           observed monthly climate
   * @param paths              climate paths, each covering {@code params.years()} years
   * @param replicates         replicates per path
   * @param seed               the scenario seed
   * @param variabilityFactor  interannual rainfall variability factor (1 = as observed)
   * @param seasons            the park's seasons, from {@link ForcingBuilder#seasons}
   */
  public Study(ModelParameters params, BaselineClimate baseline, List<ClimatePathModel> paths,
      int replicates, long seed, double variabilityFactor, Seasons seasons) {
    if (replicates < 1) {
      throw new IllegalArgumentException("replicates must be >= 1: " + replicates);
    }
    this.params = params;
    this.paths = List.copyOf(paths);
    this.replicates = replicates;
    this.seed = seed;
    this.seasons = seasons;
    this.forcing = new Forcing[paths.size() * replicates];
    for (int path = 0; path < paths.size(); path++) {
      ClimatePathModel climate = paths.get(path);
      if (climate.years() != params.years()) {
        throw new IllegalArgumentException("climate path " + climate.name() + " covers "
            + climate.years() + " years, the horizon is " + params.years());
      }
      long pathSeed = Seeds.pathSeed(seed, climate.seedIndex());
      for (int replicate = 0; replicate < replicates; replicate++) {
        long[] keys = Seeds.processKeys(Seeds.replicateSeed(pathSeed, replicate));
        Weather weather = WeatherGenerator.generate(baseline, climate, variabilityFactor,
            keys[Seeds.Process.WEATHER.ordinal()], seasons.firstMonth());
        forcing[path * replicates + replicate] = ForcingBuilder.build(params, weather,
            seasons, keys[Seeds.Process.FIRE.ordinal()],
            keys[Seeds.Process.DEMOGRAPHY.ordinal()]);
      }
    }
  }

  /** Model parameters. */
  public ModelParameters parameters() {
    return params;
  }

  /** Climate paths in scenario order. */
  public List<ClimatePathModel> paths() {
    return paths;
  }

  /** The park's seasons: when the model year starts, when burns are lit. */
  public Seasons seasons() {
    return seasons;
  }

  /** Replicates per path. */
  public int replicates() {
    return replicates;
  }

  /** The scenario seed. */
  public long seed() {
    return seed;
  }

  /** The forcing of replicate {@code replicate} of path {@code path}. */
  public Forcing forcing(int path, int replicate) {
    return forcing[path * replicates + replicate];
  }

  /**
   * The forcing of replicates {@code first .. first + LANES - 1} of path {@code path} side by
   * side for the lockstep engine; lanes past the last replicate repeat it. Built once per
   * (path, first) and kept; the same whichever thread builds it.
   */
  LaneForcing laneForcing(int path, int first) {
    return laneForcing.computeIfAbsent((long) path * replicates + first, key -> {
      Forcing[] lanes = new Forcing[LaneState.LANES];
      for (int r = 0; r < lanes.length; r++) {
        lanes[r] = forcing(path, Math.min(first + r, replicates - 1));
      }
      return new LaneForcing(lanes);
    });
  }
}
