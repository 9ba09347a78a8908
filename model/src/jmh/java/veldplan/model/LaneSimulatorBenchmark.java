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
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * A 100-year run of the example park (Duskveld, 6 burn blocks) for {@link LaneState#LANES}
 * replicates in lockstep, status-quo policy, reset and recording included: 600 x LANES
 * block-years per operation (4,800 with AVX-512). Block-years per second = 600 x LANES / (seconds
 * per op); compare {@link SimulatorBenchmark}, one replicate per operation.
 *
 * <pre>{@code
 * mvn -q -B -Pbench -pl model -am verify -Dbench.args="LaneSimulatorBenchmark -f 1 -wi 5 -w 2 -i 5 -r 2 -prof gc"
 * }</pre>
 *
 * <p>After each measured iteration it also prints the thread's CPU time per operation
 * ({@code cpu-us/op}): on a virtual machine whose host takes CPU time away from it (steal
 * time), wall-clock figures swing by tens of per cent while CPU time stays steadier.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
public class LaneSimulatorBenchmark {
  LaneSimulator simulator;
  ManagementPlan plan;
  LaneForcing forcing;
  LaneState state;
  Trajectory[] trajectories;

  @Setup(Level.Trial)
  public void setUp() throws Exception {
    ExamplePark park = ExamplePark.load(SimulatorBenchmark.YEARS);
    ModelParameters p = park.study.parameters();
    simulator = new LaneSimulator(p);
    plan = park.plan;
    Forcing[] replicates = new Forcing[LaneState.LANES];
    trajectories = Trajectory.batch(p);
    for (int r = 0; r < LaneState.LANES; r++) {
      replicates[r] = park.study.forcing(0, r);
    }
    forcing = new LaneForcing(replicates);
    state = new LaneState(p);
  }

  private static final java.lang.management.ThreadMXBean THREADS =
      java.lang.management.ManagementFactory.getThreadMXBean();
  long cpuNanos;
  long operations;

  /** One 100-year run of LANES replicates. */
  @Benchmark
  public Trajectory[] run100Years() {
    long start = THREADS.getCurrentThreadCpuTime();
    simulator.run(plan, forcing, state, trajectories);
    cpuNanos += THREADS.getCurrentThreadCpuTime() - start;
    operations++;
    return trajectories;
  }

  /** Prints the iteration's CPU time per operation and block-years per CPU second. */
  @TearDown(Level.Iteration)
  public void printCpuTime() {
    if (operations > 0) {
      double micros = cpuNanos / 1e3 / operations;
      System.out.printf(java.util.Locale.ROOT, "  cpu-us/op %.1f, %.2f million block-years"
          + " per CPU second%n", micros, 600.0 * LaneState.LANES / micros);
    }
    cpuNanos = 0;
    operations = 0;
  }
}
