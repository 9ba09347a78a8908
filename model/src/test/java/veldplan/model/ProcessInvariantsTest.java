package veldplan.model;

import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * After every process of every year, under extreme inputs and over many seeds, all state stays
 * finite and non-negative and burnt fractions stay within the block.
 *
 * <p>Besides extreme climates, the cases cover extreme parks: elephant deaths at or above births
 * (so the food term has no positive rate to scale), no water at all (so water-dependent guilds
 * and elephants have no forage within reach), no predators, and the last two together.
 */
class ProcessInvariantsTest {

  enum Extreme {
    NO_RAIN, RAIN_3000_MM, HOT_45_C, CO2_1000_PPM, EVERYTHING_AT_ONCE,
    /** Mortality 0.2 against the builder's 0.3 x 0.25 = 0.075 births per elephant a year. */
    ELEPHANT_DEATHS_EXCEED_BIRTHS,
    /** No artificial water point and no perennial river: no forage within reach of water. */
    NO_WATER,
    NO_PREDATORS,
    /** No forage for elephants while their deaths exceed births. */
    NO_WATER_AND_ELEPHANT_DEATHS_EXCEED_BIRTHS
  }

  static Stream<Arguments> cases() {
    return Stream.of(Extreme.values())
        .flatMap(e -> IntStream.range(0, 12).mapToObj(seed -> Arguments.of(e, 1000L + seed)));
  }

  @ParameterizedTest(name = "{0}, seed {1}")
  @MethodSource("cases")
  void everyProcess_extremeInputs_stateStaysFiniteAndNonNegative(Extreme extreme, long seed) {
    TestParks park = new TestParks();
    park.seed = seed;
    park.blocks = 2;
    park.replicates = 1;
    park.years = 30;
    park.noiseSd = 0.5;
    park.fireReturnIntervalYears = 1.0;
    park.offtake = 0.2;
    park.contraception = 0.5;
    park.closureYear = 2040;
    switch (extreme) {
      case NO_RAIN -> park.rainfallMm = 0;
      case RAIN_3000_MM -> park.rainfallMm = 3000;
      case HOT_45_C -> {
        park.tmaxC = 45;
        park.tminC = 30;
      }
      case CO2_1000_PPM -> park.co2Ppm = 1000;
      case EVERYTHING_AT_ONCE -> {
        park.rainfallMm = 3000;
        park.tmaxC = 45;
        park.tminC = 30;
        park.co2Ppm = 1000;
        park.treesPerHa = new double[] {20000, 8000, 3000, 900, 400};
      }
      case ELEPHANT_DEATHS_EXCEED_BIRTHS -> park.elephantMortality = 0.2;
      case NO_WATER -> {
        park.waterPoints = 0;
        park.riverKm = 0;
      }
      case NO_PREDATORS -> park.withPredators = false;
      case NO_WATER_AND_ELEPHANT_DEATHS_EXCEED_BIRTHS -> {
        park.waterPoints = 0;
        park.riverKm = 0;
        park.elephantMortality = 0.2;
      }
      default -> throw new IllegalStateException();
    }
    ModelParameters p = park.parameters();
    Study study = park.study(p);
    ManagementPlan plan = park.plan();
    Forcing f = study.forcing(0, 0);
    EcosystemState s = new EcosystemState(p);
    s.reset(p);
    for (int year = 0; year < p.years(); year++) {
      s.year = year; // as AnnualCycle.advance does
      for (int process = 0; process < AnnualCycle.PROCESSES.length; process++) {
        AnnualCycle.step(process, p, plan, f, year, s);
        String where = AnnualCycle.PROCESSES[process] + ", year " + year;
        String problem = s.violation();
        assertNull(problem, where + ": " + problem);
      }
    }
  }
}
