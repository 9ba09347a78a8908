package veldplan.model;

import static veldplan.model.Herbivory.CATEGORIES_PER_BLOCK;
import static veldplan.model.Herbivory.HIGH_BROWSE;
import static veldplan.model.Herbivory.KINDS_PER_POOL;
import static veldplan.model.Herbivory.LOW_BROWSE;
import static veldplan.model.Herbivory.POOLS;
import static veldplan.model.Herbivory.SHORT;
import static veldplan.model.Herbivory.TALL;
import static veldplan.model.LaneState.LANES;
import static veldplan.model.LaneState.SPECIES;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorMask;
import jdk.incubator.vector.VectorOperators;

/**
 * {@link Herbivory#forageAndGraze} for every lane of a {@link LaneState} at once; see there for
 * the model. Reach, acceptance and the overlap weights depend on the policy only and are read
 * from {@link LaneState#shared}; forage, diets and depletion differ between lanes. Sums are taken
 * in the scalar code's order, so each lane gets the same numbers. Small methods that pass arrays
 * rather than vectors, as in {@link LaneTrees}; entry i of a lane array starts at i x LANES.
 */
final class LaneHerbivory {
  private LaneHerbivory() {}

  static void forageAndGraze(ModelParameters p, LaneState s) {
    for (int b = 0; b < s.blocks; b++) {
      browseAndTallGrass(p, s, b);
    }
    elephantDiet(p, s);
    for (int b = 0; b < s.blocks; b++) {
      supply(p, s, b);
    }
    for (int h = 0; h < s.herbivores; h++) {
      forage(s, h);
    }
    for (int h = 0; h < s.herbivores; h++) {
      inverseForageAndDemand(p, s, h);
    }
    for (int pool = 0; pool < POOLS; pool++) {
      int o = 0;
      for (; o + 6 <= s.herbivores; o += 6) {
        depletionOfSix(s, pool, o);
      }
      for (; o + 3 <= s.herbivores; o += 3) {
        depletionOfThree(s, pool, o);
      }
      for (; o < s.herbivores; o++) {
        depletion(s, pool, o);
      }
    }
    java.util.Arrays.fill(s.grazedFraction, 0);
    java.util.Arrays.fill(s.browsePressure, 0);
    for (int h = 0; h < s.herbivores; h++) {
      share(s, h);
    }
    for (int b = 0; b < s.blocks; b++) {
      elephantUseAndPerHa(p, s, b);
      eat(s, b);
    }
  }

  /** Browse below and above 2 m, and this year's tall-grass share, of block b. */
  private static void browseAndTallGrass(ModelParameters p, LaneState s, int b) {
    TreeParameters t = p.trees();
    GrassParameters gp = p.grass();
    DoubleVector low = DoubleVector.zero(SPECIES);
    DoubleVector high = DoubleVector.zero(SPECIES);
    int trees = b * TreeClass.COUNT;
    for (int k = 0; k < TreeClass.COUNT; k++) {
      DoubleVector leaf = DoubleVector.fromArray(SPECIES, s.treesPerHa, (trees + k) * LANES)
          .mul(t.browseKgPerTreePerYear[k]);
      low = low.add(leaf.mul(t.lowBrowseShare[k]));
      high = high.add(leaf.mul(1 - t.lowBrowseShare[k]));
    }
    low.intoArray(s.lowBrowseKgPerHa, b * LANES);
    high.intoArray(s.highBrowseKgPerHa, b * LANES);
    DoubleVector intensity = DoubleVector.fromArray(SPECIES, s.grazedFraction, b * LANES)
        .div(gp.properUseFraction()).min(1);
    // tallMax x (1 - lawn x intensity); 1 - x is (-x) + 1 exactly.
    intensity.mul(gp.grazingLawnEffect()).neg().add(1).mul(gp.tallGrassMaxShare())
        .intoArray(s.tallShare, b * LANES);
  }

