package veldplan.model;

import veldplan.shared.check.Checks;

/**
 * Grass sub-model parameters.
 *
 * @param waterUseEfficiencyKgPerHaPerMm grass dry matter per mm of transpiration at
 *     optimal temperature and reference CO2, no trees (kg DM/ha/mm). Our calibration: with the
 *     soil bucket it gives rain-use efficiencies of about 3–6 kg/ha/mm at 400–700 mm, the range Le
 *     Houérou (1984) gives for semi-arid rangeland in good condition (from memory).
 * @param treeSuppressionHaPerM2 k in G = G0 exp(-k X), X tree basal area (m2/ha): the negative
 *     exponential form of Smit (2005). 0.1 halves grass at 6.9 m2/ha (our calibration).
 * @param carryOverFraction share of last year's unburnt, uneaten grass still standing as fuel
 *     (fraction); small, as Midgley et al. (2006) found carry-over unimportant for burnt area
 * @param maxFuelKgPerHa ceiling on standing fuel (kg DM/ha)
 * @param properUseFraction share of the year's grass production herbivores can use (fraction).
 *     Far below the rangeland "take half" rule because the dry season, when grass is cured and
 *     poor, limits savanna herbivores (Illius &amp; O'Connor 2000, from memory); 0.2 puts the
 *     example's starting herbivore biomass near the model's capacity, as the Coe et al. (1976)
 *     regression of herbivore biomass on rainfall suggests (from memory)
 * @param browseUseFraction share of the year's leaf production browsers can use (fraction);
 *     much browse is unpalatable, defended or shed in the dry season (our calibration)
 * @param tallGrassMaxShare share of production that stands as tall grass when nothing was grazed
 *     the year before (our calibration)
 * @param grazingLawnEffect how far grazing turns tall grass into short grass (grazing lawns):
 *     the tall share falls by this fraction when last year's grazing took all the usable grass
 *     (our calibration)
 * @param c4TminC base temperature of the C4 grass response, Yan &amp; Hunt (1999) form (°C)
 * @param c4ToptC optimum temperature of C4 grass (°C)
 * @param c4TmaxC ceiling temperature of C4 grass (°C)
 * @param c4Co2Share C4 share of the C3 (tree) CO2 response above 1: f4 = 1 + s (f3 - 1)
 */
public record GrassParameters(
    double waterUseEfficiencyKgPerHaPerMm,
    double treeSuppressionHaPerM2,
    double carryOverFraction,
    double maxFuelKgPerHa,
    double properUseFraction,
    double browseUseFraction,
    double tallGrassMaxShare,
    double grazingLawnEffect,
    double c4TminC,
    double c4ToptC,
    double c4TmaxC,
    double c4Co2Share) {

  public GrassParameters {
    Checks.strictlyPositive(waterUseEfficiencyKgPerHaPerMm, "waterUseEfficiencyKgPerHaPerMm");
    Checks.nonNegative(treeSuppressionHaPerM2, "treeSuppressionHaPerM2");
    Checks.probability(carryOverFraction, "carryOverFraction");
    Checks.strictlyPositive(maxFuelKgPerHa, "maxFuelKgPerHa");
    Checks.probability(properUseFraction, "properUseFraction");
    Checks.probability(browseUseFraction, "browseUseFraction");
    Checks.probability(tallGrassMaxShare, "tallGrassMaxShare");
    Checks.probability(grazingLawnEffect, "grazingLawnEffect");
    if (!(c4TminC < c4ToptC && c4ToptC < c4TmaxC)) {
      throw new IllegalArgumentException("C4 cardinal temperatures not ordered: " + c4TminC
          + ", " + c4ToptC + ", " + c4TmaxC);
    }
    Checks.nonNegative(c4Co2Share, "c4Co2Share");
  }

  /**
   * Default values. Cardinal temperatures: generic C4 tropical grass 8–12 / 30–35 / 42–45 °C
   * (methods sheet §6, from memory); we take 10 / 32 / 44.
   */
  public static GrassParameters defaults() {
    return new GrassParameters(7.0, 0.1, 0.15, 6000, 0.15, 0.08, 0.6, 0.7, 10, 32, 44, 0.3);
  }
}
