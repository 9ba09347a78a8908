package veldplan.objectives;

/** Whether more or less of a quantity is better. */
public enum Direction {
  /** More is better (e.g. a persistence probability). */
  MAXIMISE,
  /** Less is better (e.g. a cost). */
  MINIMISE;

  /** The worse of two values in this direction. */
  public double worse(double a, double b) {
    return this == MAXIMISE ? Math.min(a, b) : Math.max(a, b);
  }

  /** True when {@code a} is strictly better than {@code b}. */
  public boolean better(double a, double b) {
    return this == MAXIMISE ? a > b : a < b;
  }
}
