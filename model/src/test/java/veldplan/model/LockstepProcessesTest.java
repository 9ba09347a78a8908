package veldplan.model;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Each lockstep process, applied to {@link LaneState#LANES} replicates at once, against the
 * scalar process applied to each replicate: the same numbers up to the last few bits (the
 * vector exponential is within 1 ulp of {@link Math#exp}, and the operations are the same, in
 * the same order). Every year of a run of a small park with planned burns, unplanned fires and
 * elephants is checked, so the states cover burnt and unburnt blocks, lit and unlit fires.
 */
class LockstepProcessesTest {
  /** Relative tolerance: a few ulps of the exponentials, carried through a few operations. */
  private static final double TOLERANCE = 1e-13;

  @ParameterizedTest
  @ValueSource(longs = {1, 2, 3})
  void lockstepProcesses_equalTheScalarOnes_everyYear(long seed) {
    TestParks park = new TestParks();
    park.blocks = 3;
    park.years = 30;
    park.replicates = LaneState.LANES;
    park.seed = seed;
    park.fireReturnIntervalYears = 2.0;
    park.elephants = 1500;
    ModelParameters p = park.parameters();
    Study study = park.study(p);
    ManagementPlan plan = park.plan();
    int lanes = LaneState.LANES;
    Forcing[] forcing = new Forcing[lanes];
    EcosystemState[] scalar = new EcosystemState[lanes];
    for (int r = 0; r < lanes; r++) {
      forcing[r] = study.forcing(0, r);
      scalar[r] = new EcosystemState(p);
      scalar[r].reset(p);
    }
    LaneForcing laneForcing = new LaneForcing(forcing);
    LaneState lane = new LaneState(p);
    EcosystemState unpacked = new EcosystemState(p);
    double worst = 0;
    int compared = 0;
    for (int year = 0; year < p.years(); year++) {
      for (int process = 0; process < AnnualCycle.PROCESSES.length; process++) {
        boolean lockstep = true;
        for (int r = 0; r < lanes; r++) {
          lane.pack(r, scalar[r]);
        }
        copyPolicyState(scalar[0], lane.shared);
        switch (process) {
          case 0 -> LaneManagement.startOfYear(p, plan, year, lane);
          case 1 -> LaneGrass.grow(p.grass(), p.trees(), laneForcing, year, lane);
          case 2 -> LaneHerbivory.forageAndGraze(p, lane);
          case 3 -> LaneFire.burn(p, plan, laneForcing, year, lane);
          case 4 -> LaneTrees.update(p, laneForcing, year, lane);
          case 5 -> LaneAnimals.hunt(p, lane);
          case 6 -> LaneAnimals.breedAndDie(p, laneForcing, year, lane);
          case 7 -> LaneManagement.endOfYear(p, plan, year, lane);
          default -> throw new IllegalStateException();
        }
        for (int r = 0; r < lanes; r++) {
          scalar[r].year = year;
          AnnualCycle.step(process, p, plan, forcing[r], year, scalar[r]);
        }
        if (lockstep) {
          for (int r = 0; r < lanes; r++) {
            lane.unpack(r, unpacked);
            String where = String.format(Locale.ROOT, "%s, year %d, lane %d",
                AnnualCycle.PROCESSES[process], year, r);
            worst = Math.max(worst, compare(scalar[r], unpacked, where));
            compared++;
          }
        }
      }
    }
    System.out.printf(Locale.ROOT, "seed %d: %d lane states compared, worst relative"
        + " difference %.2e%n", seed, compared, worst);
  }

  /** The policy-only state the scalar run has reached, into the lockstep run's shared state. */
  private static void copyPolicyState(EcosystemState from, EcosystemState to) {
    System.arraycopy(from.waterPointsOpen, 0, to.waterPointsOpen, 0, from.waterPointsOpen.length);
    System.arraycopy(from.reach, 0, to.reach, 0, from.reach.length);
    for (int i = 0; i < from.usableWeight.length; i++) {
      System.arraycopy(from.usableWeight[i], 0, to.usableWeight[i], 0,
          from.usableWeight[i].length);
    }
    for (int i = 0; i < from.overlap.length; i++) {
      System.arraycopy(from.overlap[i], 0, to.overlap[i], 0, from.overlap[i].length);
    }
  }

  /** Largest relative difference over the state both engines keep; fails above tolerance. */
  private static double compare(EcosystemState expected, EcosystemState actual, String where) {
    double[][] a = arrays(expected);
    double[][] b = arrays(actual);
    double worst = 0;
    for (int k = 0; k < a.length; k++) {
      for (int i = 0; i < a[k].length; i++) {
        double x = a[k][i];
        double y = b[k][i];
        double difference = x == y ? 0 : Math.abs(x - y) / Math.max(Math.abs(x), Math.abs(y));
        assertTrue(difference <= TOLERANCE, where + ": array " + k + "[" + i + "] scalar " + x
            + ", lockstep " + y);
        worst = Math.max(worst, difference);
      }
    }
    return worst;
  }

  private static double[][] arrays(EcosystemState s) {
    return new double[][] {new double[] {s.costBurning, s.costOfftake, s.costContraception, s.costWater,
        s.elephantsRemoved, s.femalesTreated}, s.reach, s.treesPerHa, s.leftoverGrassKgPerHa,
        s.abundance,
        s.predatorAbundance, s.coverageHistory, s.grazedFraction, s.basalAreaM2PerHa,
        s.grassProductionKgPerHa, s.fuelKgPerHa, s.lowBrowseKgPerHa, s.highBrowseKgPerHa,
        s.browsePressure, s.plannedBurntFraction, s.plannedIntensityKwPerM,
        s.wildBurntFraction, s.wildIntensityKwPerM, s.elephantsPerKm2, s.grassDiet,
        s.forageKg, s.pressureKg, s.predationHazard, s.preyKg, s.preyBiomassKg, s.tallShare};
  }
}
