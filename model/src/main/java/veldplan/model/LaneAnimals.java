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

  static void hunt(ModelParameters p, LaneState s) {
    HerbivoreParameters hp = p.herbivores();
    for (int h = 0; h < s.herbivores; h++) {
      java.util.Arrays.fill(s.predationHazard, h * LANES, (h + 1) * LANES, 0);
      DoubleVector.fromArray(SPECIES, s.abundance, h * LANES).mul(hp.bodyMassKg[h])
          .intoArray(s.preyKg, h * LANES);
    }
    for (int q = 0; q < s.predators; q++) {
      predation(p, s, q);
    }
  }

  /**
   * Adds predator guild q's kills to the herbivores' hazards: the functional response to the
   * preferred prey biomass, shared by prey switching (see {@link Animals#hunt}). Powers of 1
   * and 2 exactly, others by the vector power, as {@code PreySwitching} does.
   */
  private static void predation(ModelParameters p, LaneState s, int q) {
    PredatorParameters pp = p.predators();
    int herbivores = s.herbivores;
    double[] preference = pp.preference[q];
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector biomass = zero;
    for (int h = 0; h < herbivores; h++) {
      biomass = biomass.add(DoubleVector.fromArray(SPECIES, s.preyKg, h * LANES)
          .mul(preference[h]));
    }
    biomass.intoArray(s.preyBiomassKg, q * LANES);
    DoubleVector predators = DoubleVector.fromArray(SPECIES, s.predatorAbundance, q * LANES);
    VectorMask<Double> hunting = biomass.compare(VectorOperators.NE, 0)
        .and(predators.compare(VectorOperators.NE, 0));
    if (!hunting.anyTrue()) {
      return;
    }
    DoubleVector density = biomass.div(pp.parkKm2);
    double a = pp.attackRate[q];
    double ah = a * pp.handlingTimeYears[q];
    // FunctionalResponse.typeII / typeIII: a n / (1 + a h n), a n^2 / (1 + a h n^2).
    DoubleVector n = pp.responseType[q] == 3 ? density.mul(density) : density;
    DoubleVector kills = predators.mul(n.mul(a).div(n.mul(ah).add(1)));
    double m = pp.switchingExponent[q];
    DoubleVector denominator = zero;
    for (int h = 0; h < herbivores; h++) {
      System.arraycopy(s.preyKg, h * LANES, s.math, 0, LANES);
      VectorMath.pow(s.math, 0, m);
      denominator = denominator.add(DoubleVector.fromArray(SPECIES, s.math, 0)
          .mul(preference[h]));
    }
    VectorMask<Double> shared = hunting.and(denominator.compare(VectorOperators.NE, 0));
    for (int h = 0; h < herbivores; h++) {
      if (preference[h] > 0) {
        DoubleVector prey = DoubleVector.fromArray(SPECIES, s.preyKg, h * LANES);
        System.arraycopy(s.preyKg, h * LANES, s.math, 0, LANES);
        VectorMath.pow(s.math, 0, m);
        DoubleVector share = DoubleVector.fromArray(SPECIES, s.math, 0).mul(preference[h])
            .div(denominator);
        DoubleVector hazard = DoubleVector.fromArray(SPECIES, s.predationHazard, h * LANES);
        hazard.blend(hazard.add(kills.mul(share).div(prey)),
                shared.and(prey.compare(VectorOperators.GT, 0)))
            .intoArray(s.predationHazard, h * LANES);
      }
    }
  }

  static void breedAndDie(ModelParameters p, LaneForcing f, int year, LaneState s) {
    // Each guild's log growth (noise included) into animalScratch, every exponential at once,
    // then the new abundances.
    for (int h = 0; h < s.herbivores; h++) {
      herbivore(p, f, year, s, h);
    }
    for (int q = 0; q < s.predators; q++) {
      predator(p, f, year, s, q);
    }
    VectorMath.exp(s.animalScratch, 0, s.herbivores + s.predators);
    for (int h = 0; h < s.herbivores; h++) {
      grow(s.abundance, h, s.animalScratch, h, s.predationHazard, true);
    }
    for (int q = 0; q < s.predators; q++) {
      grow(s.predatorAbundance, q, s.animalScratch, s.herbivores + q, null, false);
    }
  }

  /**
   * n x e^(log growth) (x (1 - min(0.95, hazard)) for prey), set to 0 below 1 animal; guilds
   * already at 0 stay there.
   */
  private static void grow(double[] abundance, int i, double[] growth, int g,
      double[] hazard, boolean prey) {
    DoubleVector n = DoubleVector.fromArray(SPECIES, abundance, i * LANES);
    VectorMask<Double> alive = n.compare(VectorOperators.NE, 0);
    if (!alive.anyTrue()) {
      return;
    }
    DoubleVector factor = DoubleVector.fromArray(SPECIES, growth, g * LANES);
    if (prey) {
      factor = factor.mul(DoubleVector.broadcast(SPECIES, 1.0).sub(
          DoubleVector.fromArray(SPECIES, hazard, i * LANES).min(Animals.MAX_PREDATION)));
    }
    DoubleVector next = n.mul(factor);
    next = DoubleVector.zero(SPECIES).blend(next, next.compare(VectorOperators.GE, 1));
    n.blend(next, alive).intoArray(abundance, i * LANES);
  }

  /** Births and deaths of herbivore h (a guild or the elephants). */
  private static void herbivore(ModelParameters p, LaneForcing f, int year, LaneState s,
      int h) {
    HerbivoreParameters hp = p.herbivores();
    DoubleVector n = DoubleVector.fromArray(SPECIES, s.abundance, h * LANES);
    if (!n.compare(VectorOperators.NE, 0).anyTrue()) {
      java.util.Arrays.fill(s.animalScratch, h * LANES, (h + 1) * LANES, 0);
      return;
    }
    DoubleVector minimum = DoubleVector.broadcast(SPECIES, Animals.MIN_LOG_GROWTH);
    DoubleVector one = DoubleVector.broadcast(SPECIES, 1.0);
    DoubleVector forage = DoubleVector.fromArray(SPECIES, s.forageKg, h * LANES);
    DoubleVector depletion = DoubleVector.fromArray(SPECIES, s.pressureKg, h * LANES)
        .div(forage);
    depletion.intoArray(s.math, 0);
    VectorMath.pow(s.math, 0, hp.densityShape[h]);
    DoubleVector food = DoubleVector.fromArray(SPECIES, s.math, 0);
    DoubleVector logGrowth;
    if (h == hp.elephant) {
      elephantRate(p, year, s);
      logGrowth = DoubleVector.fromArray(SPECIES, s.math, 0).sub(food.mul(
          Math.max(Animals.ELEPHANT_FOOD_RATE, hp.maxGrowthRatePerYear[h]))).max(minimum);
    } else {
      logGrowth = one.sub(food).mul(hp.maxGrowthRatePerYear[h]).max(minimum);
    }
    logGrowth = minimum.blend(logGrowth, forage.compare(VectorOperators.GT, 0));
    DoubleVector noise = DoubleVector.fromArray(SPECIES, f.demographicNoise,
        (year * f.noiseSlots + h) * LANES).mul(hp.noiseSd[h]);
    logGrowth.add(noise).intoArray(s.animalScratch, h * LANES);
  }

  /**
   * The elephants' log growth rate without food limitation, into s.math: ln(1 + births (1 -
   * efficacy x coverage a gestation earlier) - deaths), floored at ln(1e-9).
   */
  private static void elephantRate(ModelParameters p, int year, LaneState s) {
    ElephantParameters ep = p.elephants();
    double births = ep.breedingFemaleFraction() * ep.calvesPerFemalePerYear();
    DoubleVector coverage = year >= ep.gestationLagYears()
        ? DoubleVector.fromArray(SPECIES, s.coverageHistory,
            ((year - ep.gestationLagYears()) % s.lagSlots) * LANES)
        : DoubleVector.zero(SPECIES);
    coverage.mul(ep.contraceptionEfficacy()).neg().add(1).mul(births).add(1)
        .sub(ep.mortalityPerYear()).max(1e-9).intoArray(s.math, 0);
    VectorMath.log(s.math, 0);
  }

  /** Births and deaths of predator guild q. */
  private static void predator(ModelParameters p, LaneForcing f, int year, LaneState s, int q) {
    PredatorParameters pp = p.predators();
    DoubleVector n = DoubleVector.fromArray(SPECIES, s.predatorAbundance, q * LANES);
    int g = s.herbivores + q;
    if (!n.compare(VectorOperators.NE, 0).anyTrue()) {
      java.util.Arrays.fill(s.animalScratch, g * LANES, (g + 1) * LANES, 0);
      return;
    }
    DoubleVector minimum = DoubleVector.broadcast(SPECIES, Animals.MIN_LOG_GROWTH);
    // CarboneGittleman.carnivoreNumber: (90.1 / 10,000 x prey biomass) / body mass.
    DoubleVector capacity = DoubleVector.fromArray(SPECIES, s.preyBiomassKg, q * LANES)
        .mul(CarboneGittleman.CARNIVORE_KG_PER_10000_KG_PREY / 10_000).div(pp.bodyMassKg[q]);
    DoubleVector logGrowth = minimum.blend(DoubleVector.broadcast(SPECIES, 1.0)
            .sub(n.div(capacity)).mul(pp.maxGrowthRatePerYear[q]).max(minimum),
        capacity.compare(VectorOperators.GT, 0));
    DoubleVector noise = DoubleVector.fromArray(SPECIES, f.demographicNoise,
        (year * f.noiseSlots + s.herbivores + q) * LANES).mul(pp.noiseSd[q]);
    logGrowth.add(noise).intoArray(s.animalScratch, g * LANES);
  }
}
