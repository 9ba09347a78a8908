package veldplan.objectives;

import java.util.ArrayList;
import java.util.List;
import veldplan.model.BlockSeries;
import veldplan.model.ParkSeries;
import veldplan.model.Trajectory;
import veldplan.shared.scenario.BurnBlock;
import veldplan.shared.scenario.ElephantBand;
import veldplan.shared.scenario.Guild;
import veldplan.shared.scenario.Measure;
import veldplan.shared.scenario.ObjectiveChoice;
import veldplan.shared.scenario.Optimisation;
import veldplan.shared.scenario.Predator;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.Threshold;

/**
 * The objectives a scenario can ask for, built for that scenario (its guilds, thresholds, block
 * areas and targets). Each is a pure function of runs:
 *
 * <table>
 *   <caption>Catalogue</caption>
 *   <tr><th>name</th><th>one run scores</th><th>over replicates</th><th>better</th></tr>
 *   <tr><td>guilds-persist</td><td>1 if every herbivore guild, the elephants and every
 *     predator stay at or above their quasi-extinction abundance in every year, else 0</td>
 *     <td>probability</td><td>higher</td></tr>
 *   <tr><td>guild-persists:NAME</td><td>the same for one guild</td><td>probability</td>
 *     <td>higher</td></tr>
 *   <tr><td>large-trees-kept</td><td>area-weighted density of trees above 5 m in the last
 *     year over that at the start</td><td>mean</td><td>higher</td></tr>
 *   <tr><td>large-tree-target-met</td><td>1 if the area-weighted density of trees above 5 m
 *     in the last year is at least the target</td><td>probability</td><td>higher</td></tr>
 *   <tr><td>management-cost</td><td>present value of all management costs</td><td>mean</td>
 *     <td>lower</td></tr>
 *   <tr><td>area-burnt</td><td>mean over years of the area-weighted share burnt (%)</td>
 *     <td>mean</td><td>lower</td></tr>
 *   <tr><td>elephants-in-band</td><td>share of years with the park's elephant density in the
 *     band</td><td>mean</td><td>higher</td></tr>
 *   <tr><td>fire-trap-escape</td><td>area-weighted density of 2-5 m trees in the last year
 *     over that at the start</td><td>mean</td><td>higher</td></tr>
 * </table>
 *
 * <p>Quasi-extinction as a threshold abundance follows Ginzburg et al. (1982); "stays above"
 * means no year ends below it.
 */
public final class Catalogue {
  private final Scenario scenario;
  private final double[] areaShare;
  private final double parkKm2;
  private final double[] herbivoreThreshold;
  private final double[] predatorThreshold;
  private final List<String> herbivoreNames = new ArrayList<>();
  private final List<String> predatorNames = new ArrayList<>();
  private final double initialMidTrees;
  private final String currency;
  private final double costCeiling;

  /**
   * @param scenario    the scenario (its guilds, blocks, optimisation targets)
   * @param costCeiling the worst plausible present value of management costs, for
   *                    normalisation (e.g. the cost of the most intensive policy the levers
   *                    allow)
   */
  public Catalogue(Scenario scenario, double costCeiling) {
    if (!(costCeiling > 0)) {
      throw new IllegalArgumentException("cost ceiling must be > 0: " + costCeiling);
    }
    this.scenario = scenario;
    this.costCeiling = costCeiling;
    this.currency = scenario.costs().currency();
    List<BurnBlock> blocks = scenario.park().blocks();
    areaShare = new double[blocks.size()];
    double total = 0;
    for (BurnBlock b : blocks) {
      total += b.areaHa();
    }
    double mid = 0;
    for (int i = 0; i < blocks.size(); i++) {
      areaShare[i] = blocks.get(i).areaHa() / total;
      mid += areaShare[i] * blocks.get(i).initialTreesPerHa().from2to5m();
    }
    initialMidTrees = mid;
    parkKm2 = total / 100;
    List<Guild> guilds = scenario.guilds();
    herbivoreThreshold = new double[guilds.size() + 1];
    for (int h = 0; h < guilds.size(); h++) {
      herbivoreThreshold[h] = guilds.get(h).quasiExtinctionAbundance();
      herbivoreNames.add(guilds.get(h).name());
    }
    herbivoreThreshold[guilds.size()] = scenario.elephants().quasiExtinctionAbundance();
    herbivoreNames.add("elephants");
    List<Predator> predators = scenario.predators();
    predatorThreshold = new double[predators.size()];
    for (int p = 0; p < predators.size(); p++) {
      predatorThreshold[p] = predators.get(p).quasiExtinctionAbundance();
      predatorNames.add(predators.get(p).name());
    }
  }

  /** Names of every guild whose persistence can be scored, herbivores, elephants, predators. */
  public List<String> guildNames() {
    List<String> all = new ArrayList<>(herbivoreNames);
    all.addAll(predatorNames);
    return all;
  }

  /** The objective for a choice in the scenario. */
  public Objective of(ObjectiveChoice choice) {
    return of(choice.measure(), choice.guild());
  }

  /** The objective a threshold constrains. */
  public Objective of(Threshold threshold) {
    return of(threshold.measure(), threshold.guild());
  }

