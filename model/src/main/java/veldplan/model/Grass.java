package veldplan.model;

import veldplan.model.ecology.TreeGrassCompetition;

/**
 * Grass production and standing fuel.
 *
 * <p>Reads the year's grass potential (from the water balance), tree basal area and last year's
 * leftover grass; writes basal area, production and fuel (before grazing). Production is the
 * potential suppressed by trees in the negative exponential form G = G0 exp(-k X) of Smit (2005),
 * X the tree basal area: the first increments of tree biomass suppress grass the most.
 */
final class Grass {
  private Grass() {}

  static void grow(GrassParameters g, TreeParameters t, Forcing f, int year,
      EcosystemState s) {
    int blocks = s.blocks;
    for (int b = 0; b < blocks; b++) {
      double basalArea = 0;
      int trees = b * TreeClass.COUNT;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        basalArea += s.treesPerHa[trees + k] * t.basalAreaM2PerTree[k];
      }
      s.basalAreaM2PerHa[b] = basalArea;
      double production = TreeGrassCompetition.negativeExponential(
          f.grassPotentialKgPerHa[year * blocks + b], g.treeSuppressionHaPerM2(), basalArea);
      s.grassProductionKgPerHa[b] = production;
      s.fuelKgPerHa[b] = Math.min(g.maxFuelKgPerHa(),
          production + g.carryOverFraction() * s.leftoverGrassKgPerHa[b]);
    }
  }
}
