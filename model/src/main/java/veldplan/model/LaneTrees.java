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
  /** Number of rows. */
  static final int TERMS = 5;

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
      treeClasses(p, f, year, s, b);
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
    double[] terms = s.treeTerms;
    double[] trees = s.treesPerHa;
    double[] heightFactor = s.shared.topkillHeightFactor;
    double[] breakage = s.breakageScratch;
    int[] breakingIndex = s.breakingIndex;
    int at = b * LANES;
    int base = b * TreeClass.COUNT * LANES;
    int breakageBase = b * s.breakingClasses;
    double survivingTopkill = 1 - p.fire().topkillDeathFraction();
    double reach = s.shared.reach[p.herbivores().elephant * s.blocks + b];
    boolean fire = s.plannedFireInBlock || s.wildFireInBlock;
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    DoubleVector thinning = DoubleVector.fromArray(SPECIES, terms, THINNING * LANES);
    DoubleVector growth = DoubleVector.fromArray(SPECIES, terms, GROWTH * LANES);
    DoubleVector browseLoss = DoubleVector.fromArray(SPECIES, s.browsePressure, at)
        .mul(t.browsingGrowthLoss);
    DoubleVector planned = DoubleVector.fromArray(SPECIES, s.plannedBurntFraction, at);
    DoubleVector wild = DoubleVector.fromArray(SPECIES, s.wildBurntFraction, at);
    DoubleVector plannedFactor = DoubleVector.fromArray(SPECIES, terms, PLANNED_FACTOR * LANES);
    DoubleVector wildFactor = DoubleVector.fromArray(SPECIES, terms, WILD_FACTOR * LANES);
    // Recruitment reads the large classes before they are written over.
    DoubleVector large = DoubleVector.zero(SPECIES);
    for (int k = TreeClass.FIRST_LARGE; k < TreeClass.COUNT; k++) {
      large = large.add(DoubleVector.fromArray(SPECIES, trees, base + k * LANES));
    }
    DoubleVector recruits = large.mul(t.recruitsPerLargeTreePerYear)
        .add(t.seedRainPerHaPerYear)
        .mul(DoubleVector.fromArray(SPECIES, terms, COMPETITION * LANES))
        .mul(DoubleVector.fromArray(SPECIES, f.treeGrowthIndex, (year * s.blocks + b) * LANES)
            .min(1));
    DoubleVector next0 = DoubleVector.zero(SPECIES);
    DoubleVector next1 = DoubleVector.zero(SPECIES);
    DoubleVector movedUp = DoubleVector.zero(SPECIES);
    for (int k = 0; k < TreeClass.COUNT; k++) {
      DoubleVector n = DoubleVector.fromArray(SPECIES, trees, base + k * LANES)
          .mul(one.sub(thinning.add(t.mortalityPerYear[k]).min(1)));
      // Topkill (Topkill.probabilityOfFactors, 1 / (1 + h f)) weighted by the share burnt,
      // planned then unplanned; none in a block no fire reached in any lane.
      DoubleVector resprouts = DoubleVector.zero(SPECIES);
      if (fire) {
        DoubleVector topkill = planned.mul(one.div(plannedFactor.mul(heightFactor[k]).add(1)))
            .add(wild.mul(one.div(wildFactor.mul(heightFactor[k]).add(1))));
        DoubleVector topkilled = n.mul(topkill);
        n = n.sub(topkilled);
        resprouts = topkilled.mul(survivingTopkill);
      }
      // Breakage: n x reach x (1 - exp(-a E)); classes elephants do not break lose nothing.
      int breaking = breakingIndex[k];
      if (breaking >= 0) {
        DoubleVector broken = n.mul(reach).mul(one.sub(DoubleVector.fromArray(SPECIES,
            breakage, (breakageBase + breaking) * LANES)));
        n = n.sub(broken);
        resprouts = resprouts.add(broken);
      }
      DoubleVector stays = n;
      DoubleVector moving = DoubleVector.zero(SPECIES);
      if (k < TreeClass.COUNT - 1) {
        // (loss x browse) x share, in the scalar code's order.
        DoubleVector browsed = browseLoss.mul(t.lowBrowseShare[k]);
        moving = n.mul(growth.mul(t.transitionPerYear[k]).mul(one.sub(browsed))
            .min(MAX_TRANSITION));
        stays = n.sub(moving);
      }
      if (k == 0) {
        next0 = next0.add(resprouts).add(stays);
      } else if (k == 1) {
        next1 = movedUp.add(resprouts).add(stays);
      } else {
        next1 = next1.add(resprouts);
        movedUp.add(stays).intoArray(trees, base + k * LANES);
      }
      movedUp = moving;
    }
    next0.add(recruits).intoArray(trees, base);
    next1.intoArray(trees, base + LANES);
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
}
