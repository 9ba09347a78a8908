package veldplan.model;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Runs one policy on every (climate path, replicate) of a {@link Study}, in parallel over
 * threads, {@link LaneSimulator#lanes()} replicates at a time in lockstep. The result does not
 * depend on the thread count: each run depends only on its own forcing and the plan, and its
 * trajectory goes to its own slot.
 */
public final class Ensemble {
  private Ensemble() {}

  /** Called after each finished run; must be thread-safe. */
  @FunctionalInterface
  public interface Progress {
    /** One more run finished. */
    void runFinished();
  }

  /**
   * Runs the plan on every path and replicate.
   *
   * @param study    the study
   * @param plan     the policy
   * @param threads  worker threads, &gt;= 1
   * @param progress called after each run
   * @return trajectories indexed [path][replicate]
   */
  public static Trajectory[][] run(Study study, ManagementPlan plan, int threads,
      Progress progress) {
    if (threads < 1) {
      throw new IllegalArgumentException("threads must be >= 1: " + threads);
    }
    int paths = study.paths().size();
    int replicates = study.replicates();
    ModelParameters p = study.parameters();
    LaneSimulator simulator = new LaneSimulator(p);
    int lanes = LaneSimulator.lanes();
    int batches = (replicates + lanes - 1) / lanes;
    Trajectory[][] out = new Trajectory[paths][replicates];
    ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
      Thread t = new Thread(r, "veldplan-run");
      t.setDaemon(true);
      return t;
    });
    try {
      List<Future<?>> tasks = new ArrayList<>();
      for (int worker = 0; worker < threads; worker++) {
        final int first = worker;
        tasks.add(pool.submit(() -> {
          LaneSimulator.Workspace workspace = simulator.workspace();
          // One job per path and batch of replicates run in lockstep.
          for (int job = first; job < paths * batches; job += threads) {
            int path = job / batches;
            int from = (job % batches) * lanes;
            int count = Math.min(lanes, replicates - from);
            Trajectory[] batch = Trajectory.batch(p);
            simulator.run(plan, study, path, from, count, workspace, batch);
            for (int i = 0; i < count; i++) {
              out[path][from + i] = batch[i];
              progress.runFinished();
            }
          }
        }));
      }
      awaitAll(tasks);
    } finally {
      pool.shutdownNow();
    }
    return out;
  }

  /**
   * A failed run's exception with what is needed to repeat it: the climate path, the replicate
   * (1-based), the scenario seed and the policy.
   */
  public static IllegalStateException failure(Study study, int path, int replicate,
      ManagementPlan plan, RuntimeException e) {
    String policy = plan.name().isBlank() ? "" : ", policy \"" + plan.name() + "\"";
    return new IllegalStateException(e.getMessage() + " (climate path \""
        + study.paths().get(path).name() + "\", replicate " + (replicate + 1)
        + ", scenario seed " + study.seed() + policy + ")", e);
  }

  /**
   * Waits for every task; rethrows the first failure as it was thrown in the task (a runtime
   * exception) or wrapped in an {@link IllegalStateException}.
   */
  public static void awaitAll(List<Future<?>> tasks) {
    try {
      for (Future<?> task : tasks) {
        task.get();
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted", e);
    } catch (ExecutionException e) {
      Throwable cause = e.getCause();
      if (cause instanceof RuntimeException) {
        throw (RuntimeException) cause;
      }
      throw new IllegalStateException(cause);
    }
  }
}
