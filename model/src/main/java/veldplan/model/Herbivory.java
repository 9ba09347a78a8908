package veldplan.model;

import veldplan.model.ecology.WaterCoverage;

/**
 * Forage, who can reach it, how guilds share it, and what they eat.
 *
 * <h2>Reach</h2>
 * A water-dependent herbivore forages only within its dry-season distance d of water. The share
 * of a block within d of its open artificial water points and perennial rivers is the coverage of
 * randomly placed discs and strips (Boolean model, Hall 1988, from memory):
 * 1 - exp(-(n pi d^2 + 2 d L) / A). Closing points shrinks it. This is how water shapes the
 * guilds (Redfern et al. 2003, 2005; Western 1975): where water is plentiful the bulk grazers
 * reach everywhere, and the rare selective grazer, which forages far from water, loses its
 * refuge (as argued for roan antelope by Harrington et al. 1999, from memory).
 *
 * <h2>Forage</h2>
 * Grass production and browse production (leaf per tree by height class; elephants reach all
 * heights, other browsers only what stands within reach) within reach, times the proper-use
 * share, split by the guild's diet share. Elephants choose browse over grass with a fixed
 * preference (Chesson-type selection), so they shift to grass when browse gets scarce.
 *
 * <h2>Sharing</h2>
 * Resources are (block, grass|browse) categories. Each guild's use of them gives MacArthur &amp;
 * Levins (1967, Am. Nat. 101: 377–385) competition coefficients
 * alpha_ij = sum_k p_ik p_jk / sum_k p_ik^2, from memory. A guild's forage pressure is its own
 * demand plus alpha-weighted demand of the others; guilds that share little (different diet,
 * different distance from water) can coexist. What each guild eats is its demand, cut back
 * when the pressure exceeds its forage, spread over the categories it uses.
 */
final class Herbivory {
  private Herbivory() {}

  /** Recomputes every herbivore's reach for the water points open this year. */
  static void updateReach(BlockParameters bp, HerbivoreParameters hp, EcosystemState s) {
    int blocks = s.blocks;
    for (int h = 0; h < hp.count; h++) {
      double d = hp.reachKm[h];
      for (int b = 0; b < blocks; b++) {
        s.reach[h * blocks + b] = Double.isInfinite(d) ? 1
            : WaterCoverage.fractionWithinReach(bp.areaKm2[b], s.waterPointsOpen[b],
                bp.perennialRiverKm[b], d);
      }
    }
  }

  static void forageAndGraze(ModelParameters p, EcosystemState s) {
    BlockParameters bp = p.blocks();
    HerbivoreParameters hp = p.herbivores();
    TreeParameters t = p.trees();
    double use = p.grass().properUseFraction();
    int blocks = s.blocks;
    int herbivores = hp.count;
    int categories = blocks * 2;

    for (int b = 0; b < blocks; b++) {
      double reachable = 0;
      double all = 0;
      int trees = b * TreeClass.COUNT;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        double leaf = s.treesPerHa[trees + k] * t.browseKgPerTreePerYear[k];
        all += leaf;
        reachable += leaf * t.browseReachFraction[k];
      }
      s.browseKgPerHa[b] = reachable;
      s.browseAllKgPerHa[b] = all;
    }

    // Elephants' diet: browse preferred over grass in proportion to what is within reach.
    int e = hp.elephant;
    double grassReach = 0;
    double browseReach = 0;
    for (int b = 0; b < blocks; b++) {
      double area = bp.areaHa[b] * s.reach[e * blocks + b];
      grassReach += area * s.grassProductionKgPerHa[b];
      browseReach += area * s.browseAllKgPerHa[b];
    }
    double preference = p.elephants().browsePreference();
    double weighted = grassReach + preference * browseReach;
    s.grassDiet[e] = weighted > 0 ? grassReach / weighted : hp.grassDietFraction[e];
    for (int h = 0; h < herbivores; h++) {
      if (h != e) {
        s.grassDiet[h] = hp.grassDietFraction[h];
      }
    }

    // Forage within reach per category, and its shares p_hk.
    double[] share = s.resourceShare;
    for (int h = 0; h < herbivores; h++) {
      double grassShare = s.grassDiet[h];
      double forage = 0;
      int row = h * categories;
      for (int b = 0; b < blocks; b++) {
        double area = bp.areaHa[b] * s.reach[h * blocks + b] * use;
        double browse = h == e ? s.browseAllKgPerHa[b] : s.browseKgPerHa[b];
        double grass = area * grassShare * s.grassProductionKgPerHa[b];
        double leaves = area * (1 - grassShare) * browse;
        share[row + 2 * b] = grass;
        share[row + 2 * b + 1] = leaves;
        forage += grass + leaves;
      }
      s.forageKg[h] = forage;
      if (forage > 0) {
        for (int c = 0; c < categories; c++) {
          share[row + c] /= forage;
        }
      }
    }

    // Pressure with MacArthur–Levins overlaps.
    for (int h = 0; h < herbivores; h++) {
      int row = h * categories;
      double self = 0;
      for (int c = 0; c < categories; c++) {
        self += share[row + c] * share[row + c];
      }
      double pressure = s.abundance[h] * hp.intakeKgPerYear[h];
      if (self > 0) {
        for (int o = 0; o < herbivores; o++) {
          if (o == h || s.abundance[o] == 0) {
            continue;
          }
          int other = o * categories;
          double overlap = 0;
          for (int c = 0; c < categories; c++) {
            overlap += share[row + c] * share[other + c];
          }
          pressure += overlap / self * s.abundance[o] * hp.intakeKgPerYear[o];
        }
      }
      s.pressureKg[h] = pressure;
    }

    // What is eaten, by block: grass from fuel, browse as pressure on the trees.
    for (int b = 0; b < blocks; b++) {
      s.browsePressure[b] = 0;
      s.elephantsPerKm2[b] = 0;
    }
    for (int h = 0; h < herbivores; h++) {
      double demand = s.abundance[h] * hp.intakeKgPerYear[h];
      if (demand == 0 || s.forageKg[h] == 0) {
        continue;
      }
      double eaten = demand * Math.min(1, s.forageKg[h] / s.pressureKg[h]);
      int row = h * categories;
      for (int b = 0; b < blocks; b++) {
        double grassKgPerHa = eaten * share[row + 2 * b] / bp.areaHa[b];
        s.fuelKgPerHa[b] = Math.max(0, s.fuelKgPerHa[b] - grassKgPerHa);
        s.browsePressure[b] += eaten * share[row + 2 * b + 1] / bp.areaHa[b];
        if (h == e) {
          s.elephantsPerKm2[b] = s.abundance[h] * (share[row + 2 * b] + share[row + 2 * b + 1])
              / bp.areaKm2[b];
        }
      }
    }
    for (int b = 0; b < blocks; b++) {
      double available = s.browseAllKgPerHa[b];
      s.browsePressure[b] = available > 0 ? Math.min(1, s.browsePressure[b] / available) : 0;
    }
  }
}
