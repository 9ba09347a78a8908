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
 * {@link Fire#ignites}, the exponential computed for every lane. One small method per block and
 * kind of fire, passing arrays (see {@link LaneTrees}).
 */
final class LaneFire {
  private LaneFire() {}

  static void burn(ModelParameters p, ManagementPlan plan, LaneForcing f, int year,
      LaneState s) {
    double windTerm = Trollope.windTerm(p.fire().windSpeedMPerS());
    for (int b = 0; b < s.blocks; b++) {
      spreadArgument(p, s, b);
    }
    VectorMath.exp(s.fireSpread, 0, s.blocks);
    for (int b = 0; b < s.blocks; b++) {
      spread(s, b);
      if (plan.burnsIn(b, year)) {
        plannedBurn(plan, f, year, s, b, windTerm);
      } else {
        java.util.Arrays.fill(s.plannedBurntFraction, b * LANES, (b + 1) * LANES, 0);
        java.util.Arrays.fill(s.plannedIntensityKwPerM, b * LANES, (b + 1) * LANES, 0);
      }
      unplannedFire(p, f, year, s, b, windTerm);
    }
  }

  /** -(fuel - minimum) / scale of block b, into fireSpread, for the exponential. */
  private static void spreadArgument(ModelParameters p, LaneState s, int b) {
    FireParameters fp = p.fire();
    DoubleVector.fromArray(SPECIES, s.fuelKgPerHa, b * LANES).sub(fp.minimumFuelKgPerHa())
        .neg().div(fp.fuelSpreadScaleKgPerHa()).intoArray(s.fireSpread, b * LANES);
  }

  /** Fire.spreadFactor of block b: 1 / (1 + exp(-(fuel - minimum) / scale)), in place. */
  private static void spread(LaneState s, int b) {
    DoubleVector.broadcast(SPECIES, 1.0).div(DoubleVector.fromArray(SPECIES, s.fireSpread,
        b * LANES).add(1)).intoArray(s.fireSpread, b * LANES);
  }

  /** The planned burn of block b: Trollope's intensity in the policy's season, share burnt. */
  private static void plannedBurn(ManagementPlan plan, LaneForcing f, int year, LaneState s,
      int b, double windTerm) {
    int at = b * LANES;
    int forcingAt = (year * s.blocks + b) * LANES;
    boolean late = plan.lateDrySeason[b];
    DoubleVector moisture = DoubleVector.fromArray(SPECIES,
        late ? f.moistureTermLate : f.moistureTermEarly, 0);
    DoubleVector humidity = DoubleVector.fromArray(SPECIES,
        late ? f.humidityTermLate : f.humidityTermEarly, forcingAt);
    // Trollope.fireIntensityOfTerms: max(0, 2729 + 0.8684 FL - moisture - humidity - wind).
    DoubleVector intensity = DoubleVector.fromArray(SPECIES, s.fuelKgPerHa, at).mul(0.8684)
        .add(2729).sub(moisture).sub(humidity).sub(windTerm).max(0);
    intensity.intoArray(s.plannedIntensityKwPerM, at);
    // A fire whose intensity is not positive does not carry.
    DoubleVector.zero(SPECIES).blend(DoubleVector.fromArray(SPECIES, s.fireSpread, at)
            .mul(plan.targetFractionBurnt[b]), intensity.compare(VectorOperators.GT, 0))
        .intoArray(s.plannedBurntFraction, at);
  }

  /** Whether an unplanned fire is lit in block b, how much it burns, and what is left. */
  private static void unplannedFire(ModelParameters p, LaneForcing f, int year, LaneState s,
      int b, double windTerm) {
    FireParameters fp = p.fire();
    int at = b * LANES;
    int forcingAt = (year * s.blocks + b) * LANES;
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    DoubleVector fuel = DoubleVector.fromArray(SPECIES, s.fuelKgPerHa, at);
    DoubleVector spread = DoubleVector.fromArray(SPECIES, s.fireSpread, at);
    DoubleVector planned = DoubleVector.fromArray(SPECIES, s.plannedBurntFraction, at);
    double ignitions = fp.wildfireIgnitionsPer100Km2PerYear() * p.blocks().areaKm2[b] / 100;
    DoubleVector rate = spread.mul(ignitions)
        .mul(DoubleVector.fromArray(SPECIES, f.curedSeasonFactor, forcingAt));
    // Fire.ignites: surely lit above one bound, surely not below the other, the exact test
    // draw < 1 - exp(-rate) between them.
    VectorMask<Double> surelyLit = rate.compare(VectorOperators.GT,
        DoubleVector.fromArray(SPECIES, f.ignitionLitAbove, forcingAt));
    VectorMask<Double> undecided = surelyLit.not().and(rate.compare(VectorOperators.GE,
        DoubleVector.fromArray(SPECIES, f.ignitionUnlitBelow, forcingAt)));
    VectorMask<Double> lit = surelyLit;
    if (undecided.anyTrue()) { // the exponential only where some lane needs it
      rate.neg().intoArray(s.math, 0);
      VectorMath.exp(s.math, 0);
      lit = lit.or(undecided.and(DoubleVector.fromArray(SPECIES, f.ignitionDraw, forcingAt)
          .compare(VectorOperators.LT, one.sub(DoubleVector.fromArray(SPECIES, s.math, 0)))));
    }
    DoubleVector intensity = fuel.mul(0.8684).add(2729)
        .sub(DoubleVector.fromArray(SPECIES, f.moistureTermLate, 0))
        .sub(DoubleVector.fromArray(SPECIES, f.humidityTermLate, forcingAt)).sub(windTerm)
        .max(0);
    DoubleVector extent = DoubleVector.fromArray(SPECIES, f.extentDraw, forcingAt)
        .mul(0.7).add(0.3);
    DoubleVector wild = zero.blend(one.sub(planned).mul(spread).mul(extent),
        lit.and(intensity.compare(VectorOperators.GT, 0)));
    wild.intoArray(s.wildBurntFraction, at);
    zero.blend(intensity, wild.compare(VectorOperators.GT, 0))
        .intoArray(s.wildIntensityKwPerM, at);
    fuel.mul(one.sub(planned).sub(wild)).intoArray(s.leftoverGrassKgPerHa, at);
  }
}
