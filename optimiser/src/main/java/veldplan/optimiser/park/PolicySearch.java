package veldplan.optimiser.park;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import veldplan.model.ParametersFromScenario;
import veldplan.model.Study;
import veldplan.objectives.Catalogue;
import veldplan.objectives.Objective;
import veldplan.objectives.PathStep;
import veldplan.optimiser.report.FrontEntry;
import veldplan.optimiser.report.FrontReport;
import veldplan.optimiser.search.Hypervolume;
import veldplan.optimiser.search.Individual;
import veldplan.optimiser.search.Nsga2;
import veldplan.optimiser.search.Nsga2Settings;
import veldplan.optimiser.search.RandomSearch;
import veldplan.optimiser.search.SearchListener;
import veldplan.optimiser.search.SearchResult;
import veldplan.optimiser.search.SearchState;
import veldplan.shared.scenario.ElephantPlan;
import veldplan.shared.scenario.LoadedScenario;
import veldplan.shared.scenario.Measure;
import veldplan.shared.scenario.ObjectiveChoice;
import veldplan.shared.scenario.Optimisation;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.Scenario;
import veldplan.shared.scenario.Stochastic;
import veldplan.shared.scenario.Threshold;

/**
 * A whole policy search on a park: NSGA-II over the levers on the search replicates, starting
 * from a population that holds the scenario's own policy and "no intervention" (as near as the
 * levers' bounds allow) beside random policies; then the
 * out-of-sample check: the final front (every feasible non-dominated policy the search found)
 * and two reference policies (the scenario's own and "no intervention") are scored on fresh
 * replicates the search never used, and those are the values reported.
 *
 * <p>Replicates {@code 0 .. replicates-1} of every path are the search's (the same for every
 * policy: common random numbers); replicates {@code replicates .. replicates+validation-1} are
 * the fresh ones. Both come from the scenario's seed tree, so a different number of validation
 * replicates leaves the search unchanged.
 */
public final class PolicySearch implements AutoCloseable {
  /** What the search and the check use. */
  public record Settings(int population, int generations, int replicates,
      int validationReplicates, long seed, PathStep pathStep, int threads) {}

  /** Mixed into the scenario seed to seed the genetic algorithm (any fixed odd constant). */
  static final long SEARCH_SEED_SALT = 0x9E3779B97F4A7C15L;
  /** The cost ceiling for normalisation is this multiple of the costliest corner policy. */
  static final double COST_CEILING_MARGIN = 1.25;

  private final Scenario scenario;
  private final Settings settings;
  private final Study study;
  private final PolicySpace space;
  private final Catalogue catalogue;
  private final List<Objective> searchMeasures;
  private final List<Limit> searchLimits;
  private final int objectiveCount;
  private final ParkEvaluator evaluator;
  private final double costCeiling;
  private final List<String> blocks;
  private final int[] waterPoints;

  /**
   * Prepares a search: builds the forcing of every path for the search and validation
   * replicates and measures the cost ceiling.
   *
   * @throws IllegalArgumentException if the scenario has no optimisation section or a value the
   *                                  model cannot use (message starts with a JSON pointer)
   */
  public PolicySearch(LoadedScenario loaded, Settings settings) {
    Scenario sc = loaded.scenario();
    Optimisation o = sc.optimisation();
    if (o == null) {
      throw new IllegalArgumentException("the scenario has no optimisation section");
    }
    Stochastic st = sc.stochastic();
    sc = sc.withStochastic(new Stochastic(settings.replicates() + settings.validationReplicates(),
        settings.seed(), st.interannualVariabilityFactor()));
    this.scenario = sc;
    this.settings = settings;
    this.study = ParametersFromScenario.study(new LoadedScenario(loaded.file(), sc,
        loaded.baseline(), loaded.pathSeries(), loaded.sha256()));
    this.space = new PolicySpace(sc);
    this.blocks = space.blockNames();
    this.waterPoints = sc.park().blocks().stream().mapToInt(b -> b.artificialWaterPoints())
        .toArray();

    // The cost ceiling: the costlier of the most intensive corner of the levers and the
    // scenario's own policy, with a margin, on the search replicates.
    Catalogue provisional = new Catalogue(sc, 1);
    Objective cost = provisional.of(Measure.MANAGEMENT_COST, null);
    try (ParkEvaluator e = new ParkEvaluator(sc, study, List.of(cost), PathStep.WORST,
        settings.threads())) {
      PolicyScore[] s = e.score(List.of(space.decode(mostIntensive(), "most intensive"),
          sc.policy()), 0, settings.replicates(), () -> { });
      double max = Math.max(s[0].combined()[0].upper(), s[1].combined()[0].upper());
      max = Math.max(max, Math.max(s[0].combined()[0].value(), s[1].combined()[0].value()));
      costCeiling = COST_CEILING_MARGIN * Math.max(1, Double.isNaN(max) ? 1 : max);
    }
    this.catalogue = new Catalogue(sc, costCeiling);

    Map<String, Objective> measures = new LinkedHashMap<>();
    for (ObjectiveChoice choice : o.objectives()) {
      Objective obj = catalogue.of(choice);
      measures.putIfAbsent(obj.name(), obj);
    }
    objectiveCount = measures.size();
    for (Threshold t : o.constraints()) {
      Objective obj = catalogue.of(t);
      measures.putIfAbsent(obj.name(), obj);
    }
    searchMeasures = List.copyOf(measures.values());
    searchLimits = limits(o.constraints(), searchMeasures);
    evaluator = new ParkEvaluator(sc, study, searchMeasures, settings.pathStep(),
        settings.threads());
  }

