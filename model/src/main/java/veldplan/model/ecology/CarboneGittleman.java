package veldplan.model.ecology;

/**
 * Carnivore biomass and numbers supported by prey biomass, after Carbone &amp; Gittleman (2002)
 * [1]: "10,000 kg of prey supports about 90 kg of a given species of carnivore, irrespective of
 * body mass", so the number of carnivores per unit prey biomass scales as the reciprocal of
 * carnivore mass.
 *
 * <pre>
 *   carnivore biomass = 90.1 × prey biomass / 10,000      (kg)
 *   carnivore number  = carnivore biomass / Mc             (Mc carnivore body mass, kg)
 * </pre>
 *
 * <p>The "about 90 kg" is from the paper's abstract; the fitted constant 90.1 (and the fitted
 * exponent of about −1.0 on carnivore mass, used here as exactly −1) are quoted from memory.
 * Use the relation as an order-of-magnitude calibration target for a single predator species at
 * equilibrium, not as a dynamic law.
 *
 * <p>References:
 * <ol>
 *   <li>Carbone, C. &amp; Gittleman, J.L. (2002). A common rule for the scaling of carnivore
 *       density. Science 295: 2273–2276. doi:10.1126/science.1067994</li>
 * </ol>
 */
public final class CarboneGittleman {
  /** Carnivore biomass (kg) supported per 10,000 kg of prey biomass [1] (90.1 from memory). */
  public static final double CARNIVORE_KG_PER_10000_KG_PREY = 90.1;

  private CarboneGittleman() {}

  /**
   * Carnivore biomass supported by a prey biomass, 90.1 / 10,000 × prey [1].
   *
   * @param preyBiomassKg prey biomass (kg), &ge; 0
   * @return carnivore biomass (kg), &ge; 0
   * @throws IllegalArgumentException if the prey biomass is negative or not finite
   */
  public static double carnivoreBiomassKg(double preyBiomassKg) {
    Arguments.nonNegative(preyBiomassKg, "preyBiomassKg");
    return CARNIVORE_KG_PER_10000_KG_PREY / 10_000 * preyBiomassKg;
  }

  /**
   * Number of carnivores of one species of body mass Mc supported by a prey biomass [1].
   *
   * @param preyBiomassKg    prey biomass (kg), &ge; 0
   * @param carnivoreMassKg  body mass of the carnivore species Mc (kg), &gt; 0
   * @return number of carnivores (individuals; not rounded), &ge; 0
   * @throws IllegalArgumentException if an argument is out of range
   */
  public static double carnivoreNumber(double preyBiomassKg, double carnivoreMassKg) {
    Arguments.positive(carnivoreMassKg, "carnivoreMassKg");
    return carnivoreBiomassKg(preyBiomassKg) / carnivoreMassKg;
  }
}
