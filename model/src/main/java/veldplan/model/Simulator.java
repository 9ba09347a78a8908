package veldplan.model;

import veldplan.model.ecology.Discounting;

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
      discountFactor[year] = Discounting.presentValue(1, rate, year + 1);
    }
  }

  /** Present-value factor of the costs of model year {@code year} (paid at its end). */
  double discountFactor(int year) {
    return discountFactor[year];
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
   *     message names the process, the calendar year and the variable
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
    if (state.violation() != null) {
      throw new IllegalStateException(diagnose(plan, forcing, state));
    }
  }

  /**
   * Runs the replicate again, checking the state after every process, and says where it first
   * went wrong. Only called after a failed run, so the normal run pays nothing for it.
   */
  private String diagnose(ManagementPlan plan, Forcing forcing, EcosystemState state) {
    state.reset(params);
    for (int year = 0; year < params.years(); year++) {
      state.year = year;
      for (int process = 0; process < AnnualCycle.PROCESSES.length; process++) {
        AnnualCycle.step(process, params, plan, forcing, year, state);
        String problem = state.violation();
        if (problem != null) {
          return "model state invalid after " + AnnualCycle.PROCESSES[process] + " in year "
              + (params.startYear() + year) + ": " + problem;
        }
      }
    }
    return "model state invalid at the end of the run: " + state.violation();
  }
}