  /** Share of grass in each herbivore's diet; elephants choose by what they find. */
  private static void elephantDiet(ModelParameters p, LaneState s) {
    HerbivoreParameters hp = p.herbivores();
    int e = hp.elephant;
    double[] sums = s.dietSums;
    java.util.Arrays.fill(sums, 0);
    for (int b = 0; b < s.blocks; b++) {
      elephantReach(p, s, b);
    }
    DoubleVector grassReach = DoubleVector.fromArray(SPECIES, sums, 0);
    DoubleVector weighted = grassReach.add(DoubleVector.fromArray(SPECIES, sums, LANES)
        .mul(p.elephants().browsePreference()));
    DoubleVector.broadcast(SPECIES, hp.grassDietFraction[e])
        .blend(grassReach.div(weighted), weighted.compare(VectorOperators.GT, 0))
        .intoArray(s.grassDiet, e * LANES);
    for (int h = 0; h < hp.count; h++) {
      if (h != e) {
        java.util.Arrays.fill(s.grassDiet, h * LANES, (h + 1) * LANES,
            hp.grassDietFraction[h]);
      }
    }
  }

  /** Adds block b's grass and browse within the elephants' reach to s.dietSums. */
  private static void elephantReach(ModelParameters p, LaneState s, int b) {
    HerbivoreParameters hp = p.herbivores();
    double[] accept = hp.acceptance;
    int e = hp.elephant;
    int ea = e * CATEGORIES_PER_BLOCK;
    double area = p.blocks().areaHa[b] * s.shared.reach[e * s.blocks + b];
    int at = b * LANES;
    DoubleVector tall = DoubleVector.fromArray(SPECIES, s.tallShare, at);
    DoubleVector mix = tall.mul(accept[ea + TALL])
        .add(tall.neg().add(1).mul(accept[ea + SHORT]));
    DoubleVector.fromArray(SPECIES, s.dietSums, 0)
        .add(DoubleVector.fromArray(SPECIES, s.grassProductionKgPerHa, at)
            .mul(area * p.grass().properUseFraction()).mul(mix))
        .intoArray(s.dietSums, 0);
    DoubleVector.fromArray(SPECIES, s.dietSums, LANES)
        .add(DoubleVector.fromArray(SPECIES, s.lowBrowseKgPerHa, at).mul(accept[ea + LOW_BROWSE])
            .add(DoubleVector.fromArray(SPECIES, s.highBrowseKgPerHa, at)
                .mul(accept[ea + HIGH_BROWSE]))
            .mul(area * p.grass().browseUseFraction()))
        .intoArray(s.dietSums, LANES);
  }

  /** Usable supply of the four categories of block b. */
  private static void supply(ModelParameters p, LaneState s, int b) {
    BlockParameters bp = p.blocks();
    GrassParameters gp = p.grass();
    double[] supply = s.categorySupplyKg;
    int at = CATEGORIES_PER_BLOCK * b;
    DoubleVector grass = DoubleVector.fromArray(SPECIES, s.grassProductionKgPerHa, b * LANES)
        .mul(bp.areaHa[b] * gp.properUseFraction());
    DoubleVector tall = DoubleVector.fromArray(SPECIES, s.tallShare, b * LANES);
    grass.mul(tall).intoArray(supply, (at + TALL) * LANES);
    grass.mul(tall.neg().add(1)).intoArray(supply, (at + SHORT) * LANES);
    double browseArea = bp.areaHa[b] * gp.browseUseFraction();
    DoubleVector.fromArray(SPECIES, s.lowBrowseKgPerHa, b * LANES).mul(browseArea)
        .intoArray(supply, (at + LOW_BROWSE) * LANES);
    DoubleVector.fromArray(SPECIES, s.highBrowseKgPerHa, b * LANES).mul(browseArea)
        .intoArray(supply, (at + HIGH_BROWSE) * LANES);
  }

