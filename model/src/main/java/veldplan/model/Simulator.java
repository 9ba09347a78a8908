package veldplan.model;

/**
 * Runs the park model: one replicate of one policy under one climate path at a time. The only
 * public entry point of the model.
 *
 * <p>Thread safety: a simulator is immutable and may be shared. Each thread brings its own
 * {@link EcosystemState} and {@link Trajectory}; {@link Forcing} and {@link ManagementPlan} are
 * read-only and shared.
 */
public final class Simulator {
  private final ModelParameters params;
  private final double[] discountFactor;

  /** A simulator for these parameters. */
  public Simulator(ModelParameters params) {
    this.params = params;
    this.discountFactor = new double[params.years()];
    double rate = params.costs().discountRatePercent() / 100;
    for (int year = 0; year < params.years(); year++) {
      // Costs fall at the end of the year: PV = C / (1 + i)^t, t = year + 1 (methods sheet §12.2).
      discountFactor[year] = Math.pow(1 + rate, -(year + 1));
    }
  }

  /** The parameters. */
  public ModelParameters parameters() {
    return params;
  }

  /**
   * Runs one replicate. Resets {@code state}, then writes every year into {@code out}. Allocates
   * nothing.
   *
   * @throws IllegalStateException if the state becomes non-finite or negative (a model bug); the
   *     message names the year and the variable
   */
  public void run(ManagementPlan plan, Forcing forcing, EcosystemState state, Trajectory out) {
    if (plan.blocks() != params.blocks().count) {
      throw new IllegalArgumentException("plan has " + plan.blocks() + " blocks, park has "
          + params.blocks().count);
    }
    state.reset(params);
    out.recordStart(state);
    for (int year = 0; year < params.years(); year++) {
      AnnualCycle.advance(params, plan, forcing, year, state);
      out.record(year, state, forcing, discountFactor[year]);
    }
    String problem = state.violation();
    if (problem != null) {
      throw new IllegalStateException("model state invalid at the end of the run: " + problem);
    }
  }
}