  private List<Limit> limits(List<Threshold> thresholds, List<Objective> measures) {
    List<Limit> out = new ArrayList<>();
    for (Threshold t : thresholds) {
      String name = catalogue.of(t).name();
      int k = 0;
      while (!measures.get(k).name().equals(name)) {
        k++;
      }
      out.add(new Limit(k, t.atLeast() == null ? Double.NEGATIVE_INFINITY : t.atLeast(),
          t.atMost() == null ? Double.POSITIVE_INFINITY : t.atMost()));
    }
    return out;
  }

  /** Genes of the most intensive corner: shortest burn interval, largest targets and rates,
   * every water point open, trigger at its lowest. */
  double[] mostIntensive() {
    double[] u = new double[space.size()];
    for (int i = 0; i < u.length; i++) {
      switch (space.genes().get(i).kind()) {
        case INTERVAL:
        case TRIGGER:
          u[i] = 0;
          break;
        default:
          u[i] = 1;
      }
    }
    return u;
  }

  /** The scenario as searched (with the study's replicate count and seed). */
  public Scenario scenario() {
    return scenario;
  }

  /** The study (search and validation replicates). */
  public Study study() {
    return study;
  }

  /** The levers. */
  public PolicySpace space() {
    return space;
  }

  /** The cost ceiling used to normalise management cost. */
  public double costCeiling() {
    return costCeiling;
  }

  /** The objectives then the constrained measures, as the search scores them. */
  public List<Objective> searchMeasures() {
    return searchMeasures;
  }

  /** The genetic algorithm's settings. */
  public Nsga2Settings nsga2Settings() {
    return Nsga2Settings.defaults(settings.population(), settings.generations(),
        settings.seed() ^ SEARCH_SEED_SALT);
  }

  /**
   * Runs the search, from scratch or from a checkpoint.
   *
   * @param checkpoint a state from an earlier run with the same settings, or null
   * @param progress   called after each simulated run
   * @param listener   called after each generation
   */
  public SearchResult search(SearchState checkpoint, ParkEvaluator.Progress progress,
      SearchListener listener) {
    ParkProblem problem = new ParkProblem(space, evaluator, objectiveCount, searchLimits,
        settings.replicates(), progress);
    Nsga2 nsga2 = new Nsga2(nsga2Settings(), problem);
    if (checkpoint != null) {
      return nsga2.resume(checkpoint, listener);
    }
    // Start from the policies the managers know, beside random ones.
    List<double[]> seeds = List.of(space.encode(scenario.policy()), space.encode(noIntervention()));
    return nsga2.run(seeds.subList(0, Math.min(seeds.size(), settings.population())), listener);
  }

  /**
   * Random search with a budget of evaluations on the same problem, for comparison with the
   * genetic algorithm (same replicates, same objectives and thresholds, same archive rule).
   */
  public List<Individual> randomSearch(long budget, long seed) {
    ParkProblem problem = new ParkProblem(space, evaluator, objectiveCount, searchLimits,
        settings.replicates(), () -> { });
    return RandomSearch.run(problem, budget, settings.population(), seed);
  }

  /**
   * Hypervolume of the feasible members of an archive in the search's normalised objective
   * space (0 = best, 1 = worst plausible value; reference point 1.1 in each objective), 0 if
   * none is feasible.
   */
  public static double hypervolume(List<Individual> archive) {
    List<double[]> points = new ArrayList<>();
    for (Individual i : archive) {
      if (i.evaluation().violation() == 0) {
        points.add(i.objectives());
      }
    }
    if (points.isEmpty()) {
      return 0;
    }
    double[] reference = new double[points.get(0).length];
    Arrays.fill(reference, Hypervolume.NORMALISED_REFERENCE);
    return Hypervolume.of(points, reference);
  }