  /**
   * The objective for a measure.
   *
   * @param guild the guild for {@link Measure#GUILD_PERSISTS}, else ignored
   * @throws IllegalArgumentException if the measure needs a guild or target the scenario lacks
   */
  public Objective of(Measure measure, String guild) {
    Optimisation o = scenario.optimisation();
    switch (measure) {
      case GUILDS_PERSIST:
        return new Objective("guilds-persist", "all guilds persist", "probability",
            Direction.MAXIMISE, ReplicateStep.PROBABILITY, 1, 0, this::allPersist);
      case GUILD_PERSISTS:
        return guildPersists(guild);
      case LARGE_TREES_KEPT:
        return new Objective("large-trees-kept", "large trees (>5 m) kept", "ratio to start",
            Direction.MAXIMISE, ReplicateStep.MEAN, 4, 0, this::largeTreesKept);
      case LARGE_TREE_TARGET_MET: {
        if (o == null || o.largeTreeTargetPerHa() == null) {
          throw new IllegalArgumentException("large-tree-target-met needs largeTreeTargetPerHa");
        }
        double target = o.largeTreeTargetPerHa();
        return new Objective("large-tree-target-met", "large-tree target met", "probability",
            Direction.MAXIMISE, ReplicateStep.PROBABILITY, 1, 0,
            run -> largeTreesAtEnd(run) >= target ? 1 : 0);
      }
      case MANAGEMENT_COST:
        return new Objective("management-cost", "management cost", currency + " present value",
            Direction.MINIMISE, ReplicateStep.MEAN, 0, costCeiling, Catalogue::costPresentValue);
      case AREA_BURNT:
        return new Objective("area-burnt", "area burnt", "% of park per year",
            Direction.MINIMISE, ReplicateStep.MEAN, 0, 100, this::areaBurntPercent);
      case ELEPHANTS_IN_BAND: {
        if (o == null || o.elephantBandPerKm2() == null) {
          throw new IllegalArgumentException("elephants-in-band needs elephantBandPerKm2");
        }
        ElephantBand band = o.elephantBandPerKm2();
        return new Objective("elephants-in-band", "elephant density in band", "share of years",
            Direction.MAXIMISE, ReplicateStep.MEAN, 1, 0, run -> inBand(run, band));
      }
      case FIRE_TRAP_ESCAPE:
        return new Objective("fire-trap-escape", "trees escaping the fire trap (2-5 m)",
            "ratio to start", Direction.MAXIMISE, ReplicateStep.MEAN, 4, 0, this::midTreesKept);
      default:
        throw new IllegalArgumentException("unknown measure " + measure);
    }
  }

  /** Persistence of every guild, one objective each, herbivores, elephants, predators. */
  public List<Objective> perGuildPersistence() {
    List<Objective> out = new ArrayList<>();
    for (String name : guildNames()) {
      out.add(guildPersists(name));
    }
    return out;
  }

  private Objective guildPersists(String guild) {
    int h = herbivoreNames.indexOf(guild);
    int p = predatorNames.indexOf(guild);
    if (h < 0 && p < 0) {
      throw new IllegalArgumentException("no guild named " + guild);
    }
    Objective.RunStatistic statistic = h >= 0
        ? run -> herbivorePersists(run, h) ? 1 : 0
        : run -> predatorPersists(run, p) ? 1 : 0;
    return new Objective("guild-persists:" + guild, guild + " persist", "probability",
        Direction.MAXIMISE, ReplicateStep.PROBABILITY, 1, 0, statistic);
  }

  private double allPersist(Trajectory run) {
    for (int h = 0; h < herbivoreThreshold.length; h++) {
      if (!herbivorePersists(run, h)) {
        return 0;
      }
    }
    for (int p = 0; p < predatorThreshold.length; p++) {
      if (!predatorPersists(run, p)) {
        return 0;
      }
    }
    return 1;
  }

  private boolean herbivorePersists(Trajectory run, int h) {
    double threshold = herbivoreThreshold[h];
    for (int y = 0; y < run.years(); y++) {
      if (run.abundance(y, h) < threshold) {
        return false;
      }
    }
    return true;
  }

  private boolean predatorPersists(Trajectory run, int p) {
    double threshold = predatorThreshold[p];
    for (int y = 0; y < run.years(); y++) {
      if (run.predatorAbundance(y, p) < threshold) {
        return false;
      }
    }
    return true;
  }

  private double largeTreesAtEnd(Trajectory run) {
    int last = run.years() - 1;
    double sum = 0;
    for (int b = 0; b < areaShare.length; b++) {
      sum += areaShare[b] * run.get(BlockSeries.LARGE_TREES, last, b);
    }
    return sum;
  }

  private double largeTreesKept(Trajectory run) {
    double start = 0;
    for (int b = 0; b < areaShare.length; b++) {
      start += areaShare[b] * run.initialLargeTreesPerHa(b);
    }
    return start > 0 ? largeTreesAtEnd(run) / start : Double.NaN;
  }

  private double midTreesKept(Trajectory run) {
    int last = run.years() - 1;
    double sum = 0;
    for (int b = 0; b < areaShare.length; b++) {
      sum += areaShare[b] * run.get(BlockSeries.TREES_2_TO_5M, last, b);
    }
    return initialMidTrees > 0 ? sum / initialMidTrees : Double.NaN;
  }

  private static double costPresentValue(Trajectory run) {
    double sum = 0;
    for (int y = 0; y < run.years(); y++) {
      sum += run.get(ParkSeries.COST_DISCOUNTED, y);
    }
    return sum;
  }

  private double areaBurntPercent(Trajectory run) {
    double sum = 0;
    for (int y = 0; y < run.years(); y++) {
      for (int b = 0; b < areaShare.length; b++) {
        sum += areaShare[b] * run.get(BlockSeries.BURNT_FRACTION, y, b);
      }
    }
    return 100 * sum / run.years();
  }

  private double inBand(Trajectory run, ElephantBand band) {
    int elephants = run.herbivores() - 1;
    int inside = 0;
    for (int y = 0; y < run.years(); y++) {
      double density = run.abundance(y, elephants) / parkKm2;
      if (density >= band.min() && density <= band.max()) {
        inside++;
      }
    }
    return inside / (double) run.years();
  }
}
