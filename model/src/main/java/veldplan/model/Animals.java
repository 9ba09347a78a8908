package veldplan.model;

import org.apache.commons.numbers.gamma.InverseErfc;
import veldplan.model.ecology.CarboneGittleman;
import veldplan.model.ecology.FunctionalResponse;
import veldplan.model.ecology.PreySwitching;
import veldplan.shared.rng.CounterRandom;

/**
 * Predation, then the year's change in the numbers of herbivore guilds, elephants and predators.
 *
 * <h2>Herbivore guilds</h2>
 * Theta-Ricker growth ln(N'/N) = r_m (1 - D^theta) + sigma z, with r_m the maximum rate of
 * increase (Caughley &amp; Krebs 1983 unless the scenario gives one) and D the depletion of the
 * forage the guild uses ({@link Herbivory}; 1 = demand equals supply): capacity is forage over
 * intake per head. theta = max(1, sqrt(W / 450 kg)): large mammals feel density dependence late,
 * close to capacity (Fowler 1981, Ecology 62: 602–610, from memory); theta is 1 for most guilds
 * and about 2.3 for elephants (our calibration). The food term is floored at -2 (at most 86 % lost to starvation in a year). Predation
 * then removes the killed share.
 *
 * <h2>Predators</h2>
 * Kills per predator follow a Holling type II (or, if the scenario says so, type III) response to
 * the biomass density of the prey it hunts, with handling time 1 / (maximum kill) and the attack
 * rate that halves kills at the half-saturation density; kills are shared among prey by
 * Murdoch-type switching, share_i = B_i^m / sum B_j^m with B the prey biomass, so predators turn
 * to whatever is abundant. Predator numbers follow Ricker growth towards the Carbone &amp;
 * Gittleman (2002) capacity, 90 kg of a carnivore per 10,000 kg of its prey, at a maximum rate
 * half that of a herbivore of the same mass (our calibration: carnivores breed more slowly, common
 * practice, no source), so they grow more slowly than their prey.
 *
 * <h2>Elephants</h2>
 * Births are breeding females x calving rate, reduced by contraception coverage x efficacy once
 * the gestation lag has passed (Delsink et al. 2006); deaths are background mortality; food
 * limits growth in the same Ricker form as the guilds, scaled so that growth stops when pressure
 * equals forage without contraception.
 *
 * <h2>Random numbers</h2>
 * One standard normal per herbivore (index h) and predator (index herbivores + p) and year from
 * the demography stream, by inversion of one uniform, drawn whether used or not;
 * {@link ForcingBuilder} draws them once per replicate into the {@link Forcing}.
 *
 * <p>Fewer than one animal is none: abundance below 1 is set to 0.
 */
final class Animals {
  /** Floor of the yearly log growth from food. */
  static final double MIN_LOG_GROWTH = -2;
  /** Smallest rate at which food limits elephant growth (1/yr); our choice. */
  static final double ELEPHANT_FOOD_RATE = 0.02;
  /** Largest share of a guild predators can take in a year. */
  static final double MAX_PREDATION = 0.95;

  private Animals() {}

  /** Standard normal deviate by inversion: Phi^-1(u) = -sqrt(2) erfc^-1(2u). */
  static double standardNormal(long key, int year, int index) {
    double u = CounterRandom.openUniform(key, year, index);
    return -Math.sqrt(2) * InverseErfc.value(2 * u);
  }

