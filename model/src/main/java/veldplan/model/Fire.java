package veldplan.model;

import veldplan.model.ecology.Trollope;


/**
 * Planned burns and unplanned fires on the fuel left after grazing.
 *
 * <h2>Spread</h2>
 * The share of a block a fire can carry through rises with fuel load as a logistic curve around
 * {@link FireParameters#minimumFuelKgPerHa()}: grass fires need continuous fuel, and burnt area
 * rises with grass fuel from arid to mesic savanna (Archibald et al. 2009, from memory). A fire
 * whose Trollope intensity is not positive (too little fuel for its moisture and humidity) does
 * not carry at all.
 *
 * <h2>Planned burns</h2>
 * In the years the policy schedules (every fire return interval, staggered by block), a planned
 * burn covers the target fraction times the spread factor. Early-dry-season burns meet moist fuel
 * and humid air, late-dry-season burns cured fuel and dry air; intensity follows Trollope's
 * regression (methods sheet §8.2) with the season entering through fuel moisture and humidity.
 *
 * <h2>Unplanned fires</h2>
 * Ignitions arrive as a Poisson process, in proportion to the block's area, whose rate rises with
 * fuel (through the spread factor) and falls when the dry season is short: long growing seasons keep fuel green (a logistic fall in
 * growing days). A fire burns a random share of the area the planned burn left, in the late dry
 * season. Calibration targets: a mean fire return interval of about 3–5 years and 10–25 % of a
 * mesic park burnt per year (methods sheet §8.4), and burnt area rising with growing days to
 * about 140 a year and falling beyond about 170 (common practice, no source).
 *
 * <h2>Random numbers</h2>
 * Two draws per block and year from the fire stream (ignition, extent), indices block * 4 and
 * block * 4 + 1, drawn whether or not they are used; {@link ForcingBuilder} draws them once
 * per replicate into the {@link Forcing}.
 */
final class Fire {
  private Fire() {}

  static void burn(ModelParameters p, ManagementPlan plan, Forcing f, int year,
      EcosystemState s) {
    FireParameters fp = p.fire();
    double[] areaKm2 = p.blocks().areaKm2;
    double wind = fp.windSpeedMPerS();
    int blocks = s.blocks;
    for (int b = 0; b < blocks; b++) {
      int at = year * blocks + b;
      double fuel = s.fuelKgPerHa[b];
      double spread = spreadFactor(fp, fuel);
      double planned = 0;
      double plannedIntensity = 0;
      if (plan.burnsIn(b, year)) {
        plannedIntensity = plan.lateDrySeason[b]
            ? Trollope.fireIntensityKwPerM(fuel, f.fuelMoistureLatePercent,
                f.humidityLatePercent[at], wind)
            : Trollope.fireIntensityKwPerM(fuel, f.fuelMoistureEarlyPercent,
                f.humidityEarlyPercent[at], wind);
        // A fire whose Trollope intensity is not positive does not carry.
        planned = plannedIntensity > 0 ? plan.targetFractionBurnt[b] * spread : 0;
      }
      double rate = fp.wildfireIgnitionsPer100Km2PerYear() * areaKm2[b] / 100 * spread
          * f.curedSeasonFactor[at];
      double wild = 0;
      double wildIntensity = 0;
      if (f.ignitionDraw[at] < 1 - Math.exp(-rate)) {
        // The intensity only matters once a fire is lit (a pure function: computing it here
        // rather than for every block gives the same numbers).
        wildIntensity = Trollope.fireIntensityKwPerM(fuel, f.fuelMoistureLatePercent,
            f.humidityLatePercent[at], wind);
        if (wildIntensity > 0) {
          wild = (1 - planned) * spread * (0.3 + 0.7 * f.extentDraw[at]);
        }
      }
      s.plannedBurntFraction[b] = planned;
      s.plannedIntensityKwPerM[b] = plannedIntensity;
      s.wildBurntFraction[b] = wild;
      s.wildIntensityKwPerM[b] = wild > 0 ? wildIntensity : 0;
      s.leftoverGrassKgPerHa[b] = fuel * (1 - planned - wild);
    }
  }

  /** Share of a block a fire can carry through at this fuel load (0..1). */
  static double spreadFactor(FireParameters fp, double fuelKgPerHa) {
    return 1 / (1 + Math.exp(-(fuelKgPerHa - fp.minimumFuelKgPerHa())
        / fp.fuelSpreadScaleKgPerHa()));
  }

  /** Fall of unplanned fire with a short dry season (0..1). */
  static double curedSeasonFactor(FireParameters fp, double growingDays) {
    return 1 / (1 + Math.exp((growingDays - fp.curedSeasonMidDays())
        / fp.curedSeasonScaleDays()));
  }
}
