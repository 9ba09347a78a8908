package veldplan.model.ecology;

/**
 * NaN-safe argument checks for the formulas in this package. Every check is written as an inverted
 * test ({@code if (!(x >= 0))}) so that NaN fails it, and the message names the argument and
 * prints its value. The checks are single comparisons: cheap enough for the yearly loop, and the
 * message is built only when a check fails.
 */
final class Arguments {
  private Arguments() {}

  /** Returns {@code value} if it is finite. */
  static double finite(double value, String name) {
    if (!(Math.abs(value) <= Double.MAX_VALUE)) {
      throw new IllegalArgumentException(name + " is not finite: " + value);
    }
    return value;
  }

  /** Returns {@code value} if it is finite and at least 0. */
  static double nonNegative(double value, String name) {
    if (!(value >= 0 && value <= Double.MAX_VALUE)) {
      throw new IllegalArgumentException(name + " is not a finite value >= 0: " + value);
    }
    return value;
  }

  /** Returns {@code value} if it is finite and greater than 0. */
  static double positive(double value, String name) {
    if (!(value > 0 && value <= Double.MAX_VALUE)) {
      throw new IllegalArgumentException(name + " is not a finite value > 0: " + value);
    }
    return value;
  }

  /** Returns {@code value} if it lies in the closed interval [{@code low}, {@code high}]. */
  static double inClosedRange(double value, double low, double high, String name) {
    if (!(value >= low && value <= high)) {
      throw new IllegalArgumentException(
          name + " is not in [" + low + ", " + high + "]: " + value);
    }
    return value;
  }

  /** Returns {@code value} if it lies in the closed interval [{@code low}, {@code high}]. */
  static int inClosedRange(int value, int low, int high, String name) {
    if (value < low || value > high) {
      throw new IllegalArgumentException(
          name + " is not in [" + low + ", " + high + "]: " + value);
    }
    return value;
  }

  /** Returns {@code value} if it is at least 0. */
  static int nonNegative(int value, String name) {
    if (value < 0) {
      throw new IllegalArgumentException(name + " is negative: " + value);
    }
    return value;
  }

  /** Returns {@code array} if it is not null and has {@code length} elements. */
  static double[] length(double[] array, int length, String name) {
    if (array == null) {
      throw new NullPointerException(name + " is null");
    }
    if (array.length != length) {
      throw new IllegalArgumentException(
          name + " has " + array.length + " elements, expected " + length);
    }
    return array;
  }
}
