package veldplan.model;

import static veldplan.model.LaneState.LANES;
import static veldplan.model.LaneState.SPECIES;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorOperators;

/**
 * {@link Trees#update} for every lane of a {@link LaneState} at once; see there for the model.
 * Where the scalar code skips a term (no fire, no elephants), the term is computed for every
 * lane and set to 0 in the lanes the scalar code would skip, so each lane gets the same
 * numbers.
 *
 * <p>The work is split into small methods that pass arrays, not vectors: the JIT compiles each
 * with every vector in registers, where one large method would exceed its inlining budget and
 * leave vectors as heap objects.
 */
final class LaneTrees {
  /** Cap on the share of a class that can move up in a year (as in {@link Trees}). */
  private static final double MAX_TRANSITION = 0.9;
  /** Extra mortality per unit of basal area above the maximum (as in {@link Trees}). */
  private static final double SELF_THINNING = 0.1;

  // Rows of LaneState.treeTerms, one vector each.
  private static final int COMPETITION = 0;
  private static final int THINNING = 1;
  private static final int GROWTH = 2;
  private static final int PLANNED_FACTOR = 3;
  private static final int WILD_FACTOR = 4;
  private static final int TOPKILL = 5;
  /** Number of rows. */
  static final int TERMS = 6;

  private LaneTrees() {}

  static void update(ModelParameters p, LaneForcing f, int year, LaneState s) {
    int blocks = s.blocks;
    // Elephant breakage: -a_k E of every block and class, then every exponential at once.
    for (int b = 0; b < blocks; b++) {
      breakageArguments(p, s, b);
    }
    VectorMath.exp(s.breakageScratch, 0, blocks * s.breakingClasses);
    for (int b = 0; b < blocks; b++) {
      blockTerms(p, f, year, s, b);
      java.util.Arrays.fill(s.nextClasses, 0);
      treeClasses(p, s, b);
      recruitment(p, f, year, s, b);
      System.arraycopy(s.nextClasses, 0, s.treesPerHa, b * TreeClass.COUNT * LANES,
          TreeClass.COUNT * LANES);
    }
  }

  /** Competition, thinning, growth, topkill intensity factors and elephants of block b. */
  private static void blockTerms(ModelParameters p, LaneForcing f, int year, LaneState s,
      int b) {
    TreeParameters t = p.trees();
    FireParameters fp = p.fire();
    double[] terms = s.treeTerms;
    int at = b * LANES;
    int forcingAt = (year * s.blocks + b) * LANES;
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    DoubleVector maxBasalArea = DoubleVector.fromArray(SPECIES, f.aetMm, forcingAt)
        .mul(t.maxBasalAreaM2PerHaPerMmAet);
    DoubleVector ratio = DoubleVector.broadcast(SPECIES, 2.0).blend(
        DoubleVector.fromArray(SPECIES, s.basalAreaM2PerHa, at).div(maxBasalArea),
        maxBasalArea.compare(VectorOperators.GT, 0));
    DoubleVector competition = one.sub(ratio).max(0);
    competition.intoArray(terms, COMPETITION * LANES);
    zero.blend(ratio.sub(1).mul(SELF_THINNING).min(0.5), ratio.compare(VectorOperators.GT, 1))
        .intoArray(terms, THINNING * LANES);
    DoubleVector.fromArray(SPECIES, f.treeGrowthIndex, forcingAt).mul(competition)
        .intoArray(terms, GROWTH * LANES);
    // Topkill.intensityFactor: exp(-b sqrt(I)), where some lane has a fire of that kind (the
    // factors of lanes without one are never used).
    double coefficient = -fp.topkillSqrtIntensity();
    s.plannedFireInBlock = DoubleVector.fromArray(SPECIES, s.plannedBurntFraction, at)
        .compare(VectorOperators.GT, 0).anyTrue();
    s.wildFireInBlock = DoubleVector.fromArray(SPECIES, s.wildBurntFraction, at)
        .compare(VectorOperators.GT, 0).anyTrue();
    if (s.plannedFireInBlock) {
      DoubleVector.fromArray(SPECIES, s.plannedIntensityKwPerM, at)
          .lanewise(VectorOperators.SQRT).mul(coefficient)
          .intoArray(terms, PLANNED_FACTOR * LANES);
      VectorMath.exp(terms, PLANNED_FACTOR * LANES);
    }
    if (s.wildFireInBlock) {
      DoubleVector.fromArray(SPECIES, s.wildIntensityKwPerM, at)
          .lanewise(VectorOperators.SQRT).mul(coefficient)
          .intoArray(terms, WILD_FACTOR * LANES);
      VectorMath.exp(terms, WILD_FACTOR * LANES);
    }
    if (!s.plannedFireInBlock && !s.wildFireInBlock) {
      zero.intoArray(terms, TOPKILL * LANES);
    }
  }

