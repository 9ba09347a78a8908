package veldplan.shared.rng;

import java.util.SplittableRandom;

/**
 * Derives every random stream of a study from the one scenario seed, as a tree:
 * scenario seed &rarr; climate path &rarr; replicate &rarr; one key per process.
 *
 * <p>Each level draws its children in order from a {@link SplittableRandom} seeded by the parent,
 * so adding replicates or paths leaves the seeds of the existing ones unchanged, and no two
 * streams are derived by adding small integers to a seed. The derivation is pinned by
 * {@code SeedsTest}; changing it changes every published result, so do not.
 */
public final class Seeds {
  /** Process streams inside one replicate, in derivation order. Never reorder. */
  public enum Process {
    /** Resampling of baseline weather years. */
    WEATHER,
    /** Unplanned ignitions and burn spread. */
    FIRE,
    /** Environmental noise in animal numbers. */
    DEMOGRAPHY
  }

  private static final Process[] PROCESSES = Process.values();

  private Seeds() {}

  /** Seed of climate path {@code path} (0-based) under the scenario seed. */
  public static long pathSeed(long scenarioSeed, int path) {
    return child(scenarioSeed, path);
  }

  /** Seed of replicate {@code replicate} (0-based) of a path. */
  public static long replicateSeed(long pathSeed, int replicate) {
    return child(pathSeed, replicate);
  }

  /** Key of one process stream of a replicate, for {@link CounterRandom}. */
  public static long processKey(long replicateSeed, Process process) {
    return child(replicateSeed, process.ordinal());
  }

  /** The {@code index}-th (0-based) long drawn from a SplittableRandom seeded by the parent. */
  private static long child(long parentSeed, int index) {
    if (index < 0) {
      throw new IllegalArgumentException("index must be >= 0: " + index);
    }
    SplittableRandom parent = new SplittableRandom(parentSeed);
    long seed = 0;
    for (int i = 0; i <= index; i++) {
      seed = parent.nextLong();
    }
    return seed;
  }

  /** All process keys of a replicate, indexed by {@link Process#ordinal()}. */
  public static long[] processKeys(long replicateSeed) {
    long[] keys = new long[PROCESSES.length];
    SplittableRandom replicate = new SplittableRandom(replicateSeed);
    for (int i = 0; i < keys.length; i++) {
      keys[i] = replicate.nextLong();
    }
    return keys;
  }
}
