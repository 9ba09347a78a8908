package veldplan.model;

import veldplan.shared.scenario.Costs;

/**
 * The policy's actions and what they cost.
 *
 * <p>At the start of each year: water points open in each block (closures take effect from
 * their year; points closed at the start, relative to the park's existing points, count as
 * closures in year one) and every herbivore's reach. At the end of each year: elephant offtake
 * and contraception, in years when density is above the trigger (or every year without one), and
 * the year's costs: burning per hectare of planned burn, offtake per animal, contraception per
 * treated female, upkeep per open point, and a one-off cost per closed point.
 */
final class Management {
  private Management() {}

  static void startOfYear(ModelParameters p, ManagementPlan plan, int year, EcosystemState s) {
    BlockParameters bp = p.blocks();
    Costs c = p.costs();
    double water = 0;
    boolean changed = year == 0;
    for (int b = 0; b < s.blocks; b++) {
      int open = Math.min(plan.openPointsIn(b, year), bp.artificialWaterPoints[b]);
      int before = s.waterPointsOpen[b];
      if (open < before) {
        water += (before - open) * c.waterPointClosure();
      }
      if (open != before) {
        changed = true;
      }
      s.waterPointsOpen[b] = open;
      water += open * c.waterPointUpkeepPerYear();
    }
    if (changed) {
      Herbivory.updateReach(bp, p.herbivores(), s);
    }
    s.costWater = water;
    s.costBurning = 0;
    s.costOfftake = 0;
    s.costContraception = 0;
    s.elephantsRemoved = 0;
    s.femalesTreated = 0;
  }

  static void endOfYear(ModelParameters p, ManagementPlan plan, int year, EcosystemState s) {
    BlockParameters bp = p.blocks();
    Costs c = p.costs();
    double burnt = 0;
    for (int b = 0; b < s.blocks; b++) {
      burnt += s.plannedBurntFraction[b] * bp.areaHa[b];
    }
    s.costBurning = burnt * c.burningPerHa();
    int e = p.herbivores().elephant;
    double elephants = s.abundance[e];
    double density = elephants / bp.totalAreaKm2();
    boolean act = Double.isNaN(plan.triggerDensityPerKm2) || density > plan.triggerDensityPerKm2;
    double coverage = 0;
    if (act && elephants > 0) {
      double removed = plan.offtakeFractionPerYear * elephants;
      elephants -= removed;
      s.abundance[e] = elephants < 1 ? 0 : elephants;
      s.elephantsRemoved = removed;
      coverage = plan.contraceptionCoverage;
      s.femalesTreated = coverage * p.elephants().breedingFemaleFraction() * s.abundance[e];
    }
    s.coverageHistory[year % s.lagSlots] = coverage;
    s.costOfftake = s.elephantsRemoved * c.offtakePerAnimal();
    s.costContraception = s.femalesTreated * c.contraceptionPerFemalePerYear();
  }
}
