package veldplan.objectives;

import java.util.Objects;
import veldplan.model.Trajectory;

/**
 * One objective: what one run scores, how the runs of a path make one estimate, and which way is
 * better. Immutable; the statistic is a pure function of one run's trajectory.
 *
 * @param name       identifier used in files, e.g. {@code guilds-persist} or
 *                   {@code guild-persists:rare antelope}
 * @param label      plain words for reports, e.g. "all guilds persist"
 * @param unit       unit of the value, e.g. "probability", "USD present value"
 * @param direction  which way is better
 * @param step       aggregation over the replicates of a path
 * @param best       best plausible value, fixed for the run (for normalising, e.g. hypervolume)
 * @param worst      worst plausible value, fixed for the run
 * @param statistic  the value of one run
 */
public record Objective(String name, String label, String unit, Direction direction,
    ReplicateStep step, double best, double worst, RunStatistic statistic) {

  /** The value one run scores. */
  @FunctionalInterface
  public interface RunStatistic {
    /** The value of {@code run}; 0 or 1 for a {@link ReplicateStep#PROBABILITY} objective. */
    double of(Trajectory run);
  }

  public Objective {
    Objects.requireNonNull(name);
    Objects.requireNonNull(direction);
    Objects.requireNonNull(step);
    Objects.requireNonNull(statistic);
    if (!(best != worst) || Double.isNaN(best) || Double.isNaN(worst)) {
      throw new IllegalArgumentException(name + ": best and worst must differ: " + best);
    }
  }

  /** The value of one run. */
  public double of(Trajectory run) {
    return statistic.of(run);
  }

  /**
   * The value as a quantity to minimise, scaled so that {@code best} maps to 0 and
   * {@code worst} to 1 (values beyond either end fall outside [0, 1]).
   */
  public double normalised(double value) {
    return (value - best) / (worst - best) + 0.0; // + 0.0 turns -0.0 into 0.0
  }

  /**
   * Column name in tables: the name in lower case with underscores, and a unit tag, e.g.
   * {@code management_cost_usd_pv} or {@code persists_rare_antelope_probability}.
   */
  public String column() {
    String base = name.replace("guild-persists:", "persists:");
    String tag;
    if (unit.endsWith(" present value")) {
      tag = unit.substring(0, unit.length() - " present value".length()) + " pv";
    } else if (unit.equals("% of park per year")) {
      tag = "percent per year";
    } else {
      tag = unit;
    }
    return slug(base) + "_" + slug(tag);
  }

  /** Lower case letters and digits, runs of anything else as one underscore. */
  public static String slug(String text) {
    String s = text.toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z0-9]+", "_");
    return s.replaceAll("^_+|_+$", "");
  }

  /** The same objective with other normalisation bounds. */
  public Objective withBounds(double newBest, double newWorst) {
    return new Objective(name, label, unit, direction, step, newBest, newWorst, statistic);
  }
}
