package veldplan.optimiser.search;

import java.util.List;

/**
 * Quality indicators of an approximation set A against a reference set Z (or another set B),
 * all for minimisation (decision-methods §3.3). The hypervolume is in {@link Hypervolume}.
 *
 * <ul>
 *   <li>IGD(A, Z) = (1/|Z|) &Sigma;<sub>z</sub> min<sub>a</sub> ‖z − a‖ [1]; lower is better; not
 *       Pareto-compliant and dependent on how densely Z samples the front.</li>
 *   <li>IGD+(A, Z) = (1/|Z|) &Sigma;<sub>z</sub> min<sub>a</sub> d<sup>+</sup>(z, a), with
 *       d<sup>+</sup>(z, a) = sqrt(&Sigma;<sub>i</sub> max(a<sub>i</sub> − z<sub>i</sub>, 0)²)
 *       [2]; weakly Pareto-compliant.</li>
 *   <li>Additive epsilon I<sub>&epsilon;+</sub>(A, B) = max<sub>b</sub> min<sub>a</sub>
 *       max<sub>i</sub> (a<sub>i</sub> − b<sub>i</sub>) [3]: the smallest shift that makes A weakly
 *       dominate every b. The unary form uses B = Z.</li>
 *   <li>Coverage C(A, B) = |{b : some a weakly dominates b}| / |B| [4]; not symmetric.</li>
 * </ul>
 *
 * <p>References:
 * <ol>
 *   <li>Coello Coello, C.A., Reyes Sierra, M. (2004). A study of the parallelization of a
 *       coevolutionary multi-objective evolutionary algorithm. MICAI 2004, LNCS 2972: 688–697.
 *       (from memory)</li>
 *   <li>Ishibuchi, H., Masuda, H., Tanigaki, Y., Nojima, Y. (2015). Modified distance calculation
 *       in generational distance and inverted generational distance. EMO 2015, LNCS 9019:
 *       110–125. (from memory)</li>
 *   <li>Zitzler, E., Thiele, L., Laumanns, M., Fonseca, C.M., da Fonseca, V.G. (2003).
 *       Performance assessment of multiobjective optimizers: an analysis and review. IEEE TEC
 *       7(2): 117–132.</li>
 *   <li>Zitzler, E., Thiele, L. (1999). Multiobjective evolutionary algorithms: a comparative case
 *       study and the strength Pareto approach. IEEE TEC 3(4): 257–271.</li>
 * </ol>
 */
public final class Indicators {
  private Indicators() {}

  /** Inverted generational distance IGD(A, Z) [1]. */
  public static double igd(List<double[]> approximation, List<double[]> reference) {
    check(approximation, reference);
    double sum = 0.0;
    for (double[] z : reference) {
      double best = Double.POSITIVE_INFINITY;
      for (double[] a : approximation) {
        double s = 0.0;
        for (int i = 0; i < z.length; i++) {
          double diff = a[i] - z[i];
          s += diff * diff;
        }
        best = Math.min(best, s);
      }
      sum += Math.sqrt(best);
    }
    return sum / reference.size();
  }

  /** IGD+(A, Z) with the dominance-compliant distance d<sup>+</sup> [2]. */
  public static double igdPlus(List<double[]> approximation, List<double[]> reference) {
    check(approximation, reference);
    double sum = 0.0;
    for (double[] z : reference) {
      double best = Double.POSITIVE_INFINITY;
      for (double[] a : approximation) {
        double s = 0.0;
        for (int i = 0; i < z.length; i++) {
          double diff = Math.max(a[i] - z[i], 0.0);
          s += diff * diff;
        }
        best = Math.min(best, s);
      }
      sum += Math.sqrt(best);
    }
    return sum / reference.size();
  }

  /**
   * Binary additive epsilon indicator I<sub>&epsilon;+</sub>(A, B) [3]; negative when A strictly
   * dominates B with room to spare, e.g. −c if B = A + c in every coordinate.
   */
  public static double additiveEpsilon(List<double[]> a, List<double[]> b) {
    check(a, b);
    double worst = Double.NEGATIVE_INFINITY;
    for (double[] y : b) {
      double best = Double.POSITIVE_INFINITY;
      for (double[] x : a) {
        double shift = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < y.length; i++) {
          shift = Math.max(shift, x[i] - y[i]);
        }
        best = Math.min(best, shift);
      }
      worst = Math.max(worst, best);
    }
    return worst;
  }

  /** Coverage C(A, B): the share of B weakly dominated by some member of A [4]. */
  public static double coverage(List<double[]> a, List<double[]> b) {
    check(a, b);
    int covered = 0;
    for (double[] y : b) {
      for (double[] x : a) {
        if (Dominance.pareto(x, y) < 0 || java.util.Arrays.equals(x, y)) {
          covered++;
          break;
        }
      }
    }
    return (double) covered / b.size();
  }

  private static void check(List<double[]> a, List<double[]> b) {
    if (a.isEmpty() || b.isEmpty()) {
      throw new IllegalArgumentException("both sets must be non-empty");
    }
    int d = b.get(0).length;
    for (List<double[]> set : List.of(a, b)) {
      for (double[] p : set) {
        if (p.length != d) {
          throw new IllegalArgumentException("points of dimension " + p.length + " and " + d);
        }
      }
    }
  }
}
