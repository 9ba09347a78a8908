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
 * per replicate into the {@link Forcing}, with bounds on the rate that let {@link #ignites}
 * decide the ignition without an exponential except near the draw's threshold (the decision is
 * always that of the exact test).
 */
final class Fire {
  private Fire() {}

  static void burn(ModelParameters p, ManagementPlan plan, Forcing f, int year,
      EcosystemState s) {
    FireParameters fp = p.fire();
    double[] areaKm2 = p.blocks().areaKm2;
    // Trollope's regression with its weather terms computed once per replicate (Forcing) and
    // the wind term once here: the same operations in the same order, so the same bits as
    // Trollope.fireIntensityKwPerM (see Trollope.fireIntensityOfTerms).
    double windTerm = Trollope.windTerm(fp.windSpeedMPerS());
    int blocks = s.blocks;
    for (int b = 0; b < blocks; b++) {
      int at = year * blocks + b;
      double fuel = s.fuelKgPerHa[b];
      double spread = spreadFactor(fp, fuel);
      double planned = 0;
      double plannedIntensity = 0;
      if (plan.burnsIn(b, year)) {
        plannedIntensity = plan.lateDrySeason[b]
            ? Trollope.fireIntensityOfTerms(fuel, f.moistureTermLate, f.humidityTermLate[at],
                windTerm)
            : Trollope.fireIntensityOfTerms(fuel, f.moistureTermEarly, f.humidityTermEarly[at],
                windTerm);
        // A fire whose Trollope intensity is not positive does not carry.
        planned = plannedIntensity > 0 ? plan.targetFractionBurnt[b] * spread : 0;
      }
      double rate = fp.wildfireIgnitionsPer100Km2PerYear() * areaKm2[b] / 100 * spread
          * f.curedSeasonFactor[at];
      double wild = 0;
      double wildIntensity = 0;
      if (ignites(rate, f.ignitionDraw[at], f.ignitionLitAbove[at], f.ignitionUnlitBelow[at])) {
        // The intensity only matters once a fire is lit (a pure function: computing it here
        // rather than for every block gives the same numbers).
        wildIntensity = Trollope.fireIntensityOfTerms(fuel, f.moistureTermLate,
            f.humidityTermLate[at], windTerm);
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

  /**
   * Absolute error bound on the computed 1 - exp(-rate), with room to spare: Math.exp is within
   * 1 ulp (at most 2^-52 for a result in [0, 1]) and the subtraction rounds by at most 2^-53,
   * so the computed value is within 2^-51 of the exact one; 2^-48 is eight times that.
   */
  private static final double IGNITION_SLACK = 0x1p-48;
  /** Margin, relative to the threshold, for the rounding of the bounds (a few ulps, with room). */
  private static final double BOUND_MARGIN = 1e-12;

  /**
   * Whether an unplanned fire is lit this year: at least one ignition of a Poisson process of
   * this rate, {@code draw < 1 - exp(-rate)}, the exact test. The bounds from
   * {@link #ignitionBounds} decide it without the exponential when the rate is clearly above
   * or below the draw's threshold -ln(1 - draw); near the threshold the exact test is made, so
   * the decision is always the exact test's.
   */
  static boolean ignites(double rate, double draw, double litAbove, double unlitBelow) {
    if (rate > litAbove) {
      return true;
    }
    if (rate < unlitBelow) {
      return false;
    }
    return draw < 1 - Math.exp(-rate);
  }

  /**
   * Bounds for {@link #ignites} of a uniform draw u in [0, 1), written at index {@code at}. With
   * t = -ln(1 - u) the rate at which 1 - exp(-rate) equals u, the exact 1 - exp(-rate) exceeds
   * u by (1 - u)(1 - exp(-(rate - t))), which is more than the error bound e of the computed
   * value once rate &gt; t - ln(1 - e / (1 - u)); it falls short of u by more than e once
   * rate &lt; t - ln(1 + e / (1 - u)). Both bounds are widened by 1e-12 t for the rounding of t
   * (a few ulps); the rounding of e / (1 - u) is covered by e being eight times the bound. When e / (1 - u) &ge; 1/2 (u within 2^-47 of 1) no rate is surely lit.
   */
  static void ignitionBounds(double u, double[] litAbove, double[] unlitBelow, int at) {
    double rest = 1 - u;
    double t = -Math.log1p(-u);
    double relative = IGNITION_SLACK / rest;
    double margin = BOUND_MARGIN * t + Double.MIN_NORMAL;
    unlitBelow[at] = t - Math.log1p(relative) - margin;
    litAbove[at] = relative >= 0.5 ? Double.POSITIVE_INFINITY
        : t - Math.log1p(-relative) + margin;
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
