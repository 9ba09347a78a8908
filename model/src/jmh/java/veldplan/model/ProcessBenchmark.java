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
 * One process of the yearly cycle on the example park's state after 20 years, to see where a
 * year's time goes. {@code process} is the index into {@link AnnualCycle#PROCESSES}.
 *
 * <pre>{@code
 * mvn -q -B -Pbench -pl model -am verify -Dbench.args="ProcessBenchmark -f 1 -wi 5 -w 1 -i 5 -r 1"
 * }</pre>
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Fork(1)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
public class ProcessBenchmark {
  @Param({"0", "1", "2", "3", "4", "5", "6", "7"})
  int process;

  ModelParameters params;
  ManagementPlan plan;
  Forcing forcing;
  EcosystemState state;

  @Setup(Level.Trial)
  public void setUp() throws Exception {
    ExamplePark park = ExamplePark.load(0);
    params = park.study.parameters();
    plan = park.plan;
    forcing = park.study.forcing(0, 0);
    state = park.stateAfter(20);
    for (int p = 0; p < process; p++) {
      AnnualCycle.step(p, params, plan, forcing, 20, state);
    }
  }

  /** The process on the state as it stands before it in year 20 (state drifts a little). */
  @Benchmark
  public EcosystemState step() {
    AnnualCycle.step(process, params, plan, forcing, 20, state);
    return state;
  }
}
