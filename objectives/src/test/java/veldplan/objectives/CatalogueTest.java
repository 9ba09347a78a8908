package veldplan.objectives;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import veldplan.model.BlockSeries;
import veldplan.model.ParkSeries;
import veldplan.model.Trajectory;
import veldplan.shared.scenario.ElephantBand;
import veldplan.shared.scenario.Measure;
import veldplan.shared.scenario.Optimisation;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.ScenarioReader;

/**
 * Each measure of the catalogue on trajectories built by hand. The park is the bundled example
 * (invented; its block areas and thresholds are only the structure here); every expected value
 * is worked out from the numbers set in the test.
 */
class CatalogueTest {
  private static final int YEARS = 10;
  private static Scenario scenario;
  private static Catalogue catalogue;
  private static int blocks;
  private static int herbivores;
  private static int predators;

  @BeforeAll
  static void load() throws Exception {
    Path dir = Path.of("").toAbsolutePath();
    while (!Files.isDirectory(dir.resolve("examples/duskveld"))) {
      dir = dir.getParent();
    }
    scenario = ScenarioReader.read(dir.resolve("examples/duskveld/scenario.yaml"));
    Optimisation o = scenario.optimisation();
    scenario = scenario.withOptimisation(new Optimisation(o.objectives(), o.overPaths(),
        o.pathPercentile(), o.constraints(), 20.0, new ElephantBand(0.3, 0.6), o.levers(),
        o.search()));
    catalogue = new Catalogue(scenario, 5e6);
    blocks = scenario.park().blocks().size();
    herbivores = scenario.guilds().size() + 1;
    predators = scenario.predators().size();
  }

  /** Everyone at 1000 head, 10 large trees/ha at the start and end. */
  private static Trajectory healthy() {
    Trajectory t = new Trajectory(YEARS, blocks, herbivores, predators);
    double[] large = new double[blocks];
    java.util.Arrays.fill(large, 10);
    t.setInitial(new double[herbivores], new double[predators], large);
    for (int y = 0; y < YEARS; y++) {
      for (int h = 0; h < herbivores; h++) {
        t.setAbundance(y, h, 1000);
      }
      for (int p = 0; p < predators; p++) {
        t.setPredatorAbundance(y, p, 1000);
      }
      for (int b = 0; b < blocks; b++) {
        t.set(BlockSeries.LARGE_TREES, y, b, 10);
      }
    }
    return t;
  }

  @Test
  void persistenceNeedsEveryYearAtOrAboveTheThreshold() {
    Objective all = catalogue.of(Measure.GUILDS_PERSIST, null);
    Objective rare = catalogue.of(Measure.GUILD_PERSISTS, "rare antelope");
    Objective bulk = catalogue.of(Measure.GUILD_PERSISTS, "bulk grazers");
    Trajectory t = healthy();
    assertEquals(1, all.of(t));
    t.setAbundance(7, 2, 50);   // exactly the rare antelope's threshold of 50: still there
    assertEquals(1, rare.of(t));
    t.setAbundance(7, 2, 49.9);
    assertEquals(0, rare.of(t));
    assertEquals(0, all.of(t));
    assertEquals(1, bulk.of(t));
  }

  @Test
  void predatorsAndElephantsCountForPersistence() {
    Objective all = catalogue.of(Measure.GUILDS_PERSIST, null);
    Trajectory t = healthy();
    t.setPredatorAbundance(3, 1, 19);   // medium cats' threshold is 20
    assertEquals(0, all.of(t));
    assertEquals(0, catalogue.of(Measure.GUILD_PERSISTS, "medium cats").of(t));
    t = healthy();
    t.setAbundance(9, herbivores - 1, 99);  // elephants' threshold is 100
    assertEquals(0, catalogue.of(Measure.GUILD_PERSISTS, "elephants").of(t));
    assertEquals(herbivores + predators, catalogue.perGuildPersistence().size());
  }

