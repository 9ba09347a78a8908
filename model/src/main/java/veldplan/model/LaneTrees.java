package veldplan.model;

import static veldplan.model.LaneState.LANES;
import static veldplan.model.LaneState.SPECIES;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorMask;
import jdk.incubator.vector.VectorOperators;

/**
 * {@link Trees#update} for every lane of a {@link LaneState} at once; see there for the model.
 * Where the scalar code skips a term (no fire, no elephants), the term is computed for every
 * lane and set to 0 in the lanes the scalar code would skip, so each lane gets the same
 * numbers.
 */
final class LaneTrees {
  /** Cap on the share of a class that can move up in a year (as in {@link Trees}). */
  private static final double MAX_TRANSITION = 0.9;
  /** Extra mortality per unit of basal area above the maximum (as in {@link Trees}). */
  private static final double SELF_THINNING = 0.1;

  private LaneTrees() {}

  static void update(ModelParameters p, LaneForcing f, int year, LaneState s) {
    TreeParameters t = p.trees();
    FireParameters fp = p.fire();
    int blocks = s.blocks;
    int e = p.herbivores().elephant;
    double[] heightFactor = s.shared.topkillHeightFactor;
    double[] next = s.nextClasses;
    double resprouting = 1 - fp.topkillDeathFraction();
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    for (int b = 0; b < blocks; b++) {
      int at = b * LANES;
      int forcingAt = (year * blocks + b) * LANES;
      DoubleVector maxBasalArea = DoubleVector.fromArray(SPECIES, f.aetMm, forcingAt)
          .mul(t.maxBasalAreaM2PerHaPerMmAet);
      DoubleVector ratio = DoubleVector.broadcast(SPECIES, 2.0).blend(
          DoubleVector.fromArray(SPECIES, s.basalAreaM2PerHa, at).div(maxBasalArea),
          maxBasalArea.compare(VectorOperators.GT, 0));
      DoubleVector competition = one.sub(ratio).max(0);
      DoubleVector thinning = zero.blend(ratio.sub(1).mul(SELF_THINNING).min(0.5),
          ratio.compare(VectorOperators.GT, 1));
      DoubleVector growthIndex = DoubleVector.fromArray(SPECIES, f.treeGrowthIndex, forcingAt);
      DoubleVector growth = growthIndex.mul(competition);
      DoubleVector planned = DoubleVector.fromArray(SPECIES, s.plannedBurntFraction, at);
      DoubleVector wild = DoubleVector.fromArray(SPECIES, s.wildBurntFraction, at);
      VectorMask<Double> noPlanned = planned.compare(VectorOperators.LE, 0);
      VectorMask<Double> noWild = wild.compare(VectorOperators.LE, 0);
      // Topkill.intensityFactor: exp(-b sqrt(I)).
      double b1 = -fp.topkillSqrtIntensity();
      DoubleVector plannedFactor = DoubleVector.fromArray(SPECIES, s.plannedIntensityKwPerM, at)
          .lanewise(VectorOperators.SQRT).mul(b1).lanewise(VectorOperators.EXP);
      DoubleVector wildFactor = DoubleVector.fromArray(SPECIES, s.wildIntensityKwPerM, at)
          .lanewise(VectorOperators.SQRT).mul(b1).lanewise(VectorOperators.EXP);
      double reach = s.shared.reach[e * blocks + b];
      DoubleVector elephantsInReach = reach > 0
          ? DoubleVector.fromArray(SPECIES, s.elephantsPerKm2, at).div(reach) : zero;
      VectorMask<Double> noElephants = elephantsInReach.compare(VectorOperators.LE, 0);
      DoubleVector browse = DoubleVector.fromArray(SPECIES, s.browsePressure, at);
      java.util.Arrays.fill(next, 0);
      int base = b * TreeClass.COUNT * LANES;
      DoubleVector large = zero;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        DoubleVector now = DoubleVector.fromArray(SPECIES, s.treesPerHa, base + k * LANES);
        if (k >= TreeClass.FIRST_LARGE) {
          large = large.add(now);
        }
        DoubleVector n = now.mul(one.sub(thinning.add(t.mortalityPerYear[k]).min(1)));
        // Topkill.probabilityOfFactors: 1 / (1 + h f), weighted by the share burnt.
        DoubleVector topkill = zero
            .add(planned.mul(one.div(plannedFactor.mul(heightFactor[k]).add(1)))
                .blend(zero, noPlanned))
            .add(wild.mul(one.div(wildFactor.mul(heightFactor[k]).add(1))).blend(zero, noWild));
        DoubleVector topkilled = n.mul(topkill);
        n = n.sub(topkilled);
        DoubleVector broken = zero;
        double breakage = t.elephantBreakageKm2PerElephant[k];
        if (reach > 0 && breakage > 0) {
          broken = n.mul(reach).mul(one.sub(elephantsInReach.mul(-breakage)
              .lanewise(VectorOperators.EXP))).blend(zero, noElephants);
          n = n.sub(broken);
        }
        DoubleVector resprouts = topkilled.mul(resprouting).add(broken);
        int resproutClass = Math.min(k, TreeClass.FIRE_TRAP_0_5_TO_2M.ordinal());
        add(next, resproutClass, resprouts);
        if (k < TreeClass.COUNT - 1) {
          // (loss x browse) x share, in the scalar code's order.
          DoubleVector browsed = browse.mul(t.browsingGrowthLoss).mul(t.lowBrowseShare[k]);
          DoubleVector moving = n.mul(growth.mul(t.transitionPerYear[k]).mul(one.sub(browsed))
              .min(MAX_TRANSITION));
          add(next, k, n.sub(moving));
          add(next, k + 1, moving);
        } else {
          add(next, k, n);
        }
      }
      add(next, 0, large.mul(t.recruitsPerLargeTreePerYear).add(t.seedRainPerHaPerYear)
          .mul(competition).mul(growthIndex.min(1)));
      System.arraycopy(next, 0, s.treesPerHa, base, TreeClass.COUNT * LANES);
    }
  }

  private static void add(double[] next, int k, DoubleVector v) {
    DoubleVector.fromArray(SPECIES, next, k * LANES).add(v).intoArray(next, k * LANES);
  }
}
