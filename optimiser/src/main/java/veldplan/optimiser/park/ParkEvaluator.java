package veldplan.optimiser.park;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import veldplan.model.Ensemble;
import veldplan.model.ManagementPlan;
import veldplan.model.ModelParameters;
import veldplan.model.ParametersFromScenario;
import veldplan.model.LaneSimulator;
import veldplan.model.Study;
import veldplan.model.Trajectory;
import veldplan.objectives.Estimate;
import veldplan.objectives.Objective;
import veldplan.objectives.PathStep;
import veldplan.shared.scenario.Policy;
import veldplan.shared.scenario.Scenario;

/**
 * Scores policies: runs each on every climate path &times; replicate of a {@link Study} (the same
 * forcing for every policy: common random numbers) and reduces the runs to estimates of the
 * measures, in two steps (over replicates, then over paths).
 *
 * <p>Runs are spread over a fixed pool of worker threads, each with its own state and
 * trajectory, reused from run to run (nothing is allocated per simulated year). Each run writes
 * its statistics to its own slot, so the scores do not depend on the thread count or on
 * scheduling.
 */
public final class ParkEvaluator implements AutoCloseable {
  /** Called after each run; must be thread-safe. */
  @FunctionalInterface
  public interface Progress {
    /** One more run finished. */
    void runFinished();
  }

  private final Scenario scenario;
  private final Study study;
  private final List<Objective> measures;
  private final PathStep pathStep;
  private final int threads;
  private final LaneSimulator simulator;
  private final ExecutorService pool;

  /**
   * @param scenario the scenario
   * @param study    its study, with enough replicates for every call of {@link #score}
   * @param measures what to score
   * @param pathStep aggregation over paths
   * @param threads  worker threads, &gt;= 1
   */
  public ParkEvaluator(Scenario scenario, Study study, List<Objective> measures,
      PathStep pathStep, int threads) {
    if (threads < 1) {
      throw new IllegalArgumentException("threads must be >= 1: " + threads);
    }
    this.scenario = scenario;
    this.study = study;
    this.measures = List.copyOf(measures);
    this.pathStep = pathStep;
    this.threads = threads;
    this.simulator = new LaneSimulator(study.parameters());
    this.pool = Executors.newFixedThreadPool(threads, r -> {
      Thread t = new Thread(r, "veldplan-evaluate");
      t.setDaemon(true);
      return t;
    });
  }

  /** The measures, in the order of {@link PolicyScore} rows. */
  public List<Objective> measures() {
    return measures;
  }

  /** The study. */
  public Study study() {
    return study;
  }

  /**
   * Scores policies on replicates {@code [firstReplicate, firstReplicate + replicates)} of every
   * path.
   */
  public PolicyScore[] score(List<Policy> policies, int firstReplicate, int replicates,
      Progress progress) {
    if (firstReplicate < 0 || replicates < 1
        || firstReplicate + replicates > study.replicates()) {
      throw new IllegalArgumentException("replicates " + firstReplicate + ".."
          + (firstReplicate + replicates - 1) + " not in the study's 0.."
          + (study.replicates() - 1));
    }
    int paths = study.paths().size();
    int m = measures.size();
    List<ManagementPlan> plans = new ArrayList<>(policies.size());
    for (Policy policy : policies) {
      plans.add(ParametersFromScenario.plan(policy, scenario));
    }
    int perPolicy = paths * replicates;
    // values[(run * m) + measure]: one slot per run and measure, run = (policy, path,
    // replicate) in that order.
    double[] values = new double[policies.size() * perPolicy * m];
    // One job per (policy, path, batch of replicates run in lockstep).
    int lanes = LaneSimulator.lanes();
    int batches = (replicates + lanes - 1) / lanes;
    int jobs = policies.size() * paths * batches;
    AtomicInteger next = new AtomicInteger();
    List<Future<?>> tasks = new ArrayList<>();
    ModelParameters p = study.parameters();
    for (int w = 0; w < Math.min(threads, Math.max(1, jobs)); w++) {
      tasks.add(pool.submit(() -> {
        LaneSimulator.Workspace workspace = simulator.workspace();
        Trajectory[] batch = Trajectory.batch(p);
        for (int job = next.getAndIncrement(); job < jobs; job = next.getAndIncrement()) {
          int policy = job / (paths * batches);
          int path = (job / batches) % paths;
          int from = (job % batches) * lanes;
          int count = Math.min(lanes, replicates - from);
          ManagementPlan plan = plans.get(policy);
          try {
            simulator.run(plan, study, path, firstReplicate + from, count, workspace, batch);
          } catch (RuntimeException e) {
            throw new PolicyRunException(e.getMessage(), policies.get(policy), e);
          }
          for (int i = 0; i < count; i++) {
            int run = policy * perPolicy + path * replicates + from + i;
            for (int k = 0; k < m; k++) {
              values[run * m + k] = measures.get(k).of(batch[i]);
            }
            progress.runFinished();
          }
        }
      }));
    }
    Ensemble.awaitAll(tasks);

    PolicyScore[] out = new PolicyScore[policies.size()];
    double[] runs = new double[replicates];
    for (int i = 0; i < policies.size(); i++) {
      Estimate[][] perPath = new Estimate[m][paths];
      Estimate[] combined = new Estimate[m];
      for (int k = 0; k < m; k++) {
        Objective objective = measures.get(k);
        for (int s = 0; s < paths; s++) {
          int first = i * perPolicy + s * replicates;
          for (int r = 0; r < replicates; r++) {
            double v = values[(first + r) * m + k];
            // A run whose statistic is undefined (e.g. no large trees at the start) counts as
            // the objective's worst value rather than poisoning the mean.
            runs[r] = Double.isNaN(v) ? objective.worst() : v;
          }
          perPath[k][s] = objective.step().summarise(runs);
        }
        combined[k] = pathStep.combine(perPath[k], objective.direction());
      }
      out[i] = new PolicyScore(perPath, combined);
    }
    return out;
  }

  @Override
  public void close() {
    pool.shutdownNow();
  }
}