  /**
   * What herbivore h can use in each block, by category, and its forage: the categories summed
   * block by block (tall, short, low, high of block 0, then of block 1, ...), as the scalar code
   * adds them.
   */
  private static void forage(LaneState s, int h) {
    double[] supply = s.categorySupplyKg;
    double[] grassWeight = s.shared.usableWeight[0];
    double[] browseWeight = s.shared.usableWeight[1];
    DoubleVector grassShare = DoubleVector.fromArray(SPECIES, s.grassDiet, h * LANES);
    DoubleVector browseShare = grassShare.neg().add(1);
    DoubleVector forage = DoubleVector.zero(SPECIES);
    for (int b = 0; b < s.blocks; b++) {
      int at = CATEGORIES_PER_BLOCK * b;
      int j = (h * s.blocks + b) * KINDS_PER_POOL;
      DoubleVector tall = grassShare.mul(grassWeight[j])
          .mul(DoubleVector.fromArray(SPECIES, supply, (at + TALL) * LANES));
      DoubleVector short_ = grassShare.mul(grassWeight[j + 1])
          .mul(DoubleVector.fromArray(SPECIES, supply, (at + SHORT) * LANES));
      DoubleVector low = browseShare.mul(browseWeight[j])
          .mul(DoubleVector.fromArray(SPECIES, supply, (at + LOW_BROWSE) * LANES));
      DoubleVector high = browseShare.mul(browseWeight[j + 1])
          .mul(DoubleVector.fromArray(SPECIES, supply, (at + HIGH_BROWSE) * LANES));
      tall.intoArray(s.categoryForageKg[0], j * LANES);
      short_.intoArray(s.categoryForageKg[0], (j + 1) * LANES);
      low.intoArray(s.categoryForageKg[1], j * LANES);
      high.intoArray(s.categoryForageKg[1], (j + 1) * LANES);
      forage = forage.add(tall).add(short_).add(low).add(high);
    }
    forage.intoArray(s.forageKg, h * LANES);
  }

  /** 1 / forage (1 without forage), demand, and demand per unit of usable supply of h. */
  private static void inverseForageAndDemand(ModelParameters p, LaneState s, int h) {
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    DoubleVector forage = DoubleVector.fromArray(SPECIES, s.forageKg, h * LANES);
    one.blend(one.div(forage), forage.compare(VectorOperators.GT, 0))
        .intoArray(s.inverseForage, h * LANES);
    DoubleVector demand = DoubleVector.fromArray(SPECIES, s.abundance, h * LANES)
        .mul(p.herbivores().sharedIntakeKgPerYear[h]);
    demand.intoArray(s.sharedDemandKg, h * LANES);
    DoubleVector perForage = zero.blend(demand.div(forage),
        forage.compare(VectorOperators.GT, 0));
    DoubleVector diet = DoubleVector.fromArray(SPECIES, s.grassDiet, h * LANES);
    perForage.mul(diet).intoArray(s.demandPerUnitSupply, h * POOLS * LANES);
    perForage.mul(one.sub(diet)).intoArray(s.demandPerUnitSupply, (h * POOLS + 1) * LANES);
  }

  /**
   * Adds the demand of herbivores o, o + 1 and o + 2 on every category of one pool to the
   * depletion others meet: (d + q0 w0) + q1 w1 + q2 w2 in that order, as the scalar code adds
   * them (d absent for o = 0), in one pass over the categories.
   */
  private static void depletionOfThree(LaneState s, int pool, int o) {
    double[] depletion = s.depletion[pool];
    double[] w0 = s.shared.overlap[o * POOLS + pool];
    double[] w1 = s.shared.overlap[(o + 1) * POOLS + pool];
    double[] w2 = s.shared.overlap[(o + 2) * POOLS + pool];
    int span = s.herbivores * s.blocks * KINDS_PER_POOL;
    DoubleVector q0 = DoubleVector.fromArray(SPECIES, s.demandPerUnitSupply,
        (o * POOLS + pool) * LANES);
    DoubleVector q1 = DoubleVector.fromArray(SPECIES, s.demandPerUnitSupply,
        ((o + 1) * POOLS + pool) * LANES);
    DoubleVector q2 = DoubleVector.fromArray(SPECIES, s.demandPerUnitSupply,
        ((o + 2) * POOLS + pool) * LANES);
    if (o == 0) {
      for (int j = 0; j < span; j++) {
        q0.mul(w0[j]).add(q1.mul(w1[j])).add(q2.mul(w2[j])).intoArray(depletion, j * LANES);
      }
    } else {
      for (int j = 0; j < span; j++) {
        DoubleVector.fromArray(SPECIES, depletion, j * LANES).add(q0.mul(w0[j]))
            .add(q1.mul(w1[j])).add(q2.mul(w2[j])).intoArray(depletion, j * LANES);
      }
    }
  }

