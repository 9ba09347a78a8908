package veldplan.model;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import veldplan.shared.scenario.BurnSeason;

/**
 * Whole runs of the lockstep engine against the scalar simulator, replicate by replicate, under
 * policies that use every lever: every recorded value of every year agrees to 1e-9 relative
 * (the vector exponentials, logarithms and powers are within 1 ulp of the scalar ones, and the
 * differences are carried through the years).
 */
class LaneSimulatorTest {
  private static final double TOLERANCE = 1e-9;

  enum Policy {
    STATUS_QUO, LATE_FIRES_AND_OFFTAKE, EARLY_FIRES_CONTRACEPTION_AND_TRIGGER, CLOSURES_NO_FIRE
  }

  @ParameterizedTest
  @EnumSource(Policy.class)
  void everyLane_isTheScalarRunOfItsReplicate(Policy policy) {
    TestParks park = new TestParks();
    park.blocks = 3;
    park.years = 40;
    park.replicates = LaneState.LANES + 1;
    park.seed = 7 + policy.ordinal();
    switch (policy) {
      case STATUS_QUO -> { }
      case LATE_FIRES_AND_OFFTAKE -> {
        park.fireReturnIntervalYears = 2.0;
        park.elephants = 2000;
        park.offtake = 0.08;
      }
      case EARLY_FIRES_CONTRACEPTION_AND_TRIGGER -> {
        park.season = BurnSeason.EARLY_DRY;
        park.elephants = 2000;
        park.contraception = 0.6;
        park.offtake = 0.03;
        park.triggerDensity = 0.5;
      }
      case CLOSURES_NO_FIRE -> {
        park.fireReturnIntervalYears = null;
        park.openPoints = 1;
        park.closureYear = 2035;
      }
      default -> throw new IllegalStateException();
    }
    ModelParameters p = park.parameters();
    Study study = park.study(p);
    ManagementPlan plan = park.plan();
    int lanes = LaneState.LANES;
    // Replicates 1..LANES: not starting at 0, so a lane is never confused with its index.
    Forcing[] forcing = new Forcing[lanes];
    Trajectory[] lockstep = Trajectory.batch(p);
    for (int r = 0; r < lanes; r++) {
      forcing[r] = study.forcing(0, r + 1);
    }
    new LaneSimulator(p).run(plan, new LaneForcing(forcing), new LaneState(p), lockstep);
    Simulator simulator = new Simulator(p);
    EcosystemState state = new EcosystemState(p);
    double worst = 0;
    for (int r = 0; r < lanes; r++) {
      Trajectory expected = new Trajectory(p);
      simulator.run(plan, forcing[r], state, expected);
      String where = policy + ", lane " + r;
      worst = Math.max(worst, compare(expected.values(), lockstep[r].values(), where));
    }
    System.out.printf(Locale.ROOT, "%s: worst relative difference %.2e%n", policy, worst);
  }

  @org.junit.jupiter.api.Test
  void aRun_givesTheSameBits_beforeAndAfterTheJitCompilesTheEngine() {
    // The first run executes the engine interpreted (the Vector API's Java fallbacks); after a
    // few hundred runs it is compiled to vector instructions. Same bits both times, because
    // the engine uses only IEEE operations (VectorMath, not the Vector API's EXP/LOG/POW).
    TestParks park = new TestParks();
    park.blocks = 4;
    park.years = 30;
    park.replicates = LaneState.LANES;
    park.fireReturnIntervalYears = 2.0;
    park.elephants = 2000;
    park.offtake = 0.03;
    ModelParameters p = park.parameters();
    Study study = park.study(p);
    ManagementPlan plan = park.plan();
    Forcing[] forcing = new Forcing[LaneState.LANES];
    Trajectory[] cold = Trajectory.batch(p);
    Trajectory[] hot = Trajectory.batch(p);
    for (int r = 0; r < LaneState.LANES; r++) {
      forcing[r] = study.forcing(0, r);
    }
    LaneForcing lanes = new LaneForcing(forcing);
    LaneSimulator simulator = new LaneSimulator(p);
    LaneState state = new LaneState(p);
    simulator.run(plan, lanes, state, cold);
    for (int i = 0; i < 400; i++) {
      simulator.run(plan, lanes, state, hot);
    }
    for (int r = 0; r < LaneState.LANES; r++) {
      org.junit.jupiter.api.Assertions.assertArrayEquals(cold[r].values(), hot[r].values());
    }
  }

  private static double compare(double[] expected, double[] actual, String where) {
    double worst = 0;
    for (int i = 0; i < expected.length; i++) {
      double x = expected[i];
      double y = actual[i];
      double difference = x == y ? 0 : Math.abs(x - y) / Math.max(Math.abs(x), Math.abs(y));
      assertTrue(difference <= TOLERANCE, where + "[" + i + "]: scalar " + x + ", lockstep " + y);
      worst = Math.max(worst, difference);
    }
    return worst;
  }
}
