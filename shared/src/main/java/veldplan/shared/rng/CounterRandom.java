package veldplan.shared.rng;

/**
 * Counter-based random numbers: every draw is a pure function of (stream key, year, index).
 *
 * <p>Why counters instead of a stateful generator: a draw never depends on how many draws came
 * before it, so (1) two policies evaluated on the same replicate see exactly the same random
 * numbers for the same year and block even when their states differ (common random numbers hold
 * draw by draw, not just at the start), (2) the result cannot depend on thread scheduling, and
 * (3) nothing is allocated.
 *
 * <p>The mixing function is the 64-bit finaliser "Mix13" of David Stafford (2011), the one used
 * by {@link java.util.SplittableRandom}; the counter is spaced by the golden-ratio increment as
 * in SplitMix64 (Steele, Lea &amp; Flood 2014, "Fast splittable pseudorandom number generators",
 * OOPSLA). Pinned by {@code CounterRandomTest}; do not change it.
 */
public final class CounterRandom {
  private static final long GOLDEN_GAMMA = 0x9e3779b97f4a7c15L;
  private static final double DOUBLE_UNIT = 0x1.0p-53;

  private CounterRandom() {}

  /** Stafford's Mix13 finaliser. */
  static long mix64(long z) {
    z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
    z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
    return z ^ (z >>> 31);
  }

  /**
   * A uniform double in [0, 1) for draw {@code index} in {@code year} of the stream {@code key}.
   *
   * @param key   a process key from {@link Seeds#processKey}
   * @param year  model year (0-based), &lt; 2^31
   * @param index the draw within the year, &lt; 2^24 (e.g. block * 8 + purpose)
   */
  public static double uniform(long key, int year, int index) {
    long counter = ((long) year << 24) ^ (index & 0xFFFFFFL);
    long bits = mix64(key + (counter + 1) * GOLDEN_GAMMA);
    return (bits >>> 11) * DOUBLE_UNIT;
  }

  /** A uniform double in (0, 1): never exactly 0, for inverse-CDF sampling. */
  public static double openUniform(long key, int year, int index) {
    long counter = ((long) year << 24) ^ (index & 0xFFFFFFL);
    long bits = mix64(key + (counter + 1) * GOLDEN_GAMMA);
    return ((bits >>> 12) + 0.5) * 0x1.0p-52;
  }
}
