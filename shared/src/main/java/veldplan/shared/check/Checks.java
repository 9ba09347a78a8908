package veldplan.shared.check;

/**
 * Argument checks for programming errors (HOUSE-STYLE 2.9). Each returns the value, so a compact
 * constructor can check and assign in one line, and throws {@link IllegalArgumentException}
 * with the argument's name and value otherwise.
 *
 * <p>Every test is written so that NaN fails it ({@code !(x >= 0)} rather than {@code x < 0}).
 * The {@code double} checks other than {@link #inRange(double, double, double, String)} also
 * reject infinities: a model parameter is always a finite number.
 *
 * <p>User errors in scenario files are not checked here; they are reported with their place in
 * the file by {@code veldplan.shared.scenario.ScenarioReader}.
 */
public final class Checks {

  private Checks() {}

  /** Returns {@code value} if it is a probability in [0, 1]. */
  public static double probability(double value, String name) {
    if (!(value >= 0 && value <= 1)) {
      throw new IllegalArgumentException(name + " is not a probability in [0, 1]: " + value);
    }
    return value;
  }

  /** Returns {@code value} if it is a finite number &gt;= 0. */
  public static double nonNegative(double value, String name) {
    if (!(value >= 0 && value < Double.POSITIVE_INFINITY)) {
      throw new IllegalArgumentException(name + " is not a finite number >= 0: " + value);
    }
    return value;
  }

  /** Returns {@code value} if it is &gt;= 0. */
  public static int nonNegative(int value, String name) {
    if (value < 0) {
      throw new IllegalArgumentException(name + " is not >= 0: " + value);
    }
    return value;
  }

  /** Returns {@code value} if it is a finite number &gt; 0. */
  public static double strictlyPositive(double value, String name) {
    if (!(value > 0 && value < Double.POSITIVE_INFINITY)) {
      throw new IllegalArgumentException(name + " is not a finite number > 0: " + value);
    }
    return value;
  }

  /** Returns {@code value} if it is &gt; 0. */
  public static int strictlyPositive(int value, String name) {
    if (value <= 0) {
      throw new IllegalArgumentException(name + " is not > 0: " + value);
    }
    return value;
  }

  /** Returns {@code value} if it is finite (neither NaN nor infinite). */
  public static double finite(double value, String name) {
    if (!Double.isFinite(value)) {
      throw new IllegalArgumentException(name + " is not a finite number: " + value);
    }
    return value;
  }

  /**
   * Returns {@code value} if {@code min <= value <= max}. Infinite bounds are allowed, so
   * {@code inRange(x, 0, Double.POSITIVE_INFINITY, "x")} accepts positive infinity.
   *
   * @throws IllegalArgumentException also if {@code min} or {@code max} is NaN or
   *                                  {@code min > max}
   */
  public static double inRange(double value, double min, double max, String name) {
    if (!(min <= max)) {
      throw new IllegalArgumentException("invalid range for " + name + ": [" + min + ", " + max
          + "]");
    }
    if (!(value >= min && value <= max)) {
      throw new IllegalArgumentException(name + " is not in [" + min + ", " + max + "]: "
          + value);
    }
    return value;
  }

  /** Returns {@code value} if {@code min <= value <= max}. */
  public static int inRange(int value, int min, int max, String name) {
    if (min > max) {
      throw new IllegalArgumentException("invalid range for " + name + ": [" + min + ", " + max
          + "]");
    }
    if (value < min || value > max) {
      throw new IllegalArgumentException(name + " is not in [" + min + ", " + max + "]: "
          + value);
    }
    return value;
  }
}
