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
import jdk.incubator.vector.VectorOperators;

/**
 * {@link Herbivory#forageAndGraze} for every lane of a {@link LaneState} at once; see there for
 * the model. Reach, acceptance and the overlap weights depend on the policy only and are read
 * from {@link LaneState#shared}; forage, diets and depletion differ between lanes. Sums are taken
 * in the scalar code's order, so each lane gets the same numbers.
 */
final class LaneHerbivory {
  private LaneHerbivory() {}

  static void forageAndGraze(ModelParameters p, LaneState s) {
    browseAndTallGrass(p, s);
    elephantDiet(p, s);
    usableForage(p, s);
    compete(p, s);
    eat(s);
  }

  private static DoubleVector load(double[] a, int entry) {
    return DoubleVector.fromArray(SPECIES, a, entry * LANES);
  }

  private static void store(DoubleVector v, double[] a, int entry) {
    v.intoArray(a, entry * LANES);
  }

  static void browseAndTallGrass(ModelParameters p, LaneState s) {
    TreeParameters t = p.trees();
    GrassParameters gp = p.grass();
    double grassUse = gp.properUseFraction();
    DoubleVector zero = DoubleVector.zero(SPECIES);
    for (int b = 0; b < s.blocks; b++) {
      DoubleVector low = zero;
      DoubleVector high = zero;
      int trees = b * TreeClass.COUNT;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        DoubleVector leaf = load(s.treesPerHa, trees + k).mul(t.browseKgPerTreePerYear[k]);
        low = low.add(leaf.mul(t.lowBrowseShare[k]));
        high = high.add(leaf.mul(1 - t.lowBrowseShare[k]));
      }
      store(low, s.lowBrowseKgPerHa, b);
      store(high, s.highBrowseKgPerHa, b);
      DoubleVector intensity = load(s.grazedFraction, b).div(grassUse).min(1);
      store(intensity.mul(gp.grazingLawnEffect()).neg().add(1).mul(gp.tallGrassMaxShare()),
          s.tallShare, b);
    }
  }

  static void elephantDiet(ModelParameters p, LaneState s) {
    BlockParameters bp = p.blocks();
    HerbivoreParameters hp = p.herbivores();
    int blocks = s.blocks;
    double[] accept = hp.acceptance;
    int e = hp.elephant;
    int ea = e * CATEGORIES_PER_BLOCK;
    double grassUse = p.grass().properUseFraction();
    double browseUse = p.grass().browseUseFraction();
    DoubleVector grassReach = DoubleVector.zero(SPECIES);
    DoubleVector browseReach = DoubleVector.zero(SPECIES);
    for (int b = 0; b < blocks; b++) {
      double area = bp.areaHa[b] * s.shared.reach[e * blocks + b];
      DoubleVector tall = load(s.tallShare, b);
      DoubleVector mix = tall.mul(accept[ea + TALL])
          .add(tall.neg().add(1).mul(accept[ea + SHORT]));
      grassReach = grassReach.add(load(s.grassProductionKgPerHa, b).mul(area * grassUse)
          .mul(mix));
      browseReach = browseReach.add(load(s.lowBrowseKgPerHa, b).mul(accept[ea + LOW_BROWSE])
          .add(load(s.highBrowseKgPerHa, b).mul(accept[ea + HIGH_BROWSE]))
          .mul(area * browseUse));
    }
    DoubleVector weighted = grassReach.add(browseReach.mul(p.elephants().browsePreference()));
    store(DoubleVector.broadcast(SPECIES, hp.grassDietFraction[e]).blend(
        grassReach.div(weighted), weighted.compare(VectorOperators.GT, 0)), s.grassDiet, e);
    for (int h = 0; h < hp.count; h++) {
      if (h != e) {
        store(DoubleVector.broadcast(SPECIES, hp.grassDietFraction[h]), s.grassDiet, h);
      }
    }
  }

  static void usableForage(ModelParameters p, LaneState s) {
    GrassParameters gp = p.grass();
    double grassUse = gp.properUseFraction();
    double browseUse = gp.browseUseFraction();
    BlockParameters bp = p.blocks();
    int blocks = s.blocks;
    int herbivores = s.herbivores;
    double[] supply = s.categorySupplyKg;
    for (int b = 0; b < blocks; b++) {
      int at = CATEGORIES_PER_BLOCK * b;
      DoubleVector grass = load(s.grassProductionKgPerHa, b).mul(bp.areaHa[b] * grassUse);
      DoubleVector tall = load(s.tallShare, b);
      store(grass.mul(tall), supply, at + TALL);
      store(grass.mul(tall.neg().add(1)), supply, at + SHORT);
      store(load(s.lowBrowseKgPerHa, b).mul(bp.areaHa[b] * browseUse), supply,
          at + LOW_BROWSE);
      store(load(s.highBrowseKgPerHa, b).mul(bp.areaHa[b] * browseUse), supply,
          at + HIGH_BROWSE);
    }
    double[] grassForage = s.categoryForageKg[0];
    double[] browseForage = s.categoryForageKg[1];
    double[] grassWeight = s.shared.usableWeight[0];
    double[] browseWeight = s.shared.usableWeight[1];
    DoubleVector zero = DoubleVector.zero(SPECIES);
    for (int h = 0; h < herbivores; h++) {
      store(zero, s.forageKg, h);
    }
    for (int b = 0; b < blocks; b++) {
      int at = CATEGORIES_PER_BLOCK * b;
      DoubleVector tallSupply = load(supply, at + TALL);
      DoubleVector shortSupply = load(supply, at + SHORT);
      DoubleVector lowSupply = load(supply, at + LOW_BROWSE);
      DoubleVector highSupply = load(supply, at + HIGH_BROWSE);
      for (int h = 0; h < herbivores; h++) {
        DoubleVector grassShare = load(s.grassDiet, h);
        DoubleVector browseShare = grassShare.neg().add(1);
        int j = (h * blocks + b) * KINDS_PER_POOL;
        DoubleVector tall = grassShare.mul(grassWeight[j]).mul(tallSupply);
        DoubleVector short_ = grassShare.mul(grassWeight[j + 1]).mul(shortSupply);
        DoubleVector low = browseShare.mul(browseWeight[j]).mul(lowSupply);
        DoubleVector high = browseShare.mul(browseWeight[j + 1]).mul(highSupply);
        store(tall, grassForage, j);
        store(short_, grassForage, j + 1);
        store(low, browseForage, j);
        store(high, browseForage, j + 1);
        store(load(s.forageKg, h).add(tall).add(short_).add(low).add(high), s.forageKg, h);
      }
    }
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    for (int h = 0; h < herbivores; h++) {
      DoubleVector total = load(s.forageKg, h);
      store(one.blend(one.div(total), total.compare(VectorOperators.GT, 0)),
          s.inverseForage, h);
    }
  }

  static void compete(ModelParameters p, LaneState s) {
    BlockParameters bp = p.blocks();
    HerbivoreParameters hp = p.herbivores();
    int e = hp.elephant;
    int blocks = s.blocks;
    int herbivores = s.herbivores;
    int span = herbivores * blocks * KINDS_PER_POOL;
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    for (int o = 0; o < herbivores; o++) {
      DoubleVector demand = load(s.abundance, o).mul(hp.sharedIntakeKgPerYear[o]);
      store(demand, s.sharedDemandKg, o);
      DoubleVector forage = load(s.forageKg, o);
      DoubleVector perForage = zero.blend(demand.div(forage),
          forage.compare(VectorOperators.GT, 0));
      DoubleVector diet = load(s.grassDiet, o);
      store(perForage.mul(diet), s.demandPerUnitSupply, o * POOLS);
      store(perForage.mul(one.sub(diet)), s.demandPerUnitSupply, o * POOLS + 1);
    }
    // depletion = q0 w0 + q1 w1 + ..., added left to right as in Herbivory.compete.
    for (int pool = 0; pool < POOLS; pool++) {
      double[] depletion = s.depletion[pool];
      for (int o = 0; o < herbivores; o++) {
        DoubleVector q = load(s.demandPerUnitSupply, o * POOLS + pool);
        double[] w = s.shared.overlap[o * POOLS + pool];
        for (int j = 0; j < span; j++) {
          DoubleVector term = q.mul(w[j]);
          store(o == 0 ? term : load(depletion, j).add(term), depletion, j);
        }
      }
    }
    double[] grassForage = s.categoryForageKg[0];
    double[] browseForage = s.categoryForageKg[1];
    double[] grassDepletion = s.depletion[0];
    double[] browseDepletion = s.depletion[1];
    double[] grazedKg = s.grazedFraction;
    double[] browsedKg = s.browsePressure;
    for (int b = 0; b < blocks; b++) {
      store(zero, grazedKg, b);
      store(zero, browsedKg, b);
    }
    for (int h = 0; h < herbivores; h++) {
      DoubleVector demand = load(s.sharedDemandKg, h);
      DoubleVector inverse = load(s.inverseForage, h);
      DoubleVector pressure = zero;
      for (int b = 0; b < blocks; b++) {
        int j = (h * blocks + b) * KINDS_PER_POOL;
        DoubleVector tall = load(grassForage, j).mul(inverse);
        DoubleVector short_ = load(grassForage, j + 1).mul(inverse);
        DoubleVector low = load(browseForage, j).mul(inverse);
        DoubleVector high = load(browseForage, j + 1).mul(inverse);
        DoubleVector dTall = load(grassDepletion, j);
        DoubleVector dShort = load(grassDepletion, j + 1);
        DoubleVector dLow = load(browseDepletion, j);
        DoubleVector dHigh = load(browseDepletion, j + 1);
        pressure = pressure.add(tall.mul(dTall)).add(short_.mul(dShort)).add(low.mul(dLow))
            .add(high.mul(dHigh));
        DoubleVector grazed = load(grazedKg, b)
            .add(demand.mul(metShare(tall, dTall)))
            .add(demand.mul(metShare(short_, dShort)));
        store(grazed, grazedKg, b);
        store(load(browsedKg, b).add(demand.mul(metShare(low, dLow))), browsedKg, b);
      }
      store(pressure.mul(load(s.forageKg, h)), s.pressureKg, h);
    }
    DoubleVector inverse = load(s.inverseForage, e);
    DoubleVector elephants = load(s.abundance, e);
    for (int b = 0; b < blocks; b++) {
      int j = (e * blocks + b) * KINDS_PER_POOL;
      DoubleVector used = zero.add(load(grassForage, j).mul(inverse))
          .add(load(grassForage, j + 1).mul(inverse))
          .add(load(browseForage, j).mul(inverse))
          .add(load(browseForage, j + 1).mul(inverse));
      store(load(grazedKg, b).div(bp.areaHa[b]), grazedKg, b);
      store(load(browsedKg, b).div(bp.areaHa[b]), browsedKg, b);
      store(used.mul(elephants.div(bp.areaKm2[b])), s.elephantsPerKm2, b);
    }
  }

  /** The share of demand met in a category: share / depletion where it is over-used. */
  private static DoubleVector metShare(DoubleVector share, DoubleVector depletion) {
    return share.blend(share.div(depletion), depletion.compare(VectorOperators.GT, 1));
  }

  static void eat(LaneState s) {
    DoubleVector zero = DoubleVector.zero(SPECIES);
    for (int b = 0; b < s.blocks; b++) {
      DoubleVector fuel = load(s.fuelKgPerHa, b);
      DoubleVector eaten = load(s.grazedFraction, b).min(fuel);
      store(fuel.sub(eaten), s.fuelKgPerHa, b);
      DoubleVector production = load(s.grassProductionKgPerHa, b);
      store(zero.blend(eaten.div(production).min(1), production.compare(VectorOperators.GT, 0)),
          s.grazedFraction, b);
      DoubleVector available = load(s.lowBrowseKgPerHa, b);
      store(zero.blend(load(s.browsePressure, b).div(available).min(1),
          available.compare(VectorOperators.GT, 0)), s.browsePressure, b);
    }
  }
}
