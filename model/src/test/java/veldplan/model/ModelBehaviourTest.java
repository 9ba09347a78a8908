package veldplan.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import veldplan.shared.scenario.BurnSeason;

/**
 * How the model responds to management, other things equal (same seeds: common random numbers).
 * These are expectations of the model's design, each explained beside the check.
 */
class ModelBehaviourTest {

  private static double largeTrees(Trajectory[] runs) {
    return TestParks.meanAtEnd(runs, BlockSeries.LARGE_TREES);
  }

  @Test
  void trees_noFireAndNoElephants_gainBiomass() {
    TestParks park = new TestParks();
    park.fireReturnIntervalYears = null;
    park.elephants = 0;
    park.years = 40;
    Trajectory[] runs = park.run(TestParks.withoutWildfire(park.parameters()));
    for (Trajectory t : runs) {
      double start = 0;
      for (int k = 0; k < TreeClass.COUNT; k++) {
        start += park.treesPerHa[k] * park.parameters().trees().basalAreaM2PerTree(k);
      }
      double end = t.get(BlockSeries.BASAL_AREA, t.years() - 1, 0);
      assertTrue(end > 1.5 * start, "basal area " + start + " -> " + end);
      assertTrue(t.get(BlockSeries.LARGE_TREES, t.years() - 1, 0) > t.initialLargeTreesPerHa(0));
    }
  }

  @Test
  void trees_annualIntenseLateFire_stayInTheFireTrap() {
    TestParks park = new TestParks();
    park.rainfallMm = 800;
    park.elephants = 0;
    park.grazers = 200;
    park.mixedFeeders = 200;
    park.years = 40;
    park.fireReturnIntervalYears = 1.0;
    park.season = BurnSeason.LATE_DRY;
    park.targetFractionBurnt = 1.0;
    park.treesPerHa = new double[] {800, 600, 10, 0, 0};
    Trajectory[] burnt = park.run();
    park.fireReturnIntervalYears = null;
    Trajectory[] unburnt = park.run(TestParks.withoutWildfire(park.parameters()));
    for (int r = 0; r < burnt.length; r++) {
      Trajectory t = burnt[r];
      int last = t.years() - 1;
      double trapped = t.get(BlockSeries.TREES_BELOW_0_5M, last, 0)
          + t.get(BlockSeries.TREES_0_5_TO_2M, last, 0);
      double escaped = t.get(BlockSeries.TREES_2_TO_5M, last, 0)
          + t.get(BlockSeries.LARGE_TREES, last, 0);
      // Most stems are kept below 2 m, and far fewer escape than without fire.
      assertTrue(trapped > 5 * escaped, "trapped " + trapped + ", escaped " + escaped);
      Trajectory u = unburnt[r];
      double escapedUnburnt = u.get(BlockSeries.TREES_2_TO_5M, last, 0)
          + u.get(BlockSeries.LARGE_TREES, last, 0);
      assertTrue(escaped < 0.2 * escapedUnburnt, escaped + " vs " + escapedUnburnt);
    }
  }

  @Test
  void elephants_offtake_fewerElephantsThanWithout() {
    TestParks park = new TestParks();
    park.years = 30;
    Trajectory[] without = park.run();
    park.offtake = 0.05;
    Trajectory[] with = park.run();
    int e = park.parameters().herbivores().elephantIndex();
    for (int r = 0; r < with.length; r++) {
      for (int year = 0; year < 30; year++) {
        assertTrue(with[r].abundance(year, e) < without[r].abundance(year, e),
            "replicate " + r + ", year " + year);
      }
      assertTrue(with[r].get(ParkSeries.ELEPHANTS_REMOVED, 0) > 0);
    }
  }

  @Test
  void elephants_contraception_fewerBirthsOnlyAfterTheGestationLag() {
    TestParks park = new TestParks();
    park.years = 12;
    Trajectory[] without = park.run();
    park.contraception = 1.0;
    Trajectory[] with = park.run();
    int e = park.parameters().herbivores().elephantIndex();
    int lag = park.parameters().elephants().gestationLagYears();
    for (int r = 0; r < with.length; r++) {
      for (int year = 0; year < lag; year++) {
        assertEquals(without[r].abundance(year, e), with[r].abundance(year, e), 1e-9);
      }
      assertTrue(with[r].abundance(11, e) < without[r].abundance(11, e));
    }
  }

  @Test
  void waterPoints_closure_shrinksTheAreaWaterDependentGuildsReach() {
    TestParks park = new TestParks();
    park.waterPoints = 6;
    park.closureYear = 2035;
    park.years = 10;
    ModelParameters p = park.parameters();
    Study study = park.study(p);
    ManagementPlan plan = park.plan();
    EcosystemState s = new EcosystemState(p);
    s.reset(p);
    double[] before = null;
    for (int year = 0; year < 10; year++) {
      AnnualCycle.advance(p, plan, study.forcing(0, 0), year, s);
      if (year == 4) {
        before = new double[p.herbivores().count()];
        for (int h = 0; h < before.length; h++) {
          before[h] = s.reach(h, 0);
        }
      }
    }
    for (int h = 0; h < before.length; h++) {
      assertTrue(s.reach(h, 0) < before[h], p.herbivores().name(h) + " reach " + before[h]
          + " -> " + s.reach(h, 0));
      assertEquals(0, s.reach(h, 0), 1e-12, "no water left in the block");
    }
  }

  @Test
  void costs_noActions_onlyWaterUpkeep() {
    TestParks park = new TestParks();
    park.fireReturnIntervalYears = null;
    park.years = 5;
    Trajectory[] runs = park.run();
    for (Trajectory t : runs) {
      for (int year = 0; year < 5; year++) {
        assertEquals(0, t.get(ParkSeries.COST_BURNING, year));
        assertEquals(0, t.get(ParkSeries.COST_ELEPHANT_OFFTAKE, year));
        assertEquals(0, t.get(ParkSeries.COST_CONTRACEPTION, year));
        // 3 open points x 2000 a year (the builder's costs).
        assertEquals(6000, t.get(ParkSeries.COST_WATER_POINTS, year), 1e-9);
      }
    }
  }

  @Test
  void costs_presentValue_discountsEndOfYearCosts() {
    TestParks park = new TestParks();
    park.years = 10;
    Trajectory[] runs = park.run();
    for (Trajectory t : runs) {
      for (int year = 0; year < 10; year++) {
        // Builder: 5 %/yr; PV = C / 1.05^(year + 1) (methods sheet §12.2).
        assertEquals(t.get(ParkSeries.COST_TOTAL, year) / Math.pow(1.05, year + 1),
            t.get(ParkSeries.COST_DISCOUNTED, year), 1e-9);
      }
    }
  }
}
