package veldplan.model;

import veldplan.model.ecology.Topkill;
import veldplan.shared.check.Checks;

/**
 * Fire sub-model parameters.
 *
 * @param windSpeedMPerS wind speed at burning (m/s) in the Trollope regression; 2.5 m/s is a
 *     moderate wind of the kind burn prescriptions allow (common practice, no source)
 * @param curedFuelMoisturePercent grass fuel moisture in the dry season; 28 % is the mean of
 *     winter burns in Govender et al. (2006)
 * @param greenFuelMoisturePercent grass fuel moisture at the end of the rains; 88 % is the mean
 *     of summer burns in Govender et al. (2006)
 * @param curingMonths e-folding time of fuel drying after the growing season ends (months)
 * @param minimumFuelKgPerHa fuel below which a fire does not carry (kg DM/ha)
 * @param fuelSpreadScaleKgPerHa scale of the logistic rise of fire spread with fuel (kg DM/ha)
 * @param wildfireIgnitionsPer100Km2PerYear expected unplanned ignitions per 100 km2 and year
 *     with ample cured fuel and a long dry season
 * @param curedSeasonMidDays growing days at which the unplanned-fire chance is halved because the
 *     dry season is short (days)
 * @param curedSeasonScaleDays scale of that logistic fall (days)
 * @param topkillIntercept Higgins et al. (2007) topkill logit intercept
 * @param topkillLnHeight Higgins et al. (2007) coefficient of ln(height in m)
 * @param topkillSqrtIntensity Higgins et al. (2007) coefficient of sqrt(intensity in kW/m)
 * @param topkillDeathFraction share of topkilled trees that die instead of resprouting (fraction)
 */
public record FireParameters(
    double windSpeedMPerS,
    double curedFuelMoisturePercent,
    double greenFuelMoisturePercent,
    double curingMonths,
    double minimumFuelKgPerHa,
    double fuelSpreadScaleKgPerHa,
    double wildfireIgnitionsPer100Km2PerYear,
    double curedSeasonMidDays,
    double curedSeasonScaleDays,
    double topkillIntercept,
    double topkillLnHeight,
    double topkillSqrtIntensity,
    double topkillDeathFraction) {

  public FireParameters {
    Checks.strictlyPositive(windSpeedMPerS, "windSpeedMPerS");
    Checks.inRange(curedFuelMoisturePercent, 0, 300, "curedFuelMoisturePercent");
    Checks.inRange(greenFuelMoisturePercent, 0, 300, "greenFuelMoisturePercent");
    Checks.strictlyPositive(curingMonths, "curingMonths");
    Checks.nonNegative(minimumFuelKgPerHa, "minimumFuelKgPerHa");
    Checks.strictlyPositive(fuelSpreadScaleKgPerHa, "fuelSpreadScaleKgPerHa");
    Checks.nonNegative(wildfireIgnitionsPer100Km2PerYear, "wildfireIgnitionsPer100Km2PerYear");
    Checks.strictlyPositive(curedSeasonScaleDays, "curedSeasonScaleDays");
    Checks.finite(curedSeasonMidDays, "curedSeasonMidDays");
    Checks.finite(topkillIntercept, "topkillIntercept");
    Checks.finite(topkillLnHeight, "topkillLnHeight");
    Checks.finite(topkillSqrtIntensity, "topkillSqrtIntensity");
    Checks.probability(topkillDeathFraction, "topkillDeathFraction");
  }

  /**
   * Default values. Topkill: the Skukuza fit of Higgins et al. (2007, Appendix C, Table C2),
   * intensity taken in kW/m (see the units caveat in the methods sheet §8.3). Death of topkilled
   * trees: "a few %" (Higgins et al. 2000, from memory). The rest is our calibration.
   */
  public static FireParameters defaults() {
    return new FireParameters(2.5, 28, 88, 1.5, 1200, 300, 0.12, 185, 12,
        Topkill.SKUKUZA.intercept(), Topkill.SKUKUZA.lnHeightCoefficient(),
        Topkill.SKUKUZA.sqrtIntensityCoefficient(), 0.04);
  }
}
