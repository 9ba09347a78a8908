package veldplan.model;

import static veldplan.model.LaneState.LANES;
import static veldplan.model.LaneState.SPECIES;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorOperators;

/**
 * {@link Trees#update} for every lane of a {@link LaneState} at once; see there for the model.
 * Where the scalar code skips a term (no fire, no elephants), the term is computed for every
 * lane; in the lanes the scalar code skips, it is a finite number times 0 (the burnt share, or
 * 1 - exp(-a x 0)), so each lane gets the same numbers. A year takes all its exponentials in
 * one call, then updates each block in one pass that keeps the block's terms in registers.
 *
 * <p>The methods pass arrays, not vectors: the JIT compiles each with every vector in
 * registers, where vectors passed between methods that it does not inline would be heap
 * objects.
 */
final class LaneTrees {
  /** Cap on the share of a class that can move up in a year (as in {@link Trees}). */
  private static final double MAX_TRANSITION = 0.9;
  /** Extra mortality per unit of basal area above the maximum (as in {@link Trees}). */
  private static final double SELF_THINNING = 0.1;

  // Vectors of LaneState.treeCarry.
  private static final int NEXT_0 = 0;
  private static final int NEXT_1 = LANES;
  private static final int MOVED_UP = 2 * LANES;

  private LaneTrees() {}

  static void update(ModelParameters p, LaneForcing f, int year, LaneState s) {
    int blocks = s.blocks;
    // Elephant breakage, -a_k E, and topkill intensity factors, -b sqrt(I), of every block:
    // then every exponential at once.
    for (int b = 0; b < blocks; b++) {
      breakageArguments(p, s, b);
      fireArguments(p, s, b);
    }
    VectorMath.exp(s.treeExponentials, 0, blocks * (s.breakingClasses + 2));
    for (int b = 0; b < blocks; b++) {
      treeClasses(p, f, year, s, b);
    }
  }

  /**
   * -b sqrt(I) of block b's planned and unplanned fire, for Topkill.intensityFactor
   * exp(-b sqrt(I)), after the breakage arguments of every block (lanes without a fire of a
   * kind get exp(0), unused).
   */
  private static void fireArguments(ModelParameters p, LaneState s, int b) {
    double coefficient = -p.fire().topkillSqrtIntensity();
    int at = b * LANES;
    int to = (s.blocks * s.breakingClasses + 2 * b) * LANES;
    DoubleVector.fromArray(SPECIES, s.plannedIntensityKwPerM, at)
        .lanewise(VectorOperators.SQRT).mul(coefficient).intoArray(s.treeExponentials, to);
    DoubleVector.fromArray(SPECIES, s.wildIntensityKwPerM, at)
        .lanewise(VectorOperators.SQRT).mul(coefficient)
        .intoArray(s.treeExponentials, to + LANES);
  }

