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

  /** Replicates per lockstep run: one per vector lane on this machine. */
  public static int lanes() {
    return LANES;
  }

  /** What one thread needs to run batches: the lockstep state. */
  public static final class Workspace {
    final LaneState state;

    private Workspace(ModelParameters p) {
      state = new LaneState(p);
    }
  }

  /** A workspace for one thread. */
  public Workspace workspace() {
    return new Workspace(params);
  }

  /**
   * Runs replicates {@code first .. first + count - 1} of path {@code path} of the study in
   * lockstep, replicate {@code first + i} into {@code out[i]} of a batch made by
   * {@link Trajectory#batch}; the other lanes of the batch get replicates to discard (lanes
   * beyond the study's last replicate repeat it). Every lane depends on its own replicate only,
   * so a replicate's trajectory is the same in whichever batch and lane it runs.
   *
   * @param count 1 .. {@link #lanes()}
   * @throws IllegalStateException if a run fails (a model bug); the message names the path,
   *     replicate, seed and policy, and where the state first went wrong
   */
  public void run(ManagementPlan plan, Study study, int path, int first, int count,
      Workspace workspace, Trajectory[] out) {
    if (count < 1 || count > LANES || first < 0 || first + count > study.replicates()) {
      throw new IllegalArgumentException("replicates " + first + ".." + (first + count - 1)
          + " of " + study.replicates() + " in a batch of " + LANES);
    }
    LaneForcing forcing = study.laneForcing(path, first);
    try {
      run(plan, forcing, workspace.state, out);
    } catch (LaneFailure e) {
      throw Ensemble.failure(study, path, first + e.lane, plan,
          (RuntimeException) e.getCause());
    }
  }

  /**
   * Runs {@code forcing}'s replicates. Resets {@code state}, then writes every year of lane r
   * into {@code out[r]}.
   *
   * @throws LaneFailure if a lane's state becomes non-finite or negative (a model bug); its
   *     cause is the scalar simulator's diagnosis, naming the process, year and variable
   */
  void run(ManagementPlan plan, LaneForcing forcing, LaneState state, Trajectory[] out) {
    if (!Trajectory.isBatch(out)) {
      throw new IllegalArgumentException("the trajectories are not a batch of " + LANES
          + " made by Trajectory.batch");
    }
    if (plan.blocks() != params.blocks().count) {
      throw new IllegalArgumentException("plan has " + plan.blocks() + " blocks, park has "
          + params.blocks().count);
    }
    ModelParameters p = params;
    state.reset(p);
    Trajectory.recordStart(out, state);
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
      Trajectory.record(out, year, state, forcing, discount);
    }
    EcosystemState view = state.view;
    for (int r = 0; r < LANES; r++) {
      state.unpack(r, view);
      String problem = view.violation();
      if (problem != null) {
        // The scalar run of the same replicate finds and names where it went wrong.
        RuntimeException cause;
        try {
          scalar.run(plan, forcing.replicates[r], new EcosystemState(p), new Trajectory(p));
          cause = new IllegalStateException("model state invalid at the end of the run: "
              + problem);
        } catch (RuntimeException diagnosed) {
          cause = diagnosed;
        }
        throw new LaneFailure(r, cause);
      }
    }
  }

  /** A lane's run failed; its cause says where. */
  static final class LaneFailure extends IllegalStateException {
    private static final long serialVersionUID = 1L;
    final int lane;

    LaneFailure(int lane, RuntimeException cause) {
      super("lane " + lane + ": " + cause.getMessage(), cause);
      this.lane = lane;
    }
  }
}
