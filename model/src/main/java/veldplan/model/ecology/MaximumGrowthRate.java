package veldplan.model.ecology;

/**
 * Allometric maximum rate of increase of mammal populations.
 *
 * <pre>
 *   rm   = 1.5 W^−0.36      Caughley &amp; Krebs (1983) [1]; W mean adult live mass (kg)
 *   rmax = 1.375 W^−0.315   Sinclair (2003) [2];         W adult female mass (kg)
 * </pre>
 *
 * <p>Both are exponential (instantaneous) rates per year; the finite rate is exp(r). Both forms
 * are taken as reproduced in secondary sources: [1] as Table 6.1 and the corresponding figure
 * of the Sinclair, Fryxell &amp; Caughley wildlife-management textbook (where it appears with W
 * in grams as rm = 18 W^−0.36, the same relation), [2] in a documented R package. Realised
 * growth rates in the field lie below these maxima.
 *
 * <p>References:
 * <ol>
 *   <li>Caughley, G. &amp; Krebs, C.J. (1983). Are big mammals simply little mammals writ large?
 *       Oecologia 59: 7–17. doi:10.1007/BF00388066 (DOI from memory)</li>
 *   <li>Sinclair, A.R.E. (2003). Mammal population regulation, keystone processes and ecosystem
 *       dynamics. Philosophical Transactions of the Royal Society of London B 358:
 *       1729–1740.</li>
 * </ol>
 */
public final class MaximumGrowthRate {
  private MaximumGrowthRate() {}

  /**
   * Caughley &amp; Krebs' maximum exponential rate of increase rm = 1.5 W^−0.36 [1].
   *
   * @param bodyMassKg mean adult live mass W (kg), &gt; 0
   * @return rm (per year), &gt; 0
   * @throws IllegalArgumentException if the mass is not positive and finite
   */
  public static double caughleyKrebs(double bodyMassKg) {
    Arguments.positive(bodyMassKg, "bodyMassKg");
    return 1.5 * Math.pow(bodyMassKg, -0.36);
  }

  /**
   * Sinclair's maximum exponential rate of increase rmax = 1.375 W^−0.315 [2].
   *
   * @param bodyMassKg adult female mass W (kg), &gt; 0
   * @return rmax (per year), &gt; 0
   * @throws IllegalArgumentException if the mass is not positive and finite
   */
  public static double sinclair(double bodyMassKg) {
    Arguments.positive(bodyMassKg, "bodyMassKg");
    return 1.375 * Math.pow(bodyMassKg, -0.315);
  }
}
