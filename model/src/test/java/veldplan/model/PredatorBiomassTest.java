package veldplan.model;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Predator numbers against Carbone &amp; Gittleman (2002). */
class PredatorBiomassTest {

  @Test
  void predators_longRunWithoutNoise_biomassNearOnePercentOfTheirPrey() {
    // Carbone & Gittleman (2002, Science 295: 2273-2276) [V, abstract]: 10,000 kg of prey
    // support about 90 kg of a carnivore species (0.9 %). The methods sheet (§10.3) sets the
    // calibration check at the order of magnitude, 0.3-3 % of the prey it hunts.
    TestParks park = new TestParks();
    park.noiseSd = 0;
    park.replicates = 1;
    park.years = 80;
    park.predatorsPerGuild = 5;
    Trajectory t = park.run()[0];
    ModelParameters p = park.parameters();
    double predatorKg = 0;
    double preyKg = 0;
    int years = 20;
    for (int y = 80 - years; y < 80; y++) {
      predatorKg += t.predatorAbundance(y, 0) * 150; // the builder's predator mass
      for (int h : new int[] {0, 1, 3}) { // the guilds it hunts
        preyKg += t.abundance(y, h) * p.herbivores().bodyMassKg(h);
      }
    }
    double ratio = predatorKg / preyKg;
    assertTrue(ratio > 0.003 && ratio < 0.03,
        "predator biomass " + predatorKg / years + " kg, prey " + preyKg / years
            + " kg, ratio " + ratio);
  }
}