  /** Predation hazard of each herbivore this year, from the abundances at the start of it. */
  static void hunt(ModelParameters p, EcosystemState s) {
    HerbivoreParameters hp = p.herbivores();
    PredatorParameters pp = p.predators();
    int herbivores = hp.count;
    double[] preyKg = s.preyKg;
    for (int h = 0; h < herbivores; h++) {
      s.predationHazard[h] = 0;
      preyKg[h] = s.abundance[h] * hp.bodyMassKg[h];
    }
    double parkKm2 = pp.parkKm2;
    for (int q = 0; q < pp.count; q++) {
      double[] preference = pp.preference[q];
      double biomass = 0;
      for (int h = 0; h < herbivores; h++) {
        biomass += preference[h] * preyKg[h];
      }
      s.preyBiomassKg[q] = biomass;
      if (biomass == 0 || s.predatorAbundance[q] == 0) {
        continue;
      }
      double density = biomass / parkKm2;
      double perPredator = pp.responseType[q] == 3
          ? FunctionalResponse.typeIII(pp.attackRate[q], pp.handlingTimeYears[q], density)
          : FunctionalResponse.typeII(pp.attackRate[q], pp.handlingTimeYears[q], density);
      double kills = s.predatorAbundance[q] * perPredator;
      double m = pp.switchingExponent[q];
      double denominator = PreySwitching.denominator(preference, preyKg, m);
      for (int h = 0; h < herbivores; h++) {
        if (preference[h] > 0 && preyKg[h] > 0) {
          s.predationHazard[h] += kills
              * PreySwitching.share(preference[h], preyKg[h], m, denominator) / preyKg[h];
        }
      }
    }
  }

  /** Updates guilds, elephants and predators for the year. */
  static void breedAndDie(ModelParameters p, Forcing f, int year, EcosystemState s) {
    HerbivoreParameters hp = p.herbivores();
    PredatorParameters pp = p.predators();
    ElephantParameters ep = p.elephants();
    int herbivores = hp.count;
    int e = hp.elephant;
    double[] noiseDraws = f.demographicNoise;
    int noiseRow = year * f.noiseSlots;
    for (int h = 0; h < herbivores; h++) {
      double noise = hp.noiseSd[h] * noiseDraws[noiseRow + h];
      double n = s.abundance[h];
      if (n == 0) {
        continue;
      }
      double logGrowth;
      if (s.forageKg[h] <= 0) {
        logGrowth = MIN_LOG_GROWTH; // nothing to eat within reach
      } else {
        double depletion = s.pressureKg[h] / s.forageKg[h];
        double food = hp.densityShape[h] == 1 ? depletion
            : Math.pow(depletion, hp.densityShape[h]);
        if (h == e) {
          double births = ep.breedingFemaleFraction() * ep.calvesPerFemalePerYear();
          double coverage = year >= ep.gestationLagYears()
              ? s.coverageHistory[(year - ep.gestationLagYears()) % s.lagSlots] : 0;
          double rate = Math.log(Math.max(1e-9, 1 + births
              * (1 - ep.contraceptionEfficacy() * coverage) - ep.mortalityPerYear()));
          // Food limits growth at the rate of a population without contraception, so that
          // growth stops where demand meets supply; at least ELEPHANT_FOOD_RATE, so that food
          // still matters when births do not outnumber deaths.
          double scale = Math.max(ELEPHANT_FOOD_RATE, hp.maxGrowthRatePerYear[h]);
          logGrowth = Math.max(MIN_LOG_GROWTH, rate - scale * food);
        } else {
          logGrowth = Math.max(MIN_LOG_GROWTH, hp.maxGrowthRatePerYear[h] * (1 - food));
        }
      }
      n *= Math.exp(logGrowth + noise) * (1 - Math.min(MAX_PREDATION, s.predationHazard[h]));
      s.abundance[h] = n < 1 ? 0 : n;
    }
    for (int q = 0; q < pp.count; q++) {
      double noise = pp.noiseSd[q] * noiseDraws[noiseRow + herbivores + q];
      double n = s.predatorAbundance[q];
      if (n == 0) {
        continue;
      }
      double capacity = CarboneGittleman.carnivoreNumber(s.preyBiomassKg[q], pp.bodyMassKg[q]);
      double logGrowth = capacity > 0
          ? Math.max(MIN_LOG_GROWTH, pp.maxGrowthRatePerYear[q] * (1 - n / capacity))
          : MIN_LOG_GROWTH;
      n *= Math.exp(logGrowth + noise);
      s.predatorAbundance[q] = n < 1 ? 0 : n;
    }
  }
}
