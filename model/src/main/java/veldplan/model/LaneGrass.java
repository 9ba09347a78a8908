package veldplan.model;

import static veldplan.model.LaneState.LANES;
import static veldplan.model.LaneState.SPECIES;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorOperators;

/** {@link Grass#grow} for every lane of a {@link LaneState} at once; see there for the model. */
final class LaneGrass {
  private LaneGrass() {}

  static void grow(GrassParameters g, TreeParameters t, LaneForcing f, int year, LaneState s) {
    int blocks = s.blocks;
    double[] suppression = s.blockScratch;
    for (int b = 0; b < blocks; b++) {
      basalArea(t, s, b, -g.treeSuppressionHaPerM2());
    }
    // TreeGrassCompetition.negativeExponential: G0 exp(-k X), every block's exponential at once.
    VectorMath.exp(suppression, 0, blocks);
    for (int b = 0; b < blocks; b++) {
      production(g, f, year, s, b);
    }
  }

  /** Basal area of block b, and -k X into s.blockScratch for the exponential. */
  private static void basalArea(TreeParameters t, LaneState s, int b, double minusK) {
    DoubleVector basalArea = DoubleVector.zero(SPECIES);
    int trees = b * TreeClass.COUNT;
    for (int k = 0; k < TreeClass.COUNT; k++) {
      basalArea = basalArea.add(DoubleVector.fromArray(SPECIES, s.treesPerHa,
          (trees + k) * LANES).mul(t.basalAreaM2PerTree[k]));
    }
    basalArea.intoArray(s.basalAreaM2PerHa, b * LANES);
    basalArea.mul(minusK).intoArray(s.blockScratch, b * LANES);
  }

  /** Grass production of block b (G0 times the exponential) and the fuel. */
  private static void production(GrassParameters g, LaneForcing f, int year, LaneState s,
      int b) {
    int at = b * LANES;
    DoubleVector production = DoubleVector.fromArray(SPECIES, f.grassPotentialKgPerHa,
        (year * s.blocks + b) * LANES).mul(DoubleVector.fromArray(SPECIES, s.blockScratch, at));
    production.intoArray(s.grassProductionKgPerHa, at);
    production.add(DoubleVector.fromArray(SPECIES, s.leftoverGrassKgPerHa, at)
            .mul(g.carryOverFraction()))
        .min(g.maxFuelKgPerHa())
        .intoArray(s.fuelKgPerHa, at);
  }
}
