package veldplan.model;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One lockstep process on the example park's lanes after 20 years, to see where a lockstep
 * year's time goes (compare {@link ProcessBenchmark}, one replicate). Time per operation is for
 * all {@link LaneState#LANES} replicates.
 *
 * <pre>{@code
 * mvn -q -B -Pbench -pl model -am verify -Dbench.args="LaneProcessBenchmark -f 1 -wi 5 -w 1 -i 5 -r 1 -prof gc"
 * }</pre>
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Fork(1)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
public class LaneProcessBenchmark {
  @Param({"0", "1", "2", "3", "4", "5", "6", "7", "8"})
  int process;

  ModelParameters params;
  ManagementPlan plan;
  LaneForcing forcing;
  LaneState state;
  Trajectory[] out;

  @Setup(Level.Trial)
  public void setUp() throws Exception {
    ExamplePark park = ExamplePark.load(0);
    params = park.study.parameters();
    plan = park.plan;
    Forcing[] replicates = new Forcing[LaneState.LANES];
    out = Trajectory.batch(params);
    state = new LaneState(params);
    for (int r = 0; r < LaneState.LANES; r++) {
      replicates[r] = park.study.forcing(0, r);
      EcosystemState s = new EcosystemState(params);
      s.reset(params);
      for (int year = 0; year < 20; year++) {
        AnnualCycle.advance(params, plan, replicates[r], year, s);
      }
      state.pack(r, s);
      if (r == 0) {
        Management.startOfYear(params, plan, 20, state.shared);
      }
    }
    forcing = new LaneForcing(replicates);
  }

  /** The process in year 20 (state drifts a little); 8 = recording the year's trajectories. */
  @Benchmark
  public LaneState step() {
    switch (process) {
      case 0 -> LaneManagement.startOfYear(params, plan, 20, state);
      case 1 -> LaneGrass.grow(params.grass(), params.trees(), forcing, 20, state);
      case 2 -> LaneHerbivory.forageAndGraze(params, state);
      case 3 -> LaneFire.burn(params, plan, forcing, 20, state);
      case 4 -> LaneTrees.update(params, forcing, 20, state);
      case 5 -> LaneAnimals.hunt(params, state);
      case 6 -> LaneAnimals.breedAndDie(params, forcing, 20, state);
      case 7 -> LaneManagement.endOfYear(params, plan, 20, state);
      default -> Trajectory.record(out, 20, state, forcing, 1.0);
    }
    return state;
  }
}
