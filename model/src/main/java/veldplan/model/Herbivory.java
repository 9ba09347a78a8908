package veldplan.model;

import java.util.Arrays;
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
 * Grass production and browse production (leaf per tree by height class, below and above
 * 2 m) within reach, times the usable share, split by the guild's diet share. Grass is tall or
 * short: the share standing tall falls with the share eaten the year before (grazing makes
 * lawns). Each feeding role accepts the four kinds of forage differently, so heavy bulk grazing near water takes the tall grass the selective
 * grazer needs and makes the short swards mixed feeders prefer. Elephants choose browse over
 * grass with a fixed preference (Chesson-type selection), so they shift to grass when browse gets
 * scarce.
 *
 * <h2>Coarse forage</h2>
 * Gut capacity scales with body mass while needs scale with mass^0.75, so large herbivores can
 * live on coarser forage (the Jarman–Bell principle; Demment &amp; Van Soest 1985; methods sheet
 * §9.2). A herbivore heavier than a 450 kg large stock unit takes only 1 / f of its intake from
 * the forage the others use, f = (W / 450)^0.25, and the rest from the stems, bark and coarse
 * grass others leave; both its own depletion and the depletion it causes others use that share.
 * That coarse material is a pool the model does not track: eating it takes nothing from the
 * fuel or the browse (a simplification).
 *
 * <h2>Sharing</h2>
 * Resources are (block, tall grass|short grass|low browse|high browse) categories. Each
 * herbivore spreads its demand (head x intake) over the categories in proportion to what it can
 * use of each (p_hk). In each category, the herbivore meets a depletion: the demand of all
 * herbivores on the part it can use — within its reach, and within the share of the category it
 * accepts — over the usable supply there. A selective feeder that accepts a small share of a
 * category is limited by that share, while others eating the whole category take from it in
 * proportion. Its food
 * limitation is the p-weighted mean depletion (1 = demand equals supply), and it eats its demand
 * in each category, cut back pro rata where that category is over-used. Herbivores that share a
 * category feel the same depletion of it, so none is excluded merely by being outnumbered; what
 * differs between them is the mix of categories they use (diet, tall or short grass, low or
 * high browse, distance from water). This is our design: exploitative competition for shared
 * resource categories with ratio-dependent limitation (Arditi &amp; Ginzburg 1989, from memory).
 *
 * <h2>How the sharing is computed</h2>
 * With r the reach, a the acceptance, s the diet share of the category's pool (grass or
 * browse), S the usable supply of category k and F_o = sum_k r_o a_o s_o S_k the forage of o,
 * o spreads its demand D_o as D_o r_o a_o s_o S_k / F_o over k, that is D_o s_o S_k / F_o per
 * unit of r_o a_o. The depletion h meets in k is that demand density times the overlap weight
 * min(r_h, r_o) min(a_h, a_o) / (r_h a_h), summed over o, over S_k; S_k cancels:
 * <pre>
 *   depletion_hk = sum_o (D_o s_o(pool of k) / F_o) x overlap_hok
 * </pre>
 * The overlap weights depend only on reach and acceptance, so {@link #updateReach} keeps them
 * (in year 0 and when water points change); a year costs one multiply-add per (o, h,
 * category) in a few long loops the JIT vectorises. Compared with summing the demand densities
 * and dividing by the supply, the result differs only by rounding (the products are grouped
 * differently), by a relative 1e-12 or less over a 100-year run of the example.
 */
final class Herbivory {
  /** Resource categories per block: tall grass, short grass, low browse, high browse. */
  static final int CATEGORIES_PER_BLOCK = 4;
  static final int TALL = 0;
  static final int SHORT = 1;
  static final int LOW_BROWSE = 2;
  static final int HIGH_BROWSE = 3;
  /** Forage pools: grass (tall, short) and browse (low, high); a diet splits between them. */
  static final int POOLS = 2;
  /** Categories per pool and block: the pool's categories are 2 pool and 2 pool + 1. */
  static final int KINDS_PER_POOL = 2;

  private Herbivory() {}

  /**
   * Recomputes every herbivore's reach for the water points open this year, and the weights
   * that depend only on reach and acceptance (see "How the sharing is computed" in the class
   * comment): the usable part of each category, reach x acceptance, and the overlap weights.
   */
  static void updateReach(BlockParameters bp, HerbivoreParameters hp, EcosystemState s) {
    int blocks = s.blocks;
    int herbivores = hp.count;
    for (int h = 0; h < herbivores; h++) {
      double d = hp.reachKm[h];
      for (int b = 0; b < blocks; b++) {
        s.reach[h * blocks + b] = Double.isInfinite(d) ? 1
            : WaterCoverage.fractionWithinReach(bp.areaKm2[b], s.waterPointsOpen[b],
                bp.perennialRiverKm[b], d);
      }
    }
    double[] accept = hp.acceptance;
    for (int h = 0; h < herbivores; h++) {
      for (int b = 0; b < blocks; b++) {
        for (int c = 0; c < CATEGORIES_PER_BLOCK; c++) {
          s.usableWeight[c / KINDS_PER_POOL][(h * blocks + b) * KINDS_PER_POOL
              + c % KINDS_PER_POOL] = s.reach[h * blocks + b] * accept[h * CATEGORIES_PER_BLOCK + c];
        }
      }
    }
    // Overlap weights: the part of o's demand in category k that falls where h feeds, over
    // the supply h can use there (as a share of the category's whole supply):
    // min(r_h, r_o) / r_o x min(a_h, a_o) / a_o, divided by r_h a_h. The demand density of o
    // is per unit of its reach and acceptance, so the weight kept here is
    // min(r_h, r_o) min(a_h, a_o) / (r_h a_h). Stored as one row per (o, pool), indexed
    // [h][block][kind of the pool], so that compete() adds each o's contribution to a whole
    // pool in one loop over rows indexed alike (which the JIT vectorises).
    for (int o = 0; o < herbivores; o++) {
      for (int pool = 0; pool < POOLS; pool++) {
        double[] weights = s.overlap[o * POOLS + pool];
        for (int h = 0; h < herbivores; h++) {
          for (int b = 0; b < blocks; b++) {
            double rh = s.reach[h * blocks + b];
            double ro = s.reach[o * blocks + b];
            for (int kind = 0; kind < KINDS_PER_POOL; kind++) {
              int c = pool * KINDS_PER_POOL + kind;
              double ah = accept[h * CATEGORIES_PER_BLOCK + c];
              double ao = accept[o * CATEGORIES_PER_BLOCK + c];
              weights[(h * blocks + b) * KINDS_PER_POOL + kind] = rh > 0 && ah > 0
                  ? Math.min(rh, ro) * Math.min(ah, ao) / (rh * ah) : 0;
            }
          }
        }
      }
    }
  }

  /** Forage, sharing and grazing of one year; see the class comment. */
  static void forageAndGraze(ModelParameters p, EcosystemState s) {
    browseAndTallGrass(p, s);
    elephantDiet(p, s);
    usableForage(p, s);
    compete(p, s);
    eat(s);
  }

  /** Browse below and above 2 m, and this year's tall-grass share, per block. */
  static void browseAndTallGrass(ModelParameters p, EcosystemState s) {
    TreeParameters t = p.trees();
    GrassParameters gp = p.grass();
    double grassUse = gp.properUseFraction();
    int blocks = s.blocks;
    for (int b = 0; b < blocks; b++) {
      double low = 0;
      double high = 0;
      int trees = b * TreeClass.COUNT;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        double leaf = s.treesPerHa[trees + k] * t.browseKgPerTreePerYear[k];
        low += leaf * t.lowBrowseShare[k];
        high += leaf * (1 - t.lowBrowseShare[k]);
      }
      s.lowBrowseKgPerHa[b] = low;
      s.highBrowseKgPerHa[b] = high;
      double intensity = Math.min(1, s.grazedFraction[b] / grassUse);
      s.tallShare[b] = gp.tallGrassMaxShare() * (1 - gp.grazingLawnEffect() * intensity);
    }

  }

  /** Share of grass in each herbivore's diet; elephants choose by what they find. */
  static void elephantDiet(ModelParameters p, EcosystemState s) {
    BlockParameters bp = p.blocks();
    HerbivoreParameters hp = p.herbivores();
    int blocks = s.blocks;
    int herbivores = hp.count;
    double[] accept = hp.acceptance;
    // Elephants' diet: browse preferred over grass in proportion to what they accept in reach.
    int e = hp.elephant;
    int ea = e * CATEGORIES_PER_BLOCK;
    double grassUse = p.grass().properUseFraction();
    double browseUse = p.grass().browseUseFraction();
    double grassReach = 0;
    double browseReach = 0;
    for (int b = 0; b < blocks; b++) {
      double area = bp.areaHa[b] * s.reach[e * blocks + b];
      double tall = s.tallShare[b];
      grassReach += area * grassUse * s.grassProductionKgPerHa[b]
          * (accept[ea + TALL] * tall + accept[ea + SHORT] * (1 - tall));
      browseReach += area * browseUse * (accept[ea + LOW_BROWSE] * s.lowBrowseKgPerHa[b]
          + accept[ea + HIGH_BROWSE] * s.highBrowseKgPerHa[b]);
    }
    double preference = p.elephants().browsePreference();
    double weighted = grassReach + preference * browseReach;
    s.grassDiet[e] = weighted > 0 ? grassReach / weighted : hp.grassDietFraction[e];
    for (int h = 0; h < herbivores; h++) {
      if (h != e) {
        s.grassDiet[h] = hp.grassDietFraction[h];
      }
    }

  }

  /** Usable supply per category, and each herbivore's forage and shares p_hk. */
  static void usableForage(ModelParameters p, EcosystemState s) {
    GrassParameters gp = p.grass();
    double grassUse = gp.properUseFraction();
    double browseUse = gp.browseUseFraction();
    BlockParameters bp = p.blocks();
    HerbivoreParameters hp = p.herbivores();
    int blocks = s.blocks;
    int herbivores = hp.count;
    // Usable forage per category (tall grass, short grass, low and high browse of each block).
    double[] supply = s.categorySupplyKg;
    for (int b = 0; b < blocks; b++) {
      int at = CATEGORIES_PER_BLOCK * b;
      double grass = bp.areaHa[b] * grassUse * s.grassProductionKgPerHa[b];
      supply[at + TALL] = grass * s.tallShare[b];
      supply[at + SHORT] = grass * (1 - s.tallShare[b]);
      supply[at + LOW_BROWSE] = bp.areaHa[b] * browseUse * s.lowBrowseKgPerHa[b];
      supply[at + HIGH_BROWSE] = bp.areaHa[b] * browseUse * s.highBrowseKgPerHa[b];
    }

    // What each herbivore can use: supply within its reach that it accepts, split by its diet,
    // and its total. Kept per pool, [pool][(h * blocks + b) * 2 + kind].
    // (reach x acceptance is kept by updateReach: the same product, in the same order.)
    double[] grassForage = s.categoryForageKg[0];
    double[] browseForage = s.categoryForageKg[1];
    double[] grassWeight = s.usableWeight[0];
    double[] browseWeight = s.usableWeight[1];
    // Block by block, herbivore by herbivore within the block: each herbivore's forage is still
    // summed in the order tall, short, low, high of block 0, then of block 1, ... (the same
    // bits), but the sums of different herbivores are independent and overlap in the CPU
    // instead of waiting on each other's additions.
    double[] forage = s.forageKg;
    for (int h = 0; h < herbivores; h++) {
      forage[h] = 0;
    }
    double[] diet = s.grassDiet;
    for (int b = 0; b < blocks; b++) {
      int at = CATEGORIES_PER_BLOCK * b;
      double tallSupply = supply[at + TALL];
      double shortSupply = supply[at + SHORT];
      double lowSupply = supply[at + LOW_BROWSE];
      double highSupply = supply[at + HIGH_BROWSE];
      for (int h = 0; h < herbivores; h++) {
        double grassShare = diet[h];
        double browseShare = 1 - grassShare;
        int j = (h * blocks + b) * KINDS_PER_POOL;
        double tall = grassWeight[j] * grassShare * tallSupply;
        double short_ = grassWeight[j + 1] * grassShare * shortSupply;
        double low = browseWeight[j] * browseShare * lowSupply;
        double high = browseWeight[j + 1] * browseShare * highSupply;
        grassForage[j] = tall;
        grassForage[j + 1] = short_;
        browseForage[j] = low;
        browseForage[j + 1] = high;
        double sum = forage[h];
        sum += tall;
        sum += short_;
        sum += low;
        sum += high;
        forage[h] = sum;
      }
    }
    // The shares p_hk are these amounts times 1 / forage_h, taken where they are used
    // (compete): the same product as normalising them here, without a pass over the rows.
    double[] inverseForage = s.inverseForage;
    for (int h = 0; h < herbivores; h++) {
      double total = forage[h];
      inverseForage[h] = total > 0 ? 1 / total : 1;
    }
  }

  /** Depletion each herbivore meets, what it gets, and what is eaten where. */
  static void compete(ModelParameters p, EcosystemState s) {
    int e = p.herbivores().elephant;
    BlockParameters bp = p.blocks();
    HerbivoreParameters hp = p.herbivores();
    int blocks = s.blocks;
    int herbivores = hp.count;
    int span = herbivores * blocks * KINDS_PER_POOL;
    // Depletion h meets in category k: the demand falling on the part of k it can use, over the
    // supply of that part. Reach areas are nested (around the same water) and so are accepted
    // shares (from the most to the least selective); each herbivore spreads its demand evenly
    // over what it reaches and accepts. o's demand on k per unit of usable supply is
    // demand_o x pool_o / forage_o (see the class comment), the same in every category of the
    // pool, and the overlap weights, kept by updateReach, do the rest.
    double[] sharedDemand = s.sharedDemandKg;
    double[] perUnit = s.demandPerUnitSupply;
    for (int o = 0; o < herbivores; o++) {
      double demand = s.abundance[o] * hp.sharedIntakeKgPerYear[o];
      sharedDemand[o] = demand;
      double forage = s.forageKg[o];
      double perForage = forage > 0 ? demand / forage : 0;
      perUnit[o * POOLS] = perForage * s.grassDiet[o];
      perUnit[o * POOLS + 1] = perForage * (1 - s.grassDiet[o]);
    }
    // depletion = sum over o of q_o x weights_o, added in the order o = 0, 1, 2, ... as
    // ((q0 w0 + q1 w1) + q2 w2) + ...; three herbivores per pass over the row (same sums, same
    // order, same bits as one pass per herbivore, with a third of the loads and stores).
    for (int pool = 0; pool < POOLS; pool++) {
      double[] depletion = s.depletion[pool];
      int o = 0;
      for (; o + 3 <= herbivores; o += 3) {
        addThree(depletion, span, o == 0,
            perUnit[o * POOLS + pool], s.overlap[o * POOLS + pool],
            perUnit[(o + 1) * POOLS + pool], s.overlap[(o + 1) * POOLS + pool],
            perUnit[(o + 2) * POOLS + pool], s.overlap[(o + 2) * POOLS + pool]);
      }
      for (; o < herbivores; o++) {
        addOne(depletion, span, o == 0, perUnit[o * POOLS + pool], s.overlap[o * POOLS + pool]);
      }
    }
    // Per category: the share of h's forage times the depletion there, and the share of its
    // demand met there: all of it unless the category is over-used (depletion above 1), where
    // it gets share / depletion. One pass over each herbivore's row, summed category by
    // category (tall, short, low, high of each block). A category h does not use (share 0)
    // adds exactly 0 to every sum (the depletion is finite), so no test is needed; and where
    // the depletion is at most 1, share / max(1, d) is share itself, so the division is done
    // only where d > 1 (both give the same bits). High browse is not in the browsed share.
    double[] grassForage = s.categoryForageKg[0];
    double[] browseForage = s.categoryForageKg[1];
    double[] inverseForage = s.inverseForage;
    double[] grassDepletion = s.depletion[0];
    double[] browseDepletion = s.depletion[1];
    double[] grazedKg = s.grazedFraction;
    double[] browsedKg = s.browsePressure;
    double[] elephantUse = s.elephantsPerKm2;
    for (int b = 0; b < blocks; b++) {
      grazedKg[b] = 0;
      browsedKg[b] = 0;
    }
    for (int h = 0; h < herbivores; h++) {
      double demand = sharedDemand[h];
      double inverse = inverseForage[h];
      double pressure = 0;
      for (int b = 0; b < blocks; b++) {
        int j = (h * blocks + b) * KINDS_PER_POOL;
        double tall = grassForage[j] * inverse;
        double short_ = grassForage[j + 1] * inverse;
        double low = browseForage[j] * inverse;
        double high = browseForage[j + 1] * inverse;
        double dTall = grassDepletion[j];
        double dShort = grassDepletion[j + 1];
        double dLow = browseDepletion[j];
        double dHigh = browseDepletion[j + 1];
        pressure += tall * dTall;
        pressure += short_ * dShort;
        pressure += low * dLow;
        pressure += high * dHigh;
        double grazed = grazedKg[b];
        grazed += demand * (dTall > 1 ? tall / dTall : tall);
        grazed += demand * (dShort > 1 ? short_ / dShort : short_);
        grazedKg[b] = grazed;
        browsedKg[b] += demand * (dLow > 1 ? low / dLow : low);
      }
      s.pressureKg[h] = pressure * s.forageKg[h];
    }
    // The share of each block the elephants use: the sum of their shares there.
    for (int b = 0; b < blocks; b++) {
      int j = (e * blocks + b) * KINDS_PER_POOL;
      double inverse = inverseForage[e];
      double used = 0;
      used += grassForage[j] * inverse;
      used += grassForage[j + 1] * inverse;
      used += browseForage[j] * inverse;
      used += browseForage[j + 1] * inverse;
      elephantUse[b] = used;
    }
    for (int b = 0; b < blocks; b++) {
      // Eaten kg/ha for now; eat() turns both into shares of what there was.
      grazedKg[b] /= bp.areaHa[b];
      browsedKg[b] /= bp.areaHa[b];
      elephantUse[b] *= s.abundance[e] / bp.areaKm2[b];
    }
  }

  /** depletion = (first ? 0 : depletion) + q0 w0 + q1 w1 + q2 w2, added left to right. */
  private static void addThree(double[] depletion, int span, boolean first, double q0,
      double[] w0, double q1, double[] w1, double q2, double[] w2) {
    if (first) {
      for (int j = 0; j < span; j++) {
        depletion[j] = q0 * w0[j] + q1 * w1[j] + q2 * w2[j];
      }
    } else {
      for (int j = 0; j < span; j++) {
        depletion[j] = depletion[j] + q0 * w0[j] + q1 * w1[j] + q2 * w2[j];
      }
    }
  }

  /** depletion = (first ? 0 : depletion) + q w. */
  private static void addOne(double[] depletion, int span, boolean first, double q,
      double[] w) {
    if (first) {
      for (int j = 0; j < span; j++) {
        depletion[j] = q * w[j];
      }
    } else {
      for (int j = 0; j < span; j++) {
        depletion[j] = depletion[j] + q * w[j];
      }
    }
  }

  /** Grazing takes grass from the fuel; the grazed and browsed shares of the year. */
  static void eat(EcosystemState s) {
    int blocks = s.blocks;
    for (int b = 0; b < blocks; b++) {
      double eatenKgPerHa = Math.min(s.grazedFraction[b], s.fuelKgPerHa[b]);
      s.fuelKgPerHa[b] -= eatenKgPerHa;
      double production = s.grassProductionKgPerHa[b];
      s.grazedFraction[b] = production > 0 ? Math.min(1, eatenKgPerHa / production) : 0;
      double available = s.lowBrowseKgPerHa[b];
      s.browsePressure[b] = available > 0 ? Math.min(1, s.browsePressure[b] / available) : 0;
    }
  }
}
