package veldplan.model.ecology;

/**
 * Basal metabolic rate after Kleiber [1] and the dry-matter intake it implies.
 *
 * <pre>
 *   BMR = 293 W^0.75          kJ/day (≈ 70 W^0.75 kcal/day), W body mass (kg)     [1]
 *   DMI = m BMR / (1000 ME)   kg dry matter/day
 * </pre>
 *
 * <p>The intake relation is our design from the above: m is the field-metabolism multiple of BMR
 * (about 2–3, from memory) and ME the metabolisable energy of the forage (about 7–9 MJ/kg DM for
 * savanna grass, from memory). 293 kJ is the usual rounding of 70 kcal × 4.184 kJ/kcal =
 * 292.88 kJ.
 *
 * <p>References:
 * <ol>
 *   <li>Kleiber, M. (1961). The Fire of Life: an introduction to animal energetics. Wiley, New
 *       York.</li>
 * </ol>
 */
public final class Metabolism {
  /** Kleiber's coefficient in kJ per day per kg^0.75 [1]. */
  public static final double KLEIBER_KJ_PER_DAY_PER_KG075 = 293;

  private Metabolism() {}

  /**
   * Basal metabolic rate 293 W^0.75 [1].
   *
   * @param bodyMassKg body mass W (kg), &gt; 0
   * @return BMR (kJ/day), &gt; 0
   * @throws IllegalArgumentException if the mass is not positive and finite
   */
  public static double kleiberBasalKJPerDay(double bodyMassKg) {
    Arguments.positive(bodyMassKg, "bodyMassKg");
    return KLEIBER_KJ_PER_DAY_PER_KG075 * Math.pow(bodyMassKg, 0.75);
  }

  /**
   * Dry-matter intake needed to meet m times the basal metabolic rate on forage of a given
   * metabolisable energy, m × 293 W^0.75 / (1000 ME).
   *
   * @param bodyMassKg                 body mass W (kg), &gt; 0
   * @param fieldMetabolicMultiple     m, field metabolic rate as a multiple of BMR, &gt; 0
   * @param metabolisableEnergyMJPerKg ME of the forage (MJ per kg dry matter), &gt; 0
   * @return DMI (kg dry matter/day), &gt; 0
   * @throws IllegalArgumentException if an argument is not positive and finite
   */
  public static double dryMatterIntakeKgPerDay(double bodyMassKg, double fieldMetabolicMultiple,
      double metabolisableEnergyMJPerKg) {
    Arguments.positive(fieldMetabolicMultiple, "fieldMetabolicMultiple");
    Arguments.positive(metabolisableEnergyMJPerKg, "metabolisableEnergyMJPerKg");
    return fieldMetabolicMultiple * kleiberBasalKJPerDay(bodyMassKg)
        / (1000 * metabolisableEnergyMJPerKg);
  }
}