  @Test
  void largeTreesKeptIsAreaWeighted() {
    Objective kept = catalogue.of(Measure.LARGE_TREES_KEPT, null);
    Trajectory t = healthy();
    assertEquals(1, kept.of(t), 1e-15);
    // Only the first block (42 000 of 180 000 ha) doubles to 20 trees/ha.
    t.set(BlockSeries.LARGE_TREES, YEARS - 1, 0, 20);
    assertEquals((42000 * 20 + 138000 * 10) / (180000.0 * 10), kept.of(t), 1e-12);
    Objective target = catalogue.of(Measure.LARGE_TREE_TARGET_MET, null);  // 20 trees/ha
    assertEquals(0, target.of(t));
    for (int b = 0; b < blocks; b++) {
      t.set(BlockSeries.LARGE_TREES, YEARS - 1, b, 20);
    }
    assertEquals(1, target.of(t));
  }

  @Test
  void costIsTheSumOfDiscountedYears() {
    Trajectory t = healthy();
    for (int y = 0; y < YEARS; y++) {
      t.set(ParkSeries.COST_DISCOUNTED, y, 100 + y);
    }
    assertEquals(10 * 100 + 45, catalogue.of(Measure.MANAGEMENT_COST, null).of(t), 1e-9);
  }

  @Test
  void areaBurntIsAMeanPercentPerYear() {
    Trajectory t = healthy();
    for (int b = 0; b < blocks; b++) {
      t.set(BlockSeries.BURNT_FRACTION, 0, b, 1);   // everything burns in year 0 only
    }
    assertEquals(10, catalogue.of(Measure.AREA_BURNT, null).of(t), 1e-12);
  }

  @Test
  void elephantsInBandCountsYears() {
    Trajectory t = healthy();
    // 180 000 ha = 1800 km2: 900 elephants = 0.5/km2 (in the band 0.3-0.6), 1200 = 0.67 (out).
    for (int y = 0; y < YEARS; y++) {
      t.setAbundance(y, herbivores - 1, y < 4 ? 900 : 1200);
    }
    assertEquals(0.4, catalogue.of(Measure.ELEPHANTS_IN_BAND, null).of(t), 1e-15);
  }

  @Test
  void fireTrapEscapeIsRelativeToTheScenarioStart() {
    Trajectory t = healthy();
    for (int b = 0; b < blocks; b++) {
      double start = scenario.park().blocks().get(b).initialTreesPerHa().from2to5m();
      t.set(BlockSeries.TREES_2_TO_5M, YEARS - 1, b, 2 * start);
    }
    assertEquals(2, catalogue.of(Measure.FIRE_TRAP_ESCAPE, null).of(t), 1e-12);
  }

  @Test
  void columnsCarryTheUnit() {
    assertEquals("guilds_persist_probability", catalogue.of(Measure.GUILDS_PERSIST, null)
        .column());
    assertEquals("persists_rare_antelope_probability",
        catalogue.of(Measure.GUILD_PERSISTS, "rare antelope").column());
    assertEquals("management_cost_usd_pv", catalogue.of(Measure.MANAGEMENT_COST, null)
        .column());
    assertEquals("area_burnt_percent_per_year", catalogue.of(Measure.AREA_BURNT, null)
        .column());
  }

  @Test
  void normalisationMapsBestToZeroAndWorstToOne() {
    Objective cost = catalogue.of(Measure.MANAGEMENT_COST, null);
    assertEquals(0, cost.normalised(0));
    assertEquals(1, cost.normalised(5e6));
    Objective persist = catalogue.of(Measure.GUILDS_PERSIST, null);
    assertEquals(0, persist.normalised(1));
    assertEquals(0.25, persist.normalised(0.75));
  }

  @Test
  void unknownGuildIsRejected() {
    assertThrows(IllegalArgumentException.class,
        () -> catalogue.of(Measure.GUILD_PERSISTS, "unicorns"));
  }
}
