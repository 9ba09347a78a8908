package veldplan.model;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * Facts of the trade the model as a whole must reproduce. Each check says whether it is common
 * practice (no source) or where it comes from; the parks are test fixtures, not check values.
 */
class FactsOfTheTradeTest {

  /** Mean grass production potential (no trees, no grazing) over years 2–5, block 0. */
  private static double grassPotential(TestParks park) {
    park.replicates = 1;
    park.years = 6;
    Forcing f = park.study().forcing(0, 0);
    double sum = 0;
    for (int y = 2; y < 6; y++) {
      sum += f.grassPotentialKgPerHa(y, 0);
    }
    return sum / 4;
  }

  private static double treeIndex(TestParks park) {
    park.replicates = 1;
    park.years = 6;
    Forcing f = park.study().forcing(0, 0);
    double sum = 0;
    for (int y = 2; y < 6; y++) {
      sum += f.treeGrowthIndex(y, 0);
    }
    return sum / 4;
  }

  private static double[] productionCurve(double sand, double clay, int[] rainfall) {
    double[] out = new double[rainfall.length];
    for (int i = 0; i < rainfall.length; i++) {
      TestParks park = new TestParks();
      park.sand = sand;
      park.clay = clay;
      park.rainfallMm = rainfall[i];
      out[i] = grassPotential(park);
    }
    return out;
  }

  /** Least-squares slope and R^2 of y on x. */
  private static double[] fit(int[] x, double[] y) {
    double mx = Arrays.stream(x).average().orElseThrow();
    double my = Arrays.stream(y).average().orElseThrow();
    double sxy = 0;
    double sxx = 0;
    double syy = 0;
    for (int i = 0; i < x.length; i++) {
      sxy += (x[i] - mx) * (y[i] - my);
      sxx += (x[i] - mx) * (x[i] - mx);
      syy += (y[i] - my) * (y[i] - my);
    }
    return new double[] {sxy / sxx, sxy * sxy / (sxx * syy)};
  }

  private static final int[] RAINFALL = {200, 300, 400, 500, 600, 700};
  // Sand, loam and clay loam classes of Saxton & Rawls (2006), class table reproduced in the
  // methods sheet §3 (sand 88/5, loam 40/20, clay loam 30/35 % sand/clay).
  private static final double[] SAND = {0.88, 0.05};
  private static final double[] LOAM = {0.40, 0.20};
  private static final double[] CLAY_LOAM = {0.30, 0.35};

  @Test
  void grassProduction_rainfall_risesAboutLinearlyWithASteeperSlopeOnClayRichSoils() {
    // Common practice, no source: in water-limited savannas grass production rises about
    // linearly with rainfall, more steeply on clay-rich soils.
    double[] sand = productionCurve(SAND[0], SAND[1], RAINFALL);
    double[] clayLoam = productionCurve(CLAY_LOAM[0], CLAY_LOAM[1], RAINFALL);
    double[] sandFit = fit(RAINFALL, sand);
    double[] clayFit = fit(RAINFALL, clayLoam);
    String shown = "sand " + Arrays.toString(sand) + ", clay loam " + Arrays.toString(clayLoam);
    // "About linearly": a straight line explains at least 90 % of the variance over 200-700 mm.
    assertTrue(sandFit[1] > 0.9, "sand R2 " + sandFit[1] + ": " + shown);
    assertTrue(clayFit[1] > 0.9, "clay loam R2 " + clayFit[1] + ": " + shown);
    assertTrue(sandFit[0] > 0 && clayFit[0] > sandFit[0], "slopes " + sandFit[0] + " (sand), "
        + clayFit[0] + " (clay loam): " + shown);
  }

  @Test
  void grassProduction_sandVersusLoam_sandAheadAtLowRainfallLoamAheadAtHigh() {
    // Sala et al. (1988, Ecology 69: 40-45) [V, abstract via methods sheet §4.1]: below about
    // 370 mm sandy soils out-produce loams, above it the reverse; test at 300 and 600 mm as the
    // methods sheet suggests.
    int[] rain = {300, 600};
    double[] sand = productionCurve(SAND[0], SAND[1], rain);
    double[] loam = productionCurve(LOAM[0], LOAM[1], rain);
    assertTrue(sand[0] > loam[0], "300 mm: sand " + sand[0] + ", loam " + loam[0]);
    assertTrue(loam[1] > sand[1], "600 mm: sand " + sand[1] + ", loam " + loam[1]);
  }

