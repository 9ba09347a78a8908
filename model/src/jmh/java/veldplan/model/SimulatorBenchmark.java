package veldplan.model;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * A 100-year run of the example park (Duskveld, 6 burn blocks), one replicate, status-quo policy,
 * reset included: 600 block-years per operation. Block-years per second = 600 / (seconds per
 * op). {@code gc.alloc.rate.norm} from {@code -prof gc} is the bytes allocated per run.
 *
 * <pre>{@code
 * mvn -q -B -Pbench -pl model -am verify -Dbench.args="SimulatorBenchmark -f 1 -wi 5 -w 2 -i 5 -r 2 -prof gc"
 * }</pre>
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
public class SimulatorBenchmark {
  /** Years per run: the 100-year benchmark. */
  static final int YEARS = 100;

  Simulator simulator;
  ManagementPlan plan;
  Forcing forcing;
  EcosystemState state;
  Trajectory trajectory;

  @Setup(Level.Trial)
  public void setUp() throws Exception {
    ExamplePark park = ExamplePark.load(YEARS);
    simulator = new Simulator(park.study.parameters());
    plan = park.plan;
    forcing = park.study.forcing(0, 0);
    state = new EcosystemState(park.study.parameters());
    trajectory = new Trajectory(park.study.parameters());
  }

  /** One 100-year run: 600 block-years. */
  @Benchmark
  public Trajectory run100Years() {
    simulator.run(plan, forcing, state, trajectory);
    return trajectory;
  }
}
