package veldplan.optimiser.park;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import veldplan.optimiser.report.PolicyFile;
import veldplan.shared.scenario.BurnPlan;
import veldplan.shared.scenario.BurnSeason;
import veldplan.shared.scenario.Levers;
import veldplan.shared.scenario.Optimisation;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.ScenarioException;
import veldplan.shared.scenario.ScenarioReader;
import veldplan.shared.scenario.WaterPlan;

class PolicySpaceTest {
  private static final Scenario SCENARIO = ExampleScenario.load().scenario();
  private static final PolicySpace SPACE = new PolicySpace(SCENARIO);

  @Test
  void everySearchedLeverHasItsGenes() {
    // 6 blocks x (interval, season, target, open points, closure year) + 3 elephant levers;
    // every block of the example has water points.
    assertEquals(6 * 5 + 3, SPACE.size());
    assertEquals("Ironsand: fire return interval", SPACE.genes().get(0).label());
  }

  @Test
  void lowestGenesGiveTheLowestLevels() {
    Policy p = SPACE.decode(new double[SPACE.size()], "x");
    for (BurnPlan burn : p.burning()) {
      assertEquals(2.0, burn.fireReturnIntervalYears());
      assertEquals(BurnSeason.EARLY_DRY, burn.season());
      assertEquals(0.3, burn.targetFractionBurnt());
    }
    for (WaterPlan water : p.waterPoints()) {
      assertEquals(0, water.openPoints());
      assertNull(water.closureYear(), "no open point: the closure year is canonical (never)");
    }
    assertEquals(0, p.elephants().offtakeFractionPerYear());
    assertEquals(0, p.elephants().contraceptionCoverage());
    assertNull(p.elephants().triggerDensityPerKm2(), "elephants left alone: no trigger");
  }

  @Test
  void highestGenesGiveTheHighestLevels() {
    double[] u = new double[SPACE.size()];
    Arrays.fill(u, 1);
    Policy p = SPACE.decode(u, "x");
    // "No planned burning" is the level after the longest interval; such blocks are left out.
    assertEquals(List.of(), p.burning());
    for (int b = 0; b < 6; b++) {
      WaterPlan water = p.waterPoints().get(b);
      assertEquals(SCENARIO.park().blocks().get(b).artificialWaterPoints(), water.openPoints());
      assertNull(water.closureYear(), "never is the level after the latest closure year");
    }
    assertEquals(0.08, p.elephants().offtakeFractionPerYear());
    assertEquals(0.7, p.elephants().contraceptionCoverage());
    assertEquals(1.5, p.elephants().triggerDensityPerKm2());
  }

  @Test
  void levelsAreFloorOfUTimesK() {
    // Interval 2..8 plus "none": K = 8; u = 0.5 -> level 4 -> 6 years; u = 0.874 -> level 6.
    double[] u = new double[SPACE.size()];
    u[0] = 0.5;
    assertEquals(6.0, SPACE.decode(u, "x").burning().get(0).fireReturnIntervalYears());
    u[0] = 0.874;
    assertEquals(8.0, SPACE.decode(u, "x").burning().get(0).fireReturnIntervalYears());
    u[0] = 0.876;
    assertEquals("Copperflat", SPACE.decode(u, "x").burning().get(0).block());
    assertEquals(3, PolicySpace.level(0.5, 7));
    assertEquals(6, PolicySpace.level(1.0, 7));
  }

  @Test
  void ratesWithALowerBoundOfZeroHaveAnOffZone() {
    assertEquals(0, PolicySpace.withOff(0.05, 0, 0.08, PolicySpace.OFFTAKE_STEP));
    assertEquals(0.001, PolicySpace.withOff(0.1, 0, 0.08, PolicySpace.OFFTAKE_STEP));
    assertEquals(0.04, PolicySpace.withOff(0.55, 0, 0.08, PolicySpace.OFFTAKE_STEP));
    assertEquals(0.08, PolicySpace.withOff(1, 0, 0.08, PolicySpace.OFFTAKE_STEP));
    assertEquals(0.5, PolicySpace.withOff(0, 0.5, 0.7, PolicySpace.SHARE_STEP));
  }

