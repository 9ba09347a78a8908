package veldplan.model;

import static veldplan.model.LaneState.LANES;
import static veldplan.model.LaneState.SPECIES;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorMask;
import jdk.incubator.vector.VectorOperators;
import veldplan.model.ecology.CarboneGittleman;

/**
 * {@link Animals#hunt} and {@link Animals#breedAndDie} for every lane of a {@link LaneState} at
 * once; see there for the model. The same operations in the same order; powers other than 1
 * and 2, logarithms and exponentials use the vector forms, within 1 ulp of the scalar ones.
 */
final class LaneAnimals {
  private LaneAnimals() {}

  private static DoubleVector load(double[] a, int entry) {
    return DoubleVector.fromArray(SPECIES, a, entry * LANES);
  }

  private static void store(DoubleVector v, double[] a, int entry) {
    v.intoArray(a, entry * LANES);
  }

  /** n^m as {@code PreySwitching} computes it: 1 and 2 exactly, otherwise a power. */
  private static DoubleVector power(DoubleVector n, double m) {
    if (m == 1) {
      return n;
    }
    if (m == 2) {
      return n.mul(n);
    }
    return n.lanewise(VectorOperators.POW, m);
  }

  static void hunt(ModelParameters p, LaneState s) {
    HerbivoreParameters hp = p.herbivores();
    PredatorParameters pp = p.predators();
    int herbivores = hp.count;
    DoubleVector zero = DoubleVector.zero(SPECIES);
    for (int h = 0; h < herbivores; h++) {
      store(zero, s.predationHazard, h);
      store(load(s.abundance, h).mul(hp.bodyMassKg[h]), s.preyKg, h);
    }
    for (int q = 0; q < pp.count; q++) {
      double[] preference = pp.preference[q];
      DoubleVector biomass = zero;
      for (int h = 0; h < herbivores; h++) {
        biomass = biomass.add(load(s.preyKg, h).mul(preference[h]));
      }
      store(biomass, s.preyBiomassKg, q);
      DoubleVector predators = load(s.predatorAbundance, q);
      VectorMask<Double> hunting = biomass.compare(VectorOperators.NE, 0)
          .and(predators.compare(VectorOperators.NE, 0));
      if (!hunting.anyTrue()) {
        continue;
      }
      DoubleVector density = biomass.div(pp.parkKm2);
      double a = pp.attackRate[q];
      double ah = a * pp.handlingTimeYears[q];
      // FunctionalResponse.typeII / typeIII: a n / (1 + a h n), a n^2 / (1 + a h n^2).
      DoubleVector n = pp.responseType[q] == 3 ? density.mul(density) : density;
      DoubleVector perPredator = n.mul(a).div(n.mul(ah).add(1));
      DoubleVector kills = predators.mul(perPredator);
      double m = pp.switchingExponent[q];
      DoubleVector denominator = zero;
      for (int h = 0; h < herbivores; h++) {
        denominator = denominator.add(power(load(s.preyKg, h), m).mul(preference[h]));
      }
      VectorMask<Double> shared = hunting.and(denominator.compare(VectorOperators.NE, 0));
      for (int h = 0; h < herbivores; h++) {
        if (preference[h] > 0) {
          DoubleVector prey = load(s.preyKg, h);
          VectorMask<Double> hunted = shared.and(prey.compare(VectorOperators.GT, 0));
          DoubleVector share = power(prey, m).mul(preference[h]).div(denominator);
          DoubleVector hazard = load(s.predationHazard, h);
          store(hazard.blend(hazard.add(kills.mul(share).div(prey)), hunted),
              s.predationHazard, h);
        }
      }
    }
  }

  static void breedAndDie(ModelParameters p, LaneForcing f, int year, LaneState s) {
    HerbivoreParameters hp = p.herbivores();
    PredatorParameters pp = p.predators();
    ElephantParameters ep = p.elephants();
    int herbivores = hp.count;
    int e = hp.elephant;
    int noiseRow = year * f.noiseSlots;
    DoubleVector minimum = DoubleVector.broadcast(SPECIES, Animals.MIN_LOG_GROWTH);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    DoubleVector zero = DoubleVector.zero(SPECIES);
    for (int h = 0; h < herbivores; h++) {
      DoubleVector noise = load(f.demographicNoise, noiseRow + h).mul(hp.noiseSd[h]);
      DoubleVector n = load(s.abundance, h);
      VectorMask<Double> alive = n.compare(VectorOperators.NE, 0);
      if (!alive.anyTrue()) {
        continue;
      }
      DoubleVector forage = load(s.forageKg, h);
      DoubleVector depletion = load(s.pressureKg, h).div(forage);
      DoubleVector food = hp.densityShape[h] == 1 ? depletion
          : depletion.lanewise(VectorOperators.POW, hp.densityShape[h]);
      DoubleVector logGrowth;
      if (h == e) {
        double births = ep.breedingFemaleFraction() * ep.calvesPerFemalePerYear();
        DoubleVector coverage = year >= ep.gestationLagYears()
            ? load(s.coverageHistory, (year - ep.gestationLagYears()) % s.lagSlots) : zero;
        DoubleVector rate = coverage.mul(ep.contraceptionEfficacy()).neg().add(1).mul(births)
            .add(1).sub(ep.mortalityPerYear()).max(1e-9).lanewise(VectorOperators.LOG);
        double scale = Math.max(Animals.ELEPHANT_FOOD_RATE, hp.maxGrowthRatePerYear[h]);
        logGrowth = rate.sub(food.mul(scale)).max(minimum);
      } else {
        logGrowth = one.sub(food).mul(hp.maxGrowthRatePerYear[h]).max(minimum);
      }
      logGrowth = minimum.blend(logGrowth, forage.compare(VectorOperators.GT, 0));
      DoubleVector survival = one.sub(load(s.predationHazard, h).min(Animals.MAX_PREDATION));
      DoubleVector next = n.mul(logGrowth.add(noise).lanewise(VectorOperators.EXP).mul(survival));
      next = zero.blend(next, next.compare(VectorOperators.GE, 1));
      store(n.blend(next, alive), s.abundance, h);
    }
    double perPrey = CarboneGittleman.CARNIVORE_KG_PER_10000_KG_PREY / 10_000;
    for (int q = 0; q < pp.count; q++) {
      DoubleVector noise = load(f.demographicNoise, noiseRow + herbivores + q)
          .mul(pp.noiseSd[q]);
      DoubleVector n = load(s.predatorAbundance, q);
      VectorMask<Double> alive = n.compare(VectorOperators.NE, 0);
      if (!alive.anyTrue()) {
        continue;
      }
      // CarboneGittleman.carnivoreNumber: (90.1 / 10,000 x prey biomass) / body mass.
      DoubleVector capacity = load(s.preyBiomassKg, q).mul(perPrey).div(pp.bodyMassKg[q]);
      DoubleVector logGrowth = minimum.blend(
          one.sub(n.div(capacity)).mul(pp.maxGrowthRatePerYear[q]).max(minimum),
          capacity.compare(VectorOperators.GT, 0));
      DoubleVector next = n.mul(logGrowth.add(noise).lanewise(VectorOperators.EXP));
      next = zero.blend(next, next.compare(VectorOperators.GE, 1));
      store(n.blend(next, alive), s.predatorAbundance, q);
    }
  }
}