  @Test
  void grass_treeBasalArea_firstIncrementsSuppressTheMost() {
    // Common practice, no source: the first increments of tree biomass suppress grass the most
    // (the curvilinear relation of Smit 2005 [V, abstract]).
    TestParks park = new TestParks();
    park.years = 3;
    park.replicates = 1;
    ModelParameters p = park.parameters();
    Forcing f = park.study(p).forcing(0, 0);
    double[] production = new double[6];
    for (int step = 0; step < production.length; step++) {
      EcosystemState s = new EcosystemState(p);
      s.reset(p);
      Arrays.fill(s.treesPerHa, 0);
      s.treesPerHa[TreeClass.FROM_5_TO_9M.ordinal()] = 60.0 * step; // 1.5 m2/ha per step
      Grass.grow(p.grass(), p.trees(), f, 1, s);
      production[step] = s.grassProductionKgPerHa[0];
    }
    for (int step = 1; step < production.length - 1; step++) {
      double first = production[step - 1] - production[step];
      double next = production[step] - production[step + 1];
      assertTrue(first > next && next > 0, Arrays.toString(production));
    }
  }

  @Test
  void co2_effect_saturatesNear1000PpmAndIsSmallerForC4GrassThanC3Trees() {
    // Common practice, no source: the CO2 fertilisation effect saturates around 1000 ppm and is
    // smaller for C4 grasses than for C3 trees (beta 0-0.2 vs 0.4-0.6, methods sheet §7.1, from
    // memory).
    double[] ppm = {400, 500, 1000, 1100};
    double[] grass = new double[ppm.length];
    double[] trees = new double[ppm.length];
    for (int i = 0; i < ppm.length; i++) {
      TestParks park = new TestParks();
      park.co2Ppm = ppm[i];
      grass[i] = grassPotential(park);
      park = new TestParks();
      park.co2Ppm = ppm[i];
      trees[i] = treeIndex(park);
    }
    double grassGain = grass[2] / grass[0] - 1;
    double treeGain = trees[2] / trees[0] - 1;
    assertTrue(grassGain > 0 && treeGain > 2 * grassGain,
        "400 -> 1000 ppm: grass +" + grassGain + ", trees +" + treeGain);
    double treeEarly = trees[1] / trees[0] - 1;
    double treeLate = trees[3] / trees[2] - 1;
    double grassEarly = grass[1] / grass[0] - 1;
    double grassLate = grass[3] / grass[2] - 1;
    assertTrue(treeLate < 0.3 * treeEarly, "trees +100 ppm at 400: " + treeEarly + ", at 1000: "
        + treeLate);
    assertTrue(grassLate < 0.3 * grassEarly, "grass +100 ppm at 400: " + grassEarly
        + ", at 1000: " + grassLate);
  }

  @Test
  void temperature_optimum_higherForC4GrassThanC3Trees() {
    // Common practice, no source: C4 grasses have a higher temperature optimum than C3 trees.
    double bestGrass = Double.NaN;
    double bestTrees = Double.NaN;
    double maxGrass = -1;
    double maxTrees = -1;
    for (double shift = -10; shift <= 14; shift += 1) {
      TestParks park = new TestParks();
      park.tmaxC = 28 + shift;
      park.tminC = 14 + shift;
      park.seasonalAmplitudeC = 0;
      double grass = grassPotential(park);
      park = new TestParks();
      park.tmaxC = 28 + shift;
      park.tminC = 14 + shift;
      park.seasonalAmplitudeC = 0;
      double trees = treeIndex(park);
      if (grass > maxGrass) {
        maxGrass = grass;
        bestGrass = 21 + shift;
      }
      if (trees > maxTrees) {
        maxTrees = trees;
        bestTrees = 21 + shift;
      }
    }
    assertTrue(bestGrass > bestTrees + 2, "optimum mean temperature: grass " + bestGrass
        + " °C, trees " + bestTrees + " °C");
  }

