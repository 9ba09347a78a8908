package veldplan.objectives;

/**
 * A value with its 95 % interval, over {@code n} runs. The interval is NaN when it cannot be
 * computed (a mean over one run).
 *
 * @param value the estimate
 * @param lower lower end of the 95 % interval
 * @param upper upper end of the 95 % interval
 * @param n     runs behind the estimate (per path; the sum over paths after {@link PathStep})
 */
public record Estimate(double value, double lower, double upper, int n) {

  /** The end of the interval that is worse in {@code direction}: the cautious value. */
  public double cautious(Direction direction) {
    return direction == Direction.MAXIMISE ? lower : upper;
  }
}
