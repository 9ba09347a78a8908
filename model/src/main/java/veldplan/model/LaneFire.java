package veldplan.model;

import static veldplan.model.LaneState.LANES;
import static veldplan.model.LaneState.SPECIES;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorMask;
import jdk.incubator.vector.VectorOperators;
import veldplan.model.ecology.Trollope;

/**
 * {@link Fire#burn} for every lane of a {@link LaneState} at once; see there for the model. The
 * planned burns depend on the policy and the year only, so a block burns in every lane or in
 * none; whether an unplanned fire is lit is decided lane by lane with the same test as
 * {@link Fire#ignites}, the exponential computed for every lane.
 */
final class LaneFire {
  private LaneFire() {}

  static void burn(ModelParameters p, ManagementPlan plan, LaneForcing f, int year,
      LaneState s) {
    FireParameters fp = p.fire();
    double[] areaKm2 = p.blocks().areaKm2;
    double windTerm = Trollope.windTerm(fp.windSpeedMPerS());
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    DoubleVector moistureLate = DoubleVector.fromArray(SPECIES, f.moistureTermLate, 0);
    DoubleVector moistureEarly = DoubleVector.fromArray(SPECIES, f.moistureTermEarly, 0);
    int blocks = s.blocks;
    for (int b = 0; b < blocks; b++) {
      int at = b * LANES;
      int forcingAt = (year * blocks + b) * LANES;
      DoubleVector fuel = DoubleVector.fromArray(SPECIES, s.fuelKgPerHa, at);
      // Fire.spreadFactor: 1 / (1 + exp(-(fuel - minimum) / scale)).
      DoubleVector spread = one.div(fuel.sub(fp.minimumFuelKgPerHa()).neg()
          .div(fp.fuelSpreadScaleKgPerHa()).lanewise(VectorOperators.EXP).add(1));
      DoubleVector planned = zero;
      DoubleVector plannedIntensity = zero;
      if (plan.burnsIn(b, year)) {
        plannedIntensity = plan.lateDrySeason[b]
            ? intensity(fuel, moistureLate, DoubleVector.fromArray(SPECIES, f.humidityTermLate,
                forcingAt), windTerm)
            : intensity(fuel, moistureEarly, DoubleVector.fromArray(SPECIES,
                f.humidityTermEarly, forcingAt), windTerm);
        planned = spread.mul(plan.targetFractionBurnt[b])
            .blend(zero, plannedIntensity.compare(VectorOperators.LE, 0));
      }
      double ignitions = fp.wildfireIgnitionsPer100Km2PerYear() * areaKm2[b] / 100;
      DoubleVector rate = spread.mul(ignitions)
          .mul(DoubleVector.fromArray(SPECIES, f.curedSeasonFactor, forcingAt));
      // Fire.ignites, lane by lane: surely lit above one bound, surely not below the other,
      // the exact test draw < 1 - exp(-rate) between them.
      DoubleVector draw = DoubleVector.fromArray(SPECIES, f.ignitionDraw, forcingAt);
      VectorMask<Double> exact = draw.compare(VectorOperators.LT,
          one.sub(rate.neg().lanewise(VectorOperators.EXP)));
      VectorMask<Double> lit = rate.compare(VectorOperators.GT,
              DoubleVector.fromArray(SPECIES, f.ignitionLitAbove, forcingAt))
          .or(rate.compare(VectorOperators.GE,
              DoubleVector.fromArray(SPECIES, f.ignitionUnlitBelow, forcingAt)).and(exact));
      DoubleVector wildIntensity = intensity(fuel, moistureLate,
          DoubleVector.fromArray(SPECIES, f.humidityTermLate, forcingAt), windTerm);
      VectorMask<Double> burns = lit.and(wildIntensity.compare(VectorOperators.GT, 0));
      DoubleVector extent = DoubleVector.fromArray(SPECIES, f.extentDraw, forcingAt)
          .mul(0.7).add(0.3);
      DoubleVector wild = zero.blend(one.sub(planned).mul(spread).mul(extent), burns);
      planned.intoArray(s.plannedBurntFraction, at);
      plannedIntensity.intoArray(s.plannedIntensityKwPerM, at);
      wild.intoArray(s.wildBurntFraction, at);
      zero.blend(wildIntensity, wild.compare(VectorOperators.GT, 0))
          .intoArray(s.wildIntensityKwPerM, at);
      fuel.mul(one.sub(planned).sub(wild)).intoArray(s.leftoverGrassKgPerHa, at);
    }
  }

  /** {@link Trollope#fireIntensityOfTerms}, the same operations in the same order. */
  private static DoubleVector intensity(DoubleVector fuel, DoubleVector moistureTerm,
      DoubleVector humidityTerm, double windTerm) {
    return fuel.mul(0.8684).add(2729).sub(moistureTerm).sub(humidityTerm).sub(windTerm).max(0);
  }
}
