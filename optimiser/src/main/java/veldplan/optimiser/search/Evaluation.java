package veldplan.optimiser.search;

import java.util.Arrays;

/**
 * The objective values and the constraint violation of one gene vector.
 *
 * <p>The objectives array is copied on construction; the accessor returns the record's own array,
 * which callers must not modify. {@code equals} and {@code hashCode} compare the values bit for
 * bit ({@link Arrays#equals(double[], double[])}).
 *
 * @param objectives the M objective values, all minimised, all finite
 * @param violation  0 for a feasible solution, otherwise the sum of normalised constraint
 *                   violations (&gt; 0, finite) [Deb et al. 2002, §2.4 of decision-methods.md]
 */
public record Evaluation(double[] objectives, double violation) {
  /**
   * Checks and copies the values.
   *
   * @throws IllegalArgumentException if an objective is not finite, there are none, or the
   *                                  violation is negative, NaN or infinite
   */
  public Evaluation {
    if (objectives.length == 0) {
      throw new IllegalArgumentException("an evaluation needs at least one objective");
    }
    objectives = objectives.clone();
    for (int j = 0; j < objectives.length; j++) {
      if (!Double.isFinite(objectives[j])) {
        throw new IllegalArgumentException("objective " + j + " is not finite: " + objectives[j]);
      }
    }
    if (!(violation >= 0) || violation == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          "violation must be finite and >= 0 (0 = feasible): " + violation);
    }
  }

  /** A feasible evaluation (violation 0) of the given objective values. */
  public static Evaluation of(double... objectives) {
    return new Evaluation(objectives, 0);
  }

  /** Whether the violation is 0. (Not named {@code isFeasible}: Jackson would write it.) */
  public boolean feasible() {
    return violation == 0;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof Evaluation e
        && Double.compare(violation, e.violation) == 0
        && Arrays.equals(objectives, e.objectives);
  }

  @Override
  public int hashCode() {
    return 31 * Arrays.hashCode(objectives) + Double.hashCode(violation);
  }

  @Override
  public String toString() {
    return "Evaluation[objectives=" + Arrays.toString(objectives) + ", violation=" + violation
        + "]";
  }
}
