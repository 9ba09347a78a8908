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
 * The steps of {@link Herbivory#forageAndGraze} one by one on the example park's state after 20
 * years.
 *
 * <pre>{@code
 * mvn -q -B -Pbench -pl model -am verify -Dbench.args="HerbivoryBenchmark -f 1 -wi 5 -w 1 -i 5 -r 1"
 * }</pre>
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Fork(1)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
public class HerbivoryBenchmark {
  ModelParameters params;
  EcosystemState state;

  @Setup(Level.Trial)
  public void setUp() throws Exception {
    ExamplePark park = ExamplePark.load(0);
    params = park.study.parameters();
    state = park.stateAfter(20);
    AnnualCycle.step(0, params, park.plan, park.study.forcing(0, 0), 20, state);
    AnnualCycle.step(1, params, park.plan, park.study.forcing(0, 0), 20, state);
  }

  @Benchmark
  public EcosystemState browseAndTallGrass() {
    Herbivory.browseAndTallGrass(params, state);
    return state;
  }

  @Benchmark
  public EcosystemState elephantDiet() {
    Herbivory.elephantDiet(params, state);
    return state;
  }

  @Benchmark
  public EcosystemState usableForage() {
    Herbivory.usableForage(params, state);
    return state;
  }

  @Benchmark
  public EcosystemState compete() {
    Herbivory.compete(params, state);
    return state;
  }
}
