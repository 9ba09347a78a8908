package veldplan.model.ecology;

/**
 * Holling's functional responses: intake rate of one consumer as a function of prey (or food)
 * density [1, 2, 3].
 *
 * <pre>
 *   type II (disc equation):  f(N) = a N / (1 + a h N)        asymptote 1/h
 *   type III (sigmoid):       f(N) = a N² / (1 + a h N²)      asymptote 1/h
 * </pre>
 *
 * <p>a is the attack rate (area searched per unit time, per consumer), h the handling time per
 * prey item and N the prey density. With Imax = 1/h and N_half = 1/(a h) the type II form is the
 * half-saturation (Michaelis–Menten) intake Imax N / (N + N_half), as used for grazers on grass.
 * Units follow the inputs: with N in items per km², a in km² per year and h in years per item,
 * f is in items per consumer per year. The type III form is taken as reproduced in secondary
 * sources.
 *
 * <p>References:
 * <ol>
 *   <li>Holling, C.S. (1959). The components of predation as revealed by a study of small-mammal
 *       predation of the European pine sawfly. Canadian Entomologist 91: 293–320.</li>
 *   <li>Holling, C.S. (1959). Some characteristics of simple types of predation and parasitism.
 *       Canadian Entomologist 91: 385–398.</li>
 *   <li>Holling, C.S. (1965). The functional response of predators to prey density and its role
 *       in mimicry and population regulation. Memoirs of the Entomological Society of Canada 45:
 *       1–60.</li>
 * </ol>
 */
public final class FunctionalResponse {
  private FunctionalResponse() {}

  /**
   * Holling type II response a N / (1 + a h N) [2].
   *
   * @param a attack rate (area per consumer per unit time), &ge; 0
   * @param h handling time per prey item (time), &ge; 0
   * @param n prey density N (items per area), &ge; 0
   * @return intake (items per consumer per unit time), in [0, 1/h)
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double typeII(double a, double h, double n) {
    Arguments.nonNegative(a, "a");
    Arguments.nonNegative(h, "h");
    Arguments.nonNegative(n, "n");
    return a * n / (1 + a * h * n);
  }

  /**
   * Holling type III response a N² / (1 + a h N²) [3].
   *
   * @param a attack-rate coefficient (area² per item per consumer per unit time), &ge; 0
   * @param h handling time per prey item (time), &ge; 0
   * @param n prey density N (items per area), &ge; 0
   * @return intake (items per consumer per unit time), in [0, 1/h)
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double typeIII(double a, double h, double n) {
    Arguments.nonNegative(a, "a");
    Arguments.nonNegative(h, "h");
    Arguments.nonNegative(n, "n");
    double n2 = n * n;
    return a * n2 / (1 + a * h * n2);
  }
}
