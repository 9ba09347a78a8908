package veldplan.model;


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
 * Ignitions arrive as a Poisson process whose rate rises with fuel (through the spread factor) and
 * falls when the dry season is short: long growing seasons keep fuel green (a logistic fall in
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
  /** Fuel-load coefficient of Trollope's regression (kW/m per kg/ha), methods sheet §8.2. */
  static final double TROLLOPE_FUEL_COEFFICIENT = 0.8684;

  private Fire() {}

  static void burn(FireParameters fp, ManagementPlan plan, Forcing f, int year,
      EcosystemState s) {
    int blocks = s.blocks;
    for (int b = 0; b < blocks; b++) {
      int at = year * blocks + b;
      double fuel = s.fuelKgPerHa[b];
      double spread = spreadFactor(fp, fuel);
      double fuelTerm = TROLLOPE_FUEL_COEFFICIENT * fuel;
      double planned = 0;
      double plannedIntensity = 0;
      if (plan.burnsIn(b, year)) {
        double offset = plan.lateDrySeason[b] ? f.fireOffsetLateKwPerM[at]
            : f.fireOffsetEarlyKwPerM[at];
        plannedIntensity = Math.max(0, offset + fuelTerm);
        // A fire whose Trollope intensity is not positive does not carry.
        planned = plannedIntensity > 0 ? plan.targetFractionBurnt[b] * spread : 0;
      }
      double rate = fp.wildfireIgnitionsPerYear() * spread * f.curedSeasonFactor[at];
      double ignition = f.ignitionDraw[at];
      double extent = f.extentDraw[at];
      double wildIntensity = Math.max(0, f.fireOffsetLateKwPerM[at] + fuelTerm);
      double wild = 0;
      if (ignition < 1 - Math.exp(-rate) && wildIntensity > 0) {
        wild = (1 - planned) * spread * (0.3 + 0.7 * extent);
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
