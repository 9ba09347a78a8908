package veldplan.optimiser.search;

/**
 * Pareto dominance and constrained domination, for minimisation.
 *
 * <p>a dominates b iff a<sub>j</sub> &le; b<sub>j</sub> for every j and a<sub>j</sub> &lt;
 * b<sub>j</sub> for at least one j. Constrained domination [1, §V; decision-methods §2.4]: a
 * constrained-dominates b iff (a) a is feasible and b is not; or (b) both are infeasible and a's
 * violation is smaller; or (c) both are feasible and a dominates b. Two infeasible solutions with
 * equal violations do not dominate each other. The relation is a strict partial order
 * (irreflexive and transitive), which the external archive relies on.
 *
 * <p>The flat-array methods read objective vector i at {@code objectives[i * m .. i * m + m - 1]}.
 *
 * <p>References:
 * <ol>
 *   <li>Deb, K., Pratap, A., Agarwal, S., Meyarivan, T. (2002). A fast and elitist
 *       multiobjective genetic algorithm: NSGA-II. IEEE TEC 6(2): 182–197.</li>
 * </ol>
 */
public final class Dominance {
  private Dominance() {}

  /**
   * Pareto comparison of two objective vectors.
   *
   * @return −1 if a dominates b, +1 if b dominates a, 0 otherwise (equal or incomparable)
   */
  public static int pareto(double[] a, double[] b) {
    return pareto(a, 0, b, 0, a.length);
  }

  /** Pareto comparison of vectors stored at offsets {@code ia} and {@code ib}, m values each. */
  static int pareto(double[] a, int ia, double[] b, int ib, int m) {
    boolean aBetter = false;
    boolean bBetter = false;
    for (int j = 0; j < m; j++) {
      double x = a[ia + j];
      double y = b[ib + j];
      if (x < y) {
        aBetter = true;
      } else if (y < x) {
        bBetter = true;
      }
      if (aBetter && bBetter) {
        return 0;
      }
    }
    return aBetter ? (bBetter ? 0 : -1) : (bBetter ? 1 : 0);
  }

  /**
   * Constrained-domination comparison [1].
   *
   * @return −1 if a constrained-dominates b, +1 if b constrained-dominates a, 0 otherwise
   */
  public static int constrained(Evaluation a, Evaluation b) {
    return constrained(a.objectives(), 0, a.violation(), b.objectives(), 0, b.violation(),
        a.objectives().length);
  }

  /** Constrained-domination comparison of flat-stored vectors with their violations. */
  static int constrained(double[] a, int ia, double violationA, double[] b, int ib,
      double violationB, int m) {
    if (violationA > 0 || violationB > 0) {
      return Double.compare(violationA, violationB) < 0 ? -1
          : violationA == violationB ? 0 : 1;
    }
    return pareto(a, ia, b, ib, m);
  }
}