  @Test
  void burntArea_growingDays_risesTo140AndFallsBeyond170() {
    // Common practice, no source: burnt area rises with the number of growing days up to about
    // 140 a year and falls beyond about 170.
    double[] sum = new double[3];
    int[] count = new int[3];
    StringBuilder seen = new StringBuilder();
    for (int months : new int[] {4, 5, 6, 7, 8}) {
      for (int rain = 400; rain <= 1200; rain += 200) {
        TestParks park = new TestParks();
        park.rainPattern = TestParks.wetSeason(months);
        park.rainfallMm = rain;
        park.fireReturnIntervalYears = null;
        park.years = 30;
        park.replicates = 6;
        park.elephants = 0;
        double burnt = 0;
        double days = 0;
        int n = 0;
        for (Trajectory t : park.run()) {
          for (int y = 5; y < t.years(); y++) {
            burnt += t.get(BlockSeries.BURNT_FRACTION, y, 0);
            days += t.get(BlockSeries.GROWING_DAYS, y, 0);
            n++;
          }
        }
        burnt /= n;
        days /= n;
        int bin = days < 100 ? 0 : days <= 170 ? 1 : 2;
        if (days > 200 || days < 100 || (days >= 110 && days <= 170)) {
          sum[bin] += burnt;
          count[bin]++;
        }
        seen.append(String.format(java.util.Locale.ROOT, " (%.0f d: %.3f)", days, burnt));
      }
    }
    for (int bin = 0; bin < 3; bin++) {
      assertTrue(count[bin] > 0, "no climate in growing-day bin " + bin + ":" + seen);
    }
    double low = sum[0] / count[0];
    double mid = sum[1] / count[1];
    double high = sum[2] / count[2];
    assertTrue(mid > 1.15 * low, "burnt below 100 d " + low + ", 110-170 d " + mid + ":" + seen);
    assertTrue(mid > 2 * high, "burnt 110-170 d " + mid + ", above 200 d " + high + ":" + seen);
  }

  @Test
  void predators_lowDensityAndAmplePrey_growMoreSlowlyThanTheirPrey() {
    // Common practice, no source: predators grow more slowly than their prey.
    TestParks park = new TestParks();
    park.noiseSd = 0;
    park.replicates = 1;
    park.years = 1;
    park.grazers = 300;
    park.rareGrazers = 50;
    park.mixedFeeders = 500;
    park.predatorsPerGuild = 2;
    park.elephants = 0;
    Trajectory t = park.run()[0];
    double predator = Math.log(t.predatorAbundance(0, 0) / t.initialPredatorAbundance(0));
    for (int h : new int[] {0, 1, 3}) { // the guilds the test predator hunts
      double prey = Math.log(t.abundance(0, h) / t.initialAbundance(h));
      assertTrue(predator < prey, "predator " + predator + ", prey " + h + ": " + prey);
    }
  }

  @Test
  void elephants_noPredatorsNoManagement_exceedFourTonnesPerKm2AndCoppiceTheTrees() {
    // Common practice, no source: with no predators and no management, elephants can exceed
    // about 4 tonnes per km2 and push the tree layer into a short, coppiced state.
    TestParks park = new TestParks();
    park.withPredators = false;
    park.fireReturnIntervalYears = null;
    park.rainfallMm = 700;
    park.elephants = 100; // 0.5 per km2 on 200 km2
    park.grazers = 600;
    park.browsers = 300;
    park.mixedFeeders = 1000;
    park.years = 150;
    park.replicates = 4;
    Trajectory[] with = park.run();
    park.elephants = 0;
    Trajectory[] without = park.run();
    ModelParameters p = park.parameters();
    int e = p.herbivores().elephantIndex();
    double km2 = p.blocks().totalAreaKm2();
    double elephantKg = p.herbivores().bodyMassKg(e);
    for (int r = 0; r < with.length; r++) {
      Trajectory t = with[r];
      double peak = 0;
      for (int y = 0; y < t.years(); y++) {
        peak = Math.max(peak, t.abundance(y, e) * elephantKg / km2);
      }
      assertTrue(peak > 4000, "peak elephant biomass " + peak + " kg/km2");
      // Over the last 30 years: far fewer large trees than the same park without elephants,
      // and most stems short resprouts below 2 m.
      double large = 0;
      double largeWithout = 0;
      double below = 0;
      double above = 0;
      for (int y = t.years() - 30; y < t.years(); y++) {
        large += t.get(BlockSeries.LARGE_TREES, y, 0);
        largeWithout += without[r].get(BlockSeries.LARGE_TREES, y, 0);
        below += t.get(BlockSeries.TREES_BELOW_0_5M, y, 0)
            + t.get(BlockSeries.TREES_0_5_TO_2M, y, 0);
        above += t.get(BlockSeries.TREES_2_TO_5M, y, 0) + t.get(BlockSeries.LARGE_TREES, y, 0);
      }
      assertTrue(large < 0.4 * largeWithout, "large trees with elephants " + large / 30
          + ", without " + largeWithout / 30);
      assertTrue(below > above, "stems below 2 m " + below / 30 + ", above " + above / 30);
    }
  }
}