  /** Death, topkill, breakage and growth of each class of block b, into the next classes. */
  private static void treeClasses(ModelParameters p, LaneState s, int b) {
    TreeParameters t = p.trees();
    FireParameters fp = p.fire();
    double[] terms = s.treeTerms;
    double[] next = s.nextClasses;
    int at = b * LANES;
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    for (int k = 0; k < TreeClass.COUNT; k++) {
      double heightFactor = s.shared.topkillHeightFactor[k];
      DoubleVector n = DoubleVector.fromArray(SPECIES, s.treesPerHa,
              (b * TreeClass.COUNT + k) * LANES)
          .mul(one.sub(DoubleVector.fromArray(SPECIES, terms, THINNING * LANES)
              .add(t.mortalityPerYear[k]).min(1)));
      // Topkill: 0 in a block no fire reached in any lane (TOPKILL row zeroed in blockTerms).
      if (s.plannedFireInBlock || s.wildFireInBlock) {
        topkill(s, b, heightFactor);
      }
      DoubleVector topkill = DoubleVector.fromArray(SPECIES, terms, TOPKILL * LANES);
      DoubleVector topkilled = n.mul(topkill);
      n = n.sub(topkilled);
      // Breakage: n x reach x (1 - exp(-a E)) where there are elephants; classes elephants
      // do not break (a = 0) lose nothing.
      DoubleVector broken = zero;
      if (t.elephantBreakageKm2PerElephant[k] > 0) {
        double reach = s.shared.reach[p.herbivores().elephant * s.blocks + b];
        DoubleVector elephants = DoubleVector.fromArray(SPECIES, s.elephantsInReach,
            b * LANES);
        broken = zero.blend(n.mul(reach).mul(one.sub(DoubleVector.fromArray(SPECIES,
                s.breakageScratch, (b * s.breakingClasses + s.breakingIndex[k]) * LANES))),
            elephants.compare(VectorOperators.GT, 0));
        n = n.sub(broken);
      }
      int resproutClass = Math.min(k, TreeClass.FIRE_TRAP_0_5_TO_2M.ordinal());
      DoubleVector.fromArray(SPECIES, next, resproutClass * LANES)
          .add(topkilled.mul(1 - fp.topkillDeathFraction()).add(broken))
          .intoArray(next, resproutClass * LANES);
      if (k < TreeClass.COUNT - 1) {
        // (loss x browse) x share, in the scalar code's order.
        DoubleVector browsed = DoubleVector.fromArray(SPECIES, s.browsePressure, at)
            .mul(t.browsingGrowthLoss).mul(t.lowBrowseShare[k]);
        DoubleVector moving = n.mul(DoubleVector.fromArray(SPECIES, terms, GROWTH * LANES)
            .mul(t.transitionPerYear[k]).mul(one.sub(browsed)).min(MAX_TRANSITION));
        DoubleVector.fromArray(SPECIES, next, k * LANES).add(n.sub(moving))
            .intoArray(next, k * LANES);
        DoubleVector.fromArray(SPECIES, next, (k + 1) * LANES).add(moving)
            .intoArray(next, (k + 1) * LANES);
      } else {
        DoubleVector.fromArray(SPECIES, next, k * LANES).add(n).intoArray(next, k * LANES);
      }
    }
  }

  /**
   * Topkill.probabilityOfFactors, 1 / (1 + h f), weighted by the share burnt and summed over
   * the planned and the unplanned fire, into the TOPKILL row; 0 in lanes without a fire.
   */
  private static void topkill(LaneState s, int b, double heightFactor) {
    double[] terms = s.treeTerms;
    int at = b * LANES;
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    DoubleVector planned = DoubleVector.fromArray(SPECIES, s.plannedBurntFraction, at);
    DoubleVector wild = DoubleVector.fromArray(SPECIES, s.wildBurntFraction, at);
    DoubleVector plannedKill = planned.mul(one.div(DoubleVector.fromArray(SPECIES, terms,
        PLANNED_FACTOR * LANES).mul(heightFactor).add(1)));
    DoubleVector wildKill = wild.mul(one.div(DoubleVector.fromArray(SPECIES, terms,
        WILD_FACTOR * LANES).mul(heightFactor).add(1)));
    zero.add(zero.blend(plannedKill, planned.compare(VectorOperators.GT, 0)))
        .add(zero.blend(wildKill, wild.compare(VectorOperators.GT, 0)))
        .intoArray(terms, TOPKILL * LANES);
  }

  /**
   * E, the elephants per km2 within reach of block b (0 without reach), into
   * s.elephantsInReach, and -a_k E for every class k elephants break (a_k &gt; 0) into
   * s.breakageScratch for exp(-a_k E).
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
            .intoArray(s.breakageScratch, (b * s.breakingClasses + i) * LANES);
      }
    }
  }

  /** Seedlings from large trees and seed rain, damped by competition. */
  private static void recruitment(ModelParameters p, LaneForcing f, int year, LaneState s,
      int b) {
    TreeParameters t = p.trees();
    int base = b * TreeClass.COUNT * LANES;
    DoubleVector large = DoubleVector.zero(SPECIES);
    for (int k = TreeClass.FIRST_LARGE; k < TreeClass.COUNT; k++) {
      large = large.add(DoubleVector.fromArray(SPECIES, s.treesPerHa, base + k * LANES));
    }
    DoubleVector.fromArray(SPECIES, s.nextClasses, 0)
        .add(large.mul(t.recruitsPerLargeTreePerYear).add(t.seedRainPerHaPerYear)
            .mul(DoubleVector.fromArray(SPECIES, s.treeTerms, COMPETITION * LANES))
            .mul(DoubleVector.fromArray(SPECIES, f.treeGrowthIndex,
                (year * s.blocks + b) * LANES).min(1)))
        .intoArray(s.nextClasses, 0);
  }
}