  /**
   * Death, topkill, breakage, growth and recruitment of every class of block b, written over
   * the block's classes. Each class is read before anything is written over it, and the
   * next-year numbers are summed in the scalar code's order: class k gets (what moves up from
   * k - 1) + (what stays), and the fire-trap class then the resprouts of the classes above it.
   *
   * <p>Lanes without a fire of a kind, or without elephants, need no mask: their burnt share
   * (0) or their 1 - exp(-a x 0) (0) times finite numbers is 0, as the scalar code's skipped
   * term.
   */
  private static void treeClasses(ModelParameters p, LaneForcing f, int year, LaneState s,
      int b) {
    TreeParameters t = p.trees();
    double[] trees = s.treesPerHa;
    double[] heightFactor = s.shared.topkillHeightFactor;
    double[] exponentials = s.treeExponentials;
    int[] breakingIndex = s.breakingIndex;
    int at = b * LANES;
    int base = b * TreeClass.COUNT * LANES;
    int breakageBase = b * s.breakingClasses;
    double survivingTopkill = 1 - p.fire().topkillDeathFraction();
    double reach = s.shared.reach[p.herbivores().elephant * s.blocks + b];
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    // Competition, self-thinning and growth from basal area against its water-set maximum.
    int forcingAt = (year * s.blocks + b) * LANES;
    DoubleVector maxBasalArea = DoubleVector.fromArray(SPECIES, f.aetMm, forcingAt)
        .mul(t.maxBasalAreaM2PerHaPerMmAet);
    DoubleVector ratio = DoubleVector.broadcast(SPECIES, 2.0).blend(
        DoubleVector.fromArray(SPECIES, s.basalAreaM2PerHa, at).div(maxBasalArea),
        maxBasalArea.compare(VectorOperators.GT, 0));
    DoubleVector competition = one.sub(ratio).max(0);
    DoubleVector thinning = zero.blend(ratio.sub(1).mul(SELF_THINNING).min(0.5),
        ratio.compare(VectorOperators.GT, 1));
    DoubleVector treeGrowthIndex = DoubleVector.fromArray(SPECIES, f.treeGrowthIndex, forcingAt);
    DoubleVector growth = treeGrowthIndex.mul(competition);
    DoubleVector browseLoss = DoubleVector.fromArray(SPECIES, s.browsePressure, at)
        .mul(t.browsingGrowthLoss);
    DoubleVector planned = DoubleVector.fromArray(SPECIES, s.plannedBurntFraction, at);
    DoubleVector wild = DoubleVector.fromArray(SPECIES, s.wildBurntFraction, at);
    boolean plannedFire = planned.compare(VectorOperators.GT, 0).anyTrue();
    boolean wildFire = wild.compare(VectorOperators.GT, 0).anyTrue();
    int factors = (s.blocks * s.breakingClasses + 2 * b) * LANES;
    DoubleVector plannedFactor = DoubleVector.fromArray(SPECIES, exponentials, factors);
    DoubleVector wildFactor = DoubleVector.fromArray(SPECIES, exponentials, factors + LANES);
    // Recruitment reads the large classes before they are written over.
    DoubleVector large = DoubleVector.zero(SPECIES);
    for (int k = TreeClass.FIRST_LARGE; k < TreeClass.COUNT; k++) {
      large = large.add(DoubleVector.fromArray(SPECIES, trees, base + k * LANES));
    }
    DoubleVector recruits = large.mul(t.recruitsPerLargeTreePerYear)
        .add(t.seedRainPerHaPerYear)
        .mul(competition).mul(treeGrowthIndex.min(1));
    // Sums carried from class to class (in an array: vectors carried round a loop would be
    // heap objects): class 0 and the fire-trap class, added to until the last class, and what
    // moves up from the class before; classes 0 and 1 write each before it is read.
    double[] carry = s.treeCarry;
    for (int k = 0; k < TreeClass.COUNT; k++) {
      DoubleVector n = DoubleVector.fromArray(SPECIES, trees, base + k * LANES)
          .mul(one.sub(thinning.add(t.mortalityPerYear[k]).min(1)));
      // Topkill: planned share x 1 / (1 + h f) + unplanned share x 1 / (1 + h f), each term
      // only where some lane of the block has that fire (elsewhere 0 x a finite number, as
      // the scalar code's skipped term).
      DoubleVector resprouts = zero;
      if (plannedFire || wildFire) {
        DoubleVector topkill = plannedFire
            ? planned.mul(one.div(plannedFactor.mul(heightFactor[k]).add(1)))
            : wild.mul(one.div(wildFactor.mul(heightFactor[k]).add(1)));
        if (plannedFire && wildFire) {
          topkill = topkill.add(wild.mul(one.div(wildFactor.mul(heightFactor[k]).add(1))));
        }
        DoubleVector topkilled = n.mul(topkill);
        n = n.sub(topkilled);
        resprouts = topkilled.mul(survivingTopkill);
      }
      // Breakage: n x reach x (1 - exp(-a E)); classes elephants do not break lose nothing.
      int breaking = breakingIndex[k];
      if (breaking >= 0) {
        DoubleVector broken = n.mul(reach).mul(one.sub(DoubleVector.fromArray(SPECIES,
            exponentials, (breakageBase + breaking) * LANES)));
        n = n.sub(broken);
        resprouts = resprouts.add(broken);
      }
      DoubleVector stays = n;
      DoubleVector moving = zero;
      if (k < TreeClass.COUNT - 1) {
        // (loss x browse) x share, in the scalar code's order.
        DoubleVector browsed = browseLoss.mul(t.lowBrowseShare[k]);
        moving = n.mul(growth.mul(t.transitionPerYear[k]).mul(one.sub(browsed))
            .min(MAX_TRANSITION));
        stays = n.sub(moving);
      }
      // Class k: (what moves up from k - 1) + (what stays); the resprouts go to class 0 from
      // class 0, to the fire-trap class from every class above.
      if (k == 0) {
        resprouts.add(stays).intoArray(carry, NEXT_0);
      } else if (k == 1) {
        DoubleVector.fromArray(SPECIES, carry, MOVED_UP).add(resprouts).add(stays)
            .intoArray(carry, NEXT_1);
      } else {
        DoubleVector.fromArray(SPECIES, carry, NEXT_1).add(resprouts).intoArray(carry, NEXT_1);
        DoubleVector.fromArray(SPECIES, carry, MOVED_UP).add(stays)
            .intoArray(trees, base + k * LANES);
      }
      moving.intoArray(carry, MOVED_UP);
    }
    DoubleVector.fromArray(SPECIES, carry, NEXT_0).add(recruits).intoArray(trees, base);
    DoubleVector.fromArray(SPECIES, carry, NEXT_1).intoArray(trees, base + LANES);
  }

  /**
   * E, the elephants per km2 within reach of block b (0 without reach), into
   * s.elephantsInReach, and -a_k E for every class k elephants break (a_k &gt; 0) into
   * s.treeExponentials for exp(-a_k E).
   */
  private static void breakageArguments(ModelParameters p, LaneState s, int b) {
    TreeParameters t = p.trees();
    double reach = s.shared.reach[p.herbivores().elephant * s.blocks + b];
    DoubleVector elephants = reach > 0
        ? DoubleVector.fromArray(SPECIES, s.elephantsPerKm2, b * LANES).div(reach)
        : DoubleVector.zero(SPECIES);
    elephants.intoArray(s.elephantsInReach, b * LANES);
    for (int k = 0; k < TreeClass.COUNT; k++) {
      int i = s.breakingIndex[k];
      if (i >= 0) {
        elephants.mul(-t.elephantBreakageKm2PerElephant[k])
            .intoArray(s.treeExponentials, (b * s.breakingClasses + i) * LANES);
      }
    }
  }
}
