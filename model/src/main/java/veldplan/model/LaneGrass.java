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
    double suppression = -g.treeSuppressionHaPerM2();
    for (int b = 0; b < blocks; b++) {
      int at = b * LANES;
      DoubleVector basalArea = DoubleVector.zero(SPECIES);
      int trees = b * TreeClass.COUNT;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        basalArea = basalArea.add(DoubleVector.fromArray(SPECIES, s.treesPerHa, (trees + k) * LANES)
            .mul(t.basalAreaM2PerTree[k]));
      }
      basalArea.intoArray(s.basalAreaM2PerHa, at);
      // TreeGrassCompetition.negativeExponential: G0 exp(-k X).
      basalArea.mul(suppression).intoArray(s.math, 0);
      VectorMath.exp(s.math, 0);
      DoubleVector production = DoubleVector.fromArray(SPECIES, f.grassPotentialKgPerHa,
          (year * blocks + b) * LANES).mul(DoubleVector.fromArray(SPECIES, s.math, 0));
      production.intoArray(s.grassProductionKgPerHa, at);
      production.add(DoubleVector.fromArray(SPECIES, s.leftoverGrassKgPerHa, at)
              .mul(g.carryOverFraction()))
          .min(g.maxFuelKgPerHa())
          .intoArray(s.fuelKgPerHa, at);
    }
  }
}