  @Test
  void encodeThenDecodeGivesThePolicyBack() {
    Policy status = SCENARIO.policy();
    Policy back = SPACE.decode(SPACE.encode(status), status.name());
    assertEquals(status.elephants(), back.elephants());
    assertEquals(status.waterPoints(), back.waterPoints());
    for (BurnPlan burn : status.burning()) {
      assertTrue(back.burning().contains(burn), burn.toString());
    }
  }

  @Test
  void continuousLeversAreRoundedToWhatAParkCanDo() {
    assertEquals(0.03, PolicySpace.between(0.37, 0, 0.08, PolicySpace.OFFTAKE_STEP));
    assertEquals(0.47, PolicySpace.between(0.34, 0.3, 0.8, PolicySpace.SHARE_STEP));
    assertEquals(0.8, PolicySpace.between(1, 0.3, 0.8, PolicySpace.SHARE_STEP));
  }

  @Test
  void policiesThatActTheSameAreEqual() {
    double[] a = new double[SPACE.size()];
    Arrays.fill(a, 0.99);  // no planned burning anywhere
    double[] b = a.clone();
    b[1] = 0.1;   // Ironsand's season: no effect without planned burning
    b[2] = 0.2;   // Ironsand's target: no effect either
    assertEquals(SPACE.decode(a, "x"), SPACE.decode(b, "x"));
    b[0] = 0.1;   // but an interval does change the policy
    assertNotEquals(SPACE.decode(a, "x"), SPACE.decode(b, "x"));
  }

  @Test
  void leversLeftOutKeepTheScenarioPolicy() {
    Optimisation o = SCENARIO.optimisation();
    Levers onlyElephants = new Levers(null, null, null, null,
        o.levers().elephantOfftakeFractionPerYear(), null, null, null, null);
    Scenario sc = SCENARIO.withOptimisation(new Optimisation(o.objectives(), o.overPaths(),
        o.pathPercentile(), o.constraints(), null, null, onlyElephants, o.search()));
    PolicySpace space = new PolicySpace(sc);
    assertEquals(1, space.size());
    Policy p = space.decode(new double[] {0.5}, "x");
    assertEquals(SCENARIO.policy().burning(), p.burning());
    assertEquals(PolicySpace.withOff(0.5, 0, 0.08, PolicySpace.OFFTAKE_STEP),
        p.elephants().offtakeFractionPerYear());
    assertEquals(SCENARIO.policy().elephants().contraceptionCoverage(),
        p.elephants().contraceptionCoverage());
  }

  @Test
  void rejectsGenesOutsideTheUnitInterval() {
    double[] u = new double[SPACE.size()];
    u[3] = 1.2;
    assertThrows(IllegalArgumentException.class, () -> SPACE.decode(u, "x"));
    assertThrows(IllegalArgumentException.class, () -> SPACE.decode(new double[2], "x"));
  }

  /** Every decoded policy is a valid policy file for the scenario (feasible by construction). */
  @ParameterizedTest(name = "seed {0}")
  @ValueSource(longs = {1, 2, 3, 4, 5})
  void decodedPoliciesAreValidPolicyFiles(long seed, @TempDir Path dir)
      throws IOException, ScenarioException {
    SplittableRandom random = new SplittableRandom(seed);
    for (int i = 0; i < 40; i++) {
      double[] u = new double[SPACE.size()];
      for (int g = 0; g < u.length; g++) {
        u[g] = random.nextDouble();
      }
      Policy p = SPACE.decode(u, "P" + i);
      Path file = dir.resolve("p" + i + ".yaml");
      Files.writeString(file, PolicyFile.yaml(p, List.of("test")));
      assertEquals(p, ScenarioReader.readPolicy(file, SCENARIO));
    }
  }
}