  /** Runs of the out-of-sample check for a front of {@code policies} policies. */
  public long validationRuns(int policies) {
    return (long) (policies + 2) * study.paths().size() * settings.validationReplicates();
  }

  /**
   * The front the search found: feasible archive members, or all of it if none is feasible,
   * unnamed ({@link #validate} names them by their validated cost).
   */
  public List<Policy> front(SearchResult result) {
    List<Individual> archive = new ArrayList<>(result.archive());
    boolean anyFeasible = archive.stream().anyMatch(i -> i.evaluation().violation() == 0);
    if (anyFeasible) {
      archive.removeIf(i -> i.evaluation().violation() != 0);
    }
    // A stable order: by the objective vector, then the genes.
    archive.sort(Comparator.<Individual, double[]>comparing(i -> i.evaluation().objectives(),
        Arrays::compare).thenComparing(Individual::genes, Arrays::compare));
    Map<Policy, Boolean> seen = new LinkedHashMap<>();
    List<Policy> out = new ArrayList<>();
    for (Individual i : archive) {
      Policy p = space.decode(i.genes(), "");
      if (seen.putIfAbsent(p, true) == null) {
        out.add(p);
      }
    }
    return out;
  }

  /**
   * The out-of-sample check: scores the front and the reference policies on the fresh
   * replicates, on every reported measure.
   */
  public FrontReport validate(List<Policy> front, ParkEvaluator.Progress progress) {
    Map<String, Objective> measures = new LinkedHashMap<>();
    searchMeasures.forEach(m -> measures.put(m.name(), m));
    Objective cost = catalogue.of(Measure.MANAGEMENT_COST, null);
    measures.putIfAbsent(cost.name(), cost);
    Optimisation o = scenario.optimisation();
    for (Measure m : Measure.values()) {
      if (m == Measure.GUILD_PERSISTS
          || m == Measure.LARGE_TREE_TARGET_MET && o.largeTreeTargetPerHa() == null
          || m == Measure.ELEPHANTS_IN_BAND && o.elephantBandPerKm2() == null) {
        continue;
      }
      Objective obj = catalogue.of(m, null);
      measures.putIfAbsent(obj.name(), obj);
    }
    catalogue.perGuildPersistence().forEach(g -> measures.putIfAbsent(g.name(), g));
    List<Objective> all = List.copyOf(measures.values());
    int costIndex = new ArrayList<>(measures.keySet()).indexOf(cost.name());

    List<Policy> policies = new ArrayList<>(front);
    List<String> roles = new ArrayList<>();
    front.forEach(p -> roles.add("front"));
    policies.add(scenario.policy());
    roles.add("reference");
    policies.add(noIntervention());
    roles.add("reference");
    PolicyScore[] scores;
    try (ParkEvaluator e = new ParkEvaluator(scenario, study, all, settings.pathStep(),
        settings.threads())) {
      scores = e.score(policies, settings.replicates(), settings.validationReplicates(),
          progress);
    }
    // Name the front policies by their validated cost, cheapest first: P01, P02, ...
    Integer[] order = new Integer[front.size()];
    for (int i = 0; i < order.length; i++) {
      order[i] = i;
    }
    PolicyScore[] scored = scores;
    Arrays.sort(order, Comparator.<Integer>comparingDouble(
        i -> scored[i].combined()[costIndex].value()).thenComparing(i -> i));
    int width = Math.max(2, Integer.toString(front.size()).length());
    List<Policy> named = new ArrayList<>();
    PolicyScore[] reordered = new PolicyScore[policies.size()];
    for (int k = 0; k < order.length; k++) {
      Policy p = front.get(order[k]);
      named.add(new Policy(String.format("P%0" + width + "d", k + 1), p.burning(),
          p.elephants(), p.waterPoints()));
      reordered[k] = scores[order[k]];
    }
    for (int k = front.size(); k < policies.size(); k++) {
      named.add(policies.get(k));
      reordered[k] = scores[k];
    }
    List<FrontEntry> entries = FrontReport.entries(named, roles, reordered, all, objectiveCount,
        limits(o.constraints(), all));
    List<String> paths = study.paths().stream().map(p -> p.name()).toList();
    return new FrontReport(scenario.name(), blocks, waterPoints, paths, all, objectiveCount,
        limits(o.constraints(), all), settings.pathStep(), settings.validationReplicates(),
        entries, costIndex);
  }

  /** No planned burning, elephants left alone, water points as they are. */
  Policy noIntervention() {
    return new Policy("no intervention", List.of(), new ElephantPlan(0, 0, null), List.of());
  }

  @Override
  public void close() {
    evaluator.close();
  }
}
