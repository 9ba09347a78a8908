package veldplan.model;

import static veldplan.model.LaneState.LANES;

/**
 * Runs {@link LaneState#LANES} replicates of one policy in lockstep: the same model as
 * {@link Simulator}, process for process (the {@code Lane*} classes), with each quantity of all
 * replicates in one vector. Each replicate's trajectory is the one {@link Simulator} gives for
 * it, up to the last bits of the vector exponentials, logarithms and powers.
 *
 * <p>Thread safety: immutable and shareable; each thread brings its own {@link LaneState} and
 * trajectories.
 */
public final class LaneSimulator {
  private final ModelParameters params;
  private final Simulator scalar;

  /** A lockstep simulator for these parameters. */
  public LaneSimulator(ModelParameters params) {
    this.params = params;
    this.scalar = new Simulator(params);
  }

  /** Replicates per run: one per vector lane on this machine. */
  public static int lanes() {
    return LANES;
  }

  /**
   * Runs {@code forcing}'s replicates. Resets {@code state}, then writes every year of lane r
   * into {@code out[r]}.
   *
   * @throws IllegalStateException if a lane's state becomes non-finite or negative (a model
   *     bug); the message is the scalar simulator's, naming the process, year and variable
   */
  public void run(ManagementPlan plan, LaneForcing forcing, LaneState state, Trajectory[] out) {
    if (out.length != LANES) {
      throw new IllegalArgumentException(out.length + " trajectories for " + LANES + " lanes");
    }
    if (plan.blocks() != params.blocks().count) {
      throw new IllegalArgumentException("plan has " + plan.blocks() + " blocks, park has "
          + params.blocks().count);
    }
    ModelParameters p = params;
    state.reset(p);
    for (int r = 0; r < LANES; r++) {
      out[r].recordStart(state, r);
    }
    for (int year = 0; year < p.years(); year++) {
      state.shared.year = year;
      LaneManagement.startOfYear(p, plan, year, state);
      LaneGrass.grow(p.grass(), p.trees(), forcing, year, state);
      LaneHerbivory.forageAndGraze(p, state);
      LaneFire.burn(p, plan, forcing, year, state);
      LaneTrees.update(p, forcing, year, state);
      LaneAnimals.hunt(p, state);
      LaneAnimals.breedAndDie(p, forcing, year, state);
      LaneManagement.endOfYear(p, plan, year, state);
      double discount = scalar.discountFactor(year);
      for (int r = 0; r < LANES; r++) {
        out[r].record(year, state, r, forcing.replicates[r], discount);
      }
    }
    EcosystemState view = state.view;
    for (int r = 0; r < LANES; r++) {
      state.unpack(r, view);
      if (view.violation() != null) {
        // The scalar run of the same replicate finds and names where it went wrong.
        scalar.run(plan, forcing.replicates[r], new EcosystemState(p), new Trajectory(p));
        throw new IllegalStateException("model state invalid in lane " + r + ": "
            + view.violation());
      }
    }
  }
}
