package veldplan.model;

import static veldplan.model.LaneState.LANES;
import static veldplan.model.LaneState.SPECIES;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorMask;
import jdk.incubator.vector.VectorOperators;
import veldplan.shared.scenario.Costs;

/**
 * {@link Management#startOfYear} and {@link Management#endOfYear} for every lane of a
 * {@link LaneState}; see there for the model. The water points follow the policy alone, so the
 * start of the year runs the scalar code once on {@link LaneState#shared} and gives every lane
 * its cost; elephant actions depend on each lane's elephants.
 */
final class LaneManagement {
  private LaneManagement() {}

  static void startOfYear(ModelParameters p, ManagementPlan plan, int year, LaneState s) {
    Management.startOfYear(p, plan, year, s.shared);
    java.util.Arrays.fill(s.costWater, s.shared.costWater);
    java.util.Arrays.fill(s.costBurning, 0);
    java.util.Arrays.fill(s.costOfftake, 0);
    java.util.Arrays.fill(s.costContraception, 0);
    java.util.Arrays.fill(s.elephantsRemoved, 0);
    java.util.Arrays.fill(s.femalesTreated, 0);
  }

  static void endOfYear(ModelParameters p, ManagementPlan plan, int year, LaneState s) {
    BlockParameters bp = p.blocks();
    Costs c = p.costs();
    DoubleVector zero = DoubleVector.zero(SPECIES);
    DoubleVector burnt = zero;
    for (int b = 0; b < s.blocks; b++) {
      burnt = burnt.add(DoubleVector.fromArray(SPECIES, s.plannedBurntFraction, b * LANES)
          .mul(bp.areaHa[b]));
    }
    burnt.mul(c.burningPerHa()).intoArray(s.costBurning, 0);
    int e = p.herbivores().elephant;
    DoubleVector elephants = DoubleVector.fromArray(SPECIES, s.abundance, e * LANES);
    VectorMask<Double> act = elephants.compare(VectorOperators.GT, 0);
    if (!Double.isNaN(plan.triggerDensityPerKm2)) {
      act = act.and(elephants.div(bp.totalAreaKm2())
          .compare(VectorOperators.GT, plan.triggerDensityPerKm2));
    }
    DoubleVector removed = elephants.mul(plan.offtakeFractionPerYear);
    DoubleVector left = elephants.sub(removed);
    left = zero.blend(left, left.compare(VectorOperators.GE, 1));
    elephants = elephants.blend(left, act);
    elephants.intoArray(s.abundance, e * LANES);
    DoubleVector removedNow = DoubleVector.fromArray(SPECIES, s.elephantsRemoved, 0)
        .blend(removed, act);
    removedNow.intoArray(s.elephantsRemoved, 0);
    DoubleVector coverage = zero.blend(
        DoubleVector.broadcast(SPECIES, plan.contraceptionCoverage), act);
    DoubleVector treated = DoubleVector.fromArray(SPECIES, s.femalesTreated, 0).blend(
        elephants.mul(plan.contraceptionCoverage * p.elephants().breedingFemaleFraction()),
        act);
    treated.intoArray(s.femalesTreated, 0);
    coverage.intoArray(s.coverageHistory, (year % s.lagSlots) * LANES);
    removedNow.mul(c.offtakePerAnimal()).intoArray(s.costOfftake, 0);
    treated.mul(c.contraceptionPerFemalePerYear()).intoArray(s.costContraception, 0);
  }
}