  /**
   * {@link #depletionOfThree} for herbivores o .. o + 5 in one pass: the same additions, left to
   * right, with half the loads and stores of the depletion.
   */
  private static void depletionOfSix(LaneState s, int pool, int o) {
    double[] depletion = s.depletion[pool];
    double[][] overlap = s.shared.overlap;
    double[] w0 = overlap[o * POOLS + pool];
    double[] w1 = overlap[(o + 1) * POOLS + pool];
    double[] w2 = overlap[(o + 2) * POOLS + pool];
    double[] w3 = overlap[(o + 3) * POOLS + pool];
    double[] w4 = overlap[(o + 4) * POOLS + pool];
    double[] w5 = overlap[(o + 5) * POOLS + pool];
    int span = s.herbivores * s.blocks * KINDS_PER_POOL;
    double[] q = s.demandPerUnitSupply;
    DoubleVector q0 = DoubleVector.fromArray(SPECIES, q, (o * POOLS + pool) * LANES);
    DoubleVector q1 = DoubleVector.fromArray(SPECIES, q, ((o + 1) * POOLS + pool) * LANES);
    DoubleVector q2 = DoubleVector.fromArray(SPECIES, q, ((o + 2) * POOLS + pool) * LANES);
    DoubleVector q3 = DoubleVector.fromArray(SPECIES, q, ((o + 3) * POOLS + pool) * LANES);
    DoubleVector q4 = DoubleVector.fromArray(SPECIES, q, ((o + 4) * POOLS + pool) * LANES);
    DoubleVector q5 = DoubleVector.fromArray(SPECIES, q, ((o + 5) * POOLS + pool) * LANES);
    if (o == 0) {
      for (int j = 0; j < span; j++) {
        q0.mul(w0[j]).add(q1.mul(w1[j])).add(q2.mul(w2[j])).add(q3.mul(w3[j]))
            .add(q4.mul(w4[j])).add(q5.mul(w5[j])).intoArray(depletion, j * LANES);
      }
    } else {
      for (int j = 0; j < span; j++) {
        DoubleVector.fromArray(SPECIES, depletion, j * LANES).add(q0.mul(w0[j]))
            .add(q1.mul(w1[j])).add(q2.mul(w2[j])).add(q3.mul(w3[j])).add(q4.mul(w4[j]))
            .add(q5.mul(w5[j])).intoArray(depletion, j * LANES);
      }
    }
  }

  /** Adds herbivore o's demand on every category of one pool to the depletion others meet. */
  private static void depletion(LaneState s, int pool, int o) {
    double[] depletion = s.depletion[pool];
    double[] w = s.shared.overlap[o * POOLS + pool];
    int span = s.herbivores * s.blocks * KINDS_PER_POOL;
    DoubleVector q = DoubleVector.fromArray(SPECIES, s.demandPerUnitSupply,
        (o * POOLS + pool) * LANES);
    if (o == 0) {
      for (int j = 0; j < span; j++) {
        q.mul(w[j]).intoArray(depletion, j * LANES);
      }
    } else {
      for (int j = 0; j < span; j++) {
        DoubleVector.fromArray(SPECIES, depletion, j * LANES).add(q.mul(w[j]))
            .intoArray(depletion, j * LANES);
      }
    }
  }

