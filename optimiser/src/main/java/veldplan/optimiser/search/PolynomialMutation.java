package veldplan.optimiser.search;

import java.util.random.RandomGenerator;

/**
 * Polynomial mutation of Deb &amp; Goyal (1996) [1] in the bounded form of the NSGA-II reference
 * code [2] (decision-methods §2.5). For a value y in [yl, yu] and a uniform number u:
 * <pre>
 *   &delta;1 = (y − yl)/(yu − yl),   &delta;2 = (yu − y)/(yu − yl),   p = 1/(&eta;+1)
 *   u &le; 0.5:  &delta;q = [2u + (1 − 2u)(1 − &delta;1)^(&eta;+1)]^p − 1
 *   u &gt; 0.5:  &delta;q = 1 − [2(1 − u) + 2(u − 0.5)(1 − &delta;2)^(&eta;+1)]^p
 *   y' = y + &delta;q (yu − yl),  clipped to [yl, yu]
 * </pre>
 * The bounded form keeps y' inside the range without rejection: u = 0 gives yl, u = 1 gives yu.
 * The unbounded perturbation (the terms with &delta; vanish) is {@link #unboundedDelta}.
 *
 * <p>References:
 * <ol>
 *   <li>Deb, K., Goyal, M. (1996). A combined genetic adaptive search (GeneAS) for engineering
 *       design. Computer Science and Informatics 26(4): 30–45.</li>
 *   <li>Deb, K., Pratap, A., Agarwal, S., Meyarivan, T. (2002). NSGA-II. IEEE TEC 6(2):
 *       182–197, and the authors' C code revision 1.1.6 (from memory; see also Deb &amp; Deb 2014,
 *       decision-methods §2.5).</li>
 * </ol>
 */
public final class PolynomialMutation {
  private PolynomialMutation() {}

  /**
   * The bounded mutation of one value [2].
   *
   * @param y     the value, in [lower, upper]
   * @param lower yl
   * @param upper yu &gt; yl
   * @param u     a uniform number in [0, 1]
   * @param eta   &eta;<sub>m</sub> &ge; 0
   * @return the mutated value, in [lower, upper]
   */
  public static double mutate(double y, double lower, double upper, double u, double eta) {
    double range = upper - lower;
    double delta1 = (y - lower) / range;
    double delta2 = (upper - y) / range;
    double power = 1.0 / (eta + 1.0);
    double deltaQ;
    if (u <= 0.5) {
      double val = 2.0 * u + (1.0 - 2.0 * u) * Math.pow(1.0 - delta1, eta + 1.0);
      deltaQ = Math.pow(val, power) - 1.0;
    } else {
      double val = 2.0 * (1.0 - u) + 2.0 * (u - 0.5) * Math.pow(1.0 - delta2, eta + 1.0);
      deltaQ = 1.0 - Math.pow(val, power);
    }
    double mutated = y + deltaQ * range;
    return Math.min(Math.max(mutated, lower), upper);
  }

  /**
   * The unbounded perturbation &delta;q(u) [1]: (2u)^p − 1 for u &le; 0.5, else
   * 1 − (2(1 − u))^p, with p = 1/(&eta;+1). Its median absolute value is 1 − 0.5^p.
   */
  public static double unboundedDelta(double u, double eta) {
    double power = 1.0 / (eta + 1.0);
    return u <= 0.5 ? Math.pow(2.0 * u, power) - 1.0 : 1.0 - Math.pow(2.0 * (1.0 - u), power);
  }

  /**
   * Mutates each gene of a vector on [0, 1] with the given probability, in place [2].
   *
   * @param genes       genes in [0, 1], changed in place
   * @param probability per-gene probability p<sub>m</sub>
   * @param eta         &eta;<sub>m</sub>
   * @param random      the generation's generator
   */
  public static void mutate(double[] genes, double probability, double eta,
      RandomGenerator random) {
    for (int i = 0; i < genes.length; i++) {
      if (random.nextDouble() < probability) {
        genes[i] = mutate(genes[i], 0.0, 1.0, random.nextDouble(), eta);
      }
    }
  }
}