  /**
   * Herbivore h, block by block: its food-weighted depletion (pressureKg, times its forage at
   * the end) and what it eats (added to each block's grazed and browsed kg).
   */
  private static void share(LaneState s, int h) {
    DoubleVector inverse = DoubleVector.fromArray(SPECIES, s.inverseForage, h * LANES);
    DoubleVector demand = DoubleVector.fromArray(SPECIES, s.sharedDemandKg, h * LANES);
    DoubleVector pressure = DoubleVector.zero(SPECIES);
    for (int b = 0; b < s.blocks; b++) {
      int j = (h * s.blocks + b) * KINDS_PER_POOL;
      DoubleVector tall = DoubleVector.fromArray(SPECIES, s.categoryForageKg[0], j * LANES)
          .mul(inverse);
      DoubleVector short_ = DoubleVector.fromArray(SPECIES, s.categoryForageKg[0],
          (j + 1) * LANES).mul(inverse);
      DoubleVector low = DoubleVector.fromArray(SPECIES, s.categoryForageKg[1], j * LANES)
          .mul(inverse);
      DoubleVector high = DoubleVector.fromArray(SPECIES, s.categoryForageKg[1],
          (j + 1) * LANES).mul(inverse);
      DoubleVector dTall = DoubleVector.fromArray(SPECIES, s.depletion[0], j * LANES);
      DoubleVector dShort = DoubleVector.fromArray(SPECIES, s.depletion[0], (j + 1) * LANES);
      DoubleVector dLow = DoubleVector.fromArray(SPECIES, s.depletion[1], j * LANES);
      DoubleVector dHigh = DoubleVector.fromArray(SPECIES, s.depletion[1], (j + 1) * LANES);
      pressure = pressure.add(tall.mul(dTall)).add(short_.mul(dShort)).add(low.mul(dLow))
          .add(high.mul(dHigh));
      // The share of demand met in a category: share / depletion where it is over-used (the
      // division only where some lane over-uses the category).
      VectorMask<Double> overTall = dTall.compare(VectorOperators.GT, 1);
      VectorMask<Double> overShort = dShort.compare(VectorOperators.GT, 1);
      VectorMask<Double> overLow = dLow.compare(VectorOperators.GT, 1);
      DoubleVector metTall = overTall.anyTrue() ? tall.blend(tall.div(dTall), overTall) : tall;
      DoubleVector metShort = overShort.anyTrue()
          ? short_.blend(short_.div(dShort), overShort) : short_;
      DoubleVector metLow = overLow.anyTrue() ? low.blend(low.div(dLow), overLow) : low;
      DoubleVector.fromArray(SPECIES, s.grazedFraction, b * LANES).add(demand.mul(metTall))
          .add(demand.mul(metShort)).intoArray(s.grazedFraction, b * LANES);
      DoubleVector.fromArray(SPECIES, s.browsePressure, b * LANES).add(demand.mul(metLow))
          .intoArray(s.browsePressure, b * LANES);
    }
    pressure.mul(DoubleVector.fromArray(SPECIES, s.forageKg, h * LANES))
        .intoArray(s.pressureKg, h * LANES);
  }

  /** The elephants' use of block b, and the eaten kg per ha (still kg: see eat). */
  private static void elephantUseAndPerHa(ModelParameters p, LaneState s, int b) {
    BlockParameters bp = p.blocks();
    int e = p.herbivores().elephant;
    int j = (e * s.blocks + b) * KINDS_PER_POOL;
    DoubleVector inverse = DoubleVector.fromArray(SPECIES, s.inverseForage, e * LANES);
    DoubleVector used = DoubleVector.zero(SPECIES)
        .add(DoubleVector.fromArray(SPECIES, s.categoryForageKg[0], j * LANES).mul(inverse))
        .add(DoubleVector.fromArray(SPECIES, s.categoryForageKg[0], (j + 1) * LANES)
            .mul(inverse))
        .add(DoubleVector.fromArray(SPECIES, s.categoryForageKg[1], j * LANES).mul(inverse))
        .add(DoubleVector.fromArray(SPECIES, s.categoryForageKg[1], (j + 1) * LANES)
            .mul(inverse));
    DoubleVector.fromArray(SPECIES, s.grazedFraction, b * LANES).div(bp.areaHa[b])
        .intoArray(s.grazedFraction, b * LANES);
    DoubleVector.fromArray(SPECIES, s.browsePressure, b * LANES).div(bp.areaHa[b])
        .intoArray(s.browsePressure, b * LANES);
    used.mul(DoubleVector.fromArray(SPECIES, s.abundance, e * LANES).div(bp.areaKm2[b]))
        .intoArray(s.elephantsPerKm2, b * LANES);
  }

  /** Grazing takes grass from the fuel; the grazed and browsed shares of block b. */
  private static void eat(LaneState s, int b) {
    int at = b * LANES;
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector fuel = DoubleVector.fromArray(SPECIES, s.fuelKgPerHa, at);
    DoubleVector eaten = DoubleVector.fromArray(SPECIES, s.grazedFraction, at).min(fuel);
    fuel.sub(eaten).intoArray(s.fuelKgPerHa, at);
    DoubleVector production = DoubleVector.fromArray(SPECIES, s.grassProductionKgPerHa, at);
    zero.blend(eaten.div(production).min(1), production.compare(VectorOperators.GT, 0))
        .intoArray(s.grazedFraction, at);
    DoubleVector available = DoubleVector.fromArray(SPECIES, s.lowBrowseKgPerHa, at);
    zero.blend(DoubleVector.fromArray(SPECIES, s.browsePressure, at).div(available).min(1),
        available.compare(VectorOperators.GT, 0)).intoArray(s.browsePressure, at);
  }
}
